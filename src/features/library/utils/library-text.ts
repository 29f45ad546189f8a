import type { MaterialKind } from "../../../../shared/schemas/material";
import type { Emissivity } from "../../../../shared/thermal/index";

/** Plain words for each kind, singular and plural, used in filters, tables and headings. */
export const KIND_LABELS: Record<MaterialKind, string> = {
  reflector: "Reflector",
  spacer: "Spacer",
  "wall-finish": "Wall finish",
  "support-material": "Support material",
  "correlation-set": "Correlation set",
  cryogen: "Cryogen",
};

export const SCOPE_LABELS = { seed: "Frostfold seed", organization: "Our library" } as const;

/** Significant figures for display: enough to tell library values apart, never a float's tail. */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return String(value);
  if (value !== 0 && (Math.abs(value) < 1e-3 || Math.abs(value) >= 1e6)) return value.toExponential(Math.max(0, digits - 1)).replace("e", "×10^");
  return String(Number(value.toPrecision(digits)));
}

export const formatRange = (range: { min: number; max: number }) =>
  range.min === range.max ? `${formatNumber(range.min)} K` : `${formatNumber(range.min)} to ${formatNumber(range.max)} K`;

/** An emissivity model in one line, as a reader of a datasheet would write it. */
export function describeEmissivity(model: Emissivity): string {
  if (typeof model === "number") return `${formatNumber(model)} (constant)`;
  if (model.kind === "power") {
    return `${formatNumber(model.reference)} × (T / ${formatNumber(model.referenceTemperature_K)} K)^${formatNumber(model.exponent)} (power law)`;
  }
  const points = model.points.map(([t, e]) => `${formatNumber(t)} K: ${formatNumber(e)}`).join("; ");
  return `table of ${model.points.length} point${model.points.length === 1 ? "" : "s"} (${points})`;
}
