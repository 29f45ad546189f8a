import fc from "fast-check";
import { describe, it } from "vitest";
import { nearlyEqualAboveTiny } from "./checks.test-helpers";
import { conductivityIntegral, SUPPORT_MATERIAL_IDS, SUPPORT_MATERIALS, supportConduction, thermalConductivity } from "./supports";

const material = fc.constantFrom(...SUPPORT_MATERIAL_IDS);

/** Three temperatures inside a material's fit range, sorted. */
function temperatures(id: (typeof SUPPORT_MATERIAL_IDS)[number]) {
  const [min, max] = SUPPORT_MATERIALS[id].validRange_K;
  const t = fc.double({ min, max, noNaN: true });
  return fc.tuple(t, t, t).map((values) => values.sort((a, b) => a - b));
}

describe("conduction laws", () => {
  it("the conductivity integral is additive over adjacent intervals", () => {
    fc.assert(
      fc.property(material.chain((id) => fc.tuple(fc.constant(id), temperatures(id))), ([id, [a, b, c]]) =>
        nearlyEqualAboveTiny(conductivityIntegral(id, a, b) + conductivityIntegral(id, b, c), conductivityIntegral(id, a, c), 1e-8),
      ),
      { numRuns: 60 },
    );
  });

  it("the integral lies between min k and max k times the interval (mean-value theorem)", () => {
    fc.assert(
      fc.property(material.chain((id) => fc.tuple(fc.constant(id), temperatures(id))), ([id, [a, , c]]) => {
        fc.pre(c - a > 1e-6);
        const samples = Array.from({ length: 200 }, (_, i) => thermalConductivity(id, a + ((c - a) * i) / 199));
        const integral = conductivityIntegral(id, a, c);
        const width = c - a;
        // Sampled extremes, widened by 1 % because a sample may miss the true extreme.
        return integral >= 0.99 * Math.min(...samples) * width && integral <= 1.01 * Math.max(...samples) * width;
      }),
      { numRuns: 60 },
    );
  });

  it("support heat is linear in count and area and inverse in length", () => {
    fc.assert(
      fc.property(
        material,
        fc.integer({ min: 1, max: 50 }),
        fc.double({ min: 1e-8, max: 1e-2, noNaN: true }),
        fc.double({ min: 1e-3, max: 2, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (id, count, area, length, k) => {
          const [min, max] = SUPPORT_MATERIALS[id].validRange_K;
          const base = { material: id, warm_K: max, cold_K: min };
          const one = supportConduction({ ...base, area_m2: area, length_m: length, count: 1 }).heat_W;
          const many = supportConduction({ ...base, area_m2: area, length_m: length, count }).heat_W;
          const wider = supportConduction({ ...base, area_m2: area * k, length_m: length }).heat_W;
          const longer = supportConduction({ ...base, area_m2: area, length_m: length * k }).heat_W;
          return nearlyEqualAboveTiny(many, count * one, 1e-12) && nearlyEqualAboveTiny(wider, k * one, 1e-12) && nearlyEqualAboveTiny(longer, one / k, 1e-12);
        },
      ),
      { numRuns: 60 },
    );
  });
});
