import { describe, expect, it } from "vitest";
import {
  boilOff,
  heatFromLiquidVolume,
  heatFromStandardVentFlow,
  heatFromVentedMass,
  VENT_REFERENCE_CONDITIONS,
  type VentReference,
} from "./boil-off";
import { thrownUnchecked } from "./checks.test-helpers";
import { ThermalInputError } from "./errors";
import type { CryogenId } from "./fluids";

describe("boilOff", () => {
  it("1 W boils about 1.4 L of liquid helium an hour (common practice)", () => {
    const result = boilOff({ heat_W: 1, cryogen: "helium-4" });
    expect(result.liquidVolume_L_per_h).toBeGreaterThan(1.35);
    expect(result.liquidVolume_L_per_h).toBeLessThan(1.45);
  });

  it("1 W boils about half a litre of liquid nitrogen a day (common practice)", () => {
    const result = boilOff({ heat_W: 1, cryogen: "nitrogen" });
    expect(result.liquidVolume_L_per_day).toBeGreaterThan(0.5);
    expect(result.liquidVolume_L_per_day).toBeLessThan(0.58);
  });

  it("vents 13 % less helium gas than it evaporates", () => {
    const result = boilOff({ heat_W: 2.5, cryogen: "helium-4" });
    expect(result.ventedMass_kg_per_h / result.evaporatedMass_kg_per_h).toBeCloseTo(0.866, 3);
    expect(result.ventedGasFactor).toBeCloseTo(0.866, 3);
  });

  it("gives hold time and evaporation rate for a 250 L helium cryostat (hand-derived)", () => {
    // Hand-derived from ṁ = Q/h_fg and V̇ = ṁ/ρ_l with the table's h_fg = 20 720 J/kg and
    // ρ_l = 124.96 kg/m³: 0.1 W → 0.139 041 L/h; (0.9 − 0.1)·250 L / 0.139 041 L/h = 1438.4 h.
    const result = boilOff({ heat_W: 0.1, cryogen: "helium-4", capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 });
    expect(result.liquidVolume_L_per_h).toBeCloseTo(0.139041, 5);
    expect(result.holdTime_h).toBeCloseTo(1438.4, 0);
    // 0.139 041 L/h × 24 h / 250 L × 100 = 1.3348 %/day.
    expect(result.evaporationRate_percent_per_day).toBeCloseTo(1.3348, 3);
  });

  it("gives vent flow at 0 °C from the ideal-gas molar volume 22.414 L/mol (CODATA 2018)", () => {
    // Hand-derived: vented mass / molar mass × 22.413 97 L/mol, per minute.
    const result = boilOff({ heat_W: 1, cryogen: "helium-4" });
    const expected_L_per_min = ((result.ventedMass_kg_per_h / 4.002602e-3) * 22.41397) / 60;
    expect(result.ventFlow_standard_L_per_min).toBeCloseTo(expected_L_per_min, 4);
    expect(result.ventReference).toBe("normal-0C");
    expect(result.ventFlow_standard_L_per_min).toBeCloseTo(14.04, 2);
  });

  it("scales the vent flow with the reference temperature for the 15 °C and 20 °C variants", () => {
    const at0 = boilOff({ heat_W: 1, cryogen: "nitrogen" }).ventFlow_standard_L_per_min;
    const at15 = boilOff({ heat_W: 1, cryogen: "nitrogen", ventReference: "standard-15C" }).ventFlow_standard_L_per_min;
    const at20 = boilOff({ heat_W: 1, cryogen: "nitrogen", ventReference: "standard-20C" }).ventFlow_standard_L_per_min;
    expect(at15 / at0).toBeCloseTo(288.15 / 273.15, 10);
    expect(at20 / at0).toBeCloseTo(293.15 / 273.15, 10);
    expect(VENT_REFERENCE_CONDITIONS["normal-0C"].label).toContain("0 °C");
  });

  it("omits capacity-based results without a capacity, and gives infinite hold time at 0 W", () => {
    const open = boilOff({ heat_W: 1, cryogen: "argon" });
    expect(open.holdTime_h).toBeUndefined();
    expect(open.evaporationRate_percent_per_day).toBeUndefined();
    const idle = boilOff({ heat_W: 0, cryogen: "argon", capacity_L: 100 });
    expect(idle.holdTime_h).toBe(Infinity);
    expect(idle.evaporationRate_percent_per_day).toBe(0);
    expect(idle.ventFlow_standard_L_per_min).toBe(0);
  });

  it.each<[string, Record<string, unknown>]>([
    ["heat_W", { heat_W: -0.1 }],
    ["heat_W", { heat_W: Number.NaN }],
    ["capacity_L", { capacity_L: 0 }],
    ["fillFraction", { fillFraction: 1.2 }],
    ["minimumFraction", { minimumFraction: -0.1 }],
    ["minimumFraction", { fillFraction: 0.5, minimumFraction: 0.5 }],
    ["cryogen", { cryogen: "krypton" }],
    ["ventReference", { ventReference: "stp" }],
  ])("refuses a bad %s", (field, override) => {
    const error = thrownUnchecked(() =>
      boilOff({ heat_W: 1, cryogen: "helium-4", capacity_L: 100, ...(override as object) } as Parameters<typeof boilOff>[0]),
    );
    expect(error).toBeInstanceOf(ThermalInputError);
    expect(error.field).toBe(field);
  });
});

describe("inverse conversions", () => {
  const cryogens: CryogenId[] = ["helium-4", "hydrogen-para", "nitrogen", "oxygen"];

  it.each(cryogens)("recover the heat of %s from vented mass, liquid volume and vent flow", (cryogen) => {
    const heat_W = 3.7;
    const references: VentReference[] = ["normal-0C", "standard-15C", "standard-20C"];
    for (const ventReference of references) {
      const result = boilOff({ heat_W, cryogen, ventReference });
      expect(heatFromVentedMass({ ventedMass_kg_per_s: result.ventedMass_kg_per_h / 3600, cryogen }).heat_W).toBeCloseTo(heat_W, 10);
      expect(
        heatFromLiquidVolume({ liquidVolume_m3_per_s: result.liquidVolume_L_per_h / 1000 / 3600, cryogen }).heat_W,
      ).toBeCloseTo(heat_W, 10);
      expect(
        heatFromStandardVentFlow({ flow_standard_L_per_min: result.ventFlow_standard_L_per_min, cryogen, ventReference }).heat_W,
      ).toBeCloseTo(heat_W, 10);
    }
  });

  it("refuse negative flows with the field's name", () => {
    expect(thrownUnchecked(() => heatFromVentedMass({ ventedMass_kg_per_s: -1, cryogen: "nitrogen" })).field).toBe("ventedMass_kg_per_s");
    expect(thrownUnchecked(() => heatFromLiquidVolume({ liquidVolume_m3_per_s: -1, cryogen: "nitrogen" })).field).toBe(
      "liquidVolume_m3_per_s",
    );
    expect(thrownUnchecked(() => heatFromStandardVentFlow({ flow_standard_L_per_min: -1, cryogen: "nitrogen" })).field).toBe(
      "flow_standard_L_per_min",
    );
  });
});
