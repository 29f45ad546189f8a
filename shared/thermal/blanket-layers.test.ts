import { describe, expect, it } from "vitest";
import { BlanketLayersInput, estimateLayers } from "./blanket-layers";
import { fieldOf, relativeError } from "./checks.test-helpers";
import { Emissivity, emissivityAt } from "./emissivity";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "./errors";
import { gasConduction } from "./gas-conduction";
import { estimateStack } from "./radiation-network";

// Hagen–Rubens-like aluminized film, ε = 0.03·(T/300)^0.5 (see emissivity.test.ts for the source).
const film: Emissivity = { kind: "power", reference: 0.03, referenceTemperature_K: 300, exponent: 0.5 };

const blanket = (layers: number, extra: Partial<BlanketLayersInput> = {}): BlanketLayersInput => ({
  area_m2: 2.5,
  warm: { temperature_K: 300, emissivity: 0.05 },
  cold: { temperature_K: 4.2, emissivity: film },
  layers,
  reflector: { warmSide: film, coldSide: film },
  ...extra,
});

/**
 * Heat per unit area through each gap, recomputed from the reported temperatures with the gap
 * law of the model: two large parallel gray plates (Incropera, DeWitt, Bergman & Lavine, 6th ed.,
 * Table 13.3) plus h·ΔT for the spacer. Gas left out.
 */
function gapFluxes(input: BlanketLayersInput, layerTemperatures_K: number[], spacer_W_per_m2_K = 0): number[] {
  const t = [input.warm.temperature_K, ...layerTemperatures_K, input.cold.temperature_K];
  return t.slice(0, -1).map((a, g) => {
    const b = t[g + 1];
    const upper = emissivityAt(g === 0 ? input.warm.emissivity : input.reflector.coldSide, a);
    const lower = emissivityAt(g === t.length - 2 ? input.cold.emissivity : input.reflector.warmSide, b);
    return (SIGMA * (a ** 4 - b ** 4)) / (1 / upper + 1 / lower - 1) + spacer_W_per_m2_K * (a - b);
  });
}

describe("estimateLayers: radiation only", () => {
  it.each([0, 1, 10, 60])("reproduces estimateStack for %i shields with temperature-dependent films", (layers) => {
    const input = blanket(layers);
    const layered = estimateLayers(input);
    const stacked = estimateStack({
      geometry: { kind: "planar", area_m2: input.area_m2 },
      warm: input.warm,
      cold: input.cold,
      shields: Array.from({ length: layers }, () => ({ ...input.reflector })),
    });
    expect(relativeError(layered.heatLeak_W, stacked.heatLeak_W)).toBeLessThan(1e-9);
    layered.layerTemperatures_K.forEach((t, k) => expect(relativeError(t, stacked.shields[k].temperature_K)).toBeLessThan(1e-9));
    expect(layered.radiation_W).toBe(layered.heatLeak_W);
    expect(layered.solid_W).toBe(0);
    expect(layered.gas_W).toBe(0);
  });
});

