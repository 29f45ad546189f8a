import { describe, expect, it } from "vitest";
import type { AssemblyDesign, LayupBlock } from "./assembly-design";
import { estimateAssembly } from "./assembly";
import { expectClose, fieldOf } from "./checks.test-helpers";
import { fewestLayersForTarget, sweepLayerCount, sweepLayerDensity, sweepPressure, sweepWarmTemperature } from "./sweeps";

// Emissivities: 0.03 for aluminized polyester film, 0.1 for a stainless jacket, 0.05 for a
// polished vessel (common practice).
const film = { warmSide: 0.03, coldSide: 0.03 };
const radiation = (layers: number): LayupBlock => ({ kind: "block", layers, reflector: film, model: "radiation" });
const correlation = (layers: number): LayupBlock => ({ kind: "block", layers, reflector: { warmSide: 0.031, coldSide: 0.031 }, model: "correlation", layerDensity_per_cm: 20 });

const plate: AssemblyDesign = {
  geometry: { kind: "planar", area_m2: 2 },
  warm: { temperature_K: 300, emissivity: 0.1 },
  cold: { temperature_K: 77, emissivity: 0.1 },
  layup: [radiation(10)],
  vacuum: { pressure_Pa: 0, gas: "nitrogen" },
};

const cryostat: AssemblyDesign = {
  geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.5, flatEnds: 2 },
  warm: { temperature_K: 295, emissivity: 0.1 },
  cold: { temperature_K: 4.2, emissivity: 0.05 },
  layup: [radiation(30), { kind: "stage", label: "nitrogen shield", temperature_K: 77, emissivity: 0.05 }, radiation(10)],
  supports: [
    { material: "g10-normal", area_m2: 1e-4, length_m: 0.1, count: 4, from: "warm", to: 0 },
    { material: "stainless-304", area_m2: 1e-5, length_m: 0.3, count: 3, from: 0, to: "cold" },
  ],
  vacuum: { pressure_Pa: 1e-4, gas: "helium" },
};

function withLayers(design: AssemblyDesign, index: number, layers: number): AssemblyDesign {
  const copy = structuredClone(design);
  (copy.layup[index] as LayupBlock).layers = layers;
  return copy;
}

describe("sweepLayerCount", () => {
  it("follows the gray-plate formula point by point", () => {
    // Hand check of σA(T_w⁴ − T_c⁴)/[1/ε_w + 1/ε_c − 1 + N(2/ε − 1)] (Incropera, DeWitt, Bergman &
    // Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 13.3) for N = 1 … 5, evaluated in Python.
    const expected = [10.802528005385089, 6.083907124984063, 4.234324249024402, 3.2471504300210796, 2.633245790180242];
    const points = sweepLayerCount(plate, { blockIndex: 0, from: 1, to: 5, step: 1 });
    expect(points.map((p) => p.x)).toEqual([1, 2, 3, 4, 5]);
    points.forEach((p, i) => expectClose(p.coldHeat_W, expected[i]));
    expect(points[0].heatIntoStages_W).toEqual([]);
  });

  it("every point is what estimateAssembly gives for that count, stage and supports included", () => {
    for (const p of sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 29, step: 7 })) {
      const full = estimateAssembly(withLayers(cryostat, 2, p.x));
      expectClose(p.coldHeat_W, full.stages[1].heatIn.total_W, 1e-11);
      expectClose(p.heatIntoStages_W[0], full.stages[0].heatIn.total_W, 1e-11);
    }
  });

  it("the cold heat falls with every added layer, on a cylinder with a stage", () => {
    const points = sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 200, step: 1 });
    for (let i = 1; i < points.length; i++) expect(points[i].coldHeat_W).toBeLessThan(points[i - 1].coldHeat_W);
  });

  it("refuses a block index that is a stage, and a bad range", () => {
    expect(fieldOf(() => sweepLayerCount(cryostat, { blockIndex: 1, from: 1, to: 5, step: 1 }))).toBe("blockIndex");
    expect(fieldOf(() => sweepLayerCount(cryostat, { blockIndex: 2, from: 5, to: 4, step: 1 }))).toBe("to");
    expect(fieldOf(() => sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 1001, step: 1 }))).toBe("to");
    expect(fieldOf(() => sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 5, step: 0 }))).toBe("step");
    expect(fieldOf(() => sweepLayerCount({ ...cryostat, warm: { temperature_K: -1, emissivity: 0.1 } }, { blockIndex: 2, from: 1, to: 5, step: 1 }))).toBe("warm.temperature_K");
  });
});

