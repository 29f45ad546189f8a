import { z } from "zod";
import { evaluateEmissivity, validateEmissivity, type Emissivity } from "../thermal/emissivity";
import { ThermalInputError } from "../thermal/errors";
import { CRYOGEN_IDS, type CryogenId } from "../thermal/fluids";
import { EXTRAPOLATION_LIMIT_K, SUPPORT_MATERIAL_IDS, SUPPORT_MATERIALS, type SupportMaterial } from "../thermal/supports";
import { IdSchema } from "./common";

/**
 * The library: every number behind a prediction, with its source, temperature range and history.
 * An entry has numbered versions; approved versions never change, a change is a new draft.
 * Property names match the engine's inputs (shared/thermal), so a version feeds it unchanged.
 */
export const MATERIAL_KINDS = ["reflector", "spacer", "wall-finish", "support-material", "correlation-set", "cryogen"] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];
export const MaterialKindSchema = z.enum(MATERIAL_KINDS, { error: `kind must be one of ${MATERIAL_KINDS.join(", ")}` });

/** Entry status: retired wins, then approved (has a current version), then an open draft, else rejected. */
export const MATERIAL_STATUSES = ["draft", "approved", "rejected", "retired"] as const;
export const MaterialStatusSchema = z.enum(MATERIAL_STATUSES, { error: `status must be one of ${MATERIAL_STATUSES.join(", ")}` });
export const VERSION_STATUSES = ["draft", "approved", "rejected"] as const;

const MAX_TEMPERATURE_K = 1000;

// The engine's own validator gives the words; its dotted path becomes the zod path below the field.
function emissivityModel(label: string) {
  return z.custom<Emissivity>().superRefine((value, ctx) => {
    try {
      validateEmissivity(value as Emissivity, label);
    } catch (error) {
      if (!(error instanceof ThermalInputError)) throw error;
      const rest = error.field.slice(label.length);
      const path = [...rest.matchAll(/\.([A-Za-z_]\w*)|\[(\d+)\]/g)].map((m) => (m[1] ?? Number(m[2])) as string | number);
      ctx.addIssue({ code: "custom", message: error.message, path });
    }
  });
}

/** A surface's emissivity: the model the engine takes, and an optional band for uncertainty. */
function emissivitySpec(label: string) {
  return z.object({
    model: emissivityModel(`${label}.model`),
    low: emissivityModel(`${label}.low`).nullish(),
    high: emissivityModel(`${label}.high`).nullish(),
  });
}
export type EmissivitySpec = z.infer<ReturnType<typeof emissivitySpec>>;

const positive = (field: string, unit: string, max: number) =>
  z
    .number({ error: `${field} must be a number in ${unit}` })
    .gt(0, `${field} must be above 0 and at most ${max} ${unit}`)
    .max(max, `${field} must be above 0 and at most ${max} ${unit}`);
const atLeastZero = (field: string, max: number) =>
  z.number({ error: `${field} must be a number` }).min(0, `${field} must be from 0 to ${max}`).max(max, `${field} must be from 0 to ${max}`);

const ReflectorSchema = z.object({
  kind: z.literal("reflector"),
  form: z.enum(["film", "foil"], { error: "properties.form must be film or foil" }),
  warmSide: emissivitySpec("warmSide"),
  coldSide: emissivitySpec("coldSide"),
});

// The layer-by-layer model takes either a conductance per gap or a conductivity with thickness
// and contact factor; one flat object keeps the messages plain, the transform gives the engine's shape.
/**
 * A spacer's solid conduction per gap: a conductance, or a bulk conductivity over a thickness.
 * A conductance may say where it was taken: at a mean temperature (it then scales with each
 * gap's mean temperature) and at a layer density with its exponent (it then scales as
 * (N̄/N̄_ref)^a), the form h_s = C_s·N̄^a·T_m of the 1974 correlation's solid term.
 */
