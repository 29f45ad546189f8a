import { MaterialVersionInputSchema, type MaterialVersionInput } from "../../../shared/schemas/material";
import { CORRELATION_SETS } from "../../../shared/thermal/blanket-correlation";
import type { Emissivity } from "../../../shared/thermal/emissivity";
import { CRYOGENS, SATURATION_PRESSURE_PA } from "../../../shared/thermal/fluids";
import { SUPPORT_MATERIALS, type SupportMaterial } from "../../../shared/thermal/supports";
import type { Db } from "../client";
import * as repo from "../repositories/materials";

/**
 * The global library every organization starts with: read-only, organization_id NULL.
 *
 * Emissivities are recalled, not read off the tables; every such source says "from memory" and
 * names the compilation we believe it comes from, so an owner knows what to check before relying
 * on it. Fluid data, conductivity fits and correlation sets are not copied here: the rows are
 * built from the engine's own tables, so there is one table of each. No seed entry carries a
 * low/high band or a thickness/areal mass: we had no number for them we could name a source for.
 */
export interface SeedEntry {
  id: string;
  input: MaterialVersionInput;
}

const BARRON = { type: "citation", author: "R. F. Barron", title: "Cryogenic Systems, 2nd ed.", year: 1985, location: "tables of emissivities (table number not recalled)", fromMemory: true } as const;
const EKIN = { type: "citation", author: "J. W. Ekin", title: "Experimental Techniques for Low-Temperature Measurements", year: 2006, location: "App. A, emissivity data (table number not recalled)", fromMemory: true } as const;
const FLYNN = { type: "citation", author: "T. M. Flynn", title: "Cryogenic Engineering, 2nd ed.", year: 2005, location: "chapter on insulation", fromMemory: true } as const;

// Liquid-helium, liquid-nitrogen and room temperature: the three columns such tables print.
const HANDBOOK_TEMPERATURES_K = [4.2, 77, 300] as const;
const handbookTable = (e4: number, e77: number, e300: number): Emissivity => ({
  kind: "table",
  points: [
    [HANDBOOK_TEMPERATURES_K[0], e4],
    [HANDBOOK_TEMPERATURES_K[1], e77],
    [HANDBOOK_TEMPERATURES_K[2], e300],
  ],
});
const HANDBOOK_RANGE = { min: HANDBOOK_TEMPERATURES_K[0], max: HANDBOOK_TEMPERATURES_K[2] };

/** A reflector metallized on both faces, so both faces share one model, with its low/high band when one is given. */
function reflector(id: string, name: string, form: "film" | "foil", model: Emissivity, source: MaterialVersionInput["source"], band?: { low: Emissivity; high: Emissivity }): SeedEntry {
  const face = { model, ...(band ? { low: band.low, high: band.high } : {}) };
  return { id, input: entry(name, { kind: "reflector", form, warmSide: face, coldSide: face }, HANDBOOK_RANGE, source) };
}

function wallFinish(id: string, name: string, model: Emissivity, range: { min: number; max: number }, source: MaterialVersionInput["source"]): SeedEntry {
  return { id, input: entry(name, { kind: "wall-finish", surface: { model } }, range, source) };
}

function entry(name: string, properties: MaterialVersionInput["properties"], validRange_K: { min: number; max: number }, source: MaterialVersionInput["source"]): MaterialVersionInput {
  return { name, properties, validRange_K, thickness_m: null, arealMass_kg_per_m2: null, cost_per_m2: null, source, changeNote: "Frostfold seed" };
}

