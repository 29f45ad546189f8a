import { requireAbove, requireWhole, ThermalInputError } from "./errors";

/**
 * Suggests the steady part of a logged boil-off series, for the technician to accept or move.
 *
 * Our method (no published source; a plain heuristic, documented so the UI can explain it):
 * slide a window of w points along the log and fit each window's local slope by least squares;
 * a band around a candidate slope c is max(tolerance·|c|, 3·σ_s), where σ_s is the median
 * standard error of the local slopes, so noise alone never splits a steady run. For candidates
 * spread over the local slopes' distribution, take the longest run of consecutive windows whose
 * slopes stay in the band (ties go to the later run: steady state follows the cool-down), then
 * recentre the band on that run's median slope and take the longest run again. Each local slope
 * stands for the middle of its w points, so the suggestion runs from the middle of the run's
 * first window to the middle of its last (to the log's own end where the run reaches it): a
 * long window's first points would otherwise reach back into a transient.
 */
export interface SteadyWindowOptions {
  /** Points per local-slope window (default n/20, at least 5). */
  windowPoints?: number;
  /** Allowed relative spread of local slopes about the run's median (default 0.1). */
  tolerance?: number;
  /** Fewest points the suggestion may hold (default and minimum 10). */
  minimumPoints?: number;
}

export interface SteadyWindow {
  start_s: number;
  end_s: number;
  startIndex: number;
  /** Inclusive. */
  endIndex: number;
  /** Median local slope in the suggested window, value units per second. */
  localSlope: number;
}

export interface Series {
  time: Float64Array;
  value: Float64Array;
}

/** Validates a logged series: equal lengths, finite numbers, strictly increasing time. */
export function readSeries(time_s: ArrayLike<number>, value: ArrayLike<number>): Series {
  if (time_s === null || typeof time_s !== "object" || typeof time_s.length !== "number") {
    throw new ThermalInputError("time_s", time_s, "an array of times in seconds");
  }
  if (value === null || typeof value !== "object" || typeof value.length !== "number") {
    throw new ThermalInputError("value", value, "an array of logged values");
  }
  if (value.length !== time_s.length) {
    throw new ThermalInputError("value", `${value.length} values`, `as many values as times (${time_s.length})`);
  }
  const time = Float64Array.from(time_s);
  const values = Float64Array.from(value);
  for (let i = 0; i < time.length; i++) {
    if (!Number.isFinite(time[i])) throw new ThermalInputError(`time_s[${i}]`, time_s[i], "a finite time in seconds");
    if (!Number.isFinite(values[i])) throw new ThermalInputError(`value[${i}]`, value[i], "a finite number");
    if (i > 0 && time[i] <= time[i - 1]) {
      throw new ThermalInputError(`time_s[${i}]`, time[i], `a time after time_s[${i - 1}] (${time[i - 1]} s)`);
    }
  }
  return { time, value: values };
}

