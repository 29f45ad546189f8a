import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  estimateAssembly,
  ThermalInputError,
  validateAssembly,
  type AssemblyDesign,
  type BoilOffInput,
  type EnclosureInput,
  type StackInput,
} from "../thermal";
import {
  AssemblyDesignSchema,
  BoilOffInputSchema,
  EnclosureInputSchema,
  GasConductionInputSchema,
  StackInputSchema,
  SweepLayerCountOptionsSchema,
} from "./thermal";
import { fieldPath, pathOfField } from "./thermal-fields";

// Compile-time: what the schemas accept is what the engine takes (tsc fails otherwise).
const asDesign = (d: z.infer<typeof AssemblyDesignSchema>): AssemblyDesign => d;
const asStack = (d: z.infer<typeof StackInputSchema>): StackInput => d;
const asEnclosure = (d: z.infer<typeof EnclosureInputSchema>): EnclosureInput => d;
const asBoilOff = (d: z.infer<typeof BoilOffInputSchema>): BoilOffInput => d;

// A valid design: a liquid-helium vessel inside a liquid-nitrogen-cooled shield.
function design(): AssemblyDesign {
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.5, flatEnds: 2 },
    warm: { temperature_K: 295, emissivity: 0.1 },
    cold: { temperature_K: 4.222, emissivity: 0.05, cryogen: "helium-4", capacity_L: 250 },
    layup: [
      { kind: "block", layers: 30, reflector: { warmSide: 0.03, coldSide: 0.03 }, model: "correlation", layerDensity_per_cm: 20 },
      { kind: "stage", label: "nitrogen shield", temperature_K: 77.355, emissivity: 0.05, cryogen: "nitrogen", capacity_L: 60 },
      { kind: "block", layers: 10, reflector: { warmSide: 0.03, coldSide: { kind: "power", reference: 0.03, referenceTemperature_K: 300, exponent: 0.5 } }, model: "radiation" },
    ],
    supports: [{ material: "g10-normal", area_m2: 1e-4, length_m: 0.1, count: 4, from: "warm", to: 0 }],
    vacuum: { pressure_Pa: 1e-4, gas: "helium" },
  };
}

type Breakage = [string, (d: AssemblyDesign) => void];
const block = (d: AssemblyDesign, i: number) => d.layup[i] as unknown as Record<string, unknown>;
const breakages: Breakage[] = [
  ["too many layers", (d) => (block(d, 2).layers = 1001)],
  ["a fractional layer count", (d) => (block(d, 0).layers = 2.5)],
  ["a reflector emissivity above 1", (d) => ((block(d, 2).reflector as Record<string, unknown>).warmSide = 1.2)],
  ["an unknown model", (d) => (block(d, 2).model = "magic")],
  ["a correlation without layer density", (d) => delete block(d, 0).layerDensity_per_cm],
  ["a negative correlation coefficient", (d) => (block(d, 0).coefficients = { solid: -1, solidExponent: 2.63, radiation: 7e-10, gas: 1.46e4 })],
  ["a degradation factor below 1", (d) => (block(d, 2).degradationFactor = 0.5)],
  ["a stage warmer than the warm wall", (d) => (block(d, 1).temperature_K = 300)],
  ["a cold vessel warmer than the stage", (d) => (d.cold.temperature_K = 80)],
  ["a zero temperature", (d) => (d.warm.temperature_K = 0)],
  ["an inner warm radius", (d) => ((d.geometry as { warmRadius_m: number }).warmRadius_m = 0.2)],
  ["three flat ends", (d) => ((d.geometry as { flatEnds?: number }).flatEnds = 3)],
  ["a bad capacity", (d) => (d.cold.capacity_L = -5)],
  ["a fill below the minimum", (d) => Object.assign(d.cold, { fillFraction: 0.2, minimumFraction: 0.5 })],
  ["an unknown stage cryogen", (d) => (block(d, 1).cryogen = "xenon")],
  ["a support to a missing stage", (d) => (d.supports![0].to = 4)],
  ["an unknown support material", (d) => ((d.supports![0] as { material: string }).material = "unobtainium")],
  ["a negative pressure", (d) => (d.vacuum.pressure_Pa = -1)],
  ["an unknown gas", (d) => ((d.vacuum as { gas: string }).gas = "xenon")],
  ["an item of unknown kind", (d) => (block(d, 1).kind = "shelf")],
  ["an unsorted emissivity table", (d) => ((block(d, 2).reflector as Record<string, unknown>).coldSide = { kind: "table", points: [[80, 0.02], [20, 0.01]] })],
];

function engineError(d: AssemblyDesign): ThermalInputError {
  try {
    validateAssembly(d);
  } catch (error) {
    if (error instanceof ThermalInputError) return error;
    throw error;
  }
  throw new Error("the engine accepted the broken design");
}

