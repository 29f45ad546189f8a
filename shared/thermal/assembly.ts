import type { AssemblyDesign, BlockModel } from "./assembly-design";
import { planAssembly, type Plan, type Variant } from "./assembly-plan";
import { blockDetail, type BlockDetail } from "./block-heat";
import { boilOff, type BoilOffResult } from "./boil-off";
import { cryogenProperties } from "./fluids";
import type { StackResistance } from "./radiation-network";
import { blanketHeats, segmentFrames, segmentTemperatures, type ChainPart } from "./stages";
import { supportConduction } from "./supports";

export interface SinkHeat {
  radiation_W: number;
  solid_W: number;
  gas_W: number;
  supports_W: number;
  total_W: number;
}

/** A cold sink: each stage warm → cold, then the cold vessel. */
export interface AssemblyStage {
  label: string;
  /** Index in the layup; null for the cold vessel. */
  layupIndex: number | null;
  temperature_K: number;
  /** Heat arriving from the warm side: through the blanket above and the supports that end here. */
  heatIn: SinkHeat;
  /** Heat passed on toward colder sinks: through the blanket below and the supports that start here. */
  heatOut_W: number;
  /** What the stage's cooling must take up, heatIn.total_W − heatOut_W; boil-off is worked from this. */
  net_W: number;
  boilOff?: BoilOffResult;
}

export interface AssemblyBlock {
  layupIndex: number;
  label: string;
  model: BlockModel;
  layers: number;
  warm_K: number;
  cold_K: number;
  /** Lateral (or planar, or spherical) heat plus the flat ends', degradation included. */
  heat_W: number;
  endHeat_W: number;
  /** heat_W over the area of the block's cold bounding surface (flat ends included). */
  heatFlux_W_per_m2: number;
  radiation_W: number;
  solid_W: number;
  gas_W: number;
  degradationFactor: number;
  /** Every layer warm → cold on the lateral wall; null for the correlation model. */
  shieldTemperatures_K: number[] | null;
}

/** One shield of the wall section, warm → cold. */
export interface AssemblyShield {
  layupIndex: number;
  kind: "layer" | "stage";
  /** null inside a correlation block, which gives no layer temperatures. */
  temperature_K: number | null;
  radius_m?: number;
}

/** The resistance ladder of a radiation block (or of a bare gap between fixed surfaces: layupIndex null). */
export interface AssemblyLadder {
  segment: number;
  layupIndex: number | null;
  resistances: StackResistance[];
}

export interface AssemblyBand {
  label: string;
  low_W: number;
  nominal_W: number;
  high_W: number;
}

export interface AssemblyResult {
  stages: AssemblyStage[];
  blocks: AssemblyBlock[];
  shields: AssemblyShield[];
  resistances: AssemblyLadder[];
  supports: { label: string; heat_W: number; from: string; to: string }[];
  /** Blanket heat into the cold vessel (supports excluded) over its insulated area. */
  heatFlux_W_per_m2: number;
  /** Heat into each sink (heatIn.total_W) with the reflectors' low and high emissivity models; null without them. */
  band: AssemblyBand[] | null;
  warnings: string[];
}

// A bath this far off its 1 atm boiling point is pressurized or mislabelled: say so (our choice).
const SATURATION_WARNING_K = 0.5;

/**
 * Heat leak, per-sink heat and boil-off of a whole design (see assembly-design.ts for the
 * input). The chain splits at the stages (stages.ts); supports add (A/L)·∫k dT·count between
 * their two ends (supports.ts); each sink with a cryogen gets boilOff of its net heat.
 */
