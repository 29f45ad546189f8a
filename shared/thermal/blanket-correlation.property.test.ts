import fc from "fast-check";
import { describe, it } from "vitest";
import { blanketCorrelation, CORRELATION_SETS } from "./blanket-correlation";
import { nearlyEqualAboveTiny } from "./checks.test-helpers";

const input = fc.record({
  layers: fc.integer({ min: 1, max: 200 }),
  layerDensity_per_cm: fc.double({ min: 1, max: 60, noNaN: true }),
  cold_K: fc.double({ min: 2, max: 150, noNaN: true }),
  span_K: fc.double({ min: 0, max: 250, noNaN: true }),
  pressure_torr: fc.double({ min: 0, max: 1e-3, noNaN: true }),
  emissivity: fc.double({ min: 0.005, max: 1, noNaN: true }),
  set: fc.constantFrom(...CORRELATION_SETS),
});

describe("blanket correlation laws", () => {
  it("the three parts sum to the total and none is negative", () => {
    fc.assert(
      fc.property(input, (i) => {
        const q = blanketCorrelation({
          ...i,
          warm_K: i.cold_K + i.span_K,
          coefficients: i.set.coefficients,
        });
        return (
          nearlyEqualAboveTiny(q.heatFlux_W_per_m2, q.solid_W_per_m2 + q.radiation_W_per_m2 + q.gas_W_per_m2) &&
          q.solid_W_per_m2 >= 0 &&
          q.radiation_W_per_m2 >= 0 &&
          q.gas_W_per_m2 >= 0
        );
      }),
    );
  });

  it("radiation is proportional to emissivity and gas conduction to pressure", () => {
    fc.assert(
      fc.property(input, fc.double({ min: 0.1, max: 0.99, noNaN: true }), (i, k) => {
        const common = { ...i, warm_K: i.cold_K + i.span_K, coefficients: i.set.coefficients };
        const q = blanketCorrelation(common);
        const lowered = blanketCorrelation({ ...common, emissivity: i.emissivity * k, pressure_torr: i.pressure_torr * k });
        return (
          nearlyEqualAboveTiny(lowered.radiation_W_per_m2, k * q.radiation_W_per_m2) &&
          nearlyEqualAboveTiny(lowered.gas_W_per_m2, k * q.gas_W_per_m2) &&
          lowered.solid_W_per_m2 === q.solid_W_per_m2
        );
      }),
    );
  });

  it("adding layers never raises the heat flux", () => {
    fc.assert(
      fc.property(input, fc.integer({ min: 1, max: 50 }), (i, extra) => {
        const common = { ...i, warm_K: i.cold_K + i.span_K, coefficients: i.set.coefficients };
        return (
          blanketCorrelation({ ...common, layers: i.layers + extra }).heatFlux_W_per_m2 <=
          blanketCorrelation(common).heatFlux_W_per_m2
        );
      }),
    );
  });
});
