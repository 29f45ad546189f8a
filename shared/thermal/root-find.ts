import { ThermalInputError } from "./errors";

const MAX_ITERATIONS = 200;

/**
 * A root of f in [a, b], where f(a) and f(b) differ in sign, by Brent's method: inverse
 * quadratic interpolation and secant steps, falling back to bisection whenever they would
 * leave the bracket or converge too slowly, so it never does worse than bisection and
 * tolerates a function that is only sign-correct (R. P. Brent, Algorithms for Minimization
 * without Derivatives, 1973, ch. 4, procedure zero; as "zeroin" in Forsythe, Malcolm & Moler,
 * Computer Methods for Mathematical Computations, 1977, Sec. 7.2).
 * Stops when the bracket is narrower than 2·(2ε|x| + tolerance) or f hits 0 exactly.
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, tolerance = 0): number {
  if (!Number.isFinite(a) || !Number.isFinite(b)) throw new ThermalInputError("bracket", [a, b], "two finite numbers");
  if (!(tolerance >= 0)) throw new ThermalInputError("tolerance", tolerance, "a number of at least 0");
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(fa * fb < 0)) {
    throw new ThermalInputError("bracket", [a, b], "an interval over which the function changes sign");
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m;
      e = m;
    } else {
      let s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s; // secant
        q = 1 - s;
      } else {
        const r = fb / fc; // inverse quadratic interpolation
        q = fa / fc;
        p = s * (2 * m * q * (q - r) - (b - a) * (r - 1));
        q = (q - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      s = e;
      e = d;
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * s * q)) {
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  // Brent's bound is about (log2 of the bracket over the tolerance)² steps; 200 covers any double bracket.
  return b;
}