describe("sweepLayerCount, cold vessel only", () => {
  it("gives exactly the full sweep's heat into the cold vessel, without the stages' heats", () => {
    const full = sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 40, step: 3 });
    const cold = sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 40, step: 3, coldOnly: true });
    expect(cold.map((p) => p.x)).toEqual(full.map((p) => p.x));
    expect(cold.map((p) => p.coldHeat_W)).toEqual(full.map((p) => p.coldHeat_W));
    expect(cold.every((p) => p.heatIntoStages_W.length === 0)).toBe(true);
  });
});

describe("fewestLayersForTarget", () => {
  it("finds 139 shields for 0.1 W through 2 m² between 300 K and 77 K", () => {
    // Hand check of the gray-plate formula (Incropera et al., 6th ed., Sec. 13.3): N = 139 gives
    // 0.099994 W and N = 138 gives 0.100717 W, evaluated in Python.
    const result = fewestLayersForTarget(plate, { blockIndex: 0, targetColdHeat_W: 0.1, max: 1000 });
    expect(result.layers).toBe(139);
    expectClose(result.heat_W, 0.09999424611398731);
  });

  it("is the least count a brute-force scan finds, for several targets", () => {
    const scan = sweepLayerCount(cryostat, { blockIndex: 2, from: 1, to: 120, step: 1 });
    for (const target of [0.5, 0.05, 0.02, 0.011, scan[60].coldHeat_W]) {
      const least = scan.find((p) => p.coldHeat_W <= target)?.x ?? null;
      expect(fewestLayersForTarget(cryostat, { blockIndex: 2, targetColdHeat_W: target, max: 120 }).layers).toBe(least);
    }
  });

  it("gives null and the heat at max when max layers are not enough, and 1 when one is", () => {
    const out = fewestLayersForTarget(plate, { blockIndex: 0, targetColdHeat_W: 1e-3, max: 50 });
    expect(out.layers).toBeNull();
    expectClose(out.heat_W, sweepLayerCount(plate, { blockIndex: 0, from: 50, to: 50, step: 1 })[0].coldHeat_W);
    expect(fewestLayersForTarget(plate, { blockIndex: 0, targetColdHeat_W: 20, max: 50 }).layers).toBe(1);
  });

  it("refuses a target of 0 W and a max above 1000", () => {
    expect(fieldOf(() => fewestLayersForTarget(plate, { blockIndex: 0, targetColdHeat_W: 0, max: 10 }))).toBe("targetColdHeat_W");
    expect(fieldOf(() => fewestLayersForTarget(plate, { blockIndex: 0, targetColdHeat_W: 1, max: 1001 }))).toBe("max");
  });
});

describe("sweepPressure, sweepLayerDensity, sweepWarmTemperature", () => {
  const blanket: AssemblyDesign = { ...plate, geometry: { kind: "planar", area_m2: 1 }, cold: { temperature_K: 77, emissivity: 0.05 }, layup: [correlation(30)] };

  it("spaces pressures evenly in log10 and adds the correlation's linear gas term", () => {
    const points = sweepPressure(blanket, { from: 1e-5, to: 1e-1, pointsPerDecade: 2 });
    expect(points).toHaveLength(9);
    expectClose(points[2].x, 1e-4, 1e-14);
    expectClose(points[8].x, 1e-1, 1e-14);
    // Hand check of the gas term C_g·P·(T_h^0.52 − T_c^0.52)/N (Keller, Cunnington & Glassford, NASA
    // CR-134477, 1974) between 1e-5 and 1e-1 Pa, P in torr = Pa·760/101 325, 30 layers, 1 m², in Python.
    expectClose(points[8].coldHeat_W - points[0].coldHeat_W, 3.5922921589915773, 1e-9);
  });

  it("raises only the solid term with the layer density", () => {
    const points = sweepLayerDensity(blanket, { blockIndex: 0, from: 20, to: 40, step: 20 });
    // Hand check of C_s·N̄^2.63·T_m·ΔT/(N + 1) (NASA CR-134477, 1974) between 20 and 40 layers/cm, in Python.
    expectClose(points[1].coldHeat_W - points[0].coldHeat_W, 1.3566736318261865, 1e-9);
    expect(fieldOf(() => sweepLayerDensity(plate, { blockIndex: 0, from: 10, to: 20, step: 5 }))).toBe("blockIndex");
  });

  it("moves the heat into the stage with the warm wall and leaves the cold vessel's heat alone", () => {
    const design: AssemblyDesign = {
      ...plate,
      geometry: { kind: "planar", area_m2: 1 },
      cold: { temperature_K: 4.2, emissivity: 0.05 },
      layup: [radiation(20), { kind: "stage", label: "nitrogen shield", temperature_K: 77, emissivity: 0.05 }, radiation(10)],
    };
    const points = sweepWarmTemperature(design, { from: 250, to: 320, step: 10 });
    expect(points).toHaveLength(8);
    // Hand check of the gray-plate formula at 250 K (Incropera et al., 6th ed., Sec. 13.3), in Python.
    expectClose(points[0].heatIntoStages_W[0], 0.1635254718384576, 1e-12);
    for (const p of points) expect(p.coldHeat_W).toBe(points[0].coldHeat_W);
    expect(fieldOf(() => sweepWarmTemperature(design, { from: 70, to: 300, step: 10 }))).toBe("from");
    expect(fieldOf(() => sweepWarmTemperature(cryostat, { from: 300, to: 450, step: 10 }))).toBe("to");
  });
});

