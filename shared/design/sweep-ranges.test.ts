import { describe, expect, it } from "vitest";
import type { DesignContentInput } from "../schemas/design";
import { CRYOGENS } from "../thermal/fluids";
import { EXTRAPOLATION_LIMIT_K } from "../thermal/supports";
import { sweepLayerDensity, sweepPressure, sweepWarmTemperature } from "../thermal/sweeps";
import { cryostatInput, lookupOf, panelInput, parsed } from "./invented-library.test-helpers";
import { runSweep, sweepPlanOf, SweepRangeError, type SweepPlan } from "./sweep-ranges";
import { toAssembly } from "./to-assembly";

const lookup = lookupOf();
const assemblyOf = (input: DesignContentInput, edit?: (d: DesignContentInput) => void) => toAssembly(parsed(input, edit), lookup);

function refusal(run: () => unknown): SweepRangeError {
  try {
    run();
  } catch (error) {
    if (error instanceof SweepRangeError) return error;
    throw error;
  }
  throw new Error("expected a SweepRangeError");
}

describe("sweepPlanOf: layer density", () => {
  it("defaults to the thickest correlation or layers block facing the cold vessel, 0.25× to 2× its own density in 40 steps", () => {
    // The invented cryostat's inner blanket (layup index 4) is the only block after the last stage: 12 layers/cm.
    const plan = sweepPlanOf(assemblyOf(cryostatInput()), "layer-density");
    expect(plan).toEqual({ variable: "layer-density", unit: "layers/cm", designValue: 12, blockIndex: 4, blockLabel: "inner blanket", from: 3, to: 24, step: 21 / 40 });
  });

  it("falls back to the thickest sweepable block anywhere when the block facing the vessel is pure radiation", () => {
    const design = assemblyOf(cryostatInput(), (d) => {
      (d.layup[4] as { model: string }).model = "radiation";
    });
    const plan = sweepPlanOf(design, "layer-density");
    expect(plan.blockIndex).toBe(2);
    expect([plan.from, plan.to]).toEqual([3.75, 30]);
    expect(plan.blockLabel).toBe("block 3");
  });

  it("takes a given blockIndex of a correlation or layers block, and refuses one of a radiation block or a stage, naming blockIndex", () => {
    const design = assemblyOf(cryostatInput());
    expect(sweepPlanOf(design, "layer-density", 2).designValue).toBe(15);
    for (const index of [0, 1, 9]) {
      const error = refusal(() => sweepPlanOf(design, "layer-density", index));
      expect(error.field).toBe("blockIndex");
      expect(error.message).toMatch(/one of 2, 4/);
    }
  });

  it("does not apply to a layup of radiation blocks only, naming variable", () => {
    const error = refusal(() => sweepPlanOf(assemblyOf(panelInput()), "layer-density"));
    expect(error.field).toBe("variable");
    expect(error.message).toMatch(/pure radiation/);
  });
});

describe("sweepPlanOf: warm temperature", () => {
  it("runs from 1 K above the warmest stage to 350 K", () => {
    // The warmest stage is the nitrogen shield, held at its cryogen's saturation temperature.
    const plan = sweepPlanOf(assemblyOf(cryostatInput()), "warm-temperature") as Extract<SweepPlan, { variable: "warm-temperature" }>;
    const n2 = CRYOGENS.nitrogen.saturationTemperature_K;
    expect(plan.from).toBeCloseTo(n2 + 1, 12);
    expect(plan.to).toBe(350);
    expect(plan.designValue).toBe(293);
    expect(plan.step).toBeCloseTo((350 - n2 - 1) / 40, 12);
  });

  it("starts above the cold space when there is no stage, and halfway to a wall less than 1 K warmer", () => {
    expect(sweepPlanOf(assemblyOf(panelInput()), "warm-temperature").from).toBe(21);
    expect(sweepPlanOf(assemblyOf(panelInput(), (d) => void (d.warm.temperature_K = 20.5)), "warm-temperature").from).toBe(20.25);
  });

  it("reaches a wall warmer than 350 K, but never past the supports' fit limit when a support leaves the warm wall", () => {
    expect(sweepPlanOf(assemblyOf(panelInput(), (d) => void (d.warm.temperature_K = 450)), "warm-temperature").to).toBe(450);
    expect(sweepPlanOf(assemblyOf(cryostatInput(), (d) => void (d.warm.temperature_K = 380)), "warm-temperature").to).toBe(380);
    expect(EXTRAPOLATION_LIMIT_K).toBeGreaterThanOrEqual(350); // the cap only bites above 350 K
  });
});

describe("sweepPlanOf: pressure", () => {
  it("spans 1e-6 to 10 Pa at 6 points a decade, whatever the design's own pressure", () => {
    const plan = sweepPlanOf(assemblyOf(cryostatInput()), "pressure");
    expect(plan).toEqual({ variable: "pressure", unit: "Pa", designValue: 1e-4, blockIndex: null, blockLabel: null, from: 1e-6, to: 10, pointsPerDecade: 6 });
  });
});

describe("runSweep", () => {
  it("is the engine's own sweep over the plan's range, which the engine accepts for every variable", () => {
    const design = assemblyOf(cryostatInput());
    const density = sweepPlanOf(design, "layer-density") as Extract<SweepPlan, { variable: "layer-density" }>;
    const warm = sweepPlanOf(design, "warm-temperature") as Extract<SweepPlan, { variable: "warm-temperature" }>;
    const pressure = sweepPlanOf(design, "pressure") as Extract<SweepPlan, { variable: "pressure" }>;
    const fresh = () => assemblyOf(cryostatInput());
    expect(runSweep(design, density)).toEqual(sweepLayerDensity(fresh(), { blockIndex: density.blockIndex, from: density.from, to: density.to, step: density.step }));
    expect(runSweep(design, warm)).toEqual(sweepWarmTemperature(fresh(), { from: warm.from, to: warm.to, step: warm.step }));
    expect(runSweep(design, pressure)).toEqual(sweepPressure(fresh(), { from: 1e-6, to: 10, pointsPerDecade: 6 }));
    // 41 points on each linear range (ends included), 7 decades × 6 + 1 on the pressure one.
    for (const [plan, count] of [[density, 41], [warm, 41], [pressure, 43]] as const) {
      const points = runSweep(design, plan);
      expect(points).toHaveLength(count);
      expect(points[0].x).toBeCloseTo(plan.from, 12);
      expect(points.at(-1)!.x / plan.to).toBeCloseTo(1, 9);
      expect(points.every((p) => p.heatIntoStages_W.length === 2 && p.coldHeat_W > 0)).toBe(true);
    }
  });
});
