/**
 * SI ↔ US customary for display and CSV; the engine stays SI. Factors are the exact or
 * recommended values of NIST SP 811 (2008 ed.), Appendix B.8/B.9; "exact" marks definitions.
 */
export type UnitSystem = "si" | "us";

interface UnitPair {
  si: string;
  us: string;
  /** us = si × factor + offset */
  factor: number;
  offset?: number;
}

const FT_M = 0.3048; // exact
const IN_M = 0.0254; // exact
const LB_KG = 0.45359237; // exact
const GAL_L = 3.785411784; // US gallon, exact
const BTU_PER_H_W = 0.29307107; // Btu_IT/h in W, NIST SP 811 B.9
const TORR_PA = 101325 / 760; // exact by definition of the torr
const PSI_PA = 6894.757; // lbf/in², NIST SP 811 B.9

export const QUANTITIES = {
  temperature: { si: "K", us: "°F", factor: 9 / 5, offset: -459.67 },
  temperatureDifference: { si: "K", us: "°F", factor: 9 / 5 },
  heat: { si: "W", us: "Btu/h", factor: 1 / BTU_PER_H_W },
  heatFlux: { si: "W/m²", us: "Btu/(h·ft²)", factor: (FT_M * FT_M) / BTU_PER_H_W },
  length: { si: "m", us: "in", factor: 1 / IN_M },
  area: { si: "m²", us: "ft²", factor: 1 / (FT_M * FT_M) },
  volume: { si: "L", us: "gal", factor: 1 / GAL_L },
  volumePerDay: { si: "L/day", us: "gal/day", factor: 1 / GAL_L },
  mass: { si: "kg", us: "lb", factor: 1 / LB_KG },
  massPerDay: { si: "kg/day", us: "lb/day", factor: 1 / LB_KG },
  arealMass: { si: "kg/m²", us: "lb/ft²", factor: (FT_M * FT_M) / LB_KG },
  pressure: { si: "Pa", us: "torr", factor: 1 / TORR_PA },
  gaugePressure: { si: "Pa", us: "psi", factor: 1 / PSI_PA },
  layerDensity: { si: "layers/cm", us: "layers/in", factor: 2.54 },
  costPerArea: { si: "per m²", us: "per ft²", factor: FT_M * FT_M },
  duration: { si: "h", us: "h", factor: 1 },
  percentPerDay: { si: "%/day", us: "%/day", factor: 1 },
} satisfies Record<string, UnitPair>;
export type QuantityKind = keyof typeof QUANTITIES;

export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return QUANTITIES[kind][system];
}

/** SI value → the value shown in the chosen system. */
export function fromSi(kind: QuantityKind, siValue: number, system: UnitSystem): number {
  if (system === "si") return siValue;
  const q: UnitPair = QUANTITIES[kind];
  return siValue * q.factor + (q.offset ?? 0);
}

/** A value typed in the chosen system → SI. */
export function toSi(kind: QuantityKind, value: number, system: UnitSystem): number {
  if (system === "si") return value;
  const q: UnitPair = QUANTITIES[kind];
  return (value - (q.offset ?? 0)) / q.factor;
}
