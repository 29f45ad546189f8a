import fc from "fast-check";
import { describe, it } from "vitest";
import { nearlyEqual } from "./checks.test-helpers";
import { CRYOGEN_IDS } from "./fluids";
import { fitRate, measuredHeatLeak, suggestSteadyWindow } from "./measured-boil-off";
import { studentTQuantile } from "./student-t";

/** Strictly increasing times: cumulative sums of positive steps. */
const times = fc
  .array(fc.double({ min: 0.5, max: 100, noNaN: true }), { minLength: 10, maxLength: 80 })
  .map((steps) => steps.reduce<number[]>((acc, step) => [...acc, (acc.at(-1) ?? 0) + step], []));

const whole = { start_s: 0, end_s: 1e12 };
const normal = (x: number) => x === 0 || Math.abs(x) > 1e-300;

describe("least-squares rate laws", () => {
  it("an exact straight line is recovered with zero residual", () => {
    fc.assert(
      // Subnormal slopes and offsets (below ~1e-300) lose precision in any arithmetic: left out.
      fc.property(times, fc.double({ min: -10, max: 10, noNaN: true }).filter(normal), fc.double({ min: -1e3, max: 1e3, noNaN: true }).filter(normal), (t, slope, offset) => {
        const fit = fitRate(t, t.map((x) => offset + slope * x), whole);
        const scale = Math.abs(offset) + Math.abs(slope) * t.at(-1)!;
        // Rounding in the values (about ε·scale) limits the slope to about ε·scale / span.
        const span = t.at(-1)! - t[0];
        return nearlyEqual(fit.rate, slope, 1e-8, (1e-10 * scale) / span) && nearlyEqual(fit.intercept, offset, 1e-8, 1e-9 * scale) && fit.residualStdDev <= 1e-9 * scale;
      }),
    );
  });

  it("scaling the values by k scales the rate by k and its standard error by |k|", () => {
    fc.assert(
      fc.property(
        times,
        fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 80, maxLength: 80 }),
        fc.double({ min: -100, max: 100, noNaN: true }).filter((k) => Math.abs(k) > 1e-3),
        (t, noise, k) => {
          const y = t.map((x, i) => 2 - 0.01 * x + noise[i]);
          const a = fitRate(t, y, whole);
          const b = fitRate(t, y.map((v) => k * v), whole);
          return nearlyEqual(b.rate, k * a.rate, 1e-9, 1e-12) && nearlyEqual(b.rateStdError, Math.abs(k) * a.rateStdError, 1e-9, 1e-12);
        },
      ),
    );
  });

  it("the 95 % interval is the rate ± t(0.975, n − 2)·SE", () => {
    fc.assert(
      fc.property(times, fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 80, maxLength: 80 }), (t, noise) => {
        const fit = fitRate(t, t.map((x, i) => 5 + 0.3 * x + noise[i]), whole);
        const half = studentTQuantile(0.975, t.length - 2) * fit.rateStdError;
        return nearlyEqual(fit.interval95[0], fit.rate - half, 1e-12, 1e-15) && nearlyEqual(fit.interval95[1], fit.rate + half, 1e-12, 1e-15);
      }),
    );
  });

  it("the suggested steady window lies inside the log and holds at least 10 points", () => {
    fc.assert(
      fc.property(times, fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 80, maxLength: 80 }), (t, noise) => {
        const w = suggestSteadyWindow(t, t.map((x, i) => -x + noise[i]));
        return w.startIndex >= 0 && w.endIndex <= t.length - 1 && w.endIndex - w.startIndex + 1 >= 10 && w.start_s === t[w.startIndex];
      }),
    );
  });
});

describe("measured heat leak laws", () => {
  it("the heat leak and its standard error are linear in the rate and its standard error", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...CRYOGEN_IDS),
        fc.constantFrom("weighing" as const, "vent-flow" as const, "level" as const),
        fc.double({ min: 1e-9, max: 1, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (cryogen, method, magnitude, k) => {
          const rate = method === "vent-flow" ? magnitude : -magnitude;
          const base = { method, cryogen, capacity_L: 100 };
          const a = measuredHeatLeak({ ...base, rate, rateStdError: magnitude / 10 });
          const b = measuredHeatLeak({ ...base, rate: k * rate, rateStdError: (k * magnitude) / 10 });
          return (
            nearlyEqual(b.measuredHeatLeak_W, k * a.measuredHeatLeak_W, 1e-12) &&
            nearlyEqual(b.measuredHeatLeakStdError_W, k * a.measuredHeatLeakStdError_W, 1e-12) &&
            a.measuredHeatLeak_W > 0
          );
        },
      ),
    );
  });
});
