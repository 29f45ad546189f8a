import fc from "fast-check";
import { describe, it } from "vitest";
import { boilOff, heatFromLiquidVolume, heatFromStandardVentFlow, heatFromVentedMass } from "./boil-off";
import { nearlyEqual } from "./checks.test-helpers";
import { CRYOGEN_IDS } from "./fluids";

const cryogen = fc.constantFrom(...CRYOGEN_IDS);
const heat = fc.double({ min: 1e-4, max: 1e4, noNaN: true });
const ventReference = fc.constantFrom("normal-0C" as const, "standard-15C" as const, "standard-20C" as const);

describe("boilOff laws", () => {
  it("every output is proportional to the heat", () => {
    fc.assert(
      fc.property(heat, fc.double({ min: 0.01, max: 100, noNaN: true }), cryogen, (q, k, id) => {
        const one = boilOff({ heat_W: q, cryogen: id });
        const scaled = boilOff({ heat_W: q * k, cryogen: id });
        return (
          nearlyEqual(scaled.evaporatedMass_kg_per_h, k * one.evaporatedMass_kg_per_h) &&
          nearlyEqual(scaled.ventedMass_kg_per_h, k * one.ventedMass_kg_per_h) &&
          nearlyEqual(scaled.liquidVolume_L_per_day, k * one.liquidVolume_L_per_day) &&
          nearlyEqual(scaled.ventFlow_standard_L_per_min, k * one.ventFlow_standard_L_per_min)
        );
      }),
    );
  });

  it("the vent never sees more gas than the liquid evaporates", () => {
    fc.assert(
      fc.property(heat, cryogen, (q, id) => {
        const result = boilOff({ heat_W: q, cryogen: id });
        return result.ventedMass_kg_per_h < result.evaporatedMass_kg_per_h && result.ventedMass_kg_per_h > 0;
      }),
    );
  });

  it("each inverse conversion undoes boilOff", () => {
    fc.assert(
      fc.property(heat, cryogen, ventReference, (q, id, reference) => {
        const r = boilOff({ heat_W: q, cryogen: id, ventReference: reference });
        const fromMass = heatFromVentedMass({ ventedMass_kg_per_s: r.ventedMass_kg_per_h / 3600, cryogen: id }).heat_W;
        const fromLevel = heatFromLiquidVolume({ liquidVolume_m3_per_s: r.liquidVolume_L_per_h / 3.6e6, cryogen: id }).heat_W;
        const fromFlow = heatFromStandardVentFlow({
          flow_standard_L_per_min: r.ventFlow_standard_L_per_min,
          cryogen: id,
          ventReference: reference,
        }).heat_W;
        return nearlyEqual(fromMass, q, 1e-10) && nearlyEqual(fromLevel, q, 1e-10) && nearlyEqual(fromFlow, q, 1e-10);
      }),
    );
  });

  it("hold time times the liquid-volume rate is the usable liquid, (fill − minimum)·capacity", () => {
    fc.assert(
      fc.property(
        heat,
        cryogen,
        fc.double({ min: 0.1, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (q, id, capacity, a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [minimum, fill] = a < b ? [a, b] : [b, a];
          const r = boilOff({ heat_W: q, cryogen: id, capacity_L: capacity, fillFraction: fill, minimumFraction: minimum });
          return nearlyEqual(r.holdTime_h! * r.liquidVolume_L_per_h, (fill - minimum) * capacity, 1e-10);
        },
      ),
    );
  });
});
