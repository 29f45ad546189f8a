import { LTTB } from "downsample";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { downsample } from "./test-analysis";

// Our LTTB runs over Float64 columns for speed; the registry's downsample package (its LTTB,
// after Steinarsson's 2013 thesis) is the reference it must agree with point for point.
const columns = (ys: number[]) => ({ x: Float64Array.from(ys, (_, i) => i * 10), y: Float64Array.from(ys) });

describe("downsample (LTTB) against the downsample package", () => {
  it("returns the same points as the package for random series", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 3, maxLength: 600 }), fc.integer({ min: 3, max: 200 }), (ys, threshold) => {
        const { x, y } = columns(ys);
        const ours = downsample(x, y, threshold);
        const theirs = LTTB(Array.from(x, (t, i): [number, number] => [t, y[i]]), threshold) as [number, number][];
        expect(ours).toEqual(theirs.map(([t, v]) => [t, v]));
      }),
      { numRuns: 200 },
    );
  });

  it("keeps every reading when there are fewer than the threshold", () => {
    const { x, y } = columns([1, 2, 3, 4]);
    expect(downsample(x, y, 10)).toEqual([[0, 1], [10, 2], [20, 3], [30, 4]]);
  });
});
