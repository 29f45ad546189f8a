import { bench, describe } from "vitest";
import { estimateStack } from "../../shared/thermal/radiation-network";
import { solveEnclosure } from "../../shared/thermal/enclosure";
import { sweepLayerCount } from "../../shared/thermal/sweeps";
import type { AssemblyDesign } from "../../shared/thermal/assembly-design";
import type { Emissivity } from "../../shared/thermal/emissivity";

// Printed, never asserted (npm run bench). Inputs are invented for timing only.
const metal: Emissivity = { kind: "power", reference: 0.03, referenceTemperature_K: 300, exponent: 0.5 };
const stack = {
  geometry: { kind: "cylinder" as const, coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1 },
  warm: { temperature_K: 300, emissivity: 0.1 },
  cold: { temperature_K: 4.2, emissivity: 0.1 },
  shields: Array.from({ length: 60 }, () => ({ warmSide: metal, coldSide: metal })),
};

const design: AssemblyDesign = {
  geometry: { kind: "planar", area_m2: 1 },
  warm: { temperature_K: 300, emissivity: 0.1 },
  cold: { temperature_K: 77.4, emissivity: 0.1, cryogen: "nitrogen" },
  layup: [{ kind: "block", layers: 20, reflector: { warmSide: 0.03, coldSide: 0.03 }, model: "radiation", layerDensity_per_cm: 20 }],
  vacuum: { pressure_Pa: 1e-4, gas: "nitrogen" },
};

// 50 equal surfaces that all see each other equally (reciprocity and row sums hold exactly).
const n = 50;
const enclosure = {
  surfaces: Array.from({ length: n }, (_, i) => (i % 2 === 0 ? { area_m2: 1, emissivity: 0.5, temperature_K: 200 + 2 * i } : { area_m2: 1, emissivity: 0.7, reradiating: true })),
  viewFactors: Array.from({ length: n }, () => Array.from({ length: n }, () => 1 / n)),
};

describe("engine", () => {
  bench("60-shield cylindrical stack, power-law emissivities", () => {
    estimateStack(stack);
  });
  bench("10,000-case layer-count sweep (10 × 1..1000 layers)", () => {
    for (let k = 0; k < 10; k++) sweepLayerCount(design, { blockIndex: 0, from: 1, to: 1000, step: 1 });
  }, { iterations: 5 });
  bench("50-surface enclosure", () => {
    solveEnclosure(enclosure);
  });
});
