import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { Emissivity, emissivityAt, emissivitySlope } from "./emissivity";

const temperature = fc.double({ min: 1, max: 2000, noNaN: true });
const epsilon = fc.double({ min: 1e-4, max: 1, noNaN: true });
const powerLaw = fc.record({
  kind: fc.constant("power" as const),
  reference: epsilon,
  referenceTemperature_K: fc.double({ min: 1, max: 1000, noNaN: true }),
  exponent: fc.double({ min: -5, max: 5, noNaN: true }),
});
const table = fc
  .uniqueArray(fc.integer({ min: 1, max: 2000 }), { minLength: 1, maxLength: 8 })
  .chain((temps) => fc.tuple(fc.constant(temps.sort((a, b) => a - b)), fc.array(epsilon, { minLength: temps.length, maxLength: temps.length })))
  .map(([temps, values]) => ({ kind: "table" as const, points: temps.map((t, i) => [t, values[i]] as [number, number]) }));

describe("emissivity laws", () => {
  it("every model gives an emissivity above 0 and at most 1 at every temperature", () => {
    fc.assert(
      fc.property(fc.oneof(epsilon, powerLaw, table), temperature, (model: Emissivity, t) => {
        const value = emissivityAt(model, t);
        expect(value).toBeGreaterThan(0);
        expect(value).toBeLessThanOrEqual(1);
      }),
    );
  });

  it("a table never leaves the range of its own points", () => {
    fc.assert(
      fc.property(table, temperature, (model, t) => {
        const values = model.points.map((p) => p[1]);
        const value = emissivityAt(model, t);
        expect(value).toBeGreaterThanOrEqual(Math.min(...values) * (1 - 1e-12));
        expect(value).toBeLessThanOrEqual(Math.max(...values) * (1 + 1e-12));
      }),
    );
  });

  it("a table returns each point's emissivity at that point's temperature", () => {
    fc.assert(
      fc.property(table, (model) => {
        for (const [t, e] of model.points) expect(emissivityAt(model, t)).toBeCloseTo(e, 12);
      }),
    );
  });

  it("a power law with a positive exponent never falls as temperature rises", () => {
    fc.assert(
      fc.property(powerLaw, temperature, temperature, (model, a, b) => {
        fc.pre(model.exponent > 0);
        const [low, high] = a < b ? [a, b] : [b, a];
        expect(emissivityAt(model, high)).toBeGreaterThanOrEqual(emissivityAt(model, low));
      }),
    );
  });

  it("the slope agrees with a centred finite difference wherever the model is smooth", () => {
    fc.assert(
      fc.property(powerLaw, temperature, (model, t) => {
        const h = t * 1e-6;
        const up = emissivityAt(model, t + h);
        const down = emissivityAt(model, t - h);
        // Away from the cap at 1, where the slope jumps: on either side, since a negative
        // exponent makes the colder point the higher one.
        fc.pre(up < 1 && down < 1);
        const numeric = (up - down) / (2 * h);
        // Rounding in the difference quotient is about ε_machine·ε/h; allow a hundred times that.
        const noise = (1e-8 * (up + down)) / t;
        expect(Math.abs(emissivitySlope(model, t) - numeric)).toBeLessThanOrEqual(1e-5 * Math.abs(numeric) + noise);
      }),
    );
  });
});
