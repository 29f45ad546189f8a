import { describe, expect, it } from "vitest";
import { cryostatInput, LIB, parsed, refTo } from "../../../../shared/design/invented-library.test-helpers";
import type { DesignContent } from "../../../../shared/schemas/design";
import { fromSi, toSi } from "../../../../shared/units";
import { diffContent, kindOfPath, readablePath } from "./content-diff";

type Block = Extract<DesignContent["layup"][number], { kind: "block" }>;
const base = () => parsed(cryostatInput());

describe("diffContent", () => {
  it("finds nothing between a design and its copy", () => {
    expect(diffContent(base(), structuredClone(base()))).toEqual([]);
  });

  it("names each changed field by its form path", () => {
    const after = base();
    (after.layup[0] as Block).layers = 45;
    after.vacuum.pressure_Pa = 2e-4;
    expect(diffContent(base(), after)).toEqual([
      { path: "layup.0.layers", before: 30, after: 45 },
      { path: "vacuum.pressure_Pa", before: 1e-4, after: 2e-4 },
    ]);
  });

  it("keeps a library pick as one field: another version is one change, not a change of .version", () => {
    const after = base();
    (after.layup[0] as Block).reflector = refTo(LIB.filmV1);
    expect(diffContent(base(), after)).toEqual([{ path: "layup.0.reflector", before: refTo(LIB.film), after: refTo(LIB.filmV1) }]);
  });

  it("lists an added item's fields as new and a removed item's as gone, after the changes", () => {
    const before = base();
    const after = base();
    after.supports.pop();
    after.targetColdHeat_W = 0.1;
    const changes = diffContent(before, after);
    expect(changes[0]).toEqual({ path: "targetColdHeat_W", before: null, after: 0.1 });
    const removed = changes.slice(1);
    expect(removed.every((c) => c.path.startsWith("supports.2.") && c.after === undefined)).toBe(true);
    expect(removed.find((c) => c.path === "supports.2.label")).toEqual({ path: "supports.2.label", before: "neck", after: undefined });
    // And the other way round, the same fields are additions.
    const added = diffContent(after, before).filter((c) => c.path.startsWith("supports.2."));
    expect(added.length).toBe(removed.length);
    expect(added.every((c) => c.before === undefined)).toBe(true);
  });

  it("shows an emptied list as one field", () => {
    const after = base();
    after.supports = [];
    expect(diffContent(base(), after)).toContainEqual({ path: "supports", before: undefined, after: "(none)" });
  });
});

describe("kindOfPath: the unit of a design field, from its name's suffix", () => {
  it.each([
    ["geometry.area_m2", "area"],
    ["geometry.coldRadius_m", "length"],
    ["geometry.length_m", "length"],
    ["warm.temperature_K", "temperature"],
    ["cold.capacity_L", "volume"],
    ["layup.1.temperature_K", "temperature"],
    ["layup.0.layerDensity_per_cm", "layerDensity"],
    ["supports.0.area_m2", "area"],
    ["supports.0.length_m", "length"],
    ["vacuum.pressure_Pa", "pressure"],
    ["targetColdHeat_W", "heat"],
  ])("%s is a %s", (path, kind) => {
    expect(kindOfPath(path)).toBe(kind);
  });

  it.each(["layup.0.layers", "layup.0.degradationFactor", "cold.fillFraction", "cold.minimumFraction", "geometry.flatEnds", "supports.0.count", "supports.0.from", "layup.0.model"])(
    "%s is a pure number or a word",
    (path) => {
      expect(kindOfPath(path)).toBeNull();
    },
  );

  it("gives every numeric field of a design a unit or none, and never a wrong one for its suffix", () => {
    const paths = diffContent({}, base()).filter((c) => typeof c.after === "number").map((c) => c.path);
    for (const path of paths) {
      const kind = kindOfPath(path);
      if (/(_K|_m2|_m|_L|_Pa|_W|_per_cm)$/.test(path)) expect(kind, path).not.toBeNull();
      else expect(kind, path).toBeNull();
    }
  });

  it("converts the default design's SI values to US customary by exact definitions, and back", () => {
    // NIST SP 811 (2008), App. B: 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 US gal = 3.785411784 L,
    // 1 torr = 101325/760 Pa and T(°F) = 1.8·T(K) − 459.67, all exact.
    const cases: [path: string, si: number, us: number][] = [
      ["layup.0.layerDensity_per_cm", 20, 50.8],
      ["warm.temperature_K", 293, 67.73],
      ["geometry.coldRadius_m", 0.25, 0.25 / 0.0254],
      ["geometry.area_m2", 1, 1 / 0.3048 ** 2],
      ["cold.capacity_L", 180, 180 / 3.785411784],
      ["vacuum.pressure_Pa", 1e-3, (1e-3 * 760) / 101325],
    ];
    for (const [path, si, us] of cases) {
      const kind = kindOfPath(path)!;
      expect(Math.abs(fromSi(kind, si, "us") - us), path).toBeLessThanOrEqual(1e-12 * Math.abs(us));
      expect(Math.abs(toSi(kind, fromSi(kind, si, "us"), "us") - si), path).toBeLessThanOrEqual(1e-12 * Math.abs(si));
      expect(fromSi(kind, si, "si")).toBe(si);
    }
  });
});

describe("readablePath", () => {
  it("counts layup items and list entries from 1", () => {
    expect(readablePath("layup.2.layers")).toBe("layup · item 3 · layers");
    expect(readablePath("supports.0.material")).toBe("supports · entry 1 · material");
    expect(readablePath("vacuum.pressure_Pa")).toBe("vacuum · pressure_Pa");
  });
});
