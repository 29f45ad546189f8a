import fc from "fast-check";
import { describe, it } from "vitest";
import type { AssemblyDesign, AssemblyGeometry, LayupItem } from "./assembly-design";
import { fewestLayersForTarget, sweepLayerCount } from "./sweeps";

// A warm jacket, an optional stage, a cold vessel; one block per segment, radiation or correlation.
const geometry: fc.Arbitrary<AssemblyGeometry> = fc.oneof(
  fc.double({ min: 0.1, max: 10, noNaN: true }).map((area_m2) => ({ kind: "planar" as const, area_m2 })),
  fc
    .tuple(fc.double({ min: 0.1, max: 1, noNaN: true }), fc.double({ min: 0.02, max: 0.3, noNaN: true }), fc.integer({ min: 0, max: 2 }))
    .map(([r, gap, flatEnds]) => ({ kind: "cylinder" as const, coldRadius_m: r, warmRadius_m: r + gap, length_m: 1, flatEnds })),
);
const block = fc.record({
  kind: fc.constant("block" as const),
  layers: fc.integer({ min: 1, max: 30 }),
  reflector: fc.double({ min: 0.01, max: 0.2, noNaN: true }).map((e) => ({ warmSide: e, coldSide: e })),
  model: fc.constantFrom("radiation" as const, "correlation" as const),
  layerDensity_per_cm: fc.double({ min: 5, max: 40, noNaN: true }),
});
const design: fc.Arbitrary<{ design: AssemblyDesign; blockIndex: number }> = fc
  .record({ geometry, upper: block, lower: block, staged: fc.boolean(), coldSide: fc.boolean() })
  .map(({ geometry, upper, lower, staged, coldSide }) => {
    const layup: LayupItem[] = staged ? [upper, { kind: "stage", label: "stage", temperature_K: 77, emissivity: 0.05 }, lower] : [upper];
    const d: AssemblyDesign = {
      geometry,
      warm: { temperature_K: 300, emissivity: 0.1 },
      cold: { temperature_K: staged ? 4.2 : 77, emissivity: 0.05 },
      layup,
      vacuum: { pressure_Pa: 1e-4, gas: "helium" },
    };
    return { design: d, blockIndex: staged && coldSide ? 2 : 0 };
  });

describe("sweep laws", () => {
  it("fewestLayersForTarget returns the least count that meets the target, as a brute-force scan finds it", () => {
    fc.assert(
      fc.property(design, fc.integer({ min: 1, max: 60 }), fc.double({ min: 0, max: 1, noNaN: true }), ({ design, blockIndex }, max, share) => {
        const scan = sweepLayerCount(design, { blockIndex, from: 1, to: max, step: 1 });
        // A target spread (in log) over the range the scan covers, and a little beyond it.
        const high = scan[0].coldHeat_W * 1.2;
        const low = scan[scan.length - 1].coldHeat_W * 0.8;
        const target = low * (high / low) ** share;
        const least = scan.find((p) => p.coldHeat_W <= target)?.x ?? null;
        return fewestLayersForTarget(design, { blockIndex, targetColdHeat_W: target, max }).layers === least;
      }),
      { numRuns: 60 },
    );
  });

  it("a layer-count sweep of a block in the cold vessel's segment never rises in cold heat", () => {
    fc.assert(
      fc.property(design, ({ design }) => {
        const index = design.layup.length - 1; // the block next to the cold vessel
        const points = sweepLayerCount(design, { blockIndex: index, from: 1, to: 80, step: 1 });
        return points.every((p, i) => i === 0 || p.coldHeat_W <= points[i - 1].coldHeat_W * (1 + 1e-12));
      }),
      { numRuns: 40 },
    );
  });
});
