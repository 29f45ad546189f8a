import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { anyEmissivity, constantEmissivity, wallTemperatures } from "./arbitraries.test-helpers";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "./errors";
import { StackGeometry, StackInput, estimateStack } from "./radiation-network";

const shield = fc.record({ warmSide: anyEmissivity, coldSide: anyEmissivity });
const constantShield = fc.record({ warmSide: constantEmissivity, coldSide: constantEmissivity });

const geometry: fc.Arbitrary<StackGeometry> = fc.oneof(
  fc.record({ kind: fc.constant("planar" as const), area_m2: fc.double({ min: 0.01, max: 100, noNaN: true }) }),
  fc
    .tuple(fc.double({ min: 0.01, max: 2, noNaN: true }), fc.double({ min: 1.01, max: 3, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }))
    .map(([cold, ratio, length]) => ({ kind: "cylinder" as const, coldRadius_m: cold, warmRadius_m: cold * ratio, length_m: length })),
  fc
    .tuple(fc.double({ min: 0.01, max: 2, noNaN: true }), fc.double({ min: 1.01, max: 3, noNaN: true }))
    .map(([cold, ratio]) => ({ kind: "sphere" as const, coldRadius_m: cold, warmRadius_m: cold * ratio })),
);

function stack(geometryValue: StackGeometry, walls: { warm_K: number; cold_K: number }, warm: StackInput["warm"]["emissivity"], cold: StackInput["cold"]["emissivity"], shields: StackInput["shields"]): StackInput {
  return { geometry: geometryValue, warm: { temperature_K: walls.warm_K, emissivity: warm }, cold: { temperature_K: walls.cold_K, emissivity: cold }, shields };
}

describe("estimateStack laws", () => {
  it("adding a shield never raises the heat leak", () => {
    fc.assert(
      fc.property(geometry, wallTemperatures, constantEmissivity, constantEmissivity, fc.array(constantShield, { maxLength: 30 }), constantShield, fc.nat(), fc.double({ min: 0.05, max: 0.95, noNaN: true }), (g, walls, ew, ec, shields, extra, at, where) => {
        const before = estimateStack(stack(g, walls, ew, ec, shields));
        // Insert the new shield between two neighbours of the existing stack, keeping every radius.
        const position = at % (shields.length + 1);
        const placed = shields.map((s, k) => ({ ...s, radius_m: before.shields[k].radius_m }));
        if (g.kind !== "planar") {
          const outer = position === 0 ? g.warmRadius_m : placed[position - 1].radius_m!;
          const inner = position === shields.length ? g.coldRadius_m : placed[position].radius_m!;
          placed.splice(position, 0, { ...extra, radius_m: inner + (outer - inner) * where });
        } else {
          placed.splice(position, 0, { ...extra, radius_m: undefined });
        }
        const after = estimateStack(stack(g, walls, ew, ec, placed));
        expect(after.heatLeak_W).toBeLessThanOrEqual(before.heatLeak_W * (1 + 1e-12));
      }),
    );
  });

  it("black surfaces everywhere give the black-body heat σ(T_h⁴ − T_c⁴)·A_cold, and ε → 1 approaches it", () => {
    fc.assert(
      fc.property(geometry, wallTemperatures, (g, walls) => {
        const coldArea = g.kind === "planar" ? g.area_m2 : g.kind === "cylinder" ? 2 * Math.PI * g.coldRadius_m * g.length_m : 4 * Math.PI * g.coldRadius_m ** 2;
        const black = SIGMA * (walls.warm_K ** 4 - walls.cold_K ** 4) * coldArea;
        expect(Math.abs(estimateStack(stack(g, walls, 1, 1, [])).heatLeak_W - black) / black).toBeLessThan(1e-13);
        const nearlyBlack = estimateStack(stack(g, walls, 1 - 1e-9, 1 - 1e-9, [])).heatLeak_W;
        expect(Math.abs(nearlyBlack - black) / black).toBeLessThan(1e-8);
      }),
    );
  });

  it("N shields with the walls' emissivity divide the planar heat by N + 1", () => {
    fc.assert(
      fc.property(wallTemperatures, constantEmissivity, fc.integer({ min: 0, max: 300 }), fc.double({ min: 0.01, max: 100, noNaN: true }), (walls, eps, n, area) => {
        const planar = { kind: "planar" as const, area_m2: area };
        const bare = estimateStack(stack(planar, walls, eps, eps, [])).heatLeak_W;
        const shielded = estimateStack(stack(planar, walls, eps, eps, Array.from({ length: n }, () => ({ warmSide: eps, coldSide: eps })))).heatLeak_W;
        expect(Math.abs(shielded * (n + 1) - bare) / bare).toBeLessThan(1e-11);
      }),
    );
  });

  it("shield temperatures fall strictly from the warm wall to the cold wall", () => {
    fc.assert(
      fc.property(geometry, wallTemperatures, anyEmissivity, anyEmissivity, fc.array(shield, { maxLength: 60 }), (g, walls, ew, ec, shields) => {
        const t = [walls.warm_K, ...estimateStack(stack(g, walls, ew, ec, shields)).shields.map((s) => s.temperature_K), walls.cold_K];
        for (let k = 1; k < t.length; k++) expect(t[k]).toBeLessThan(t[k - 1]);
      }),
    );
  });

  it("the heat of a planar stack scales linearly with its area", () => {
    fc.assert(
      fc.property(wallTemperatures, anyEmissivity, anyEmissivity, fc.array(shield, { maxLength: 40 }), fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 0.1, max: 50, noNaN: true }), (walls, ew, ec, shields, area, factor) => {
        const one = estimateStack(stack({ kind: "planar", area_m2: area }, walls, ew, ec, shields));
        const scaled = estimateStack(stack({ kind: "planar", area_m2: area * factor }, walls, ew, ec, shields));
        expect(Math.abs(scaled.heatLeak_W - factor * one.heatLeak_W) / (factor * one.heatLeak_W)).toBeLessThan(1e-9);
        expect(Math.abs(scaled.heatFlux_W_per_m2 - one.heatFlux_W_per_m2) / one.heatFlux_W_per_m2).toBeLessThan(1e-9);
      }),
    );
  });

  it("the shares of the resistance ladder are fractions that sum to 1", () => {
    fc.assert(
      fc.property(geometry, wallTemperatures, anyEmissivity, anyEmissivity, fc.array(shield, { maxLength: 40 }), (g, walls, ew, ec, shields) => {
        const { resistances } = estimateStack(stack(g, walls, ew, ec, shields));
        expect(resistances).toHaveLength(3 * shields.length + 3);
        for (const r of resistances) {
          expect(r.share).toBeGreaterThanOrEqual(0);
          expect(r.share).toBeLessThanOrEqual(1);
        }
        expect(Math.abs(resistances.reduce((sum, r) => sum + r.share, 0) - 1)).toBeLessThan(1e-12);
      }),
    );
  });

  it("the heat equals σ(T_w⁴ − T_c⁴) divided by the sum of the reported resistances", () => {
    fc.assert(
      fc.property(geometry, wallTemperatures, anyEmissivity, anyEmissivity, fc.array(shield, { maxLength: 40 }), (g, walls, ew, ec, shields) => {
        const result = estimateStack(stack(g, walls, ew, ec, shields));
        const total = result.resistances.reduce((sum, r) => sum + r.value, 0);
        const expected = (SIGMA * (walls.warm_K ** 4 - walls.cold_K ** 4)) / total;
        expect(Math.abs(result.heatLeak_W - expected) / expected).toBeLessThan(1e-12);
      }),
    );
  });
});
