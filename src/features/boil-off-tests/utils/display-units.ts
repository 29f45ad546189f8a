import { VALUE_UNITS, type Analysis, type TestMethod } from "../../../../shared/schemas/boil-off-test";
import { fromSi, unitLabel, type UnitSystem } from "../../../../shared/units";
import { formatNumber } from "../../../lib/format-quantity";

/**
 * The series as shown: the server keeps kg, standard L/min or % of capacity; a US-customary user
 * sees lb and standard ft³/h (shared/units and the log schema's own factors). Level stays in %.
 */
export function seriesDisplay(method: TestMethod, system: UnitSystem): { factor: number; unit: string } {
  if (system === "us" && method === "weighing") return { factor: fromSi("mass", 1, "us"), unit: unitLabel("mass", "us") };
  if (system === "us" && method === "vent-flow") return { factor: 1 / VALUE_UNITS["standard-ft3/h"].factor, unit: "standard ft³/h" };
  return { factor: 1, unit: { weighing: "kg", "vent-flow": "standard L/min", level: "% of capacity" }[method] };
}

/**
 * The fitted boil-off signal as a person reads it: mass lost per hour, mean vent flow, or level
 * fall per hour. Weighing and level slopes are negative while the vessel boils off.
 */
export function rateDisplay(a: Pick<Analysis, "method">, system: UnitSystem): { factor: number; unit: string } {
  const s = seriesDisplay(a.method, system);
  if (a.method === "vent-flow") return s;
  const perHour = 3600 * s.factor;
  return { factor: perHour, unit: a.method === "weighing" ? `${s.unit}/h` : "%/h" };
}

export function formatRate(a: Pick<Analysis, "method">, value: number, system: UnitSystem): string {
  const { factor, unit } = rateDisplay(a, system);
  return `${formatNumber(value * factor, 5)} ${unit}`;
}

/** Seconds from the first reading → hours, the chart's axis. */
export const hours = (seconds: number) => seconds / 3600;
export const formatHours = (seconds: number) => `${formatNumber(seconds / 3600, 5)} h`;
