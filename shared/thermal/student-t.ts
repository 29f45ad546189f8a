import { requireAbove, ThermalInputError } from "./errors";

/**
 * Student's t distribution for the confidence interval of a fitted boil-off rate.
 *
 * CDF through the regularized incomplete beta function, P(|T| > t) = I_x(ν/2, 1/2) with
 * x = ν/(ν + t²) (Abramowitz & Stegun, Handbook of Mathematical Functions, 26.7.1 and 26.5.27),
 * evaluated by its continued fraction with the modified Lentz method and ln Γ by the Lanczos
 * approximation (Press et al., Numerical Recipes, 3rd ed., §6.1 and §6.4). The quantile inverts
 * the CDF by bisection, which is slow-ish but cannot fail to converge.
 */

const LANCZOS_G = 7;
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x); // reflection
  const z = x - 1;
  let sum = LANCZOS[0];
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i] / (z + i);
  const t = z + LANCZOS_G + 0.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction for I_x(a, b), modified Lentz; converges fast for x < (a + 1)/(a + b + 2). */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 10_000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const step = d * c;
    h *= step;
    if (Math.abs(step - 1) < 1e-16) break;
  }
  return h;
}

function regularizedBeta(a: number, b: number, x: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x),
  );
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** P(T ≤ t) for Student's t with ν degrees of freedom. */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  const nu = requireAbove("degreesOfFreedom", degreesOfFreedom, 0);
  if (!Number.isFinite(t)) {
    if (Number.isNaN(t)) throw new ThermalInputError("t", t, "a number");
    return t > 0 ? 1 : 0;
  }
  const tail = 0.5 * regularizedBeta(nu / 2, 0.5, nu / (nu + t * t));
  return t >= 0 ? 1 - tail : tail;
}

/** The t with P(T ≤ t) = probability, e.g. studentTQuantile(0.975, ν) for a 95 % two-sided interval. */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  if (typeof probability !== "number" || !(probability > 0 && probability < 1)) {
    throw new ThermalInputError("probability", probability, "a probability between 0 and 1 (exclusive)");
  }
  const nu = requireAbove("degreesOfFreedom", degreesOfFreedom, 0);
  if (probability === 0.5) return 0;
  const upper = probability > 0.5;
  const p = upper ? probability : 1 - probability;
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, nu) < p) {
    lo = hi;
    hi *= 2;
  }
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (studentTCdf(mid, nu) < p) lo = mid;
    else hi = mid;
  }
  const t = (lo + hi) / 2;
  return upper ? t : -t;
}
