import { z } from "zod";
import {
  checkViewFactors,
  blanketCorrelation,
  boilOff,
  CRYOGEN_IDS,
  GASES,
  gasConduction,
  MAX_BLOCK_LAYERS,
  MAX_ENCLOSURE_SURFACES,
  MAX_LAYUP_ITEMS,
  MAX_SHIELDS,
  MAX_SUPPORTS,
  measuredHeatLeak,
  stackNodes,
  SUPPORT_MATERIAL_IDS,
  supportConduction,
  ThermalInputError,
  validateAssembly,
  validateEmissivity,
  VENT_REFERENCE_CONDITIONS,
  type Emissivity,
  type GasName,
  type VentReference,
} from "../thermal";
import { above, aboveZeroAtMostOne, atLeast, EmissivitySchema, EmissivityValueSchema, engineCheck, inRange, must, oneOf, whole } from "./thermal-fields";

/**
 * zod contracts for the engine's inputs: a whole design (estimateAssembly), the sweeps, and
 * the small functions. Shapes and ranges are checked here; cross-field rules run the engine's
 * own checks (engineCheck), so every message is the engine's. Types come from z.infer.
 */

export { EmissivitySchema, EmissivityValueSchema } from "./thermal-fields";

const GAS_NAMES = Object.keys(GASES) as GasName[];
const VENT_REFERENCES = Object.keys(VENT_REFERENCE_CONDITIONS) as VentReference[];
const label = z.string(must("a text of at most 120 characters")).max(120, must("a text of at most 120 characters"));

export const ReflectorFacesSchema = z.object({ warmSide: EmissivitySchema, coldSide: EmissivitySchema }, must("a reflector { warmSide, coldSide }"));

const load = {
  cryogen: oneOf(CRYOGEN_IDS).optional(),
  capacity_L: above(0, "L").optional(),
  fillFraction: inRange(0, 1).optional(),
  minimumFraction: inRange(0, 1).optional(),
  ventReference: oneOf(VENT_REFERENCES).optional(),
};

const radius = above(0, "m");
export const AssemblyGeometrySchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("planar"), area_m2: above(0, "m²") }),
    z.object({ kind: z.literal("cylinder"), coldRadius_m: radius, warmRadius_m: radius, length_m: above(0, "m"), flatEnds: whole(0, 2).optional() }),
    z.object({ kind: z.literal("sphere"), coldRadius_m: radius, warmRadius_m: radius }),
  ],
  must('an object with kind "planar", "cylinder" or "sphere"'),
);

export const BlanketCoefficientsSchema = z.object(
  {
    solid: atLeast(0),
    solidExponent: atLeast(0),
    radiation: atLeast(0),
    gas: atLeast(0),
    solidTemperatureTerm: oneOf(["mean-temperature", "polyester-conductivity"] as const).optional(),
  },
  must("an object with solid, solidExponent, radiation and gas"),
);

const SpacerSchema = z.union(
  [
    z.object({
      conductance_W_per_m2_K: above(0, "W/(m²·K)"),
      referenceMeanTemperature_K: above(0, "K").optional(),
      referenceLayerDensity_per_cm: above(0, "layers/cm").optional(),
      layerDensityExponent: inRange(0, 5).optional(),
    }),
    z.object({
      conductivity_W_per_m_K: above(0, "W/(m·K)"),
      thickness_m: above(0, "m").optional(),
      contactFactor: aboveZeroAtMostOne("a number above 0 and at most 1").optional(),
    }),
  ],
  must("a spacer { conductance_W_per_m2_K } or { conductivity_W_per_m_K, thickness_m?, contactFactor? }"),
);

export const LayupBlockSchema = z.object({
  kind: z.literal("block"),
  label: label.optional(),
  layers: whole(1, MAX_BLOCK_LAYERS),
  reflector: ReflectorFacesSchema.extend({ low: ReflectorFacesSchema.optional(), high: ReflectorFacesSchema.optional() }),
  model: oneOf(["radiation", "correlation", "layers"] as const),
  layerDensity_per_cm: above(0, "layers/cm").optional(),
  spacer: SpacerSchema.optional(),
  coefficients: BlanketCoefficientsSchema.optional(),
  degradationFactor: atLeast(1).optional(),
});

export const LayupStageSchema = z.object({
  kind: z.literal("stage"),
  label: label.min(1, must("a non-empty name")),
  temperature_K: above(0, "K"),
  emissivity: EmissivitySchema,
  ...load,
});

export const LayupItemSchema = z.discriminatedUnion("kind", [LayupBlockSchema, LayupStageSchema], must('"block" or "stage"'));

const stageNumber = z.number(must("a stage number")).int(must("a stage number")).min(0, must("a stage number"));
export const AssemblySupportSchema = z.object({
  label: label.optional(),
  material: oneOf(SUPPORT_MATERIAL_IDS),
  area_m2: above(0, "m²"),
  length_m: above(0, "m"),
  count: whole(1, 1_000_000).optional(),
  from: z.union([z.literal("warm"), stageNumber], must('"warm" or a stage number')),
  to: z.union([z.literal("cold"), stageNumber], must('"cold" or a stage number')),
});

