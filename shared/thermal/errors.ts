/**
 * The engine's one error type. Every public function validates its input and throws this,
 * naming the field path, the value it got and the range it accepts, so the API can turn it
 * into a 400 with the same words the form shows.
 */
export class ThermalInputError extends Error {
  readonly field: string;
  readonly value: unknown;
  readonly allowed: string;

  constructor(field: string, value: unknown, allowed: string) {
    super(`${field} must be ${allowed} (got ${formatValue(value)})`);
    this.name = "ThermalInputError";
    this.field = field;
    this.value = value;
    this.allowed = allowed;
  }
}

function formatValue(value: unknown): string {
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : String(value);
  if (value === undefined) return "nothing";
  try {
    return JSON.stringify(value);
  } catch {
    return String(value);
  }
}

/** Throws unless value is a finite number strictly above min. */
export function requireAbove(field: string, value: unknown, min: number, unit = ""): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= min) {
    throw new ThermalInputError(field, value, `a number above ${min}${unit ? ` ${unit}` : ""}`);
  }
  return value;
}

/** Throws unless value is a finite number in [min, max]. */
export function requireInRange(field: string, value: unknown, min: number, max: number, unit = ""): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < min || value > max) {
    throw new ThermalInputError(field, value, `a number from ${min} to ${max}${unit ? ` ${unit}` : ""}`);
  }
  return value;
}

/** Throws unless value is a whole number in [min, max]. */
export function requireWhole(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== "number" || !Number.isInteger(value) || value < min || value > max) {
    throw new ThermalInputError(field, value, `a whole number from ${min} to ${max}`);
  }
  return value;
}

/** Emissivity of a gray surface: in (0, 1]. */
export function requireEmissivityValue(field: string, value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0 || value > 1) {
    throw new ThermalInputError(field, value, "an emissivity above 0 and at most 1");
  }
  return value;
}

/** Stefan–Boltzmann constant, CODATA 2018 exact-derived value, W/(m²·K⁴). */
export const STEFAN_BOLTZMANN_W_PER_M2_K4 = 5.670374419e-8;

/** Throws unless value is a finite number at or above min (a heat of 0 W or a pressure of 0 torr is allowed). */
export function requireAtLeast(field: string, value: unknown, min: number, unit = ""): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < min) {
    throw new ThermalInputError(field, value, `a number of at least ${min}${unit ? ` ${unit}` : ""}`);
  }
  return value;
}
