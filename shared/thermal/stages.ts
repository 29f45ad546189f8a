import type { Plan, PlanSurface, Variant } from "./assembly-plan";
import { blockHeat, type BlockFrame } from "./block-heat";
import { ThermalConvergenceError } from "./convergence-error";
import { brentRoot } from "./root-find";
import type { StackGeometry } from "./stack-geometry";

/**
 * The chain from the warm wall to the cold vessel splits at every stage, whose temperature is
 * fixed: each segment between two fixed temperatures is solved on its own. Blocks in series
 * inside one segment carry the same heat, so the temperatures between them are solved for.
 */

/** "lateral": the design's own geometry; "ends": the planar flat ends of a cylinder. */
export type ChainPart = "lateral" | "ends";

export interface SegmentFrames {
  warm: PlanSurface;
  cold: PlanSurface;
  coldSink: number;
  warmSink: number;
  /** One frame per block; a single bare frame when the segment has no block. */
  frames: BlockFrame[];
}

/**
 * Frames of every segment. Curved walls: all surfaces of the chain (every layer and stage) are
 * spread evenly in radius between the walls, r_k = r_c + (r_w − r_c)·(M + 1 − k)/(M + 1), the
 * default spacing of the radiation network (stack-geometry.ts), so each block's own stack
 * sees the same radii as the whole chain.
 */
export function segmentFrames(plan: Plan, variant: Variant, part: ChainPart): SegmentFrames[] {
  const g = plan.geometry;
  let total = plan.sinks.length - 1;
  for (const segment of plan.segments) for (const block of segment.blocks) total += block.layers;
  const radius = (k: number) =>
    g.kind === "planar" ? 0 : g.coldRadius_m + ((g.warmRadius_m - g.coldRadius_m) * (total + 1 - k)) / (total + 1);
  const place = (warmIndex: number, coldIndex: number): StackGeometry => {
    if (part === "ends" && g.kind === "cylinder") return { kind: "planar", area_m2: plan.flatEnds * Math.PI * g.coldRadius_m ** 2 };
    if (g.kind === "planar") return g;
    if (g.kind === "sphere") return { kind: "sphere", warmRadius_m: radius(warmIndex), coldRadius_m: radius(coldIndex) };
    return { kind: "cylinder", warmRadius_m: radius(warmIndex), coldRadius_m: radius(coldIndex), length_m: g.length_m };
  };
  const result: SegmentFrames[] = [];
  let surface = 0; // index of the segment's warm surface: 0 is the warm wall
  for (const segment of plan.segments) {
    const warm = segment.warmSink < 0 ? plan.warm : plan.sinks[segment.warmSink];
    const cold = plan.sinks[segment.coldSink];
    const frames: BlockFrame[] = [];
    const blocks = segment.blocks;
    if (blocks.length === 0) {
      const faces = { warmSide: cold.emissivity, coldSide: warm.emissivity };
      frames.push({ block: null, faces, warmFace: warm.emissivity, coldFace: cold.emissivity, interior: 0, endsOnOwnLayer: false, place: place(surface, surface + 1), vacuum: plan.vacuum });
    }
    blocks.forEach((block, j) => {
      const faces = block.faces[variant];
      const last = j === blocks.length - 1;
      const warmFace = j === 0 ? warm.emissivity : blocks[j - 1].faces[variant].coldSide;
      const coldFace = last ? cold.emissivity : faces.warmSide;
      const coldIndex = last ? surface + block.layers + 1 : surface + block.layers;
      const interior = last ? block.layers : block.layers - 1;
      frames.push({ block, faces, warmFace, coldFace, interior, endsOnOwnLayer: !last, place: place(surface, coldIndex), vacuum: plan.vacuum });
      surface += block.layers;
    });
    result.push({ warm, cold, warmSink: segment.warmSink, coldSink: segment.coldSink, frames });
    surface += 1; // the stage (or cold wall) closing this segment
  }
  return result;
}

// Interface temperatures to a few parts in 10¹³ of the warm end.
const RELATIVE_TOLERANCE = 2e-13;
// Heats of neighbouring blocks must agree this well after polishing, and at least this well at all.
const HEAT_AGREEMENT = 1e-12;
const HEAT_AGREEMENT_FLOOR = 1e-7;
const MAX_SWEEPS = 200;