const wall = { temperature_K: above(0, "K"), emissivity: EmissivitySchema };

export const AssemblyVacuumSchema = z.object({
  pressure_Pa: atLeast(0, "Pa"),
  gas: oneOf(GAS_NAMES),
  gaugeTemperature_K: above(0, "K").optional(),
  accommodation: z
    .object({
      warm: aboveZeroAtMostOne("an accommodation coefficient above 0 and at most 1"),
      cold: aboveZeroAtMostOne("an accommodation coefficient above 0 and at most 1"),
    })
    .optional(),
});

/** The design body of estimateAssembly; stage order, support ends and fit ranges by the engine. */
export const AssemblyDesignSchema = z
  .object(
    {
      geometry: AssemblyGeometrySchema,
      warm: z.object(wall, must("a warm boundary { temperature_K, emissivity }")),
      cold: z.object({ ...wall, ...load, label: label.optional() }, must("a cold boundary { temperature_K, emissivity, … }")),
      layup: z
        .array(LayupItemSchema, must(`a list of at most ${MAX_LAYUP_ITEMS} blocks and stages, warm → cold`))
        .max(MAX_LAYUP_ITEMS, must(`a list of at most ${MAX_LAYUP_ITEMS} blocks and stages, warm → cold`)),
      supports: z.array(AssemblySupportSchema, must(`a list of at most ${MAX_SUPPORTS} supports`)).max(MAX_SUPPORTS, must(`a list of at most ${MAX_SUPPORTS} supports`)).optional(),
      vacuum: AssemblyVacuumSchema,
    },
    must("a design { geometry, warm, cold, layup, vacuum }"),
  )
  .superRefine(...engineCheck(validateAssembly));
export type AssemblyDesignInput = z.infer<typeof AssemblyDesignSchema>;

// ---- Sweeps -------------------------------------------------------------------------------

const blockIndex = whole(0, MAX_LAYUP_ITEMS - 1);

/** Throws the engine's words unless `to` is at or above `from`. */
function ordered(words: (from: number) => string) {
  return engineCheck((range: { from: number; to: number }) => {
    if (range.to < range.from) throw new ThermalInputError("to", range.to, words(range.from));
  });
}

export const SweepLayerCountOptionsSchema = z
  .object({ blockIndex, from: whole(1, MAX_BLOCK_LAYERS), to: whole(1, MAX_BLOCK_LAYERS), step: whole(1, MAX_BLOCK_LAYERS) })
  .superRefine(...ordered((from) => `a whole number from ${from} to ${MAX_BLOCK_LAYERS}`));

export const SweepLayerDensityOptionsSchema = z
  .object({ blockIndex, from: above(0, "layers/cm"), to: above(0, "layers/cm"), step: above(0, "layers/cm") })
  .superRefine(...ordered((from) => `a number at or above from (${from} layers/cm)`));

export const SweepWarmTemperatureOptionsSchema = z
  .object({ from: above(0, "K"), to: above(0, "K"), step: above(0, "K") })
  .superRefine(...ordered((from) => `a number at or above from (${from} K)`));

export const SweepPressureOptionsSchema = z
  .object({ from: above(0, "Pa"), to: above(0, "Pa"), pointsPerDecade: whole(1, 1000) })
  .superRefine(...ordered((from) => `a pressure at or above from (${from} Pa)`));

export const FewestLayersOptionsSchema = z.object({ blockIndex, targetColdHeat_W: above(0, "W"), max: whole(1, MAX_BLOCK_LAYERS) });

// ---- Small functions ----------------------------------------------------------------------

export const StackInputSchema = z
  .object({
    geometry: z.discriminatedUnion(
      "kind",
      [
        z.object({ kind: z.literal("planar"), area_m2: above(0, "m²") }),
        z.object({ kind: z.literal("cylinder"), coldRadius_m: radius, warmRadius_m: radius, length_m: above(0, "m") }),
        z.object({ kind: z.literal("sphere"), coldRadius_m: radius, warmRadius_m: radius }),
      ],
      must('an object with kind "planar", "cylinder" or "sphere"'),
    ),
    warm: z.object(wall),
    cold: z.object(wall),
    shields: z
      .array(ReflectorFacesSchema.extend({ radius_m: above(0, "m").optional() }), must(`a list of at most ${MAX_SHIELDS} shields`))
      .max(MAX_SHIELDS, must(`a list of at most ${MAX_SHIELDS} shields`)),
  })
  .superRefine(
    ...engineCheck((input: { geometry: Parameters<typeof stackNodes>[0]; warm: { temperature_K: number; emissivity: Emissivity }; cold: { temperature_K: number; emissivity: Emissivity }; shields: { warmSide: Emissivity; coldSide: Emissivity; radius_m?: number }[] }) => {
      if (input.warm.temperature_K <= input.cold.temperature_K) {
        throw new ThermalInputError("warm.temperature_K", input.warm.temperature_K, `a temperature above cold.temperature_K (${input.cold.temperature_K} K)`);
      }
      validateEmissivity(input.warm.emissivity, "warm.emissivity");
      validateEmissivity(input.cold.emissivity, "cold.emissivity");
      input.shields.forEach((s, i) => {
        validateEmissivity(s.warmSide, `shields[${i}].warmSide`);
        validateEmissivity(s.coldSide, `shields[${i}].coldSide`);
      });
      stackNodes(input.geometry, input.shields.map((s) => s.radius_m));
    }),
  );