const SolidConductionSchema = z
  .object({
    conductance_W_per_m2_K: positive("solidConduction.conductance_W_per_m2_K", "W/(m²·K)", 1000).optional(),
    referenceMeanTemperature_K: positive("solidConduction.referenceMeanTemperature_K", "K", 400).optional(),
    referenceLayerDensity_per_cm: positive("solidConduction.referenceLayerDensity_per_cm", "layers/cm", 100).optional(),
    layerDensityExponent: atLeastZero("solidConduction.layerDensityExponent", 5).optional(),
    conductivity_W_per_m_K: positive("solidConduction.conductivity_W_per_m_K", "W/(m·K)", 500).optional(),
    thickness_m: positive("solidConduction.thickness_m", "m", 0.01).optional(),
    contactFactor: positive("solidConduction.contactFactor", "(a fraction)", 1).optional(),
  })
  .superRefine((v, ctx) => {
    const byConductance = v.conductance_W_per_m2_K !== undefined;
    const byConductivity = v.conductivity_W_per_m_K !== undefined || v.thickness_m !== undefined || v.contactFactor !== undefined;
    const message = "solidConduction needs either conductance_W_per_m2_K (with optional reference conditions), or conductivity_W_per_m_K with thickness_m (and an optional contactFactor)";
    if (byConductance === byConductivity) ctx.addIssue({ code: "custom", message });
    else if (byConductivity && (v.conductivity_W_per_m_K === undefined || v.thickness_m === undefined)) {
      ctx.addIssue({ code: "custom", message, path: [v.conductivity_W_per_m_K === undefined ? "conductivity_W_per_m_K" : "thickness_m"] });
    }
    const references = [v.referenceMeanTemperature_K, v.referenceLayerDensity_per_cm, v.layerDensityExponent].some((x) => x !== undefined);
    if (byConductivity && references) {
      ctx.addIssue({ code: "custom", message: "solidConduction's reference temperature and layer density go with a conductance, not a conductivity", path: ["conductance_W_per_m2_K"] });
    }
    if ((v.referenceLayerDensity_per_cm === undefined) !== (v.layerDensityExponent === undefined)) {
      ctx.addIssue({
        code: "custom",
        message: "solidConduction.referenceLayerDensity_per_cm and solidConduction.layerDensityExponent go together: give both or neither",
        path: [v.referenceLayerDensity_per_cm === undefined ? "referenceLayerDensity_per_cm" : "layerDensityExponent"],
      });
    }
  })
  .transform((v) =>
    v.conductance_W_per_m2_K !== undefined
      ? {
          conductance_W_per_m2_K: v.conductance_W_per_m2_K,
          ...(v.referenceMeanTemperature_K !== undefined ? { referenceMeanTemperature_K: v.referenceMeanTemperature_K } : {}),
          ...(v.referenceLayerDensity_per_cm !== undefined && v.layerDensityExponent !== undefined
            ? { referenceLayerDensity_per_cm: v.referenceLayerDensity_per_cm, layerDensityExponent: v.layerDensityExponent }
            : {}),
        }
      : { conductivity_W_per_m_K: v.conductivity_W_per_m_K!, thickness_m: v.thickness_m!, ...(v.contactFactor !== undefined ? { contactFactor: v.contactFactor } : {}) },
  );

const SpacerSchema = z.object({
  kind: z.literal("spacer"),
  form: z.enum(["netting", "paper", "other"], { error: "properties.form must be netting, paper or other" }),
  solidConduction: SolidConductionSchema.nullish(),
});

const WallFinishSchema = z.object({ kind: z.literal("wall-finish"), surface: emissivitySpec("surface") });

const SupportMaterialSchema = z.object({
  kind: z.literal("support-material"),
  supportMaterial: z.enum(SUPPORT_MATERIAL_IDS as [SupportMaterial, ...SupportMaterial[]], {
    error: `properties.supportMaterial must be one of the engine's fits: ${SUPPORT_MATERIAL_IDS.join(", ")}`,
  }),
});

