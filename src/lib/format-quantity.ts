import { fromSi, toSi, unitLabel, type QuantityKind, type UnitSystem } from "../../shared/units";

/**
 * One way to show a quantity: convert from SI for display only, three significant figures
 * (the engine's inputs are rarely known better), the unit always written after the number.
 */
const shown = new Intl.NumberFormat("en-US", { maximumSignificantDigits: 3 });
const precise = new Intl.NumberFormat("en-US", { maximumSignificantDigits: 5 });

export function formatNumber(value: number, digits: 3 | 5 = 3): string {
  if (!Number.isFinite(value)) return value > 0 ? "∞" : "—";
  return (digits === 5 ? precise : shown).format(value);
}

export function formatQuantity(kind: QuantityKind, siValue: number | null | undefined, system: UnitSystem, digits: 3 | 5 = 3): string {
  if (siValue == null || Number.isNaN(siValue)) return "—";
  return `${formatNumber(fromSi(kind, siValue, system), digits)} ${unitLabel(kind, system)}`;
}

/** The value an input shows: plain digits (no grouping) so the user can edit it as typed. */
export function inputText(kind: QuantityKind | null, siValue: unknown, system: UnitSystem): string {
  if (typeof siValue !== "number" || !Number.isFinite(siValue)) return "";
  const v = kind ? fromSi(kind, siValue, system) : siValue;
  return String(Number(v.toPrecision(6)));
}

/**
 * Typed text → the SI number the form keeps. Empty is `empty` (undefined or null, as the field
 * allows); anything that is not a number is NaN, so the schema's own message says what is allowed.
 */
export function parseInput(kind: QuantityKind | null, text: string, system: UnitSystem, empty: null | undefined): number | null | undefined {
  const trimmed = text.trim().replace(",", ".");
  if (trimmed === "") return empty;
  const n = Number(trimmed);
  if (!Number.isFinite(n)) return Number.NaN;
  return kind ? toSi(kind, n, system) : n;
}

const RANGE = /(from|above) (-?[\d.]+(?:e[+-]?\d+)?)(?: to| and at most) (-?[\d.]+(?:e[+-]?\d+)?)/;

/**
 * The shared schemas word their ranges in SI; a US-customary user also gets the same range in
 * the units they type in, appended, so the message still names the field and the allowed range.
 */
export function localizeRange(message: string, kind: QuantityKind | null, system: UnitSystem): string {
  if (system === "si" || kind === null) return message;
  const m = RANGE.exec(message);
  if (!m || unitLabel(kind, "si") === unitLabel(kind, "us")) return message;
  const [, word, lo, hi] = m;
  const a = formatNumber(fromSi(kind, Number(lo), system), 5);
  const b = formatNumber(fromSi(kind, Number(hi), system), 5);
  const unit = unitLabel(kind, system);
  return `${message} (${word === "above" ? `above ${a} and at most ${b}` : `from ${a} to ${b}`} ${unit})`;
}