const reflectors: SeedEntry[] = [
  reflector("seed-reflector-al-foil", "Bright aluminium foil", "foil", handbookTable(0.011, 0.018, 0.04), { ...BARRON, note: "values recalled, approximate; check before relying on them" }),
  // The band is the spread of the films' values in handbook compilations as recalled (from
  // memory): deposit thickness, handling and ageing move a film's emissivity by about that much.
  reflector(
    "seed-reflector-al-polyester",
    "Double-aluminized polyester film (vacuum-deposited aluminium)",
    "film",
    handbookTable(0.015, 0.02, 0.035),
    { ...BARRON, note: "values recalled, approximate; the 300 K value agrees with the 0.031 the 1974 correlation was fitted with; low/high band recalled as the spread between sources" },
    { low: handbookTable(0.01, 0.015, 0.025), high: handbookTable(0.025, 0.03, 0.05) },
  ),
  reflector(
    "seed-reflector-al-polyimide",
    "Double-aluminized polyimide film (vacuum-deposited aluminium)",
    "film",
    handbookTable(0.015, 0.025, 0.04),
    { ...FLYNN, note: "values recalled, approximate; low/high band recalled as the spread between sources" },
    { low: handbookTable(0.01, 0.018, 0.03), high: handbookTable(0.025, 0.035, 0.055) },
  ),
];

const wallFinishes: SeedEntry[] = [
  wallFinish("seed-wall-copper-polished", "Polished copper", handbookTable(0.015, 0.019, 0.03), HANDBOOK_RANGE, { ...EKIN, note: "mechanically polished; values recalled" }),
  wallFinish("seed-wall-gold", "Gold, polished or plated", handbookTable(0.01, 0.01, 0.02), HANDBOOK_RANGE, { ...EKIN, note: "values recalled" }),
  wallFinish("seed-wall-silver", "Silver, polished or plated", handbookTable(0.0044, 0.008, 0.022), HANDBOOK_RANGE, { ...EKIN, note: "values recalled" }),
  wallFinish("seed-wall-ss304-polished", "Polished 304 stainless steel", handbookTable(0.04, 0.061, 0.07), HANDBOOK_RANGE, { ...EKIN, note: "values recalled" }),
  // One remembered room-temperature value carried down with the Hagen–Rubens law ε ∝ T^0.5; the
  // law fails below about 77 K (anomalous skin effect), hence the range.
  wallFinish("seed-wall-al-alloy-polished", "Polished aluminium alloy", { kind: "power", reference: 0.06, referenceTemperature_K: 300, exponent: 0.5 }, { min: 77, max: 300 }, {
    type: "citation",
    author: "R. Siegel & J. R. Howell",
    title: "Thermal Radiation Heat Transfer, 4th ed.",
    year: 2002,
    location: "Sec. 4.5 (Hagen–Rubens relation, exponent 0.5)",
    fromMemory: true,
    note: "300 K emissivity 0.06 recalled from handbook compilations (e.g. Ekin, 2006, App. A); lowest confidence of the seed",
  }),
];

// The 1974 correlation's solid term per gap is h = C_s·N̄^a·T_m (q_s = h·ΔT/(N + 1)). We evaluate
// it at 20 layers/cm (our choice, a typical blanket) and T_m of a 77–300 K blanket, and keep both
// reference conditions so the layer-by-layer model scales it to each block and gap.
const SPACER_LAYER_DENSITY_PER_CM = 20;
const SPACER_RANGE = { min: 77, max: 300 };
function spacerFromCorrelation(id: string, name: string, setId: string): SeedEntry {
  const set = CORRELATION_SETS.find((s) => s.id === setId);
  if (!set) throw new Error(`seed: the engine has no correlation set ${setId}`);
  const meanTemperature_K = (SPACER_RANGE.min + SPACER_RANGE.max) / 2;
  const conductance_W_per_m2_K = set.coefficients.solid * SPACER_LAYER_DENSITY_PER_CM ** set.coefficients.solidExponent * meanTemperature_K;
  const solidConduction = {
    conductance_W_per_m2_K: Number(conductance_W_per_m2_K.toPrecision(3)),
    referenceMeanTemperature_K: meanTemperature_K,
    referenceLayerDensity_per_cm: SPACER_LAYER_DENSITY_PER_CM,
    layerDensityExponent: set.coefficients.solidExponent,
  };
  return {
    id,
    input: entry(name, { kind: "spacer", form: "netting", solidConduction }, SPACER_RANGE, {
      type: "citation",
      author: "G. R. Cunnington, C. W. Keller & C. L. Glassford",
      title: "Thermal Performance of Multilayer Insulations, NASA CR-134477",
      year: 1974,
      location: `solid-conduction term of the ${set.label} fit`,
      fromMemory: true,
      note: `derived: C_s·N̄^a·T_m with the engine's set ${set.id} at ${SPACER_LAYER_DENSITY_PER_CM} layers/cm and T_m = ${meanTemperature_K} K, scaled as N̄^${set.coefficients.solidExponent}·T_m elsewhere; ${set.provenance}`,
    }),
  };
}