describe("estimateLayers: with spacer conduction", () => {
  it("carries the same heat through every gap", () => {
    const input = blanket(30, { spacer: { conductance_W_per_m2_K: 0.05 } });
    const result = estimateLayers(input);
    for (const q of gapFluxes(input, result.layerTemperatures_K, 0.05)) expect(relativeError(q, result.heatFlux_W_per_m2)).toBeLessThan(1e-9);
  });

  it("tends to conduction through N + 1 equal conductances in series when radiation is negligible", () => {
    // Resistances in series (Incropera et al., 6th ed., Sec. 3.1.3): q = h·ΔT/(N + 1), and the
    // temperatures fall linearly. With ε = 1e-6 radiation is ~1e-5 of that here.
    const input = blanket(10, {
      warm: { temperature_K: 300, emissivity: 1e-6 },
      cold: { temperature_K: 77, emissivity: 1e-6 },
      reflector: { warmSide: 1e-6, coldSide: 1e-6 },
      spacer: { conductance_W_per_m2_K: 0.1 },
    });
    const result = estimateLayers(input);
    expect(relativeError(result.heatFlux_W_per_m2, (0.1 * 223) / 11)).toBeLessThan(1e-4);
    result.layerTemperatures_K.forEach((t, k) => expect(Math.abs(t - (300 - (223 * (k + 1)) / 11))).toBeLessThan(1e-2));
  });

  it("with a conductance proportional to the mean temperature, makes T² fall linearly (k ∝ T integrated)", () => {
    // h(T_m) = h_ref·T_m/T_ref gives each gap q = (h_ref/2T_ref)·(T_i² − T_{i+1}²): equal heats
    // make T² linear in the gap index, q = (h_ref/2T_ref)·(T_w² − T_c²)/(N + 1), as the thermal-
    // conductivity integral for k ∝ T gives (common practice).
    const input = blanket(10, {
      warm: { temperature_K: 300, emissivity: 1e-6 },
      cold: { temperature_K: 20, emissivity: 1e-6 },
      reflector: { warmSide: 1e-6, coldSide: 1e-6 },
      spacer: { conductance_W_per_m2_K: 0.0364, referenceTemperature_K: 188.5 },
    });
    const result = estimateLayers(input);
    const p = 0.0364 / 188.5;
    const span = 300 ** 2 - 20 ** 2;
    expect(relativeError(result.heatFlux_W_per_m2, (p / 2) * (span / 11))).toBeLessThan(1e-4);
    result.layerTemperatures_K.forEach((t, k) => expect(relativeError(t, Math.sqrt(300 ** 2 - (span * (k + 1)) / 11))).toBeLessThan(1e-4));
    // The same conductance held fixed carries more: the cold gaps conduct as if they were warm.
    const fixed = estimateLayers({ ...input, spacer: { conductance_W_per_m2_K: 0.0364 } });
    expect(fixed.heatFlux_W_per_m2).toBeGreaterThan(result.heatFlux_W_per_m2);
  });

  it("carries the same heat through every gap with a temperature-proportional spacer and real films", () => {
    const spacer = { conductance_W_per_m2_K: 0.05, referenceTemperature_K: 150 };
    const input = blanket(30, { spacer });
    const result = estimateLayers(input);
    const t = [300, ...result.layerTemperatures_K, 4.2];
    const fluxes = gapFluxes(input, result.layerTemperatures_K).map((radiation, g) => radiation + (0.05 / 150) * ((t[g] + t[g + 1]) / 2) * (t[g] - t[g + 1]));
    for (const q of fluxes) expect(relativeError(q, result.heatFlux_W_per_m2)).toBeLessThan(1e-9);
  });

  it("treats conductivity over thickness times the contact factor as the conductance", () => {
    // 0.02 W/(m·K) over 0.1 mm with 1 % surviving the point contacts: 2 W/(m²·K).
    const modelled = estimateLayers(blanket(8, { spacer: { conductivity_W_per_m_K: 0.02, thickness_m: 1e-4, contactFactor: 0.01 } }));
    const direct = estimateLayers(blanket(8, { spacer: { conductance_W_per_m2_K: 2 } }));
    expect(relativeError(modelled.heatLeak_W, direct.heatLeak_W)).toBeLessThan(1e-12);
  });

  it("splits the coldest gap's heat into its radiation and solid parts", () => {
    const input = blanket(15, { spacer: { conductance_W_per_m2_K: 0.02 } });
    const result = estimateLayers(input);
    const last = result.layerTemperatures_K[14];
    const radiation = (SIGMA * (last ** 4 - 4.2 ** 4)) / (1 / emissivityAt(film, last) + 1 / emissivityAt(film, 4.2) - 1);
    expect(relativeError(result.radiation_W, radiation * 2.5)).toBeLessThan(1e-9);
    expect(relativeError(result.solid_W, 0.02 * (last - 4.2) * 2.5)).toBeLessThan(1e-9);
    expect(relativeError(result.radiation_W + result.solid_W + result.gas_W, result.heatLeak_W)).toBeLessThan(1e-15);
  });
});