const CorrelationSetSchema = z.object({
  kind: z.literal("correlation-set"),
  /** The engine's CORRELATION_SETS id this entry was built from, if any. */
  basedOn: z.string().max(64, "properties.basedOn must be at most 64 characters").nullish(),
  coefficients: z.object({
    solid: atLeastZero("coefficients.solid", 1),
    solidExponent: atLeastZero("coefficients.solidExponent", 10),
    radiation: atLeastZero("coefficients.radiation", 1),
    gas: atLeastZero("coefficients.gas", 1e7),
    solidTemperatureTerm: z
      .enum(["mean-temperature", "polyester-conductivity"], { error: "coefficients.solidTemperatureTerm must be mean-temperature or polyester-conductivity" })
      .optional(),
  }),
  fittedEmissivity: positive("properties.fittedEmissivity", "(an emissivity)", 1).nullish(),
});

const CryogenSchema = z
  .object({
    kind: z.literal("cryogen"),
    fluid: z.enum(CRYOGEN_IDS as [CryogenId, ...CryogenId[]], { error: `properties.fluid must be one of ${CRYOGEN_IDS.join(", ")}` }),
    saturationTemperature_K: positive("saturationTemperature_K", "K", 300),
    latentHeat_J_per_kg: positive("latentHeat_J_per_kg", "J/kg", 1e7),
    liquidDensity_kg_per_m3: positive("liquidDensity_kg_per_m3", "kg/m³", 5000),
    vapourDensity_kg_per_m3: positive("vapourDensity_kg_per_m3", "kg/m³", 5000),
    molarMass_kg_per_mol: positive("molarMass_kg_per_mol", "kg/mol", 1),
  })
  .refine((c) => c.vapourDensity_kg_per_m3 < c.liquidDensity_kg_per_m3, {
    path: ["vapourDensity_kg_per_m3"],
    message: "vapourDensity_kg_per_m3 must be below liquidDensity_kg_per_m3 (saturated vapour is lighter than its liquid)",
  });

export const MaterialPropertiesSchema = z.discriminatedUnion(
  "kind",
  [ReflectorSchema, SpacerSchema, WallFinishSchema, SupportMaterialSchema, CorrelationSetSchema, CryogenSchema],
  { error: `properties.kind must be one of ${MATERIAL_KINDS.join(", ")}` },
);
export type MaterialProperties = z.infer<typeof MaterialPropertiesSchema>;

/** Where a number comes from: a publication, an in-house test, or someone's memory (said plainly). */
export const MaterialSourceSchema = z.discriminatedUnion(
  "type",
  [
    z.object({
      type: z.literal("citation"),
      author: z.string({ error: "source.author is required" }).trim().min(1, "source.author must be 1 to 200 characters").max(200, "source.author must be 1 to 200 characters"),
      title: z.string({ error: "source.title is required" }).trim().min(1, "source.title must be 1 to 300 characters").max(300, "source.title must be 1 to 300 characters"),
      year: z.number({ error: "source.year must be a year such as 1985" }).int("source.year must be a whole year").min(1800, "source.year must be from 1800 to 2100").max(2100, "source.year must be from 1800 to 2100").nullish(),
      location: z.string().trim().max(200, "source.location (table, page or section) must be at most 200 characters").nullish(),
      /** True when the value was recalled as from this work rather than read off it. */
      fromMemory: z.boolean({ error: "source.fromMemory must be true or false" }).default(false),
      note: z.string().trim().max(1000, "source.note must be at most 1000 characters").nullish(),
    }),
    z.object({
      type: z.literal("measured"),
      test: z.string({ error: "source.test is required: which in-house test measured it" }).trim().min(1, "source.test must be 1 to 300 characters").max(300, "source.test must be 1 to 300 characters"),
      note: z.string().trim().max(1000, "source.note must be at most 1000 characters").nullish(),
    }),
    z.object({
      type: z.literal("memory"),
      note: z.string().trim().max(1000, "source.note must be at most 1000 characters").nullish(),
    }),
  ],
  { error: "source.type must be citation, measured or memory" },
);
export type MaterialSource = z.infer<typeof MaterialSourceSchema>;

