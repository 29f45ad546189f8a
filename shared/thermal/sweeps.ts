import { MAX_BLOCK_LAYERS, MAX_TOTAL_SHIELDS, type AssemblyDesign } from "./assembly-design";
import { planAssembly, type Plan, type PlanBlock } from "./assembly-plan";
import { arrivingHeats, supportHeats } from "./assembly";
import { requireAbove, requireWhole, ThermalInputError } from "./errors";
import { EXTRAPOLATION_LIMIT_K } from "./supports";

/**
 * Heat into every sink as one input of a design varies. The design is validated and planned
 * once; each point changes one number of the plan and re-solves heats only (no layer
 * temperatures, no ladders), which keeps a 10 000-point sweep allocation-light.
 */
export interface SweepPoint {
  x: number;
  /** Heat arriving at each cooled stage warm → cold (heatIn.total_W of estimateAssembly). */
  heatIntoStages_W: number[];
  /** Heat arriving at the cold vessel. */
  coldHeat_W: number;
}

export interface SweepRange {
  from: number;
  to: number;
  step: number;
}

export const MAX_SWEEP_POINTS = 100_000;

/**
 * Heat against the layer count of one block; blockIndex is the block's index in the layup. With
 * coldOnly, only the cold vessel's heat is solved for (heatIntoStages_W comes back empty): the
 * segments that end at a stage are skipped, which is what a layer-count chart of the vessel needs.
 */
export function sweepLayerCount(design: AssemblyDesign, options: SweepRange & { blockIndex: number; coldOnly?: boolean }): SweepPoint[] {
  requireOptions(options, "{ blockIndex, from, to, step }");
  const plan = planAssembly(design);
  const block = blockAt(plan, design, options.blockIndex);
  const from = requireWhole("from", options.from, 1, MAX_BLOCK_LAYERS);
  const to = requireWhole("to", options.to, from, MAX_BLOCK_LAYERS);
  const step = requireWhole("step", options.step, 1, MAX_BLOCK_LAYERS);
  requireShieldRoom(plan, block, to);
  const supports = supportHeats(plan, []).arriving;
  const cold = plan.sinks.length - 1;
  return points(from, to, step, (x) => {
    block.layers = x;
    if (!options.coldOnly) return arrivingHeats(plan, "nominal", supports);
    return [arrivingHeats(plan, "nominal", supports, cold)[cold]];
  });
}

/** Heat against the layer density (layers/cm) of a correlation or layers block. */
export function sweepLayerDensity(design: AssemblyDesign, options: SweepRange & { blockIndex: number }): SweepPoint[] {
  requireOptions(options, "{ blockIndex, from, to, step }");
  const plan = planAssembly(design);
  const block = blockAt(plan, design, options.blockIndex);
  if (block.model === "radiation") {
    throw new ThermalInputError("blockIndex", options.blockIndex, "the layup index of a correlation or layers block (the radiation model has no layer density)");
  }
  const range = linearRange(options, 0, "layers/cm");
  const supports = supportHeats(plan, []).arriving;
  return points(range.from, range.to, range.step, (x) => {
    block.layerDensity_per_cm = x;
    return arrivingHeats(plan, "nominal", supports);
  });
}

/** Heat against the warm wall's temperature; every point stays above the warmest stage (or the cold vessel). */
export function sweepWarmTemperature(design: AssemblyDesign, options: SweepRange): SweepPoint[] {
  const plan = planAssembly(design);
  const below = plan.sinks[0].temperature_K;
  const range = linearRange(options, below, "K");
  // planAssembly checked the supports' fit ranges at the design's own warm temperature only.
  if (plan.supports.some((s) => s.from < 0) && range.to > EXTRAPOLATION_LIMIT_K) {
    throw new ThermalInputError("to", range.to, `a temperature at or below ${EXTRAPOLATION_LIMIT_K} K, the limit of the supports' conductivity fits`);
  }
  return points(range.from, range.to, range.step, (x) => {
    plan.warm.temperature_K = x;
    // Supports from the warm wall change with it.
    return arrivingHeats(plan, "nominal", supportHeats(plan, []).arriving);
  });
}

/** Heat against the residual pressure, spaced evenly in log10 P. */
export function sweepPressure(design: AssemblyDesign, options: { from: number; to: number; pointsPerDecade: number }): SweepPoint[] {
  requireOptions(options, "{ from, to, pointsPerDecade }");
  const plan = planAssembly(design);
  const from = requireAbove("from", options.from, 0, "Pa");
  const to = requireAbove("to", options.to, 0, "Pa");
  if (to < from) throw new ThermalInputError("to", to, `a pressure at or above from (${from} Pa)`);
  const perDecade = requireWhole("pointsPerDecade", options.pointsPerDecade, 1, 1000);
  const last = Math.floor(Math.log10(to / from) * perDecade + 1e-9);
  if (last + 1 > MAX_SWEEP_POINTS) throw new ThermalInputError("pointsPerDecade", perDecade, `a spacing giving at most ${MAX_SWEEP_POINTS} points`);
  const supports = supportHeats(plan, []).arriving;
  const result: SweepPoint[] = [];
  for (let i = 0; i <= last; i++) {
    const x = from * 10 ** (i / perDecade);
    plan.vacuum.pressure_Pa = x;
    result.push(point(x, arrivingHeats(plan, "nominal", supports)));
  }
  return result;
}

