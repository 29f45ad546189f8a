import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { boilOff } from "./boil-off";
import { thrownUnchecked } from "./checks.test-helpers";
import { ThermalInputError } from "./errors";
import { CRYOGEN_IDS } from "./fluids";
import { compareWithPrediction, fitRate, measuredHeatLeak, suggestSteadyWindow } from "./measured-boil-off";

// All logs below are invented: straight lines (and one cool-down transient) plus seeded Gaussian
// noise, so the true rate is known.

/** mulberry32, a small seeded generator, with Box–Muller for normal deviates. */
function normalNoise(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => {
    const u = 1 - uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
}

function syntheticLog(points: number, step_s: number, shape: (t: number) => number, noise: number, seed: number) {
  const gauss = normalNoise(seed);
  const time_s = Array.from({ length: points }, (_, i) => i * step_s);
  const value = time_s.map((t) => shape(t) + noise * gauss());
  return { time_s, value };
}

describe("fitRate", () => {
  it("matches a hand-worked least-squares fit of ten points", () => {
    // y = 50 − 2e-4·t + e at t = 0, 60, …, 540 s with e = (3, −2, 4, −1, 0, −3, 2, −4, 1, 0) g.
    // Hand-derived from the closed-form OLS formulas (NIST/SEMATECH e-Handbook §4.1.4.1):
    // slope −2.040404e-4, intercept 50.0010909, s = 2.62563e-3, SE = s/√Sxx = 4.817875e-6;
    // 95 % interval with t(0.975, 8) = 2.306 (NIST/SEMATECH Table 1.3.6.7.2).
    const time_s = Array.from({ length: 10 }, (_, i) => i * 60);
    const e = [0.003, -0.002, 0.004, -0.001, 0, -0.003, 0.002, -0.004, 0.001, 0];
    const value = time_s.map((t, i) => 50 - 2e-4 * t + e[i]);
    const fit = fitRate(time_s, value, { start_s: 0, end_s: 540 });
    expect(fit.rate).toBeCloseTo(-2.040404e-4, 10);
    expect(fit.intercept).toBeCloseTo(50.0010909, 6);
    expect(fit.residualStdDev).toBeCloseTo(2.62563e-3, 8);
    expect(fit.rateStdError).toBeCloseTo(4.817875e-6, 11);
    expect(fit.degreesOfFreedom).toBe(8);
    expect(fit.points).toBe(10);
    expect(fit.interval95[0]).toBeCloseTo(-2.040404e-4 - 2.306 * 4.817875e-6, 8);
    expect(fit.interval95[1]).toBeCloseTo(-2.040404e-4 + 2.306 * 4.817875e-6, 8);
  });

  it("recovers the known rate of a noisy weighing log within its 95 % interval", () => {
    // A helium dewar losing 1 W worth of vented gas, weighed every 10 s for 6 h, scale noise 5 g.
    const rate = -boilOff({ heat_W: 1, cryogen: "helium-4" }).ventedMass_kg_per_h / 3600;
    const log = syntheticLog(2160, 10, (t) => 180 + rate * t, 0.005, 7);
    const fit = fitRate(log.time_s, log.value, { start_s: 0, end_s: 21_590 });
    expect(fit.interval95[0]).toBeLessThan(rate);
    expect(fit.interval95[1]).toBeGreaterThan(rate);
  });

  it("gives the standard error of the closed form for evenly spaced points, σ·√12/(√n·T)", () => {
    // For n evenly spaced points over a span T, Sxx ≈ n·T²/12 (closed form for the variance of a
    // uniform grid), so SE ≈ σ·√12/(√n·T) when the residual s estimates σ.
    const n = 2000;
    const sigma = 0.01;
    const log = syntheticLog(n, 5, (t) => 3 - 1e-5 * t, sigma, 11);
    const fit = fitRate(log.time_s, log.value, { start_s: 0, end_s: 1e9 });
    const span = (n - 1) * 5;
    expect(fit.rateStdError / ((sigma * Math.sqrt(12)) / (Math.sqrt(n) * span))).toBeCloseTo(1, 1);
    expect(fit.residualStdDev / sigma).toBeCloseTo(1, 1);
  });

  it("covers the true rate about 95 % of the time over 300 seeded logs", () => {
    let covered = 0;
    for (let seed = 1; seed <= 300; seed++) {
      const log = syntheticLog(40, 60, (t) => 20 - 3e-4 * t, 0.02, seed);
      const fit = fitRate(log.time_s, log.value, { start_s: 0, end_s: 1e9 });
      if (fit.interval95[0] <= -3e-4 && -3e-4 <= fit.interval95[1]) covered++;
    }
    // Binomial standard deviation at 300 trials is 1.3 %; allow about ±3 of them.
    expect(covered / 300).toBeGreaterThan(0.91);
    expect(covered / 300).toBeLessThan(0.99);
  });

  it("fits only the points inside the window, and refuses fewer than 10", () => {
    const time_s = Array.from({ length: 30 }, (_, i) => i);
    const value = time_s.map((t) => (t < 10 ? 0 : 2 * t));
    expect(fitRate(time_s, value, { start_s: 10, end_s: 29 }).rate).toBeCloseTo(2, 12);
    const error = thrownUnchecked(() => fitRate(time_s, value, { start_s: 10, end_s: 18 }));
    expect(error.field).toBe("window");
    expect(error.allowed).toContain("at least 10 points");
  });

  it("refuses malformed logs with the offending field", () => {
    const t = Array.from({ length: 12 }, (_, i) => i);
    expect(thrownUnchecked(() => fitRate(t, t.slice(1), { start_s: 0, end_s: 11 })).field).toBe("value");
    expect(thrownUnchecked(() => fitRate([0, 1, 2, 2, 4, 5, 6, 7, 8, 9, 10, 11], t, { start_s: 0, end_s: 11 })).field).toBe("time_s[3]");
    expect(thrownUnchecked(() => fitRate(t, t.map((v) => (v === 5 ? Number.NaN : v)), { start_s: 0, end_s: 11 })).field).toBe("value[5]");
    expect(thrownUnchecked(() => fitRate(t, t, { start_s: 5, end_s: 5 })).field).toBe("window.end_s");
  });

  it("accepts Float64Array logs", () => {
    const time_s = Float64Array.from({ length: 12 }, (_, i) => i);
    const fit = fitRate(time_s, time_s.map((t) => 1 - 0.5 * t), { start_s: 0, end_s: 11 });
    expect(fit.rate).toBeCloseTo(-0.5, 12);
  });
});

describe("suggestSteadyWindow", () => {
  it.each([1, 2, 3, 4, 5])("skips a cool-down transient and keeps the steady tail (seed %i)", (seed) => {
    // Invented: steady vented-mass loss r plus a transient whose extra rate starts at 4·r and
    // decays with τ = 30 min; 8 h logged every 10 s, scale noise 5 g.
    const r = 4e-5;
    const tau = 1800;
    const log = syntheticLog(2880, 10, (t) => 200 - r * t - 4 * r * tau * (1 - Math.exp(-t / tau)), 0.005, seed);
    const window = suggestSteadyWindow(log.time_s, log.value);
    // The extra rate is 40 % of r at τ·ln 10 = 4145 s and 2 % of r at τ·ln 200 = 9537 s.
    expect(window.start_s).toBeGreaterThan(tau * Math.log(10));
    expect(window.start_s).toBeLessThan(tau * Math.log(200));
    expect(window.end_s).toBeGreaterThan(0.95 * 28_790);
    // What is left of the transient inside the window biases the fitted rate by under 2 %.
    const fit = fitRate(log.time_s, log.value, window);
    expect(Math.abs(fit.rate + r) / r).toBeLessThan(0.02);
  });

  it("takes nearly the whole log when it is steady from the start", () => {
    const log = syntheticLog(600, 30, (t) => 50 - 2e-4 * t, 0.01, 5);
    const window = suggestSteadyWindow(log.time_s, log.value);
    expect(window.endIndex - window.startIndex + 1).toBeGreaterThan(0.9 * 600);
  });

  it("always returns at least 10 points, inside the log", () => {
    const time_s = Array.from({ length: 12 }, (_, i) => i);
    const window = suggestSteadyWindow(time_s, time_s.map((t) => t * t));
    expect(window.endIndex - window.startIndex + 1).toBeGreaterThanOrEqual(10);
    expect(window.startIndex).toBeGreaterThanOrEqual(0);
    expect(window.endIndex).toBeLessThanOrEqual(11);
  });

  it("refuses a log of fewer than 10 points and bad options", () => {
    const t = Array.from({ length: 9 }, (_, i) => i);
    expect(thrownUnchecked(() => suggestSteadyWindow(t, t)).field).toBe("time_s");
    const long = Array.from({ length: 50 }, (_, i) => i);
    expect(thrownUnchecked(() => suggestSteadyWindow(long, long, { windowPoints: 2 })).field).toBe("options.windowPoints");
    expect(thrownUnchecked(() => suggestSteadyWindow(long, long, { tolerance: 0 })).field).toBe("options.tolerance");
  });
});

describe("measuredHeatLeak", () => {
  it("round-trips 1 W of helium through a weighing log: about 1.4 L/h (common practice)", () => {
    const predicted = boilOff({ heat_W: 1, cryogen: "helium-4", capacity_L: 250 });
    const rate = -predicted.ventedMass_kg_per_h / 3600;
    const log = syntheticLog(2160, 10, (t) => 180 + rate * t, 0.005, 21);
    const fit = fitRate(log.time_s, log.value, { start_s: 0, end_s: 1e9 });
    const measured = measuredHeatLeak({
      method: "weighing",
      rate: fit.rate,
      rateStdError: fit.rateStdError,
      cryogen: "helium-4",
      capacity_L: 250,
    });
    expect(Math.abs(measured.measuredHeatLeak_W - 1)).toBeLessThan(3 * measured.measuredHeatLeakStdError_W);
    expect(measured.evaporationRate_percent_per_day).toBeCloseTo(predicted.evaporationRate_percent_per_day!, 1);
    expect(boilOff({ heat_W: measured.measuredHeatLeak_W, cryogen: "helium-4" }).liquidVolume_L_per_h).toBeCloseTo(1.39, 1);
    expect(measured.warnings).toEqual([]);
  });

  it("undoes the helium vented-gas factor: a scale sees 0.866 of the evaporated mass", () => {
    const evaporated_kg_per_s = boilOff({ heat_W: 1, cryogen: "helium-4" }).evaporatedMass_kg_per_h / 3600;
    const measured = measuredHeatLeak({ method: "weighing", rate: -0.866 * evaporated_kg_per_s, rateStdError: 0, cryogen: "helium-4" });
    expect(measured.measuredHeatLeak_W).toBeCloseTo(1, 3);
  });

  it("round-trips vent flow and level readings for nitrogen (vented-gas factor 0.994)", () => {
    const predicted = boilOff({ heat_W: 5, cryogen: "nitrogen", capacity_L: 180 });
    const fromFlow = measuredHeatLeak({
      method: "vent-flow",
      rate: predicted.ventFlow_standard_L_per_min,
      rateStdError: 0.01,
      cryogen: "nitrogen",
    });
    expect(fromFlow.measuredHeatLeak_W).toBeCloseTo(5, 10);
    const levelRate_per_s = -predicted.liquidVolume_L_per_h / 180 / 3600;
    const fromLevel = measuredHeatLeak({ method: "level", rate: levelRate_per_s, rateStdError: 0, cryogen: "nitrogen", capacity_L: 180 });
    expect(fromLevel.measuredHeatLeak_W).toBeCloseTo(5, 10);
    expect(fromLevel.evaporationRate_percent_per_day).toBeCloseTo(-levelRate_per_s * 86_400 * 100, 10);
    expect(predicted.ventedGasFactor).toBeCloseTo(0.994, 3);
  });

  it("scales the standard error by the same factor as the heat", () => {
    const a = measuredHeatLeak({ method: "weighing", rate: -2e-5, rateStdError: 1e-7, cryogen: "nitrogen" });
    expect(a.measuredHeatLeakStdError_W / a.measuredHeatLeak_W).toBeCloseTo(1e-7 / 2e-5, 12);
  });

  it("warns when the mass rises instead of falling", () => {
    const result = measuredHeatLeak({ method: "weighing", rate: 1e-6, rateStdError: 1e-7, cryogen: "nitrogen" });
    expect(result.measuredHeatLeak_W).toBeLessThan(0);
    expect(result.warnings[0]).toContain("rises");
  });

  it("reports, but does not correct for, a low barometer", () => {
    // Clapeyron slope of helium 0.01053 K/kPa (see fluids.test.ts): at 95 kPa the bath sits
    // 6.325 kPa × 0.01053 K/kPa ≈ 0.0666 K below 4.222 K.
    const plain = measuredHeatLeak({ method: "weighing", rate: -4e-5, rateStdError: 1e-7, cryogen: "helium-4" });
    const low = measuredHeatLeak({ method: "weighing", rate: -4e-5, rateStdError: 1e-7, cryogen: "helium-4", barometricPressure_Pa: 95_000 });
    expect(low.measuredHeatLeak_W).toBe(plain.measuredHeatLeak_W);
    expect(low.barometricCorrectionApplied).toBe(false);
    expect(low.saturationTemperatureShift_K).toBeCloseTo(-0.0666, 3);
    expect(low.warnings.join(" ")).toContain("not corrected");
  });

  it.each<[string, Record<string, unknown>]>([
    ["method", { method: "scale" }],
    ["rate", { rate: Number.POSITIVE_INFINITY }],
    ["rateStdError", { rateStdError: -1 }],
    ["capacity_L", { method: "level", capacity_L: undefined }],
    ["barometricPressure_Pa", { barometricPressure_Pa: 10 }],
    ["cryogen", { cryogen: "air" }],
  ])("refuses a bad %s", (field, override) => {
    const input = { method: "weighing", rate: -1e-5, rateStdError: 1e-7, cryogen: "nitrogen", capacity_L: 100, ...override };
    const error = thrownUnchecked(() => measuredHeatLeak(input as Parameters<typeof measuredHeatLeak>[0]));
    expect(error).toBeInstanceOf(ThermalInputError);
    expect(error.field).toBe(field);
  });
});

describe("measuredHeatLeak: barometric correction", () => {
  // Invented case: 200 kg of liquid nitrogen, the barometer rising 100 Pa/h (1 hPa/h) ± 10 Pa/h,
  // boil-off 2e-5 kg/s vented ± 1e-7 kg/s.
  const base = { method: "weighing" as const, rate: -2e-5, rateStdError: 1e-7, cryogen: "nitrogen" as const };
  const rising = { slope_Pa_per_s: 100 / 3600, stdError_Pa_per_s: 10 / 3600 };

  it("matches a hand calculation for liquid nitrogen: 200 kg, +100 Pa/h gives +0.9502 W", () => {
    // Hand-worked from the fluid table (NIST Chemistry WebBook saturation at 1 atm, from memory:
    // T 77.355 K, ρ_l 806.08, ρ_v 4.6079 kg/m³, h_fg 199.18 kJ/kg, c_p,l 2.041 kJ/(kg·K)):
    // Clapeyron dT/dp = 77.355 × (1/4.6079 − 1/806.08) / 199180 = 77.355 × 0.215778 / 199180
    //   = 8.3801e-5 K/Pa (about 0.084 K/kPa);
    // m·c_p·dT/dp = 200 × 2041 × 8.3801e-5 = 34.208 J/Pa; × 100/3600 Pa/s = 0.95021 W;
    // its standard error 34.208 × 10/3600 = 0.095021 W, in quadrature with the vented heat's.
    const plain = measuredHeatLeak(base);
    const result = measuredHeatLeak({ ...base, pressureTrend: rising, liquidMass_kg: 200 });
    expect(result.barometricCorrectionApplied).toBe(true);
    const c = result.barometricCorrection;
    if (!c.applied) throw new Error("expected the correction to be applied");
    expect(c.saturationTemperatureSlope_K_per_Pa).toBeCloseTo(8.3801e-5, 8);
    expect(c.correction_W).toBeCloseTo(0.95021, 4);
    expect(c.correctionStdError_W).toBeCloseTo(0.095021, 5);
    expect(result.ventedHeatLeak_W).toBe(plain.measuredHeatLeak_W);
    expect(result.measuredHeatLeak_W).toBeCloseTo(plain.measuredHeatLeak_W + 0.95021, 4);
    expect(result.measuredHeatLeakStdError_W).toBeCloseTo(Math.hypot(plain.measuredHeatLeakStdError_W, 0.095021), 5);
  });

  it("adds heat while the pressure rises and takes it off while it falls", () => {
    const up = measuredHeatLeak({ ...base, pressureTrend: rising, liquidMass_kg: 50 });
    const down = measuredHeatLeak({ ...base, pressureTrend: { ...rising, slope_Pa_per_s: -rising.slope_Pa_per_s }, liquidMass_kg: 50 });
    expect(up.measuredHeatLeak_W).toBeGreaterThan(up.ventedHeatLeak_W);
    expect(down.measuredHeatLeak_W).toBeLessThan(down.ventedHeatLeak_W);
  });

  it("gives no correction for a flat barometer, and only its slope's uncertainty", () => {
    const flat = measuredHeatLeak({ ...base, pressureTrend: { slope_Pa_per_s: 0, stdError_Pa_per_s: 0 }, liquidMass_kg: 200 });
    expect(flat.barometricCorrectionApplied).toBe(true);
    expect(flat.measuredHeatLeak_W).toBe(flat.ventedHeatLeak_W);
    expect(flat.measuredHeatLeakStdError_W).toBe(flat.ventedHeatLeakStdError_W);
  });

  it("keeps the vented heat and says why when the trend or the liquid mass is unknown", () => {
    const noMass = measuredHeatLeak({ ...base, pressureTrend: rising });
    expect(noMass.barometricCorrection).toEqual({ applied: false, reason: expect.stringContaining("liquid mass") });
    expect(noMass.measuredHeatLeak_W).toBe(noMass.ventedHeatLeak_W);
    const noTrend = measuredHeatLeak({ ...base, liquidMass_kg: 200 });
    expect(noTrend.barometricCorrection).toEqual({ applied: false, reason: expect.stringContaining("barometer") });
  });

  it("warns when the barometer moves faster than weather (over 1 kPa/h)", () => {
    const fast = measuredHeatLeak({ ...base, pressureTrend: { slope_Pa_per_s: 0.5, stdError_Pa_per_s: 0 }, liquidMass_kg: 10 });
    expect(fast.warnings.join(" ")).toContain("faster than weather");
  });

  it.each<[string, Record<string, unknown>]>([
    ["liquidMass_kg", { liquidMass_kg: 0 }],
    ["pressureTrend.slope_Pa_per_s", { pressureTrend: { slope_Pa_per_s: Number.NaN, stdError_Pa_per_s: 0 } }],
    ["pressureTrend.stdError_Pa_per_s", { pressureTrend: { slope_Pa_per_s: 0, stdError_Pa_per_s: -1 } }],
  ])("refuses a bad %s", (field, override) => {
    const input = { ...base, pressureTrend: rising, liquidMass_kg: 10, ...override };
    expect(thrownUnchecked(() => measuredHeatLeak(input as Parameters<typeof measuredHeatLeak>[0])).field).toBe(field);
  });

  it("is linear in the pressure slope and in the liquid mass (property)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...CRYOGEN_IDS),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (cryogen, slope, mass, k) => {
          const at = (s: number, m: number) => {
            const c = measuredHeatLeak({ ...base, cryogen, pressureTrend: { slope_Pa_per_s: s, stdError_Pa_per_s: 0 }, liquidMass_kg: m }).barometricCorrection;
            if (!c.applied) throw new Error("expected the correction to be applied");
            return c.correction_W;
          };
          const a = at(slope, mass);
          const tolerance = 1e-12 * Math.abs(k * a) + 1e-300;
          return Math.abs(at(k * slope, mass) - k * a) <= tolerance && Math.abs(at(slope, k * mass) - k * a) <= tolerance;
        },
      ),
    );
  });
});

describe("compareWithPrediction", () => {
  it("gives the ratio and its standard error, e.g. a test running 40 % over its prediction (invented demo)", () => {
    const comparison = compareWithPrediction({ measured_W: 1.4, measuredStdError_W: 0.05, predicted_W: 1 });
    expect(comparison.ratio).toBeCloseTo(1.4, 12);
    expect(comparison.ratioStdError).toBeCloseTo(0.05, 12);
  });

  it("refuses a prediction of zero", () => {
    expect(thrownUnchecked(() => compareWithPrediction({ measured_W: 1, measuredStdError_W: 0, predicted_W: 0 })).field).toBe("predicted_W");
  });
});