describe("AssemblyDesignSchema", () => {
  it("accepts a valid design, and its output runs in the engine", () => {
    const parsed = AssemblyDesignSchema.parse(design());
    expect(estimateAssembly(asDesign(parsed)).stages).toHaveLength(2);
  });

  it.each(breakages)("for %s, names the same field and range as the engine, in the same words", (_name, breakIt) => {
    const d = design();
    breakIt(d);
    const expected = engineError(d);
    const result = AssemblyDesignSchema.safeParse(d);
    expect(result.success).toBe(false);
    const issues = result.error!.issues;
    expect(issues).toHaveLength(1);
    expect(fieldPath(issues[0].path)).toBe(expected.field);
    expect(issues[0].message).toBe(`${expected.field} must be ${expected.allowed}`);
  });

  it("lists every bad field of a design at once, each with its path and range", () => {
    const d = design();
    d.warm.emissivity = 2;
    block(d, 2).layers = 0;
    d.vacuum.pressure_Pa = -1;
    const issues = AssemblyDesignSchema.safeParse(d).error!.issues.map((i) => [fieldPath(i.path), i.message]);
    expect(issues).toEqual(
      expect.arrayContaining([
        ["warm.emissivity", "warm.emissivity must be an emissivity above 0 and at most 1"],
        ["layup[2].layers", "layup[2].layers must be a whole number from 1 to 1000"],
        ["vacuum.pressure_Pa", "vacuum.pressure_Pa must be a number of at least 0 Pa"],
      ]),
    );
    expect(issues).toHaveLength(3);
  });

  it("words the message with the full path when the design sits inside a request body", () => {
    const d = design();
    block(d, 1).temperature_K = 300;
    const issue = z.object({ design: AssemblyDesignSchema }).safeParse({ design: d }).error!.issues[0];
    expect(issue.path).toEqual(["design", "layup", 1, "temperature_K"]);
    expect(issue.message).toMatch(/^design\.layup\[1\]\.temperature_K must be a temperature below warm\.temperature_K \(295 K\)/);
  });

  it("names a missing field with its range", () => {
    const d = design() as unknown as Record<string, unknown>;
    delete d.vacuum;
    const issue = AssemblyDesignSchema.safeParse(d).error!.issues[0];
    expect(fieldPath(issue.path)).toBe("vacuum");
  });
});

describe("schemas of the small engine inputs", () => {
  const stack: StackInput = {
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.35, length_m: 1 },
    warm: { temperature_K: 300, emissivity: 0.1 },
    cold: { temperature_K: 77, emissivity: 0.05 },
    shields: [{ warmSide: 0.03, coldSide: 0.03 }],
  };

  it("a stack: accepts a valid one; refuses a cold wall above the warm one, and a shield outside the walls, in the engine's words", () => {
    expect(asStack(StackInputSchema.parse(stack)).shields).toHaveLength(1);
    const hot = StackInputSchema.safeParse({ ...stack, cold: { temperature_K: 400, emissivity: 0.05 } }).error!.issues[0];
    expect(hot.message).toBe("warm.temperature_K must be a temperature above cold.temperature_K (400 K)");
    const outside = StackInputSchema.safeParse({ ...stack, shields: [{ warmSide: 0.03, coldSide: 0.03, radius_m: 0.5 }] }).error!.issues[0];
    expect(fieldPath(outside.path)).toBe("shields[0].radius_m");
    expect(outside.message).toContain("a radius strictly between the cold wall's 0.3 m and the warm wall's 0.35 m");
  });

  it("an enclosure: refuses a view-factor matrix that breaks reciprocity", () => {
    // Reciprocity A_i·F_ij = A_j·F_ji (Incropera et al., 6th ed., Eq. 13.3): with A = 1 and 2 m², F_12 = 1 needs F_21 = 0.5.
    const input: EnclosureInput = {
      surfaces: [
        { area_m2: 1, emissivity: 0.5, temperature_K: 300 },
        { area_m2: 2, emissivity: 0.5, temperature_K: 77 },
      ],
      viewFactors: [[0, 1], [0.7, 0.3]],
    };
    const issue = EnclosureInputSchema.safeParse(input).error!.issues[0];
    expect(fieldPath(issue.path)).toBe("viewFactors[1][0]");
    expect(issue.message).toContain("(reciprocity)");
    expect(asEnclosure(EnclosureInputSchema.parse({ ...input, viewFactors: [[0, 1], [0.5, 0.5]] })).surfaces).toHaveLength(2);
  });

  it("boil-off, gas conduction and sweep options refuse cross-field mistakes in the engine's words", () => {
    const boil = BoilOffInputSchema.safeParse({ heat_W: 1, cryogen: "nitrogen", capacity_L: 10, fillFraction: 0.3, minimumFraction: 0.6 });
    expect(boil.error!.issues[0].message).toBe("minimumFraction must be a fraction below the fill fraction (0.3)");
    expect(asBoilOff(BoilOffInputSchema.parse({ heat_W: 1, cryogen: "nitrogen" })).cryogen).toBe("nitrogen");
    const gas = GasConductionInputSchema.safeParse({ gas: "helium", pressure_Pa: 1e-3, gaugeTemperature_K: 300, warm_K: 4, cold_K: 77 });
    expect(gas.error!.issues[0].message).toBe("warm_K must be a temperature above cold_K (77 K)");
    const sweep = SweepLayerCountOptionsSchema.safeParse({ blockIndex: 0, from: 20, to: 10, step: 1 });
    expect(sweep.error!.issues[0].message).toBe("to must be a whole number from 20 to 1000");
  });

  it("field paths go both ways between zod's arrays and the engine's strings", () => {
    expect(fieldPath(["layup", 2, "reflector", "points", 1, 0])).toBe("layup[2].reflector.points[1][0]");
    expect(pathOfField("layup[2].reflector.points[1][0]")).toEqual(["layup", 2, "reflector", "points", 1, 0]);
  });
});