/**
 * The least layer count of one block, up to `max`, whose cold-vessel heat is at or below the
 * target: bisection on the count, which the heat falls with. Every count bisection evaluated
 * is checked to be in that order; if one is not (the heat is not monotone in this design),
 * every count from 1 to max is tried instead, so the answer is the least count either way.
 */
export function fewestLayersForTarget(
  design: AssemblyDesign,
  options: { blockIndex: number; targetColdHeat_W: number; max: number },
): { layers: number | null; heat_W: number } {
  requireOptions(options, "{ blockIndex, targetColdHeat_W, max }");
  const plan = planAssembly(design);
  const block = blockAt(plan, design, options.blockIndex);
  const target = requireAbove("targetColdHeat_W", options.targetColdHeat_W, 0, "W");
  const max = requireWhole("max", options.max, 1, MAX_BLOCK_LAYERS);
  requireShieldRoom(plan, block, max);
  const supports = supportHeats(plan, []).arriving;
  const cold = plan.sinks.length - 1;
  const own = block.layers;
  const seen = new Map<number, number>();
  const heat = (n: number): number => {
    let q = seen.get(n);
    if (q === undefined) {
      block.layers = n;
      q = arrivingHeats(plan, "nominal", supports, cold)[cold];
      seen.set(n, q);
    }
    return q;
  };
  let answer: number | null;
  if (heat(1) <= target) answer = 1;
  else {
    // Gallop up from the block's own count before bisecting: a long blanket is a long chain to
    // solve, and the answer is usually near the design, so most searches never solve ~max layers.
    let lo = 1; // heat(lo) > target
    let hi = Math.min(max, Math.max(2, own));
    while (hi < max && heat(hi) > target) {
      lo = hi;
      hi = Math.min(max, hi * 2);
    }
    if (heat(hi) > target) answer = null; // hi is max, and even that is not enough
    else {
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (heat(mid) > target) lo = mid;
        else hi = mid;
      }
      answer = hi;
    }
  }
  const counts = [...seen.keys()].sort((a, b) => a - b);
  const monotone = counts.every((n, i) => i === 0 || seen.get(n)! <= seen.get(counts[i - 1])!);
  if (!monotone) {
    answer = null;
    for (let n = 1; n <= max && answer === null; n++) if (heat(n) <= target) answer = n;
  }
  return { layers: answer, heat_W: heat(answer ?? max) };
}

function requireOptions<T>(options: T, allowed: string): T {
  if (options === null || typeof options !== "object") throw new ThermalInputError("options", options, allowed);
  return options;
}

function blockAt(plan: Plan, design: AssemblyDesign, blockIndex: number): PlanBlock {
  const blocks = plan.segments.flatMap((s) => s.blocks);
  const indices = blocks.map((b) => b.layupIndex);
  const allowed = indices.length === 0 ? "the layup index of a block (this layup has none)" : `the layup index of a block (one of ${indices.join(", ")})`;
  requireWhole("blockIndex", blockIndex, 0, Math.max(0, design.layup.length - 1));
  const block = blocks.find((b) => b.layupIndex === blockIndex);
  if (block === undefined) throw new ThermalInputError("blockIndex", blockIndex, allowed);
  return block;
}

function requireShieldRoom(plan: Plan, block: PlanBlock, most: number): void {
  let shields = plan.sinks.length - 1 - block.layers + most;
  for (const segment of plan.segments) for (const b of segment.blocks) shields += b.layers;
  if (shields > MAX_TOTAL_SHIELDS) throw new ThermalInputError("to", most, `a count keeping the layup within ${MAX_TOTAL_SHIELDS} shields in all`);
}

function linearRange(options: SweepRange, above: number, unit: string): SweepRange {
  requireOptions(options, "{ from, to, step }");
  const from = requireAbove("from", options.from, above, unit);
  const to = requireAbove("to", options.to, above, unit);
  if (to < from) throw new ThermalInputError("to", to, `a number at or above from (${from}${unit ? ` ${unit}` : ""})`);
  const step = requireAbove("step", options.step, 0, unit);
  if ((to - from) / step + 1 > MAX_SWEEP_POINTS) throw new ThermalInputError("step", step, `a step giving at most ${MAX_SWEEP_POINTS} points`);
  return { from, to, step };
}

/** x = from + i·step up to `to` (inclusive, allowing for rounding), not accumulated. */
function points(from: number, to: number, step: number, heats: (x: number) => number[]): SweepPoint[] {
  const last = Math.floor((to - from) / step + 1e-9);
  const result: SweepPoint[] = new Array(last + 1);
  for (let i = 0; i <= last; i++) {
    const x = from + i * step;
    result[i] = point(x, heats(x));
  }
  return result;
}

function point(x: number, heats: number[]): SweepPoint {
  const coldHeat_W = heats[heats.length - 1];
  heats.length -= 1;
  return { x, heatIntoStages_W: heats, coldHeat_W };
}
