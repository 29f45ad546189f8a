import type { Plan, PlanSurface, Variant } from "./assembly-plan";
import { blockHeat, type BlockFrame } from "./block-heat";
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

// Interface temperatures to a few parts in 10¹³ of the warm end: heats then match to ~1e-11.
const RELATIVE_TOLERANCE = 2e-13;

/**
 * Temperatures of the segment's block boundaries, warm → cold (k blocks give k + 1 values,
 * the ends fixed). With two or more blocks, the first interface T₁ is found by Brent's method
 * on r(T₁) = Q_k(T_{k−1}, T_c) − Q₁(T_h, T₁): given T₁, each following block's cold end is
 * the temperature at which it carries Q₁ (again by Brent). r rises with T₁, is positive at
 * T₁ = T_h (no heat yet) and negative at T₁ = T_c (nothing left to drive the rest), so the
 * root is bracketed; a block that cannot carry Q₁ even down to T_c returns its shortfall.
 */
export function segmentTemperatures(frames: BlockFrame[], warm_K: number, cold_K: number): number[] {
  const k = frames.length;
  if (k === 1) return [warm_K, cold_K];
  const tolerance = RELATIVE_TOLERANCE * warm_K;
  const temperatures = new Array<number>(k + 1).fill(warm_K);
  temperatures[k] = cold_K;
  const march = (t1: number): number => {
    const q = blockHeat(frames[0], warm_K, t1);
    temperatures[1] = t1;
    let t = t1;
    for (let j = 1; j < k - 1; j++) {
      const frame = frames[j];
      const most = blockHeat(frame, t, cold_K);
      if (most < q) return most - q;
      const top = t;
      t = q === 0 ? top : most === q ? cold_K : brentRoot((x) => blockHeat(frame, top, x) - q, cold_K, top, tolerance);
      temperatures[j + 1] = t;
    }
    return blockHeat(frames[k - 1], t, cold_K) - q;
  };
  const t1 = brentRoot(march, cold_K, warm_K, tolerance);
  march(t1); // leave the interfaces of the root in `temperatures`
  return temperatures;
}

/**
 * Heat arriving at every sink through the blanket (supports excluded), without layer
 * temperatures or ladders: what sweeps and the band need.
 */
export function blanketHeats(plan: Plan, variant: Variant, part: ChainPart, into: number[]): number[] {
  for (const segment of segmentFrames(plan, variant, part)) {
    const t = segmentTemperatures(segment.frames, segment.warm.temperature_K, segment.cold.temperature_K);
    const k = segment.frames.length;
    into[segment.coldSink] += blockHeat(segment.frames[k - 1], t[k - 1], t[k]);
  }
  return into;
}