const EnclosureSurfaceSchema = z
  .object({
    area_m2: above(0, "m²"),
    emissivity: EmissivityValueSchema,
    temperature_K: above(0, "K").optional(),
    netHeat_W: z.number(must("a finite number of watts (positive leaving the surface)")).optional(),
    reradiating: z.boolean(must("true or false")).optional(),
  })
  .superRefine(
    ...engineCheck((s: { temperature_K?: number; netHeat_W?: number; reradiating?: boolean }) => {
      const conditions = [s.temperature_K !== undefined, s.netHeat_W !== undefined, s.reradiating === true].filter(Boolean).length;
      if (conditions !== 1) throw new ThermalInputError("", `${conditions} boundary conditions`, "exactly one of temperature_K, netHeat_W or reradiating: true");
    }),
  );

export const EnclosureInputSchema = z
  .object({
    surfaces: z
      .array(EnclosureSurfaceSchema, must(`a list of 2 to ${MAX_ENCLOSURE_SURFACES} surfaces`))
      .min(2, must(`a list of 2 to ${MAX_ENCLOSURE_SURFACES} surfaces`))
      .max(MAX_ENCLOSURE_SURFACES, must(`a list of 2 to ${MAX_ENCLOSURE_SURFACES} surfaces`)),
    viewFactors: z.array(z.array(z.number(must("a view factor from 0 to 1")), must("a row of view factors")), must("a matrix of view factors, one row per surface")),
  })
  .superRefine(
    ...engineCheck((input: { surfaces: { area_m2: number; temperature_K?: number }[]; viewFactors: number[][] }) => {
      if (!input.surfaces.some((s) => s.temperature_K !== undefined)) {
        throw new ThermalInputError("surfaces", "no surface with temperature_K", "at least one surface with a known temperature_K");
      }
      checkViewFactors(input.surfaces.map((s) => s.area_m2), input.viewFactors);
    }),
  );

export const GasConductionInputSchema = z
  .object({
    gas: oneOf(GAS_NAMES),
    pressure_Pa: atLeast(0, "Pa"),
    gaugeTemperature_K: above(0, "K"),
    warm_K: above(0, "K"),
    cold_K: above(0, "K"),
    accommodation: z.object({ warm: aboveZeroAtMostOne("an accommodation coefficient above 0 and at most 1"), cold: aboveZeroAtMostOne("an accommodation coefficient above 0 and at most 1") }).optional(),
    gap_m: above(0, "m").optional(),
    areaRatio: above(0).optional(),
  })
  .superRefine(...engineCheck(gasConduction));

export const BlanketCorrelationInputSchema = z
  .object({
    layers: whole(1, 10_000),
    layerDensity_per_cm: above(0, "layers/cm"),
    warm_K: above(0, "K"),
    cold_K: above(0, "K"),
    pressure_torr: atLeast(0, "torr"),
    emissivity: EmissivityValueSchema,
    coefficients: BlanketCoefficientsSchema,
  })
  .superRefine(...engineCheck(blanketCorrelation));

export const BoilOffInputSchema = z.object({ heat_W: atLeast(0, "W"), ...load, cryogen: oneOf(CRYOGEN_IDS) }).superRefine(...engineCheck(boilOff));

export const SupportConductionInputSchema = z
  .object({ material: oneOf(SUPPORT_MATERIAL_IDS), area_m2: above(0, "m²"), length_m: above(0, "m"), warm_K: above(0, "K"), cold_K: above(0, "K"), count: whole(1, 1_000_000).optional() })
  .superRefine(...engineCheck(supportConduction));

export const MeasuredHeatLeakInputSchema = z
  .object({
    method: oneOf(["weighing", "vent-flow", "level"] as const),
    rate: z.number(must("a finite number")),
    rateStdError: atLeast(0),
    cryogen: oneOf(CRYOGEN_IDS),
    capacity_L: above(0, "L").optional(),
    ventReference: oneOf(VENT_REFERENCES).optional(),
    barometricPressure_Pa: above(0, "Pa").optional(),
  })
  .superRefine(...engineCheck(measuredHeatLeak));
