import { describe, expect, it } from "vitest";
import type { DesignContentInput } from "../schemas/design";
import { estimateAssembly } from "../thermal/assembly";
import { MAX_TOTAL_SHIELDS, type LayupBlock } from "../thermal/assembly-design";
import { boilOff } from "../thermal/boil-off";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "../thermal/errors";
import { CRYOGENS } from "../thermal/fluids";
import { cryostatInput, LIB, lookupOf, panelInput, parsed, refTo } from "./invented-library.test-helpers";
import { predictDesign } from "./predict";
import { toAssembly } from "./to-assembly";

const lookup = lookupOf();
type Draft = DesignContentInput;
type DraftBlock = Extract<Draft["layup"][number], { kind: "block" }>;
const draftBlock = (d: Draft, i: number) => d.layup[i] as DraftBlock;
const predict = (input: Draft, edit?: (d: Draft) => void) => predictDesign(parsed(input, edit), lookup);

function close(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}

const block = (layers: number, extra: Partial<DraftBlock> = {}): DraftBlock => ({ kind: "block", layers, reflector: refTo(LIB.foil), layerDensity_per_cm: 20, model: "radiation", ...extra });

/**
 * A 2 m² panel: 40 foil layers, a fixed 80 K stage (finish ε 0.05), then `inner` foil layers
 * facing the 20 K cold wall (ε 0.05); no gas. Foil is ε 0.04 on both faces.
 */
function shieldedPanel(inner: number, outer = 40): Draft {
  const d = panelInput();
  d.layup = [block(outer), { kind: "stage", label: "cooled shield", temperature_K: 80, finish: refTo(LIB.vessel) }, block(inner)];
  return d;
}

/**
 * The heat into the cold wall of shieldedPanel with n inner layers, by the gray parallel-plate
 * shield formula σA(T₁⁴ − T₂⁴)/[1/ε₁ + 1/ε₂ − 1 + n(1/ε_a + 1/ε_b − 1)] (Incropera, DeWitt,
 * Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 13.3).
 */
const panelHeat = (n: number) => (SIGMA * 2 * (80 ** 4 - 20 ** 4)) / (1 / 0.05 + 1 / 0.05 - 1 + n * (2 / 0.04 - 1));

describe("predictDesign: the engine's result and the figures drawn from it", () => {
  it("is estimateAssembly of toAssembly, called directly on the same content", () => {
    const content = parsed(cryostatInput());
    const prediction = predictDesign(content, lookup);
    const direct = estimateAssembly(toAssembly(content, lookup));
    expect(prediction.result).toEqual(direct);
    expect(prediction.coldHeat_W).toBe(direct.stages[direct.stages.length - 1].heatIn.total_W);
    expect(prediction.result.stages.at(-1)!.label).toBe("cold vessel");
  });

  it("works the cold vessel's boil-off, evaporation rate and hold time from its net heat", () => {
    const p = predict(cryostatInput());
    const cold = p.result.stages.at(-1)!;
    const direct = boilOff({ heat_W: cold.net_W, cryogen: "helium-4", capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 });
    expect(p.coldBoilOff_L_per_day).toBe(direct.liquidVolume_L_per_day);
    // By hand: volume = Q/(h_fg·ρ_l), hold = (fill − minimum)·capacity/volume rate, rate = volume/capacity.
    const he = CRYOGENS["helium-4"];
    const litresPerHour = (cold.net_W / he.latentHeat_J_per_kg / he.liquidDensity_kg_per_m3) * 1000 * 3600;
    close(p.coldBoilOff_L_per_day!, litresPerHour * 24, 1e-12);
    close(p.holdTime_h!, ((0.9 - 0.1) * 250) / litresPerHour, 1e-12);
    close(p.evaporationRate_percent_per_day!, ((litresPerHour * 24) / 250) * 100, 1e-12);
  });

  it("has a boil-off but no hold time or evaporation rate for a cryogen of unknown capacity", () => {
    const p = predict(cryostatInput(), (d) => (d.cold.capacity_L = null));
    expect(p.coldBoilOff_L_per_day).toBeGreaterThan(0);
    expect(p.holdTime_h).toBeNull();
    expect(p.evaporationRate_percent_per_day).toBeNull();
  });

  it("has no boil-off figures for a fixed-temperature cold space", () => {
    const p = predict(panelInput());
    expect(p.result.stages.at(-1)!.boilOff).toBeUndefined();
    expect([p.coldBoilOff_L_per_day, p.holdTime_h, p.evaporationRate_percent_per_day]).toEqual([null, null, null]);
    close(p.coldHeat_W, (SIGMA * 2 * (300 ** 4 - 20 ** 4)) / (1 / 0.1 + 1 / 0.05 - 1 + 12 * (2 / 0.04 - 1)));
  });

  it("a block outside the last stage does not change the heat into the cold vessel (planar walls)", () => {
    // The stage's fixed temperature cuts the chain; on curved walls the outer count would still move the radii.
    const thin = predict(shieldedPanel(12, 5));
    const thick = predict(shieldedPanel(12, 200));
    expect(thick.coldHeat_W).toBe(thin.coldHeat_W);
    expect(thick.result.stages[0].heatIn.total_W).toBeLessThan(thin.result.stages[0].heatIn.total_W);
  });
});