export function estimateAssembly(design: AssemblyDesign): AssemblyResult {
  const plan = planAssembly(design);
  const warnings: string[] = [];
  const supports = supportHeats(plan, warnings);
  const lateral = chainDetail(plan, "lateral");
  const ends = plan.flatEnds > 0 ? chainDetail(plan, "ends") : null;

  const sinks = plan.sinks;
  const heatIn: SinkHeat[] = sinks.map(() => ({ radiation_W: 0, solid_W: 0, gas_W: 0, supports_W: 0, total_W: 0 }));
  const heatOut = new Array<number>(sinks.length).fill(0);
  for (const chain of ends === null ? [lateral] : [lateral, ends]) {
    for (const segment of chain) {
      const arriving = segment.details[segment.details.length - 1];
      const into = heatIn[segment.coldSink];
      into.radiation_W += arriving.radiation_W;
      into.solid_W += arriving.solid_W;
      into.gas_W += arriving.gas_W;
      if (segment.warmSink >= 0) heatOut[segment.warmSink] += segment.details[0].heat_W;
    }
  }
  supports.arriving.forEach((q, i) => (heatIn[i].supports_W = q));
  supports.leaving.forEach((q, i) => (heatOut[i] += q));

  const stages: AssemblyStage[] = sinks.map((sink, i) => {
    const h = heatIn[i];
    h.total_W = h.radiation_W + h.solid_W + h.gas_W + h.supports_W;
    const net_W = h.total_W - heatOut[i];
    const stage: AssemblyStage = { label: sink.label, layupIndex: sink.layupIndex, temperature_K: sink.temperature_K, heatIn: h, heatOut_W: heatOut[i], net_W };
    if (sink.cryogen !== undefined) {
      const fluid = cryogenProperties(sink.cryogen);
      if (Math.abs(fluid.saturationTemperature_K - sink.temperature_K) > SATURATION_WARNING_K) {
        warnings.push(`${sink.label} is at ${sink.temperature_K} K but ${fluid.label} boils at ${fluid.saturationTemperature_K} K at 1 atm; boil-off uses the 1 atm properties`);
      }
      if (net_W >= 0) {
        const { cryogen, capacity_L, fillFraction, minimumFraction, ventReference } = sink;
        stage.boilOff = boilOff({ heat_W: net_W, cryogen, capacity_L, fillFraction, minimumFraction, ventReference });
      } else {
        warnings.push(`${sink.label} passes on more heat than it receives (${net_W.toPrecision(3)} W net): no boil-off is worked out`);
      }
    }
    return stage;
  });

  const blocks = blockResults(plan, lateral, ends);
  const coldArea = lateral[lateral.length - 1].details.at(-1)!.coldArea_m2 + (ends === null ? 0 : ends[ends.length - 1].details.at(-1)!.coldArea_m2);
  const cold = heatIn[sinks.length - 1];
  return {
    stages,
    blocks,
    shields: wallSection(plan, lateral),
    resistances: ladders(lateral),
    supports: supports.results,
    heatFlux_W_per_m2: (cold.radiation_W + cold.solid_W + cold.gas_W) / coldArea,
    band: plan.hasBand ? band(plan, stages, supports.arriving) : null,
    warnings,
  };
}

/** Checks a design as estimateAssembly would, without solving it; throws ThermalInputError naming the field path. */
export function validateAssembly(design: AssemblyDesign): void {
  planAssembly(design);
}

interface SegmentDetail {
  warmSink: number;
  coldSink: number;
  temperatures_K: number[];
  details: BlockDetail[];
  layupIndices: (number | null)[];
}

function chainDetail(plan: Plan, part: ChainPart): SegmentDetail[] {
  return segmentFrames(plan, "nominal", part).map((segment) => {
    const t = segmentTemperatures(segment.frames, segment.warm.temperature_K, segment.cold.temperature_K);
    return {
      warmSink: segment.warmSink,
      coldSink: segment.coldSink,
      temperatures_K: t,
      details: segment.frames.map((frame, j) => blockDetail(frame, t[j], t[j + 1])),
      layupIndices: segment.frames.map((frame) => (frame.block === null ? null : frame.block.layupIndex)),
    };
  });
}

/** Conduction of every support, and its sums arriving at and leaving each sink. */
export function supportHeats(plan: Plan, warnings: string[]) {
  const arriving = new Array<number>(plan.sinks.length).fill(0);
  const leaving = new Array<number>(plan.sinks.length).fill(0);
  const name = (i: number) => (i < 0 ? "warm wall" : plan.sinks[i].label);
  const results = plan.supports.map((s) => {
    const warm_K = s.from < 0 ? plan.warm.temperature_K : plan.sinks[s.from].temperature_K;
    const r = supportConduction({ material: s.material, area_m2: s.area_m2, length_m: s.length_m, count: s.count, warm_K, cold_K: plan.sinks[s.to].temperature_K });
    for (const w of r.warnings) warnings.push(`${s.label}: ${w}`);
    arriving[s.to] += r.heat_W;
    if (s.from >= 0) leaving[s.from] += r.heat_W;
    return { label: s.label, heat_W: r.heat_W, from: name(s.from), to: name(s.to) };
  });
  return { arriving, leaving, results };
}