export const MaterialNameSchema = z
  .string({ error: "name is required" })
  .trim()
  .min(2, "name must be 2 to 120 characters")
  .max(120, "name must be 2 to 120 characters");

const TemperatureSchema = (field: string) => positive(field, "K", MAX_TEMPERATURE_K);
const optionalNumber = <T extends z.ZodNumber>(s: T) => s.nullish().transform((v) => v ?? null);

const VersionFieldsSchema = z.object({
  name: MaterialNameSchema,
  properties: MaterialPropertiesSchema,
  validRange_K: z.object({ min: TemperatureSchema("validRange_K.min"), max: TemperatureSchema("validRange_K.max") }, { error: "validRange_K must be { min, max } in K" }),
  thickness_m: optionalNumber(positive("thickness_m", "m", 0.1)),
  arealMass_kg_per_m2: optionalNumber(positive("arealMass_kg_per_m2", "kg/m²", 100)),
  /** The organization's own price, in its own currency; seed entries carry none. */
  cost_per_m2: optionalNumber(atLeastZero("cost_per_m2", 1e6)),
  source: MaterialSourceSchema,
  changeNote: z.string().trim().max(500, "changeNote must be at most 500 characters").nullish(),
});

/** Cross-field rules: range order, band order, and ranges the referenced engine data allows. */
function checkVersion(v: z.infer<typeof VersionFieldsSchema>, ctx: z.RefinementCtx) {
  const { min, max } = v.validRange_K;
  if (min > max) {
    ctx.addIssue({ code: "custom", path: ["validRange_K", "max"], message: `validRange_K.max must be at or above validRange_K.min (got min ${min} K, max ${max} K)` });
    return;
  }
  const p = v.properties;
  const specs: [string, EmissivitySpec][] = p.kind === "reflector" ? [["warmSide", p.warmSide], ["coldSide", p.coldSide]] : p.kind === "wall-finish" ? [["surface", p.surface]] : [];
  for (const [face, spec] of specs) {
    for (const T of [min, Math.sqrt(min * max), max]) {
      const nominal = evaluateEmissivity(spec.model, T);
      if (spec.low != null && evaluateEmissivity(spec.low, T) > nominal + 1e-12) {
        ctx.addIssue({ code: "custom", path: ["properties", face, "low"], message: `${face}.low must not exceed the nominal emissivity across validRange_K (at ${round(T)} K: ${round(evaluateEmissivity(spec.low, T))} > ${round(nominal)})` });
        break;
      }
      if (spec.high != null && evaluateEmissivity(spec.high, T) < nominal - 1e-12) {
        ctx.addIssue({ code: "custom", path: ["properties", face, "high"], message: `${face}.high must not be below the nominal emissivity across validRange_K (at ${round(T)} K: ${round(evaluateEmissivity(spec.high, T))} < ${round(nominal)})` });
        break;
      }
    }
  }
  if (p.kind === "support-material") {
    const fit = SUPPORT_MATERIALS[p.supportMaterial];
    if (min < fit.validRange_K[0] || max > EXTRAPOLATION_LIMIT_K) {
      ctx.addIssue({ code: "custom", path: ["validRange_K"], message: `validRange_K must lie from ${fit.validRange_K[0]} K (the fit's lower limit) to ${EXTRAPOLATION_LIMIT_K} K for ${fit.label}` });
    }
  }
  if (p.kind === "cryogen" && (p.saturationTemperature_K < min || p.saturationTemperature_K > max)) {
    ctx.addIssue({ code: "custom", path: ["validRange_K"], message: `validRange_K must include saturationTemperature_K (${p.saturationTemperature_K} K)` });
  }
}
const round = (x: number) => Number(x.toPrecision(4));

