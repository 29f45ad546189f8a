import type { TestMethod } from "../../../../shared/schemas/boil-off-test";

/**
 * The one figure per method the barometric correction needs for the liquid mass and that the
 * test page lets people set later: the empty vessel's mass (weighing) or the starting fill
 * (vent flow). A level gauge reads the liquid itself, so it needs neither.
 */
export const LIQUID_MASS_FIGURES = {
  weighing: { name: "tareMass_kg", label: "Empty vessel mass" },
  "vent-flow": { name: "fillFraction", label: "Starting fill fraction" },
} as const;
export type LiquidMassMethod = keyof typeof LIQUID_MASS_FIGURES;

export const needsLiquidMassFigure = (method: TestMethod): method is LiquidMassMethod => method in LIQUID_MASS_FIGURES;

/** The panel's title, which the comparison's "Not applied" reason names. */
export const LIQUID_MASS_TITLE = "Liquid in the vessel";

export const liquidMassFieldId = (testId: string) => `liquid-mass-${testId}`;

/** Brings the field into view with the caret in it (from the comparison's pointer). */
export function focusLiquidMassField(testId: string) {
  const field = document.getElementById(liquidMassFieldId(testId));
  field?.scrollIntoView({ block: "center" });
  field?.focus({ preventScroll: true });
}
