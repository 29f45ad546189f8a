import { VALUE_UNIT_IDS, VALUE_UNITS, type TestMethod, type TestStatus, type ValueUnit } from "../../../../shared/schemas/boil-off-test";

/** The words each method and status goes by on screen. */
export const METHOD_LABELS: Record<TestMethod, string> = {
  weighing: "Weighing",
  "vent-flow": "Vent-gas flowmeter",
  level: "Level gauge",
};

export const METHOD_HINTS: Record<TestMethod, string> = {
  weighing: "The vessel's mass against time, from a scale.",
  "vent-flow": "The vented gas's standard volumetric flow against time; state the flowmeter's reference conditions.",
  level: "The liquid level against time; the vessel's capacity turns it into litres.",
};

export const STATUS_LABELS: Record<TestStatus, string> = { logging: "Awaiting log", analysed: "Analysed", accepted: "Accepted" };

export const unitsForMethod = (method: TestMethod): ValueUnit[] => VALUE_UNIT_IDS.filter((u) => VALUE_UNITS[u].method === method);