/** Heat arriving at each sink, blanket and supports, for one set of reflector faces. */
/** Heat arriving at every sink; with onlySink, only that sink's entry is complete (the others hold supports alone). */
export function arrivingHeats(plan: Plan, variant: Variant, supportsArriving: number[], onlySink?: number): number[] {
  const into = supportsArriving.slice();
  blanketHeats(plan, variant, "lateral", into, onlySink);
  if (plan.flatEnds > 0) blanketHeats(plan, variant, "ends", into, onlySink);
  return into;
}

function band(plan: Plan, stages: AssemblyStage[], supportsArriving: number[]): AssemblyBand[] {
  const low = arrivingHeats(plan, "low", supportsArriving);
  const high = arrivingHeats(plan, "high", supportsArriving);
  return stages.map((s, i) => ({ label: s.label, low_W: low[i], nominal_W: s.heatIn.total_W, high_W: high[i] }));
}

function blockResults(plan: Plan, lateral: SegmentDetail[], ends: SegmentDetail[] | null): AssemblyBlock[] {
  const blocks: AssemblyBlock[] = [];
  lateral.forEach((segment, g) => {
    plan.segments[g].blocks.forEach((block, j) => {
      const d = segment.details[j];
      const e = ends === null ? null : ends[g].details[j];
      const heat_W = d.heat_W + (e?.heat_W ?? 0);
      blocks.push({
        layupIndex: block.layupIndex,
        label: block.label,
        model: block.model,
        layers: block.layers,
        warm_K: segment.temperatures_K[j],
        cold_K: segment.temperatures_K[j + 1],
        heat_W,
        endHeat_W: e?.heat_W ?? 0,
        heatFlux_W_per_m2: heat_W / (d.coldArea_m2 + (e?.coldArea_m2 ?? 0)),
        radiation_W: d.radiation_W + (e?.radiation_W ?? 0),
        solid_W: d.solid_W + (e?.solid_W ?? 0),
        gas_W: d.gas_W + (e?.gas_W ?? 0),
        degradationFactor: block.degradationFactor,
        shieldTemperatures_K: d.shieldTemperatures_K,
      });
    });
  });
  return blocks;
}

function wallSection(plan: Plan, lateral: SegmentDetail[]): AssemblyShield[] {
  const g = plan.geometry;
  const shields: AssemblyShield[] = [];
  lateral.forEach((segment, s) => {
    plan.segments[s].blocks.forEach((block, j) => {
      const temperatures = segment.details[j].shieldTemperatures_K;
      for (let k = 0; k < block.layers; k++) {
        shields.push({ layupIndex: block.layupIndex, kind: "layer", temperature_K: temperatures === null ? null : temperatures[k] });
      }
    });
    const sink = plan.sinks[segment.coldSink];
    if (sink.layupIndex !== null) shields.push({ layupIndex: sink.layupIndex, kind: "stage", temperature_K: sink.temperature_K });
  });
  if (g.kind !== "planar") {
    // Same even spacing as stages.ts: shield k of M sits at r_c + (r_w − r_c)·(M + 1 − k)/(M + 1).
    const m = shields.length;
    shields.forEach((shield, i) => (shield.radius_m = g.coldRadius_m + ((g.warmRadius_m - g.coldRadius_m) * (m - i)) / (m + 1)));
  }
  return shields;
}

function ladders(lateral: SegmentDetail[]): AssemblyLadder[] {
  const result: AssemblyLadder[] = [];
  lateral.forEach((segment, g) => {
    segment.details.forEach((d, j) => {
      if (d.resistances !== null) result.push({ segment: g, layupIndex: segment.layupIndices[j], resistances: d.resistances });
    });
  });
  return result;
}
