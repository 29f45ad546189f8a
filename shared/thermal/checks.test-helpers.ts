import { expect } from "vitest";
import { ThermalInputError } from "./errors";

/**
 * Test-only (imported by *.test.ts and *.property.test.ts, never by the engine): the small
 * checks the engine's tests share. The variants differ on purpose and are kept apart by name:
 * which magnitude a tolerance is relative to, and whether a thrown error's class is asserted.
 */

/** |actual − expected| / |expected|. */
export function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

/** Asserts |actual − expected| ≤ relative·|expected|: the tolerance scales with the expected value. */
export function expectClose(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}

/** For fast-check predicates: |a − b| ≤ relative·max(|a|, |b|) + absolute. */
export function nearlyEqual(a: number, b: number, relative = 1e-12, absolute = 0): boolean {
  return Math.abs(a - b) <= relative * Math.max(Math.abs(a), Math.abs(b)) + absolute;
}

/** As nearlyEqual without an absolute term, but the scale never drops below 1e-300, so two tiny values are not compared on a vanishing tolerance. */
export function nearlyEqualAboveTiny(a: number, b: number, relative = 1e-12): boolean {
  return Math.abs(a - b) <= relative * Math.max(Math.abs(a), Math.abs(b), 1e-300);
}

/** Runs `run`, asserts that it threw a ThermalInputError and returns it. */
export function thrownInputError(run: () => unknown): ThermalInputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(ThermalInputError);
    return error as ThermalInputError;
  }
  throw new Error("expected a ThermalInputError");
}

/** Runs `run` and returns what it threw, typed as a ThermalInputError without checking its class. */
export function thrownUnchecked(run: () => unknown): ThermalInputError {
  try {
    run();
  } catch (error) {
    return error as ThermalInputError;
  }
  throw new Error("expected a ThermalInputError");
}

/** The field named by the ThermalInputError that `run` throws (its class asserted). */
export function fieldOf(run: () => unknown): string {
  return thrownInputError(run).field;
}
