import { z } from "zod";
import type { Prediction } from "../design/prediction";
import type { ResolvedMaterial } from "../design/to-assembly";
import { IdSchema } from "./common";

/**
 * A design as the Design page edits it and a revision stores it: the vessel, its boundaries, the
 * layup warm → cold, supports and vacuum, with every material named as an exact library version
 * ({ materialId, version }), so a revision always resolves to the numbers it was computed with.
 * shared/design/to-assembly.ts turns it into the engine's AssemblyDesign.
 */

const num = (field: string, unit: string, min: number, max: number, opts: { exclusiveMin?: boolean } = {}) => {
  const range = `${opts.exclusiveMin ? "above" : "from"} ${min}${opts.exclusiveMin ? " and at most" : " to"} ${max}${unit ? ` ${unit}` : ""}`;
  const base = z.number({ error: `${field} must be a number ${range}` });
  return (opts.exclusiveMin ? base.gt(min, `${field} must be ${range}`) : base.min(min, `${field} must be ${range}`)).max(max, `${field} must be ${range}`);
};
const whole = (field: string, min: number, max: number) =>
  z.number({ error: `${field} must be a whole number from ${min} to ${max}` }).int(`${field} must be a whole number from ${min} to ${max}`).min(min, `${field} must be a whole number from ${min} to ${max}`).max(max, `${field} must be a whole number from ${min} to ${max}`);

export const MaterialRefSchema = z.object(
  {
    materialId: IdSchema,
    version: whole("version", 1, 100_000),
  },
  { error: "pick a library entry" },
);
export type MaterialRef = z.infer<typeof MaterialRefSchema>;

export const GeometrySchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("planar"), area_m2: num("area_m2", "m²", 0, 1e4, { exclusiveMin: true }) }),
    z.object({
      kind: z.literal("cylinder"),
      coldRadius_m: num("coldRadius_m", "m", 0, 20, { exclusiveMin: true }),
      warmRadius_m: num("warmRadius_m", "m", 0, 20, { exclusiveMin: true }),
      length_m: num("length_m", "m", 0, 100, { exclusiveMin: true }),
      flatEnds: whole("flatEnds", 0, 2).default(0),
    }),
    z.object({
      kind: z.literal("sphere"),
      coldRadius_m: num("coldRadius_m", "m", 0, 20, { exclusiveMin: true }),
      warmRadius_m: num("warmRadius_m", "m", 0, 20, { exclusiveMin: true }),
    }),
  ],
  { error: "geometry.kind must be planar, cylinder or sphere" },
);

export const BLOCK_MODELS = ["radiation", "correlation", "layers"] as const;

export const BlockSchema = z.object({
  kind: z.literal("block"),
  label: z.string().trim().max(80, "label must be at most 80 characters").optional(),
  layers: whole("layers", 1, 1000),
  reflector: MaterialRefSchema,
  spacer: MaterialRefSchema.nullish(),
  layerDensity_per_cm: num("layerDensity_per_cm", "layers/cm", 0, 100, { exclusiveMin: true }),
  model: z.enum(BLOCK_MODELS, { error: "model must be radiation, correlation or layers" }),
  correlationSet: MaterialRefSchema.nullish(),
  degradationFactor: num("degradationFactor", "", 1, 10).default(1),
});

export const StageSchema = z.object({
  kind: z.literal("stage"),
  label: z.string().trim().min(1, "label must be 1 to 80 characters").max(80, "label must be 1 to 80 characters"),
  /** Fixed temperature; when a cryogen is given its saturation temperature is used instead. */
  temperature_K: num("temperature_K", "K", 0, 400, { exclusiveMin: true }),
  cryogen: MaterialRefSchema.nullish(),
  capacity_L: num("capacity_L", "L", 0, 1e6, { exclusiveMin: true }).nullish(),
  finish: MaterialRefSchema,
});

export const LayupItemSchema = z.discriminatedUnion("kind", [BlockSchema, StageSchema], { error: "each layup item is a block or a stage" });