/** A new entry (its version 1, a draft) or a draft's replacement: the kind is properties.kind. */
export const MaterialVersionInputSchema = VersionFieldsSchema.superRefine(checkVersion);
export type MaterialVersionInput = z.infer<typeof MaterialVersionInputSchema>;

/** A proposed change must say what changed. */
export const ProposeVersionInputSchema = VersionFieldsSchema.extend({
  changeNote: z.string({ error: "changeNote is required: say what changed" }).trim().min(1, "changeNote must be 1 to 500 characters").max(500, "changeNote must be 1 to 500 characters"),
}).superRefine(checkVersion);

export const ApprovalInputSchema = z
  .object({
    decision: z.enum(["approve", "reject"], { error: "decision must be approve or reject" }),
    comment: z.string().trim().max(1000, "comment must be at most 1000 characters").nullish(),
    /** The draft the owner looked at; refused if another draft is open by then. */
    version: z.number().int("version must be a whole number").min(1, "version must be 1 or more").optional(),
  })
  .refine((a) => a.decision === "approve" || (a.comment ?? "").length > 0, { path: ["comment"], message: "comment is required when rejecting: say why, 1 to 1000 characters" });
export type ApprovalInput = z.infer<typeof ApprovalInputSchema>;

export const RetireInputSchema = z.object({ comment: z.string().trim().max(1000, "comment must be at most 1000 characters").nullish() });
export const CopyInputSchema = z.object({ name: MaterialNameSchema.optional() });

export const MaterialParamsSchema = z.object({ id: IdSchema });
export const MaterialVersionParamsSchema = z.object({
  id: IdSchema,
  version: z.coerce.number({ error: "version must be a whole number" }).int("version must be a whole number").min(1, "version must be 1 or more").max(100_000, "version must be at most 100000"),
});

export const MaterialListQuerySchema = z.object({
  kind: MaterialKindSchema.optional(),
  status: MaterialStatusSchema.optional(),
  q: z.string().trim().max(100, "q must be at most 100 characters").optional(),
  scope: z.enum(["seed", "organization"], { error: "scope must be seed or organization" }).optional(),
});
export type MaterialListQuery = z.infer<typeof MaterialListQuerySchema>;

export const ImportQuerySchema = z.object({
  dryRun: z.enum(["true", "false"], { error: "dryRun must be true or false" }).optional().transform((v) => v === "true"),
});

// ── Responses ────────────────────────────────────────────────────────────────────────────────

export const MaterialVersionSchema = VersionFieldsSchema.extend({
  materialId: IdSchema,
  version: z.number().int(),
  status: z.enum(VERSION_STATUSES),
  isCurrent: z.boolean(),
  changeNote: z.string().nullable(),
  proposedBy: z.string().nullable(), // a person's name; null for seed entries
  proposedAt: z.string(),
  decidedBy: z.string().nullable(),
  decidedAt: z.string().nullable(),
  decisionComment: z.string().nullable(),
});
export type MaterialVersion = z.infer<typeof MaterialVersionSchema>;

export const MaterialSummarySchema = z.object({
  id: IdSchema,
  kind: MaterialKindSchema,
  name: z.string(),
  status: MaterialStatusSchema,
  /** seed: shared by every organization, read-only; organization: this organization's own. */
  scope: z.enum(["seed", "organization"]),
  currentVersion: z.number().int().nullable(),
  latestVersion: z.number().int(),
  draftVersion: z.number().int().nullable(),
  /** Designs may pick only approved, unretired entries. */
  pickable: z.boolean(),
  updatedAt: z.string(),
  /** The current approved version, or the latest one when none is approved yet. */
  shown: MaterialVersionSchema,
});
export type MaterialSummary = z.infer<typeof MaterialSummarySchema>;

