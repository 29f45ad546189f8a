import { estimateAssembly } from "../thermal/assembly";
import { MAX_TOTAL_SHIELDS, type AssemblyDesign } from "../thermal/assembly-design";
import { fewestLayersForTarget, sweepLayerCount } from "../thermal/sweeps";
import type { DesignContent } from "../schemas/design";
import type { LayerSweep, Prediction } from "./prediction";
import { toAssembly, type ResolvedMaterial } from "./to-assembly";
import type { MaterialRef } from "../schemas/design";

const SWEEP_POINTS = 40;
const SWEEP_MAX_LAYERS = 200;

/**
 * The one function both the saved prediction and the live estimate call. The sweep is most of
 * the cost, so a live edit may ask for the figures first ({ sweep: false } gives sweep null).
 */
export function predictDesign(content: DesignContent, lookup: (ref: MaterialRef) => ResolvedMaterial | undefined, options: { sweep?: boolean } = {}): Prediction {
  const assembly = toAssembly(content, lookup);
  const result = estimateAssembly(assembly);
  const cold = result.stages[result.stages.length - 1];
  return {
    result,
    coldHeat_W: cold.heatIn.total_W,
    coldBoilOff_L_per_day: cold.boilOff ? cold.boilOff.liquidVolume_L_per_day : null,
    holdTime_h: cold.boilOff?.holdTime_h != null && Number.isFinite(cold.boilOff.holdTime_h) ? cold.boilOff.holdTime_h : null,
    evaporationRate_percent_per_day: cold.boilOff?.evaporationRate_percent_per_day ?? null,
    sweep: options.sweep === false ? null : layerSweep(assembly, content.targetColdHeat_W ?? null),
  };
}

/**
 * Heat into the cold vessel against the layer count of the thickest block facing the cold vessel
 * (after the last cooled stage: a stage's fixed temperature shields the vessel from the blocks
 * outside it), from 1 to twice its count (at most 200), in up to 40 steps; with a target, the
 * fewest layers meeting it.
 */
function layerSweep(assembly: AssemblyDesign, target: number | null): LayerSweep | null {
  let layupIndex = -1;
  let layers = 0;
  let otherShields = 0;
  const lastStage = assembly.layup.findLastIndex((item) => item.kind === "stage");
  assembly.layup.forEach((item, i) => {
    const n = item.kind === "block" ? item.layers : 1;
    otherShields += n;
    if (item.kind === "block" && i > lastStage && item.layers > layers) {
      layers = item.layers;
      layupIndex = i;
    }
  });
  if (layupIndex < 0) return null;
  otherShields -= layers;
  // At least two points where the shield limit leaves room for them (a valid design always leaves room for its own count).
  const room = MAX_TOTAL_SHIELDS - otherShields;
  const max = Math.min(room, Math.max(2, Math.min(SWEEP_MAX_LAYERS, 2 * layers)));
  const step = Math.max(1, Math.ceil(max / SWEEP_POINTS));
  const points = sweepLayerCount(assembly, { blockIndex: layupIndex, from: 1, to: max, step, coldOnly: true }).map((p) => ({ layers: p.x, coldHeat_W: p.coldHeat_W }));
  const fewest = target != null ? fewestLayersForTarget(assembly, { blockIndex: layupIndex, targetColdHeat_W: target, max: Math.min(1000, MAX_TOTAL_SHIELDS - otherShields) }).layers : null;
  return { layupIndex, points, targetColdHeat_W: target, fewestLayers: fewest };
}