export const SupportSchema = z.object({
  label: z.string().trim().max(80, "label must be at most 80 characters").optional(),
  material: MaterialRefSchema,
  area_m2: num("area_m2", "m²", 0, 1, { exclusiveMin: true }),
  length_m: num("length_m", "m", 0, 10, { exclusiveMin: true }),
  count: whole("count", 1, 1000).default(1),
  /** Stage index counted over stages only (0 = warmest stage), or a wall. */
  from: z.union([z.literal("warm"), whole("from", 0, 49)]),
  to: z.union([z.literal("cold"), whole("to", 0, 49)]),
});

export const GASES = ["helium", "hydrogen", "neon", "nitrogen", "air", "argon"] as const;

export const DesignContentSchema = z
  .object({
    geometry: GeometrySchema,
    warm: z.object({ temperature_K: num("warm.temperature_K", "K", 0, 500, { exclusiveMin: true }), finish: MaterialRefSchema }),
    cold: z.object({
      /** The cryogen of the cold vessel; without it the cold wall is held at temperature_K. */
      cryogen: MaterialRefSchema.nullish(),
      temperature_K: num("cold.temperature_K", "K", 0, 400, { exclusiveMin: true }).nullish(),
      finish: MaterialRefSchema,
      capacity_L: num("cold.capacity_L", "L", 0, 1e6, { exclusiveMin: true }).nullish(),
      fillFraction: num("cold.fillFraction", "", 0, 1).default(1),
      minimumFraction: num("cold.minimumFraction", "", 0, 1).default(0),
    }),
    layup: z.array(LayupItemSchema).min(1, "layup needs at least one block").max(50, "layup holds at most 50 items"),
    supports: z.array(SupportSchema).max(100, "supports holds at most 100 entries").default([]),
    vacuum: z.object({
      pressure_Pa: num("vacuum.pressure_Pa", "Pa", 0, 1e5),
      gas: z.enum(GASES, { error: `vacuum.gas must be one of ${GASES.join(", ")}` }),
    }),
    /** The heat into the cold vessel the design should not exceed; drives the sweep's target line. */
    targetColdHeat_W: num("targetColdHeat_W", "W", 0, 1e5, { exclusiveMin: true }).nullish(),
  })
  .superRefine((d, ctx) => {
    if (d.cold.cryogen == null && d.cold.temperature_K == null) {
      ctx.addIssue({ code: "custom", path: ["cold", "temperature_K"], message: "cold.temperature_K is required when the cold space has no cryogen" });
    }
    if (d.cold.minimumFraction >= d.cold.fillFraction) {
      ctx.addIssue({ code: "custom", path: ["cold", "minimumFraction"], message: "cold.minimumFraction must be below cold.fillFraction" });
    }
    if (d.geometry.kind !== "planar" && d.geometry.warmRadius_m <= d.geometry.coldRadius_m) {
      ctx.addIssue({ code: "custom", path: ["geometry", "warmRadius_m"], message: "geometry.warmRadius_m must be larger than geometry.coldRadius_m (the cold vessel sits inside)" });
    }
    if (d.layup[0]?.kind === "stage" || d.layup[d.layup.length - 1]?.kind === "stage") {
      ctx.addIssue({ code: "custom", path: ["layup"], message: "layup must start and end with a block: a stage sits between blocks" });
    }
    const stages = d.layup.filter((i) => i.kind === "stage").length;
    d.supports.forEach((s, i) => {
      const from = s.from === "warm" ? -1 : s.from;
      const to = s.to === "cold" ? stages : s.to;
      if (typeof s.from === "number" && s.from >= stages) ctx.addIssue({ code: "custom", path: ["supports", i, "from"], message: `supports[${i}].from must be "warm" or a stage index from 0 to ${stages - 1}` });
      if (typeof s.to === "number" && s.to >= stages) ctx.addIssue({ code: "custom", path: ["supports", i, "to"], message: `supports[${i}].to must be "cold" or a stage index from 0 to ${stages - 1}` });
      if (from >= to) ctx.addIssue({ code: "custom", path: ["supports", i, "to"], message: `supports[${i}] must run from a warmer to a colder point` });
    });
  });
