import { CORRELATION_SETS } from "../thermal/blanket-correlation";
import { CRYOGENS, type CryogenId } from "../thermal/fluids";
import { DesignContentSchema, type DesignContent, type DesignContentInput, type MaterialRef } from "../schemas/design";
import type { MaterialProperties } from "../schemas/material";
import { materialKey, type ResolvedMaterial } from "./to-assembly";

/**
 * A small invented library for the mapping tests: no database, every entry made up here.
 * Emissivities and spacer values are invented but plausible (common practice: ~0.03 for an
 * aluminized polyester film face, ~0.1 for a polished stainless wall); cryogens and the
 * correlation set are copied from the engine's own tables, so no number is written twice.
 */
export function entry(materialId: string, version: number, name: string, properties: MaterialProperties): ResolvedMaterial {
  return { materialId, version, name, properties, arealMass_kg_per_m2: null, cost_per_m2: null, thickness_m: null, source: "Invented for a unit test" };
}

/** A cryogen entry copied from the engine's table; a test may give its own saturation temperature. */
export function cryogen(materialId: string, id: CryogenId, saturationTemperature_K = CRYOGENS[id].saturationTemperature_K): ResolvedMaterial {
  const f = CRYOGENS[id];
  return entry(materialId, 1, f.label, {
    kind: "cryogen",
    fluid: id,
    saturationTemperature_K,
    latentHeat_J_per_kg: f.latentHeat_J_per_kg,
    liquidDensity_kg_per_m3: f.liquidDensity_kg_per_m3,
    vapourDensity_kg_per_m3: f.vapourDensity_kg_per_m3,
    molarMass_kg_per_mol: f.molarMass_kg_per_mol,
  });
}

const KCG_1974 = CORRELATION_SETS.find((s) => s.id === "kcg-1974-polyester-netting")!;
/** The correlation-set entry's coefficients: the engine's 1974 polyester-netting set. */
export const SET_COEFFICIENTS = { ...KCG_1974.coefficients };

export const LIB = {
  jacket: entry("finish-jacket", 1, "Polished stainless jacket", { kind: "wall-finish", surface: { model: 0.1 } }),
  vessel: entry("finish-vessel", 3, "Polished vessel", { kind: "wall-finish", surface: { model: 0.05 } }),
  shieldFinish: entry("finish-shield", 1, "Bright copper shield", { kind: "wall-finish", surface: { model: { kind: "power", reference: 0.06, referenceTemperature_K: 300, exponent: 0.5 } } }),
  filmV1: entry("film", 1, "Aluminized polyester film", { kind: "reflector", form: "film", warmSide: { model: 0.05 }, coldSide: { model: 0.05 } }),
  film: entry("film", 2, "Aluminized polyester film", {
    kind: "reflector",
    form: "film",
    warmSide: { model: 0.03, low: 0.025, high: 0.045 },
    coldSide: { model: 0.035, low: 0.03, high: 0.05 },
  }),
  foil: entry("foil", 1, "Aluminium foil", { kind: "reflector", form: "foil", warmSide: { model: 0.04 }, coldSide: { model: 0.04, low: null, high: null } }),
  // One face gives only a low model, the other only a high one.
  filmHalfBand: entry("film-half", 1, "Aluminized polyimide film", { kind: "reflector", form: "film", warmSide: { model: 0.03, low: 0.02 }, coldSide: { model: 0.032, high: 0.06 } }),
  netReferenced: entry("net-ref", 1, "Polyester netting, measured", {
    kind: "spacer",
    form: "netting",
    solidConduction: { conductance_W_per_m2_K: 0.0364, referenceMeanTemperature_K: 188.5, referenceLayerDensity_per_cm: 20, layerDensityExponent: 2.63 },
  }),
  netPlain: entry("net-plain", 1, "Polyester netting", { kind: "spacer", form: "netting", solidConduction: { conductance_W_per_m2_K: 0.05 } }),
  paper: entry("paper", 1, "Glass-fibre paper", { kind: "spacer", form: "paper", solidConduction: { conductivity_W_per_m_K: 0.02, thickness_m: 1e-4, contactFactor: 0.01 } }),
  netBare: entry("net-bare", 1, "Netting without conduction data", { kind: "spacer", form: "netting", solidConduction: null }),
  correlationSet: entry("set-1974", 1, KCG_1974.label, {
    kind: "correlation-set",
    basedOn: KCG_1974.id,
    coefficients: SET_COEFFICIENTS,
    fittedEmissivity: KCG_1974.emissivity,
  }),
  nitrogen: cryogen("ln2", "nitrogen"),
  helium: cryogen("lhe", "helium-4"),
  g10: entry("g10", 1, "Glass-epoxy laminate, normal", { kind: "support-material", supportMaterial: "g10-normal" }),
  steel: entry("steel", 1, "Stainless steel 304", { kind: "support-material", supportMaterial: "stainless-304" }),
} satisfies Record<string, ResolvedMaterial>;