const spacers: SeedEntry[] = [
  spacerFromCorrelation("seed-spacer-polyester-netting", "Polyester netting", "kcg-1974-polyester-netting"),
  spacerFromCorrelation("seed-spacer-silk-netting", "Silk netting", "kcg-1974-silk-netting"),
  {
    id: "seed-spacer-glass-fiber-paper",
    input: entry("Glass-fiber paper", { kind: "spacer", form: "paper", solidConduction: null }, { min: 4.2, max: 300 }, {
      ...FLYNN,
      note: "glass-fiber paper as a spacer is described there; range recalled; no solid-conduction value recalled, so none is given: enter a measured one on a copy",
    }),
  },
];

const SUPPORT_IDS: Record<SupportMaterial, string> = {
  "stainless-304": "seed-support-ss304",
  "g10-normal": "seed-support-g10-normal",
  "g10-warp": "seed-support-g10-warp",
  ptfe: "seed-support-ptfe",
  "copper-ofhc-rrr50": "seed-support-cu-ofhc-rrr50",
  "copper-ofhc-rrr100": "seed-support-cu-ofhc-rrr100",
};
// The entry only points at the engine's fit by key; label, range and source come from the fit.
const supports: SeedEntry[] = (Object.keys(SUPPORT_MATERIALS) as SupportMaterial[]).map((key) => {
  const fit = SUPPORT_MATERIALS[key];
  const [min, max] = fit.validRange_K;
  return {
    id: SUPPORT_IDS[key] ?? `seed-support-${key}`.slice(0, 32),
    input: entry(fit.label, { kind: "support-material", supportMaterial: key }, { min, max }, {
      type: "citation",
      author: "E. D. Marquardt, J. P. Le & R. Radebaugh",
      title: "Cryogenic Material Properties Database, 11th International Cryocooler Conference",
      year: 2000,
      location: fit.fitSource,
      fromMemory: false,
      note: fit.fitError_percent ? `fit within about ${fit.fitError_percent} % of its data` : null,
    }),
  };
});

// Published sources of each engine correlation set; an unknown set still gets its provenance.
const CORRELATION_CITATIONS: Record<string, { author: string; title: string; year: number }> = {
  "kcg-1974-polyester-netting": { author: "G. R. Cunnington, C. W. Keller & C. L. Glassford", title: "Thermal Performance of Multilayer Insulations, NASA CR-134477", year: 1974 },
  "kcg-1974-silk-netting": { author: "G. R. Cunnington, C. W. Keller & C. L. Glassford", title: "Thermal Performance of Multilayer Insulations, NASA CR-134477", year: 1974 },
  "modified-polyester-netting": { author: "W. L. Johnson", title: "Thermal Performance of Cryogenic Multilayer Insulation at Various Layer Spacings", year: 2010 },
};
const correlations: SeedEntry[] = CORRELATION_SETS.map((set) => {
  const cited = CORRELATION_CITATIONS[set.id];
  return {
    id: `seed-corr-${set.id}`.slice(0, 32),
    input: entry(
      set.label,
      { kind: "correlation-set", basedOn: set.id, coefficients: { ...set.coefficients }, fittedEmissivity: set.emissivity },
      // From memory: the tests behind the fits ran between about liquid-hydrogen and room temperature.
      { min: 20, max: 300 },
      cited ? { type: "citation", ...cited, location: null, fromMemory: true, note: `${set.provenance}; range recalled` } : { type: "memory", note: set.provenance },
    ),
  };
});