export type DesignContent = z.infer<typeof DesignContentSchema>;
export type DesignContentInput = z.input<typeof DesignContentSchema>;

export const DesignNameSchema = z.string({ error: "name is required" }).trim().min(2, "name must be 2 to 120 characters").max(120, "name must be 2 to 120 characters");
const ChangeNoteSchema = z.string().trim().max(500, "changeNote must be at most 500 characters");

export const CreateDesignInputSchema = z.object({
  name: DesignNameSchema,
  vesselLabel: z.string().trim().max(120, "vesselLabel must be at most 120 characters").optional(),
  content: DesignContentSchema,
  changeNote: ChangeNoteSchema.optional(),
});
export type CreateDesignInput = z.infer<typeof CreateDesignInputSchema>;

export const SaveRevisionInputSchema = z.object({
  /** The revision the edit started from; a save on a stale base is a 409. */
  baseRevision: whole("baseRevision", 1, 1_000_000),
  name: DesignNameSchema.optional(),
  content: DesignContentSchema,
  changeNote: z.string({ error: "changeNote is required: say what changed" }).trim().min(1, "changeNote must be 1 to 500 characters").max(500, "changeNote must be 1 to 500 characters"),
});
export type SaveRevisionInput = z.infer<typeof SaveRevisionInputSchema>;

export const DuplicateDesignInputSchema = z.object({ name: DesignNameSchema.optional() });
/** sweep: false leaves the layer-count sweep out (null), for the quick figures of a live edit. */
export const EstimateInputSchema = z.object({ content: DesignContentSchema, sweep: z.boolean({ error: "sweep must be true or false" }).default(true) });
export const SWEEP_VARIABLES = ["layer-density", "warm-temperature", "pressure"] as const;
export type SweepVariable = (typeof SWEEP_VARIABLES)[number];
/** POST /api/estimate/sweep: the server chooses the range from the design (shared/design/sweep-ranges.ts). */
export const SweepInputSchema = z.object({
  content: DesignContentSchema,
  variable: z.enum(SWEEP_VARIABLES, { error: `variable must be one of ${SWEEP_VARIABLES.join(", ")}` }),
  blockIndex: whole("blockIndex", 0, 49).optional(),
});
export type SweepInput = z.infer<typeof SweepInputSchema>;
export const DesignParamsSchema = z.object({ id: IdSchema });
export const RevisionParamsSchema = z.object({
  id: IdSchema,
  rev: z.coerce.number({ error: "rev must be a whole number" }).int("rev must be a whole number").min(1, "rev must be 1 or more").max(1_000_000, "rev must be at most 1000000"),
});
export const DesignListQuerySchema = z.object({ q: z.string().trim().max(100, "q must be at most 100 characters").optional() });
export const CompareQuerySchema = z.object({
  ids: z
    .string({ error: "ids is required: 2 to 6 designs as id or id:revision, comma-separated" })
    .transform((s) => s.split(",").map((x) => x.trim()).filter(Boolean))
    .pipe(
      z
        .array(z.string().regex(/^[A-Za-z0-9_-]{1,64}(:\d{1,7})?$/, "each id must be a design id, optionally with :revision"))
        .min(2, "ids must name 2 to 6 designs")
        .max(6, "ids must name 2 to 6 designs"),
    ),
  price_per_L: z.coerce.number({ error: "price_per_L must be a number from 0 to 1000" }).min(0, "price_per_L must be from 0 to 1000").max(1000, "price_per_L must be from 0 to 1000").optional(),
});

// ── Responses ────────────────────────────────────────────────────────────────────────────────
// The prediction is the engine's own output type (shared/design/prediction.ts), passed through
// as computed; it is not re-described here so the two can never drift.
const PredictionSchema = z.custom<Prediction>((v) => typeof v === "object" && v !== null && "result" in v);