export const refTo = (m: ResolvedMaterial): MaterialRef => ({ materialId: m.materialId, version: m.version });

/** A lookup over the given entries (default: the whole invented library), as the server builds one. */
export function lookupOf(entries: ResolvedMaterial[] = Object.values(LIB)) {
  const byKey = new Map(entries.map((m) => [materialKey(m), m]));
  return (ref: MaterialRef) => byKey.get(materialKey(ref));
}

/**
 * An invented two-stage helium cryostat: a nitrogen-cooled shield, a fixed 20 K cryocooler
 * stage, three blocks (one of each model) and supports joining every stage.
 */
export function cryostatInput(): DesignContentInput {
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2, flatEnds: 2 },
    warm: { temperature_K: 293, finish: refTo(LIB.jacket) },
    cold: { cryogen: refTo(LIB.helium), temperature_K: null, finish: refTo(LIB.vessel), capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 },
    layup: [
      { kind: "block", label: "outer blanket", layers: 30, reflector: refTo(LIB.film), spacer: refTo(LIB.netPlain), layerDensity_per_cm: 20, model: "radiation", correlationSet: null, degradationFactor: 1.5 },
      { kind: "stage", label: "nitrogen shield", temperature_K: 80, cryogen: refTo(LIB.nitrogen), capacity_L: 60, finish: refTo(LIB.shieldFinish) },
      { kind: "block", layers: 20, reflector: refTo(LIB.foil), spacer: refTo(LIB.netReferenced), layerDensity_per_cm: 15, model: "layers", correlationSet: null },
      { kind: "stage", label: "cryocooler stage", temperature_K: 20, cryogen: null, capacity_L: null, finish: refTo(LIB.vessel) },
      { kind: "block", label: "inner blanket", layers: 10, reflector: refTo(LIB.film), spacer: null, layerDensity_per_cm: 12, model: "correlation", correlationSet: refTo(LIB.correlationSet), degradationFactor: 2 },
    ],
    supports: [
      { label: "outer strap", material: refTo(LIB.g10), area_m2: 2e-4, length_m: 0.15, count: 3, from: "warm", to: 0 },
      { material: refTo(LIB.steel), area_m2: 1e-5, length_m: 0.3, from: 0, to: 1 },
      { label: "neck", material: refTo(LIB.steel), area_m2: 5e-5, length_m: 0.5, count: 1, from: "warm", to: "cold" },
    ],
    vacuum: { pressure_Pa: 1e-4, gas: "helium" },
    targetColdHeat_W: null,
  };
}

/** A planar panel: one stage, then the given blocks facing a fixed-temperature cold wall. */
export function panelInput(): DesignContentInput {
  return {
    geometry: { kind: "planar", area_m2: 2 },
    warm: { temperature_K: 300, finish: refTo(LIB.jacket) },
    cold: { cryogen: null, temperature_K: 20, finish: refTo(LIB.vessel) },
    layup: [{ kind: "block", layers: 12, reflector: refTo(LIB.foil), layerDensity_per_cm: 20, model: "radiation" }],
    vacuum: { pressure_Pa: 0, gas: "nitrogen" },
  };
}

/** The input parsed as the server parses it (schema defaults filled in); edit a copy first. */
export function parsed(input: DesignContentInput, edit?: (draft: DesignContentInput) => void): DesignContent {
  const draft = structuredClone(input);
  edit?.(draft);
  return DesignContentSchema.parse(draft);
}
