import { describe, expect, it } from "vitest";
import {
  blanketCorrelation,
  CORRELATION_SETS,
  polyesterConductivity_W_per_m_K,
  type BlanketCorrelationInput,
} from "./blanket-correlation";
import { thrownUnchecked } from "./checks.test-helpers";
import { ThermalInputError } from "./errors";

function set(id: string) {
  const found = CORRELATION_SETS.find((s) => s.id === id);
  if (!found) throw new Error(`no set ${id}`);
  return found;
}

// A blanket between a room-temperature jacket and a liquid-nitrogen shield.
const base: BlanketCorrelationInput = {
  layers: 30,
  layerDensity_per_cm: 20,
  warm_K: 300,
  cold_K: 77,
  pressure_torr: 1e-6,
  emissivity: 0.031,
  coefficients: set("kcg-1974-polyester-netting").coefficients,
};

describe("blanketCorrelation, 1974 form", () => {
  it("gives each term of the Keller–Cunnington–Glassford formula (hand-derived)", () => {
    // Hand-derived from the formula in NASA CR-134477 with C_s = 7.3e-8, a = 2.63,
    // C_r = 7.07e-10, C_g = 1.46e4 (evaluated separately in Python):
    // solid 7.3e-8·20^2.63·188.5·223/31, radiation 7.07e-10·0.031·(300^4.67 − 77^4.67)/30,
    // gas 1.46e4·1e-6·(300^0.52 − 77^0.52)/30.
    const q = blanketCorrelation(base);
    expect(q.solid_W_per_m2).toBeCloseTo(0.261388, 5);
    expect(q.radiation_W_per_m2).toBeCloseTo(0.26981, 5);
    expect(q.gas_W_per_m2).toBeCloseTo(0.0047898, 6);
    expect(q.heatFlux_W_per_m2).toBeCloseTo(0.535988, 5);
  });

  it("a cold blanket at soft vacuum is dominated by gas conduction (hand-derived)", () => {
    // 10 layers at 15 /cm, 80 → 20 K, 1e-5 torr: solid 0.024670, radiation 0.0016887, gas 0.073223 W/m².
    const q = blanketCorrelation({ ...base, layers: 10, layerDensity_per_cm: 15, warm_K: 80, cold_K: 20, pressure_torr: 1e-5 });
    expect(q.solid_W_per_m2).toBeCloseTo(0.02467013, 7);
    expect(q.radiation_W_per_m2).toBeCloseTo(0.00168865, 7);
    expect(q.gas_W_per_m2).toBeCloseTo(0.07322274, 7);
  });

  it("every default set gives a 300 → 77 K flux of a good blanket, 0.2 to 2 W/m² (common practice)", () => {
    for (const s of CORRELATION_SETS) {
      const q = blanketCorrelation({ ...base, emissivity: s.emissivity, coefficients: s.coefficients });
      expect(q.heatFlux_W_per_m2).toBeGreaterThan(0.2);
      expect(q.heatFlux_W_per_m2).toBeLessThan(2);
      expect(s.provenance.length).toBeGreaterThan(30);
    }
  });

  it("doubling the layer density multiplies only the solid term, by 2^a", () => {
    const q1 = blanketCorrelation(base);
    const q2 = blanketCorrelation({ ...base, layerDensity_per_cm: 40 });
    expect(q2.solid_W_per_m2 / q1.solid_W_per_m2).toBeCloseTo(2 ** 2.63, 10);
    expect(q2.radiation_W_per_m2).toBe(q1.radiation_W_per_m2);
    expect(q2.gas_W_per_m2).toBe(q1.gas_W_per_m2);
  });

  it("radiation and gas fall as 1/N, solid as 1/(N + 1)", () => {
    const q10 = blanketCorrelation({ ...base, layers: 10 });
    const q40 = blanketCorrelation({ ...base, layers: 40 });
    expect(q10.radiation_W_per_m2 / q40.radiation_W_per_m2).toBeCloseTo(4, 10);
    expect(q10.gas_W_per_m2 / q40.gas_W_per_m2).toBeCloseTo(4, 10);
    expect(q10.solid_W_per_m2 / q40.solid_W_per_m2).toBeCloseTo(41 / 11, 10);
  });

  it("has no gas term in perfect vacuum and no flux between equal temperatures", () => {
    expect(blanketCorrelation({ ...base, pressure_torr: 0 }).gas_W_per_m2).toBe(0);
    const q = blanketCorrelation({ ...base, warm_K: 77, cold_K: 77 });
    expect(q.heatFlux_W_per_m2).toBe(0);
  });
});

describe("blanketCorrelation, modified form", () => {
  it("uses polyester's conductivity at T_m, about 0.15 W/(m·K) at 300 K (common practice)", () => {
    expect(polyesterConductivity_W_per_m_K(300)).toBeCloseTo(0.1505, 4);
  });

  it("gives the modified solid term (hand-derived): 2.4e-4·20^2.63·k_p(188.5 K)·223/31 = 0.64159 W/m²", () => {
    const s = set("modified-polyester-netting");
    const q = blanketCorrelation({ ...base, coefficients: s.coefficients });
    expect(q.solid_W_per_m2).toBeCloseTo(0.641588, 5);
  });

  it("overstates the solid term about a thousandfold if its C_s is used with T_m (the trap the flag prevents)", () => {
    const s = set("modified-polyester-netting");
    const wrong = blanketCorrelation({ ...base, coefficients: { ...s.coefficients, solidTemperatureTerm: "mean-temperature" } });
    const right = blanketCorrelation({ ...base, coefficients: s.coefficients });
    expect(wrong.solid_W_per_m2 / right.solid_W_per_m2).toBeGreaterThan(500);
  });
});

describe("blanketCorrelation validation", () => {
  it.each<[string, Partial<BlanketCorrelationInput>]>([
    ["layers", { layers: 0 }],
    ["layers", { layers: 2.5 }],
    ["layerDensity_per_cm", { layerDensity_per_cm: 0 }],
    ["cold_K", { cold_K: 0 }],
    ["warm_K", { warm_K: 50 }],
    ["pressure_torr", { pressure_torr: -1e-6 }],
    ["emissivity", { emissivity: 0 }],
    ["coefficients.solid", { coefficients: { ...base.coefficients, solid: Number.NaN } }],
    ["coefficients.solidTemperatureTerm", { coefficients: { ...base.coefficients, solidTemperatureTerm: "x" as never } }],
  ])("refuses a bad %s", (field, override) => {
    const error = thrownUnchecked(() => blanketCorrelation({ ...base, ...override }));
    expect(error).toBeInstanceOf(ThermalInputError);
    expect(error.field).toBe(field);
  });

  it("refuses missing coefficients", () => {
    expect(thrownUnchecked(() => blanketCorrelation({ ...base, coefficients: undefined as never })).field).toBe("coefficients");
  });
});