export const ResolvedMaterialSchema = z.object({
  materialId: IdSchema,
  version: z.number().int(),
  name: z.string(),
  properties: z.custom<ResolvedMaterial["properties"]>(),
  arealMass_kg_per_m2: z.number().nullable(),
  cost_per_m2: z.number().nullable(),
  thickness_m: z.number().nullable(),
  source: z.string(),
});

export const DesignSummarySchema = z.object({
  id: IdSchema,
  name: z.string(),
  vesselLabel: z.string().nullable(),
  geometryKind: z.enum(["planar", "cylinder", "sphere"]),
  latestRevision: z.number().int(),
  coldHeat_W: z.number().nullable(),
  boilOff_L_per_day: z.number().nullable(),
  createdBy: z.string().nullable(),
  updatedAt: z.string(),
});
export type DesignSummary = z.infer<typeof DesignSummarySchema>;
export const DesignListSchema = z.object({ designs: z.array(DesignSummarySchema) });

export const RevisionSummarySchema = z.object({
  revision: z.number().int(),
  name: z.string(),
  changeNote: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  coldHeat_W: z.number().nullable(),
});
export type RevisionSummary = z.infer<typeof RevisionSummarySchema>;

export const RevisionDetailSchema = z.object({
  designId: IdSchema,
  revision: z.number().int(),
  name: z.string(),
  changeNote: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  content: DesignContentSchema,
  /** The exact library versions this revision used, with their sources. */
  materials: z.array(ResolvedMaterialSchema),
  prediction: PredictionSchema,
});
export type RevisionDetail = z.infer<typeof RevisionDetailSchema>;

export const DesignDetailSchema = DesignSummarySchema.extend({
  revisions: z.array(RevisionSummarySchema), // newest first
  latest: RevisionDetailSchema,
});
export type DesignDetail = z.infer<typeof DesignDetailSchema>;

export const EstimateResultSchema = z.object({ prediction: PredictionSchema, materials: z.array(ResolvedMaterialSchema) });
export type EstimateResult = z.infer<typeof EstimateResultSchema>;

export const SweepResultSchema = z.object({
  variable: z.enum(SWEEP_VARIABLES),
  /** The SI unit of x and designValue. */
  unit: z.enum(["layers/cm", "K", "Pa"]),
  /** The design's own value of the variable. */
  designValue: z.number(),
  /** The swept block (layer density only). */
  blockIndex: z.number().int().nullable(),
  blockLabel: z.string().nullable(),
  /** The cooled stages warm → cold, in the order of each point's heatIntoStages_W. */
  stageLabels: z.array(z.string()),
  points: z.array(z.object({ x: z.number(), coldHeat_W: z.number(), heatIntoStages_W: z.array(z.number()) })),
});
export type SweepResult = z.infer<typeof SweepResultSchema>;

export const CompareItemSchema = z.object({
  designId: IdSchema,
  revision: z.number().int(),
  name: z.string(),
  prediction: PredictionSchema,
  /** Per sink: heat in, net heat and boil-off, flattened for the table. */
  stages: z.array(z.object({ label: z.string(), heatIn_W: z.number(), net_W: z.number(), boilOff_L_per_day: z.number().nullable(), cryogen: z.string().nullable() })),
  holdTime_h: z.number().nullable(),
  /** Cryogen bought per year to replace the boil-off of every sink, at price_per_L; null without a price. */
  yearlyCryogenCost: z.number().nullable(),
  yearlyBoilOff_L: z.number().nullable(),
  /** Blanket mass and cost from the library's areal mass and cost per m² (null where the library has none). */
  blanketMass_kg: z.number().nullable(),
  blanketCost: z.number().nullable(),
});
export const CompareResultSchema = z.object({ price_per_L: z.number().nullable(), items: z.array(CompareItemSchema) });
export type CompareResult = z.infer<typeof CompareResultSchema>;