const cryogens: SeedEntry[] = Object.values(CRYOGENS).map((fluid) => ({
  id: `seed-cryogen-${fluid.id}`,
  input: entry(
    fluid.label,
    {
      kind: "cryogen",
      fluid: fluid.id,
      saturationTemperature_K: fluid.saturationTemperature_K,
      latentHeat_J_per_kg: fluid.latentHeat_J_per_kg,
      liquidDensity_kg_per_m3: fluid.liquidDensity_kg_per_m3,
      vapourDensity_kg_per_m3: fluid.vapourDensity_kg_per_m3,
      molarMass_kg_per_mol: fluid.molarMass_kg_per_mol,
    },
    { min: fluid.saturationTemperature_K, max: fluid.saturationTemperature_K },
    {
      type: "citation",
      author: "E. W. Lemmon, M. O. McLinden & D. G. Friend",
      title: "Thermophysical Properties of Fluid Systems, NIST Chemistry WebBook",
      year: null,
      location: `saturation at ${SATURATION_PRESSURE_PA} Pa`,
      fromMemory: /from memory/i.test(fluid.source),
      note: fluid.source,
    },
  ),
}));

/** Every seed entry, validated by the same schema the API uses (a bad seed fails loudly). */
export function librarySeedEntries(): SeedEntry[] {
  return [...reflectors, ...wallFinishes, ...spacers, ...supports, ...correlations, ...cryogens].map((e) => ({ id: e.id, input: MaterialVersionInputSchema.parse(e.input) }));
}

const contentKey = (v: { name: string; properties: unknown; validMinK: number; validMaxK: number; thicknessM: number | null; arealMassKgPerM2: number | null; costPerM2: number | null; source: unknown }) =>
  JSON.stringify([v.name, v.properties, v.validMinK, v.validMaxK, v.thicknessM, v.arealMassKgPerM2, v.costPerM2, v.source]);

/**
 * Inserts missing seed entries; when the engine's tables changed, adds a new approved version so
 * designs that point at the old one still resolve. A second run with nothing changed writes nothing.
 * Seed changes write no audit entry: the audit log belongs to organizations, and no one acted.
 */
export async function seedLibrary(db: Db, deps: { newId: () => string; now: Date }): Promise<{ inserted: number; updated: number }> {
  let inserted = 0;
  let updated = 0;
  await db.transaction(async (tx) => {
    for (const { id, input } of librarySeedEntries()) {
      const row = {
        status: "approved" as const,
        name: input.name,
        properties: input.properties,
        validMinK: input.validRange_K.min,
        validMaxK: input.validRange_K.max,
        thicknessM: input.thickness_m,
        arealMassKgPerM2: input.arealMass_kg_per_m2,
        costPerM2: input.cost_per_m2,
        source: input.source,
        changeNote: input.changeNote ?? null,
        proposedByUserId: null,
        proposedAt: deps.now,
        decidedAt: deps.now,
      };
      const existing = await repo.findSeedMaterial(tx, id);
      if (!existing) {
        await repo.insertSeedMaterial(
          tx,
          { id, kind: input.properties.kind, name: input.name, status: "approved", currentVersion: 1, latestVersion: 1, draftVersion: null, createdAt: deps.now, updatedAt: deps.now },
          { id: deps.newId(), materialId: id, version: 1, ...row },
        );
        inserted++;
      } else if (contentKey(existing.version) !== contentKey(row)) {
        const version = existing.material.latestVersion + 1;
        await repo.addSeedVersion(tx, id, { id: deps.newId(), materialId: id, version, ...row, changeNote: "Seed updated from the engine's tables" }, {
          name: input.name,
          currentVersion: version,
          latestVersion: version,
          updatedAt: deps.now,
        });
        updated++;
      }
    }
  });
  return { inserted, updated };
}