export function suggestSteadyWindow(
  time_s: ArrayLike<number>,
  value: ArrayLike<number>,
  options: SteadyWindowOptions = {},
): SteadyWindow {
  const series = readSeries(time_s, value);
  const n = series.time.length;
  const minimumPoints =
    options.minimumPoints === undefined ? 10 : requireWhole("options.minimumPoints", options.minimumPoints, 10, 1e9);
  if (n < minimumPoints) {
    throw new ThermalInputError("time_s", `${n} points`, `a log of at least ${minimumPoints} points`);
  }
  const windowPoints =
    options.windowPoints === undefined
      ? Math.min(Math.max(Math.round(n / 20), 5), Math.floor(n / 2))
      : requireWhole("options.windowPoints", options.windowPoints, 3, n);
  const tolerance = options.tolerance === undefined ? 0.1 : requireAbove("options.tolerance", options.tolerance, 0);

  const { slopes, stdErrors } = localSlopes(series, windowPoints);
  const noise = median(Array.from(stdErrors));
  const band = (c: number) => Math.max(tolerance * Math.abs(c), 3 * noise);

  const sorted = Array.from(slopes).sort((a, b) => a - b);
  const candidateCount = Math.min(sorted.length, 101);
  let best = { start: 0, length: 0 };
  for (let k = 0; k < candidateCount; k++) {
    const c = sorted[Math.round((k * (sorted.length - 1)) / Math.max(candidateCount - 1, 1))];
    const run = longestRun(slopes, c, band(c));
    if (run.length > best.length || (run.length === best.length && run.start > best.start)) best = run;
  }
  const centre = median(Array.from(slopes.subarray(best.start, best.start + best.length)));
  const refined = longestRun(slopes, centre, band(centre));
  if (refined.length >= best.length) best = refined;

  // A local slope speaks for the middle of its w points, so the steady part runs from the middle
  // of the run's first window to the middle of its last; a run that reaches either end of the log
  // takes the log to that end.
  const half = Math.floor(windowPoints / 2);
  const lastWindow = slopes.length - 1;
  const runEnd = best.start + best.length - 1;
  let startIndex = best.start === 0 ? 0 : best.start + half;
  let endIndex = runEnd === lastWindow ? n - 1 : runEnd + half;
  while (endIndex - startIndex + 1 < minimumPoints) {
    if (endIndex < n - 1) endIndex++;
    if (endIndex - startIndex + 1 < minimumPoints && startIndex > 0) startIndex--;
  }
  return {
    start_s: series.time[startIndex],
    end_s: series.time[endIndex],
    startIndex,
    endIndex,
    localSlope: median(Array.from(slopes.subarray(best.start, best.start + best.length))),
  };
}

/** Least-squares slope and its standard error of every run of w consecutive points, O(n). */
function localSlopes(series: Series, w: number): { slopes: Float64Array; stdErrors: Float64Array } {
  const n = series.time.length;
  const t0 = series.time[0];
  const y0 = series.value[0];
  const st = new Float64Array(n + 1);
  const stt = new Float64Array(n + 1);
  const sy = new Float64Array(n + 1);
  const sty = new Float64Array(n + 1);
  const syy = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) {
    const t = series.time[i] - t0; // offsets keep the prefix sums well conditioned
    const y = series.value[i] - y0;
    st[i + 1] = st[i] + t;
    stt[i + 1] = stt[i] + t * t;
    sy[i + 1] = sy[i] + y;
    sty[i + 1] = sty[i] + t * y;
    syy[i + 1] = syy[i] + y * y;
  }
  const m = n - w + 1;
  const slopes = new Float64Array(m);
  const stdErrors = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const j = i + w;
    const sT = st[j] - st[i];
    const sY = sy[j] - sy[i];
    const sxx = stt[j] - stt[i] - (sT * sT) / w;
    const sxy = sty[j] - sty[i] - (sT * sY) / w;
    const s_yy = syy[j] - syy[i] - (sY * sY) / w;
    const slope = sxy / sxx;
    slopes[i] = slope;
    const sse = Math.max(0, s_yy - slope * sxy);
    stdErrors[i] = w > 2 ? Math.sqrt(sse / (w - 2) / sxx) : 0;
  }
  return { slopes, stdErrors };
}

function longestRun(slopes: Float64Array, centre: number, halfWidth: number): { start: number; length: number } {
  let best = { start: 0, length: 0 };
  let runStart = -1;
  for (let i = 0; i <= slopes.length; i++) {
    const inside = i < slopes.length && Math.abs(slopes[i] - centre) <= halfWidth;
    if (inside && runStart < 0) runStart = i;
    if (!inside && runStart >= 0) {
      const length = i - runStart;
      if (length >= best.length) best = { start: runStart, length };
      runStart = -1;
    }
  }
  return best;
}

function median(values: number[]): number {
  if (values.length === 0) return 0;
  const sorted = values.slice().sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}
