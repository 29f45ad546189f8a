import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { EnclosureSurface, solveEnclosure } from "./enclosure";

/**
 * A random closed enclosure: a symmetric matrix of exchange areas W_ij = A_i·F_ij (zero or
 * positive, W_ii allowed for concave surfaces), areas A_i = Σ_j W_ij, F_ij = W_ij/A_i. Summation
 * and reciprocity then hold by construction (Incropera et al., 6th ed., Sec. 13.1.2). Every
 * off-diagonal W is positive so that each surface sees every other one.
 */
const enclosure = fc.integer({ min: 2, max: 8 }).chain((n) =>
  fc.record({
    exchange: fc.array(fc.double({ min: 0.05, max: 5, noNaN: true }), { minLength: n * n, maxLength: n * n }),
    selfViewing: fc.array(fc.oneof(fc.constant(0), fc.double({ min: 0, max: 3, noNaN: true })), { minLength: n, maxLength: n }),
    emissivities: fc.array(fc.double({ min: 0.02, max: 1, noNaN: true }), { minLength: n, maxLength: n }),
    temperatures: fc.array(fc.double({ min: 4, max: 2000, noNaN: true }), { minLength: n, maxLength: n }),
    roles: fc.array(fc.constantFrom("temperature", "heat", "reradiating"), { minLength: n, maxLength: n }),
  }).map(({ exchange, selfViewing, emissivities, temperatures, roles }) => {
    const w = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? selfViewing[i] : exchange[Math.min(i, j) * n + Math.max(i, j)])));
    const areas = w.map((row) => row.reduce((sum, x) => sum + x, 0));
    const viewFactors = w.map((row, i) => row.map((x) => x / areas[i]));
    roles[0] = "temperature"; // at least one surface of known temperature
    return { n, areas, viewFactors, emissivities, temperatures, roles };
  }),
);

function allKnown(e: { areas: number[]; viewFactors: number[][]; emissivities: number[]; temperatures: number[] }) {
  return solveEnclosure({
    surfaces: e.areas.map((area_m2, i) => ({ area_m2, emissivity: e.emissivities[i], temperature_K: e.temperatures[i] })),
    viewFactors: e.viewFactors,
  });
}

describe("solveEnclosure laws", () => {
  it("the net heats of an enclosure sum to zero", () => {
    fc.assert(
      fc.property(enclosure, (e) => {
        const { surfaces } = allKnown(e);
        const total = surfaces.reduce((sum, s) => sum + s.netHeat_W, 0);
        const scale = surfaces.reduce((sum, s) => sum + Math.abs(s.netHeat_W), 0);
        expect(Math.abs(total)).toBeLessThanOrEqual(1e-9 * scale + 1e-12);
      }),
    );
  });

  it("a surface given the net heat it carries at a temperature comes back at that temperature", () => {
    fc.assert(
      fc.property(enclosure, (e) => {
        const base = allKnown(e).surfaces;
        const mixed: EnclosureSurface[] = e.areas.map((area_m2, i) =>
          e.roles[i] === "temperature"
            ? { area_m2, emissivity: e.emissivities[i], temperature_K: e.temperatures[i] }
            : { area_m2, emissivity: e.emissivities[i], netHeat_W: base[i].netHeat_W },
        );
        const { surfaces } = solveEnclosure({ surfaces: mixed, viewFactors: e.viewFactors });
        // Compared as emissive powers against the hottest surface's: a 4 K wall facing a 2000 K
        // one is found from a radiosity 10¹³ times its own σT⁴, so its kelvins carry less.
        const largest = Math.max(...e.temperatures) ** 4;
        surfaces.forEach((s, i) => expect(Math.abs(s.temperature_K ** 4 - e.temperatures[i] ** 4)).toBeLessThan(1e-9 * largest));
      }),
    );
  });

  it("a re-radiating surface's emissivity does not change the answer", () => {
    fc.assert(
      fc.property(enclosure, fc.double({ min: 0.01, max: 1, noNaN: true }), (e, otherEmissivity) => {
        const build = (rerad: number) =>
          solveEnclosure({
            surfaces: e.areas.map((area_m2, i) =>
              e.roles[i] === "temperature"
                ? { area_m2, emissivity: e.emissivities[i], temperature_K: e.temperatures[i] }
                : { area_m2, emissivity: rerad, reradiating: true },
            ),
            viewFactors: e.viewFactors,
          }).surfaces;
        const a = build(e.emissivities[e.n - 1]);
        const b = build(otherEmissivity);
        const scale = a.reduce((sum, s) => sum + Math.abs(s.netHeat_W), 0);
        a.forEach((s, i) => {
          expect(Math.abs(b[i].temperature_K - s.temperature_K) / s.temperature_K).toBeLessThan(1e-9);
          expect(Math.abs(b[i].netHeat_W - s.netHeat_W)).toBeLessThanOrEqual(1e-9 * scale + 1e-12);
        });
      }),
    );
  });

  it("an isothermal enclosure exchanges no net heat", () => {
    fc.assert(
      fc.property(enclosure, fc.double({ min: 4, max: 2000, noNaN: true }), (e, t) => {
        const { surfaces } = allKnown({ ...e, temperatures: e.temperatures.map(() => t) });
        const emitted = 5.670374419e-8 * t ** 4 * e.areas.reduce((sum, a) => sum + a, 0);
        for (const s of surfaces) expect(Math.abs(s.netHeat_W)).toBeLessThanOrEqual(1e-10 * emitted);
      }),
    );
  });

  it("the hottest surface gives heat and the coldest takes it", () => {
    fc.assert(
      fc.property(enclosure, (e) => {
        const { surfaces } = allKnown(e);
        const hottest = e.temperatures.indexOf(Math.max(...e.temperatures));
        const coldest = e.temperatures.indexOf(Math.min(...e.temperatures));
        fc.pre(e.temperatures[hottest] > e.temperatures[coldest] * (1 + 1e-6));
        expect(surfaces[hottest].netHeat_W).toBeGreaterThan(0);
        expect(surfaces[coldest].netHeat_W).toBeLessThan(0);
      }),
    );
  });
});
