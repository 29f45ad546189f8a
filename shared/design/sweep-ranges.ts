import type { SweepVariable } from "../schemas/design";
import type { AssemblyDesign } from "../thermal/assembly-design";
import { sweepLayerDensity, sweepPressure, sweepWarmTemperature, type SweepPoint } from "../thermal/sweeps";
import { EXTRAPOLATION_LIMIT_K } from "../thermal/supports";

/**
 * The ranges of the "more sweeps" charts, chosen from the design itself so the client only names
 * a variable: layer density 0.25× to 2× the swept block's own, the warm wall from just above the
 * warmest sink to 350 K, the residual pressure over seven decades. Pure, so the server's answer
 * and a direct call of the engine on the same ranges cannot disagree.
 */

/** Points per linear sweep, less one: 40 steps draw a smooth line at a fraction of a millisecond each. */
export const LINEAR_STEPS = 40;
export const DENSITY_FACTORS = { from: 0.25, to: 2 } as const;
/** A room-temperature vacuum jacket rarely runs warmer than this (common practice: a sunlit or heated jacket). */
export const WARM_TOP_K = 350;
/** From a good cold vacuum to where free-molecular gas conduction no longer holds (common practice). */
export const PRESSURE_RANGE_PA = { from: 1e-6, to: 10, pointsPerDecade: 6 } as const;

export type SweepPlan =
  | { variable: "layer-density"; unit: "layers/cm"; designValue: number; blockIndex: number; blockLabel: string; from: number; to: number; step: number }
  | { variable: "warm-temperature"; unit: "K"; designValue: number; blockIndex: null; blockLabel: null; from: number; to: number; step: number }
  | { variable: "pressure"; unit: "Pa"; designValue: number; blockIndex: null; blockLabel: null; from: number; to: number; pointsPerDecade: number };

/** A sweep that does not apply to this design, or a blockIndex that names no sweepable block; `field` is the input's name. */
export class SweepRangeError extends Error {
  constructor(
    readonly field: "variable" | "blockIndex",
    message: string,
  ) {
    super(message);
    this.name = "SweepRangeError";
  }
}

export function sweepPlanOf(design: AssemblyDesign, variable: SweepVariable, blockIndex?: number): SweepPlan {
  if (variable === "layer-density") return densityPlan(design, blockIndex);
  if (variable === "warm-temperature") return warmPlan(design);
  return { variable, unit: "Pa", designValue: design.vacuum.pressure_Pa, blockIndex: null, blockLabel: null, ...PRESSURE_RANGE_PA };
}

/** The engine's sweep over the plan's range: heat into each stage and the cold vessel at every point. */
export function runSweep(design: AssemblyDesign, plan: SweepPlan): SweepPoint[] {
  if (plan.variable === "layer-density") return sweepLayerDensity(design, { blockIndex: plan.blockIndex, from: plan.from, to: plan.to, step: plan.step });
  if (plan.variable === "warm-temperature") return sweepWarmTemperature(design, { from: plan.from, to: plan.to, step: plan.step });
  return sweepPressure(design, { from: plan.from, to: plan.to, pointsPerDecade: plan.pointsPerDecade });
}

/**
 * The given block, or by default the thickest correlation or layers block facing the cold vessel
 * (after the last stage, as the layer-count sweep picks its block: a stage's fixed temperature
 * shields the vessel from the blocks outside it); failing that, the thickest such block anywhere.
 */
function densityPlan(design: AssemblyDesign, blockIndex: number | undefined): SweepPlan {
  const sweepable = design.layup.flatMap((item, i) => (item.kind === "block" && item.model !== "radiation" ? [i] : []));
  if (sweepable.length === 0) {
    throw new SweepRangeError("variable", "variable layer-density does not apply to this design: every block is pure radiation, which has no layer density (use a correlation or layers block, or sweep warm-temperature or pressure)");
  }
  let index: number;
  if (blockIndex !== undefined) {
    if (!sweepable.includes(blockIndex)) {
      throw new SweepRangeError("blockIndex", `blockIndex must be the layup index of a correlation or layers block (one of ${sweepable.join(", ")})`);
    }
    index = blockIndex;
  } else {
    const lastStage = design.layup.findLastIndex((item) => item.kind === "stage");
    const facing = sweepable.filter((i) => i > lastStage);
    index = thickest(design, facing.length > 0 ? facing : sweepable);
  }
  const block = design.layup[index];
  if (block.kind !== "block" || block.layerDensity_per_cm === undefined) {
    throw new SweepRangeError("blockIndex", `blockIndex ${index} names a block without a layer density`);
  }
  const own = block.layerDensity_per_cm;
  const from = DENSITY_FACTORS.from * own;
  const to = DENSITY_FACTORS.to * own;
  return { variable: "layer-density", unit: "layers/cm", designValue: own, blockIndex: index, blockLabel: block.label ?? `block ${index + 1}`, from, to, step: (to - from) / LINEAR_STEPS };
}

function thickest(design: AssemblyDesign, indices: number[]): number {
  let best = indices[0];
  for (const i of indices) {
    const item = design.layup[i];
    const bestItem = design.layup[best];
    if (item.kind === "block" && bestItem.kind === "block" && item.layers > bestItem.layers) best = i;
  }
  return best;
}

/**
 * From just above the warmest sink (the engine needs the wall warmer than every stage) to 350 K,
 * or to the design's own temperature where that is warmer, so its mark is on the chart. Supports
 * from the warm wall cap it at their conductivity fits' limit, beyond which the engine refuses.
 */
function warmPlan(design: AssemblyDesign): SweepPlan {
  const sinks = [design.cold.temperature_K, ...design.layup.flatMap((item) => (item.kind === "stage" ? [item.temperature_K] : []))];
  const warmest = Math.max(...sinks);
  const own = design.warm.temperature_K;
  const limit = (design.supports ?? []).some((s) => s.from === "warm") ? EXTRAPOLATION_LIMIT_K : Number.POSITIVE_INFINITY;
  const from = warmest + Math.min(1, (own - warmest) / 2);
  const to = Math.min(Math.max(WARM_TOP_K, own), limit);
  return { variable: "warm-temperature", unit: "K", designValue: own, blockIndex: null, blockLabel: null, from, to, step: (to - from) / LINEAR_STEPS };
}
