import { describe, expect, it } from "vitest";
import { formatRate, rateDisplay, seriesDisplay } from "./display-units";

// Factors: NIST SP 811 (2008), Appendix B.8/B.9: lb = 0.45359237 kg and ft³ = 0.028316846592 m³, both exact.
describe("seriesDisplay", () => {
  it("keeps the stored units for an SI user", () => {
    expect(seriesDisplay("weighing", "si")).toEqual({ factor: 1, unit: "kg" });
    expect(seriesDisplay("vent-flow", "si")).toEqual({ factor: 1, unit: "standard L/min" });
    expect(seriesDisplay("level", "si")).toEqual({ factor: 1, unit: "% of capacity" });
  });

  it("shows a weighed mass in pounds for a US-customary user (1 kg = 1/0.45359237 lb)", () => {
    const { factor, unit } = seriesDisplay("weighing", "us");
    expect(unit).toBe("lb");
    expect(factor).toBeCloseTo(2.2046226218, 9);
  });

  it("shows a vent flow in standard ft³/h (1 L/min = 60 L/h = 60/28.316846592 ft³/h)", () => {
    const { factor, unit } = seriesDisplay("vent-flow", "us");
    expect(unit).toBe("standard ft³/h");
    expect(factor).toBeCloseTo(2.118880003, 8);
  });

  it("leaves a level in % of capacity whatever the unit system", () => {
    expect(seriesDisplay("level", "us")).toEqual({ factor: 1, unit: "% of capacity" });
  });
});

describe("rateDisplay", () => {
  it("turns a weighing slope in kg/s into kg/h and lb/h", () => {
    expect(rateDisplay({ method: "weighing" }, "si")).toEqual({ factor: 3600, unit: "kg/h" });
    expect(rateDisplay({ method: "weighing" }, "us").factor).toBeCloseTo(3600 / 0.45359237, 6);
  });

  it("turns a level slope in %/s into %/h, and keeps the mean vent flow as a flow", () => {
    expect(rateDisplay({ method: "level" }, "si")).toEqual({ factor: 3600, unit: "%/h" });
    expect(rateDisplay({ method: "vent-flow" }, "si")).toEqual({ factor: 1, unit: "standard L/min" });
  });

  it("writes the boil-off of a weighed vessel as a negative mass rate", () => {
    // 1 g lost every 100 s is 36 g/h.
    expect(formatRate({ method: "weighing" }, -1e-5, "si")).toBe("-0.036 kg/h");
  });
});