describe("estimateLayers: with residual gas", () => {
  it("adds the free-molecular gas heat of gasConduction between bare walls", () => {
    // No shields: one gap, radiation (Table 13.3, parallel plates) plus Corruccini's gas term.
    const input = blanket(0, { warm: { temperature_K: 300, emissivity: 0.05 }, cold: { temperature_K: 77, emissivity: 0.05 }, gas: { gas: "helium", pressure_Pa: 1e-3, accommodation: { warm: 0.5, cold: 0.5 } } });
    const result = estimateLayers(input);
    const radiation = (SIGMA * (300 ** 4 - 77 ** 4)) / (1 / 0.05 + 1 / 0.05 - 1);
    const gas = gasConduction({ gas: "helium", pressure_Pa: 1e-3, gaugeTemperature_K: 300, warm_K: 300, cold_K: 77, accommodation: { warm: 0.5, cold: 0.5 } }).heatFlux_W_per_m2;
    expect(relativeError(result.heatFlux_W_per_m2, radiation + gas)).toBeLessThan(1e-12);
    expect(relativeError(result.gas_W, gas * 2.5)).toBeLessThan(1e-12);
  });

  it("tends to gas conduction through N + 1 gaps in series when radiation is negligible", () => {
    // Fixed coefficients make every gap's gas conductance G·a·P equal, so q = G·a·P·ΔT/(N + 1);
    // derived by hand with G = 2.0995 W/(m²·K·Pa) for helium at a 300 K gauge (gas-conduction.test.ts):
    // 2.0995 × (1/3) × 0.01 Pa × 223 K / 6 = 0.26010 W/m².
    const input = blanket(5, {
      warm: { temperature_K: 300, emissivity: 1e-6 },
      cold: { temperature_K: 77, emissivity: 1e-6 },
      reflector: { warmSide: 1e-6, coldSide: 1e-6 },
      gas: { gas: "helium", pressure_Pa: 0.01, accommodation: { warm: 0.5, cold: 0.5 } },
    });
    expect(relativeError(estimateLayers(input).heatFlux_W_per_m2, 0.2601)).toBeLessThan(1e-3);
  });

  it("balances the gaps with temperature-dependent default coefficients too", () => {
    const result = estimateLayers(blanket(20, { gas: { gas: "helium", pressure_Pa: 1e-2 } }));
    expect(result.gas_W).toBeGreaterThan(0);
    expect(relativeError(result.radiation_W + result.gas_W, result.heatLeak_W)).toBeLessThan(1e-15);
    const t = [300, ...result.layerTemperatures_K, 4.2];
    for (let k = 1; k < t.length; k++) expect(t[k]).toBeLessThan(t[k - 1]);
  });
});

describe("estimateLayers: bad input", () => {
  it.each<[string, Partial<BlanketLayersInput> & Record<string, unknown>, string]>([
    ["an area of 0", { area_m2: 0 }, "area_m2"],
    ["a warm wall at 0 K", { warm: { temperature_K: 0, emissivity: 0.05 } }, "warm.temperature_K"],
    ["a warm wall no warmer than the cold one", { warm: { temperature_K: 4.2, emissivity: 0.05 } }, "warm.temperature_K"],
    ["a cold wall below 0 K", { cold: { temperature_K: -1, emissivity: 0.05 } }, "cold.temperature_K"],
    ["a warm-wall emissivity of 0", { warm: { temperature_K: 300, emissivity: 0 } }, "warm.emissivity"],
    ["a cold-wall emissivity above 1", { cold: { temperature_K: 4.2, emissivity: 2 } }, "cold.emissivity"],
    ["a fractional layer count", { layers: 2.5 }, "layers"],
    ["a negative layer count", { layers: -1 }, "layers"],
    ["more than 1000 layers", { layers: 1001 }, "layers"],
    ["a reflector face above 1", { reflector: { warmSide: 1.1, coldSide: 0.03 } }, "reflector.warmSide"],
    ["a reflector face with a bad table", { reflector: { warmSide: 0.03, coldSide: { kind: "table", points: [] } } }, "reflector.coldSide.points"],
    ["a spacer conductance of 0", { spacer: { conductance_W_per_m2_K: 0 } }, "spacer.conductance_W_per_m2_K"],
    ["a spacer conductivity of 0", { spacer: { conductivity_W_per_m_K: 0, thickness_m: 1e-4 } }, "spacer.conductivity_W_per_m_K"],
    ["a spacer without thickness", { spacer: { conductivity_W_per_m_K: 0.02, thickness_m: 0 } }, "spacer.thickness_m"],
    ["a contact factor above 1", { spacer: { conductivity_W_per_m_K: 0.02, thickness_m: 1e-4, contactFactor: 2 } }, "spacer.contactFactor"],
    ["an unknown gas", { gas: { gas: "krypton" as "helium", pressure_Pa: 1e-3 } }, "gas.gas"],
    ["a negative gas pressure", { gas: { gas: "helium", pressure_Pa: -1 } }, "gas.pressure_Pa"],
    ["a gauge at 0 K", { gas: { gas: "helium", pressure_Pa: 1e-3, gaugeTemperature_K: 0 } }, "gas.gaugeTemperature_K"],
    ["an accommodation above 1", { gas: { gas: "helium", pressure_Pa: 1e-3, accommodation: { warm: 1.5, cold: 0.5 } } }, "gas.accommodation.warm"],
  ])("rejects %s, naming the field", (_name, change, field) => {
    expect(fieldOf(() => estimateLayers({ ...blanket(5), ...change } as BlanketLayersInput))).toBe(field);
  });
});