describe("sweeps of layer-by-layer blocks on a cylinder with flat ends", () => {
  // The ends and the lateral wall solve the same per-area blanket, so recent solves are reused
  // (block-heat.ts); sweeps change the plan in place, so every point must still be its own design's.
  const netting = { conductance_W_per_m2_K: 0.04, referenceMeanTemperature_K: 190, referenceLayerDensity_per_cm: 20, layerDensityExponent: 2.6 };
  const table = (): LayupBlock["reflector"]["warmSide"] => ({ kind: "table", points: [[4.2, 0.015], [77, 0.02], [300, 0.035]] });
  const layered = (layers: number): LayupBlock => ({ kind: "block", layers, reflector: { warmSide: table(), coldSide: table() }, model: "layers", layerDensity_per_cm: 20, spacer: netting });
  const design: AssemblyDesign = { ...cryostat, layup: [layered(20), cryostat.layup[1], layered(8)], vacuum: { pressure_Pa: 1e-3, gas: "helium" } };
  const coldHeat = (d: AssemblyDesign) => estimateAssembly(d).stages[1].heatIn.total_W;
  const changed = (edit: (copy: AssemblyDesign) => void) => {
    const copy = structuredClone(design);
    edit(copy);
    return copy;
  };

  it("every point of the layer-density, pressure, warm-temperature and layer-count sweeps is estimateAssembly of that design", () => {
    // Blanket and supports are summed in another order by the sweeps: agreement to the last few digits.
    for (const p of sweepLayerDensity(design, { blockIndex: 2, from: 10, to: 40, step: 10 })) {
      expectClose(p.coldHeat_W, coldHeat(changed((c) => ((c.layup[2] as LayupBlock).layerDensity_per_cm = p.x))), 1e-12);
    }
    for (const p of sweepPressure(design, { from: 1e-5, to: 1e-1, pointsPerDecade: 1 })) {
      expectClose(p.coldHeat_W, coldHeat(changed((c) => (c.vacuum.pressure_Pa = p.x))), 1e-12);
    }
    for (const p of sweepWarmTemperature(design, { from: 250, to: 300, step: 25 })) {
      expectClose(p.heatIntoStages_W[0], estimateAssembly(changed((c) => (c.warm.temperature_K = p.x))).stages[0].heatIn.total_W, 1e-12);
    }
    for (const p of sweepLayerCount(design, { blockIndex: 2, from: 2, to: 14, step: 4 })) {
      expectClose(p.coldHeat_W, coldHeat(withLayers(design, 2, p.x)), 1e-12);
    }
  });

  it("an emissivity table edited in place gives the new answer, not a kept one", () => {
    const copy = structuredClone(design);
    const before = coldHeat(copy);
    const face = (copy.layup[2] as LayupBlock).reflector.coldSide as { points: [number, number][] };
    face.points[0][1] = 0.03;
    const after = coldHeat(copy);
    expect(after).toBeGreaterThan(before);
    expect(after).toBe(coldHeat(structuredClone(copy)));
    expect(coldHeat(design)).toBe(before);
  });
});
