import type { AssemblyResult } from "../thermal/assembly";

/**
 * What a design predicts: the engine's whole result plus the figures lists and tables show,
 * and the layer-count sweep of one block against the design's target. Stored with each revision.
 */
export interface Prediction {
  result: AssemblyResult;
  /** Heat into the cold vessel, all parts, W. */
  coldHeat_W: number;
  /** Liquid boiled off the cold vessel per day, L; null without a cryogen. */
  coldBoilOff_L_per_day: number | null;
  holdTime_h: number | null;
  evaporationRate_percent_per_day: number | null;
  sweep: LayerSweep | null;
}

export interface LayerSweep {
  /** The layup index of the swept block (the one with the most layers after the last stage). */
  layupIndex: number;
  points: { layers: number; coldHeat_W: number }[];
  targetColdHeat_W: number | null;
  /** The fewest layers in that block that meet the target; null when none up to the limit does. */
  fewestLayers: number | null;
}
