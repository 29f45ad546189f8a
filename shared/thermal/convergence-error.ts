/**
 * Thrown when an iterative solve of the engine (shield temperatures with temperature-dependent
 * emissivity, layer temperatures of a blanket) stops short of its tolerance. Unlike
 * ThermalInputError every single input was in range; the combination defeated the solver, so
 * the message says what was being solved and how far it got.
 */
export class ThermalConvergenceError extends Error {
  readonly iterations: number;
  readonly relativeChange: number;

  constructor(what: string, iterations: number, relativeChange: number) {
    super(
      `${what} did not converge within ${iterations} iterations ` +
        `(last relative change ${relativeChange.toExponential(2)}); check for emissivity tables ` +
        "with very steep steps or extreme inputs",
    );
    this.name = "ThermalConvergenceError";
    this.iterations = iterations;
    this.relativeChange = relativeChange;
  }
}