/**
 * Temperatures of the segment's block boundaries, warm → cold (k blocks give k + 1 values,
 * the ends fixed); each found by Brent's method (root-find.ts).
 *
 * Two blocks: the interface T₁ solves Q₁(T_h, T₁) = Q₂(T₁, T_c), whose two sides move apart as
 * T₁ moves, so T₁ is well determined. Three or more: first a shooting pass on T₁ (given T₁,
 * each following block's cold end is where it carries Q₁; r(T₁) = Q_k − Q₁ rises with T₁, is
 * positive at T_h and negative at T_c; a block that cannot carry Q₁ even down to T_c returns
 * its shortfall). Shooting can amplify the last digits of T₁ enormously (a radiation block
 * near 4 K hardly feels its cold end), so Gauss–Seidel sweeps then re-solve every interface
 * between its two neighbours, as in the two-block case, until neighbouring heats agree.
 */
export function segmentTemperatures(frames: BlockFrame[], warm_K: number, cold_K: number): number[] {
  const k = frames.length;
  if (k === 1) return [warm_K, cold_K];
  const tolerance = RELATIVE_TOLERANCE * warm_K;
  const t = new Array<number>(k + 1).fill(warm_K);
  t[k] = cold_K;
  const balance = (j: number) => {
    const above = frames[j - 1];
    const below = frames[j];
    const a = t[j - 1];
    const b = t[j + 1];
    t[j] = brentRoot((x) => blockHeat(above, a, x) - blockHeat(below, x, b), b, a, tolerance);
  };
  if (k === 2) {
    balance(1);
    return t;
  }
  const march = (t1: number): number => {
    const q = blockHeat(frames[0], warm_K, t1);
    t[1] = t1;
    let top = t1;
    for (let j = 1; j < k - 1; j++) {
      const frame = frames[j];
      const most = blockHeat(frame, top, cold_K);
      if (most < q) return most - q;
      const from = top;
      top = q === 0 ? from : most === q ? cold_K : brentRoot((x) => blockHeat(frame, from, x) - q, cold_K, from, tolerance);
      t[j + 1] = top;
    }
    return blockHeat(frames[k - 1], top, cold_K) - q;
  };
  march(brentRoot(march, cold_K, warm_K, tolerance));
  let mismatch = heatMismatch(frames, t);
  for (let sweep = 1; mismatch > HEAT_AGREEMENT; sweep++) {
    if (sweep > MAX_SWEEPS) {
      if (mismatch > HEAT_AGREEMENT_FLOOR) throw new ThermalConvergenceError("Temperatures between blocks", MAX_SWEEPS, mismatch);
      break;
    }
    for (let j = 1; j < k; j++) balance(j);
    const next = heatMismatch(frames, t);
    // Stop once the sweeps no longer improve: what is left is the blocks' own rounding.
    if (next >= mismatch && next <= HEAT_AGREEMENT_FLOOR) break;
    mismatch = next;
  }
  return t;
}

/** Largest difference between neighbouring blocks' heats, relative to the largest heat. */
function heatMismatch(frames: BlockFrame[], t: number[]): number {
  let worst = 0;
  let previous = blockHeat(frames[0], t[0], t[1]);
  let largest = Math.abs(previous);
  for (let j = 1; j < frames.length; j++) {
    const q = blockHeat(frames[j], t[j], t[j + 1]);
    worst = Math.max(worst, Math.abs(q - previous));
    largest = Math.max(largest, Math.abs(q));
    previous = q;
  }
  return largest > 0 ? worst / largest : 0;
}

/**
 * Heat arriving at every sink through the blanket (supports excluded), without layer
 * temperatures or ladders: what sweeps and the band need.
 */
export function blanketHeats(plan: Plan, variant: Variant, part: ChainPart, into: number[], onlySink?: number): number[] {
  for (const segment of segmentFrames(plan, variant, part)) {
    // A segment adds heat to its own cold sink only: skipping the others leaves that sink exact.
    if (onlySink !== undefined && segment.coldSink !== onlySink) continue;
    const t = segmentTemperatures(segment.frames, segment.warm.temperature_K, segment.cold.temperature_K);
    const k = segment.frames.length;
    into[segment.coldSink] += blockHeat(segment.frames[k - 1], t[k - 1], t[k]);
  }
  return into;
}
