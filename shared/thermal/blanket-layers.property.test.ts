import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { anyEmissivity, constantEmissivity, wallTemperatures } from "./arbitraries.test-helpers";
import { BlanketLayersInput, estimateLayers } from "./blanket-layers";
import { GasName } from "./gas-conduction";
import { estimateStack } from "./radiation-network";

const reflector = fc.record({ warmSide: anyEmissivity, coldSide: anyEmissivity });
const spacer = fc.double({ min: 1e-4, max: 1, noNaN: true }).map((h) => ({ conductance_W_per_m2_K: h }));
const gas = fc.record({
  gas: fc.constantFrom<GasName>("helium", "hydrogen", "neon", "nitrogen", "air", "argon"),
  pressure_Pa: fc.double({ min: 1e-7, max: 1e-1, noNaN: true }),
});
const blanket = fc.record({
  area_m2: fc.double({ min: 0.01, max: 100, noNaN: true }),
  walls: wallTemperatures,
  warmEmissivity: anyEmissivity,
  coldEmissivity: anyEmissivity,
  layers: fc.integer({ min: 0, max: 80 }),
  reflector,
});

type Blanket = typeof blanket extends fc.Arbitrary<infer T> ? T : never;

function input(b: Blanket, extra: Partial<BlanketLayersInput> = {}): BlanketLayersInput {
  return {
    area_m2: b.area_m2,
    warm: { temperature_K: b.walls.warm_K, emissivity: b.warmEmissivity },
    cold: { temperature_K: b.walls.cold_K, emissivity: b.coldEmissivity },
    layers: b.layers,
    reflector: b.reflector,
    ...extra,
  };
}

describe("estimateLayers laws", () => {
  it("with spacer conduction and gas off it equals estimateStack for the same planar stack", () => {
    fc.assert(
      fc.property(blanket, (b) => {
        const layered = estimateLayers(input(b));
        const stacked = estimateStack({
          geometry: { kind: "planar", area_m2: b.area_m2 },
          warm: { temperature_K: b.walls.warm_K, emissivity: b.warmEmissivity },
          cold: { temperature_K: b.walls.cold_K, emissivity: b.coldEmissivity },
          shields: Array.from({ length: b.layers }, () => ({ ...b.reflector })),
        });
        expect(Math.abs(layered.heatLeak_W - stacked.heatLeak_W) / stacked.heatLeak_W).toBeLessThan(1e-9);
        layered.layerTemperatures_K.forEach((t, k) => expect(Math.abs(t - stacked.shields[k].temperature_K) / t).toBeLessThan(1e-9));
      }),
    );
  });

  it("adding spacer conduction never lowers the heat leak", () => {
    fc.assert(
      fc.property(blanket, constantEmissivity, spacer, (b, eps, s) => {
        const constant = { ...b, warmEmissivity: eps, coldEmissivity: eps, reflector: { warmSide: eps, coldSide: eps } };
        expect(estimateLayers(input(constant, { spacer: s })).heatLeak_W).toBeGreaterThanOrEqual(estimateLayers(input(constant)).heatLeak_W * (1 - 1e-12));
      }),
    );
  });

  it("the radiation, solid and gas parts are each non-negative and sum to the heat leak", () => {
    fc.assert(
      fc.property(blanket, fc.option(spacer, { nil: undefined }), fc.option(gas, { nil: undefined }), (b, s, g) => {
        const result = estimateLayers(input(b, { spacer: s, gas: g }));
        for (const part of [result.radiation_W, result.solid_W, result.gas_W]) expect(part).toBeGreaterThanOrEqual(0);
        expect(Math.abs(result.radiation_W + result.solid_W + result.gas_W - result.heatLeak_W)).toBeLessThanOrEqual(1e-12 * result.heatLeak_W);
        if (s === undefined) expect(result.solid_W).toBe(0);
        if (g === undefined) expect(result.gas_W).toBe(0);
      }),
    );
  });

  it("layer temperatures fall strictly from the warm wall to the cold wall", () => {
    fc.assert(
      fc.property(blanket, fc.option(spacer, { nil: undefined }), fc.option(gas, { nil: undefined }), (b, s, g) => {
        const t = [b.walls.warm_K, ...estimateLayers(input(b, { spacer: s, gas: g })).layerTemperatures_K, b.walls.cold_K];
        for (let k = 1; k < t.length; k++) expect(t[k]).toBeLessThan(t[k - 1]);
      }),
    );
  });

  it("the heat leak scales linearly with the area", () => {
    fc.assert(
      fc.property(blanket, fc.option(spacer, { nil: undefined }), fc.option(gas, { nil: undefined }), fc.double({ min: 0.1, max: 50, noNaN: true }), (b, s, g, factor) => {
        const one = estimateLayers(input(b, { spacer: s, gas: g })).heatLeak_W;
        const scaled = estimateLayers(input({ ...b, area_m2: b.area_m2 * factor }, { spacer: s, gas: g })).heatLeak_W;
        expect(Math.abs(scaled - factor * one) / (factor * one)).toBeLessThan(1e-9);
      }),
    );
  });
});
