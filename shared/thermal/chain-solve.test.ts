import { describe, expect, it } from "vitest";
import { solveChain } from "./chain-solve";
import { ThermalConvergenceError } from "./convergence-error";

describe("solveChain", () => {
  it("solves conductances in series", () => {
    // Resistances in series (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
    // Sec. 3.1.3): conductances 1, 2 and 4 W/K across 70 K carry Q = 70/(1 + 1/2 + 1/4) = 40 W,
    // so the drops are 40, 20 and 10 K: the nodes sit 30 K and 10 K above the cold end.
    const conductance = [1, 2, 4];
    const u = [70, 35, 35, 0];
    solveChain(u, (x, q, dWarm, dCold) => {
      for (let g = 0; g < 3; g++) {
        q[g] = conductance[g] * (x[g] - x[g + 1]);
        dWarm[g] = conductance[g];
        dCold[g] = -conductance[g];
      }
    }, "test chain");
    expect(u[1]).toBeCloseTo(30, 12);
    expect(u[2]).toBeCloseTo(10, 12);
  });

  it("throws ThermalConvergenceError naming the solve when the gaps cannot balance", () => {
    // Each gap insists on its own heat whatever the temperatures: no solution exists.
    const u = [10, 5, 0];
    const run = () =>
      solveChain(u, (_x, q, dWarm, dCold) => {
        for (let g = 0; g < 2; g++) {
          q[g] = g + 1;
          dWarm[g] = 0;
          dCold[g] = 0;
        }
      }, "Impossible chain");
    expect(run).toThrow(ThermalConvergenceError);
    expect(run).toThrow(/Impossible chain did not converge/);
  });
});
