import { z } from "zod";
import { ThermalInputError } from "../thermal";

/**
 * Building blocks of the engine's input schemas. Every message reads "<field path> must be
 * <allowed>" in the same words as the engine's ThermalInputError (shared/thermal/errors.ts),
 * so a 400 from the schema and an error from the engine say the same thing.
 */

/** ["layup", 2, "layers"] → "layup[2].layers", the engine's own field-path style. */
export function fieldPath(path: readonly PropertyKey[] | undefined): string {
  let out = "";
  for (const key of path ?? []) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out === "" ? "value" : out;
}

/** "layup[2].reflector.points[1][0]" → ["layup", 2, "reflector", "points", 1, 0]. */
export function pathOfField(field: string): (string | number)[] {
  const path: (string | number)[] = [];
  for (const match of field.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) path.push(match[2] !== undefined ? Number(match[2]) : match[1]);
  return path;
}

/** The error option that words every issue of one field alike. */
export function must(allowed: string) {
  return { error: (issue: { path?: PropertyKey[] }) => `${fieldPath(issue.path)} must be ${allowed}` };
}

const withUnit = (unit: string) => (unit ? ` ${unit}` : "");

/** As the engine's requireAbove: a finite number strictly above min. */
export function above(min: number, unit = "") {
  const m = must(`a number above ${min}${withUnit(unit)}`);
  return z.number(m).gt(min, m);
}

/** As requireAtLeast. */
export function atLeast(min: number, unit = "") {
  const m = must(`a number of at least ${min}${withUnit(unit)}`);
  return z.number(m).min(min, m);
}

/** As requireInRange. */
export function inRange(min: number, max: number, unit = "") {
  const m = must(`a number from ${min} to ${max}${withUnit(unit)}`);
  return z.number(m).min(min, m).max(max, m);
}

/** As requireWhole. */
export function whole(min: number, max: number) {
  const m = must(`a whole number from ${min} to ${max}`);
  return z.number(m).int(m).min(min, m).max(max, m);
}

/** As the engine's "one of a, b, c" for a named set. */
export function oneOf<const T extends readonly string[]>(values: T) {
  return z.enum(values, must(`one of ${values.join(", ")}`));
}

/** A fraction in (0, 1], for accommodation coefficients and contact factors, in the engine's words. */
export function aboveZeroAtMostOne(allowed: string) {
  const m = must(allowed);
  return z.number(m).gt(0, m).lte(1, m);
}

export const EmissivityValueSchema = aboveZeroAtMostOne("an emissivity above 0 and at most 1");

// Power-law exponents beyond ±5 are typos, not surfaces (the engine's emissivity.ts). A table's
// temperatures must rise strictly; that cross-element rule is left to the engine (engineCheck).
const PowerLawSchema = z.object({
  kind: z.literal("power"),
  reference: EmissivityValueSchema,
  referenceTemperature_K: above(0, "K"),
  exponent: inRange(-5, 5),
});

const TableSchema = z.object({
  kind: z.literal("table"),
  points: z
    .array(z.tuple([above(0, "K"), EmissivityValueSchema], must("a pair [temperature_K, emissivity]")), must("a non-empty list of [temperature_K, emissivity] points"))
    .min(1, must("a non-empty list of [temperature_K, emissivity] points")),
});

/** A constant, a power law or a table: the engine's Emissivity. */
export const EmissivitySchema = z.union(
  [EmissivityValueSchema, z.discriminatedUnion("kind", [PowerLawSchema, TableSchema], must('"power" or "table"'))],
  must('an emissivity above 0 and at most 1, or { kind: "power" | "table", … }'),
);

/**
 * Arguments for .superRefine that run an engine check inside a schema and turn its
 * ThermalInputError into an issue at the field it names, in the engine's words: cross-field
 * rules (stage order, support ends, fit ranges, sorted tables) are written once, in the engine.
 * The message is worded when the issue is final, so it carries the full path even when the
 * schema is nested in a request body.
 */
export function engineCheck<T>(check: (value: T) => void) {
  // The issue's `inst` supplies its error map; zod calls it with the issue's final path.
  const wording = z.never({ error: (issue) => `${fieldPath(issue.path)} must be ${(issue as { params?: { allowed?: string } }).params?.allowed ?? "valid"}` });
  return [
    (value: T, ctx: z.RefinementCtx<T>) => {
      try {
        check(value);
      } catch (error) {
        if (!(error instanceof ThermalInputError)) throw error;
        ctx.addIssue({ code: "custom", path: pathOfField(error.field), params: { allowed: error.allowed }, inst: wording });
      }
    },
    // Only once the shape is clean: the engine would otherwise repeat a range issue zod already raised.
    { when: (payload: { issues: unknown[] }) => payload.issues.length === 0 },
  ] as const;
}