describe("predictDesign: the layer-count sweep", () => {
  it("sweeps the thickest block after the last stage, not the thickest overall", () => {
    expect(predict(shieldedPanel(12)).sweep!.layupIndex).toBe(2);
    expect(predict(cryostatInput()).sweep!.layupIndex).toBe(4);
    const twoInner = shieldedPanel(12);
    twoInner.layup.push(block(30), block(8));
    expect(predict(twoInner).sweep!.layupIndex).toBe(3);
    expect(predict(panelInput()).sweep!.layupIndex).toBe(0);
  });

  it("runs from 1 to twice the block's count, each point the gray-plate formula for that count", () => {
    const p = predict(shieldedPanel(12));
    expect(p.sweep!.points.map((x) => x.layers)).toEqual(Array.from({ length: 24 }, (_, i) => i + 1));
    for (const point of p.sweep!.points) close(point.coldHeat_W, panelHeat(point.layers), 1e-12);
    // The design's own count is one of the points, and it is the design's cold heat.
    close(p.sweep!.points[11].coldHeat_W, p.coldHeat_W, 1e-12);
  });

  it("each point equals the engine run on the design with that count (a curved wall, a correlation block)", () => {
    const content = parsed(cryostatInput());
    const assembly = toAssembly(content, lookup);
    const sweep = predictDesign(content, lookup).sweep!;
    expect(sweep.points.map((x) => x.layers)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
    for (const n of [1, 7, 10, 20]) {
      const changed = structuredClone(assembly);
      (changed.layup[4] as LayupBlock).layers = n;
      close(sweep.points[n - 1].coldHeat_W, estimateAssembly(changed).stages.at(-1)!.heatIn.total_W, 1e-9);
    }
  });

  it("never rises with more layers of a radiation block, on a cylinder with supports", () => {
    const p = predict(cryostatInput(), (d) => Object.assign(draftBlock(d, 4), { model: "radiation", layers: 20 }));
    const heats = p.sweep!.points.map((x) => x.coldHeat_W);
    expect(heats).toHaveLength(40);
    heats.slice(1).forEach((q, i) => expect(q).toBeLessThanOrEqual(heats[i]));
    expect(heats[heats.length - 1]).toBeLessThan(heats[0]);
  });

  it("caps the sweep at 200 layers in at most 40 steps", () => {
    const wide = predict(shieldedPanel(150)).sweep!.points.map((x) => x.layers);
    expect(wide).toHaveLength(40);
    expect(wide[0]).toBe(1);
    expect(wide[1] - wide[0]).toBe(5);
    expect(wide.at(-1)).toBe(196);
    expect(predict(shieldedPanel(1)).sweep!.points.map((x) => x.layers)).toEqual([1, 2]);
  });

  it("finds the fewest layers meeting the target: that count meets it, one fewer does not", () => {
    // The target sits between the gray-plate heats of 7 and 8 inner layers.
    const target = (panelHeat(7) + panelHeat(8)) / 2;
    const p = predict(shieldedPanel(12), (d) => (d.targetColdHeat_W = target));
    expect(p.sweep!.targetColdHeat_W).toBe(target);
    const n = p.sweep!.fewestLayers!;
    expect(n).toBe(8);
    expect(predict(shieldedPanel(n)).coldHeat_W).toBeLessThanOrEqual(target);
    expect(predict(shieldedPanel(n - 1)).coldHeat_W).toBeGreaterThan(target);
  });

  it("agrees with the count solved from the gray-plate formula, beyond the plotted range", () => {
    // n ≥ (σAΔT⁴/Q − (1/ε₁ + 1/ε₂ − 1))/(1/ε_a + 1/ε_b − 1), rounded up (same formula as panelHeat).
    const target = 0.002;
    const byHand = Math.ceil(((SIGMA * 2 * (80 ** 4 - 20 ** 4)) / target - (2 / 0.05 - 1)) / (2 / 0.04 - 1));
    expect(byHand).toBeGreaterThan(24);
    expect(predict(shieldedPanel(12), (d) => (d.targetColdHeat_W = target)).sweep!.fewestLayers).toBe(byHand);
  });

  it("is 1 for a target one layer meets, null for one no count up to the limit meets, and null without a target", () => {
    expect(predict(shieldedPanel(12), (d) => (d.targetColdHeat_W = panelHeat(1) * 1.01)).sweep!.fewestLayers).toBe(1);
    expect(predict(shieldedPanel(12), (d) => (d.targetColdHeat_W = panelHeat(1000) / 2)).sweep!.fewestLayers).toBeNull();
    const none = predict(shieldedPanel(12)).sweep!;
    expect(none.targetColdHeat_W).toBeNull();
    expect(none.fewestLayers).toBeNull();
  });

  it("stays within the engine's shield limit on a design that uses all of it", () => {
    // 4 × 1000 + 994 layers, 5 stages and a last block of 1: exactly MAX_TOTAL_SHIELDS shields.
    const d = panelInput();
    const stage = (label: string, temperature_K: number) => ({ kind: "stage" as const, label, temperature_K, finish: refTo(LIB.vessel) });
    d.layup = [block(1000), stage("s1", 250), block(1000), stage("s2", 200), block(1000), stage("s3", 150), block(1000), stage("s4", 100), block(994), stage("s5", 60), block(1)];
    const shields = d.layup.reduce((n, item) => n + (item.kind === "block" ? item.layers : 1), 0);
    expect(shields).toBe(MAX_TOTAL_SHIELDS);
    const sweep = predict(d, (x) => (x.targetColdHeat_W = 1e3)).sweep!;
    expect(sweep.layupIndex).toBe(10);
    expect(sweep.points.map((x) => x.layers)).toEqual([1]);
    expect(sweep.fewestLayers).toBe(1);
  });
});