export const MaterialListSchema = z.object({ materials: z.array(MaterialSummarySchema) });
export type MaterialList = z.infer<typeof MaterialListSchema>;

export const MaterialDetailSchema = MaterialSummarySchema.extend({
  versions: z.array(MaterialVersionSchema), // newest first
  copiedFrom: z.object({ materialId: z.string(), version: z.number().int() }).nullable(),
  retired: z.object({ at: z.string(), by: z.string().nullable(), comment: z.string().nullable() }).nullable(),
});
export type MaterialDetail = z.infer<typeof MaterialDetailSchema>;

/** A source in one line, for tables, CSV readers and reports. */
export function formatSource(source: MaterialSource): string {
  if (source.type === "measured") return `Measured in-house: ${source.test}${source.note ? ` (${source.note})` : ""}`;
  if (source.type === "memory") return `From memory${source.note ? `: ${source.note}` : ""}`;
  const parts = [`${source.author}, ${source.title}${source.year ? ` (${source.year})` : ""}`];
  if (source.location) parts.push(source.location);
  let text = parts.join(", ");
  if (source.fromMemory) text += "; from memory";
  if (source.note) text += `. ${source.note}`;
  return text;
}

// ── CSV ──────────────────────────────────────────────────────────────────────────────────────
/**
 * Frostfold's library CSV: UTF-8, comma-separated, a header line, one row per entry.
 *   kind                  one of MATERIAL_KINDS
 *   name                  generic name, 2–120 characters
 *   valid_min_K, valid_max_K   the temperature range the values hold over, K
 *   properties            the kind's properties as JSON without "kind", e.g. for a reflector
 *                         {"form":"foil","warmSide":{"model":0.04},"coldSide":{"model":0.04}};
 *                         emissivity models as the engine takes them (number, power or table)
 *   thickness_m, areal_mass_kg_per_m2, cost_per_m2   optional numbers, SI
 *   source_type           citation | measured | memory, then source_author, source_title,
 *                         source_year, source_location, source_from_memory (yes/no),
 *                         source_test, source_note as they apply
 *   change_note           optional
 *   status, version, scope   written on export for the reader; ignored on import
 * Import always creates new drafts in the caller's organization. Text cells that would start a
 * spreadsheet formula (= + - @) are written with a leading apostrophe, removed again on import.
 */
export const MATERIAL_CSV_COLUMNS = [
  "kind", "name", "valid_min_K", "valid_max_K", "properties", "thickness_m", "areal_mass_kg_per_m2", "cost_per_m2",
  "source_type", "source_author", "source_title", "source_year", "source_location", "source_from_memory", "source_test", "source_note",
  "change_note", "status", "version", "scope",
] as const;
export type MaterialCsvColumn = (typeof MATERIAL_CSV_COLUMNS)[number];
export const MATERIAL_CSV_REQUIRED_COLUMNS: MaterialCsvColumn[] = ["kind", "name", "valid_min_K", "valid_max_K", "properties", "source_type"];
export const MATERIAL_CSV_MAX_BYTES = 1024 * 1024;
export const MATERIAL_CSV_MAX_ROWS = 1000;

export const CsvProblemSchema = z.object({ column: z.string(), message: z.string() });
export const ImportPreviewSchema = z.object({
  valid: z.boolean(),
  rowCount: z.number().int(),
  rows: z.array(z.object({ line: z.number().int(), kind: z.string().nullable(), name: z.string().nullable(), problems: z.array(CsvProblemSchema) })),
});
export type ImportPreview = z.infer<typeof ImportPreviewSchema>;
export const ImportResultSchema = z.object({ imported: z.number().int(), materials: z.array(z.object({ id: IdSchema, name: z.string() })) });
export type ImportResult = z.infer<typeof ImportResultSchema>;
