import { describe, expect, it } from "vitest";
import type { DesignContentInput, MaterialRef } from "../schemas/design";
import { estimateAssembly, validateAssembly } from "../thermal/assembly";
import type { AssemblyDesign, LayupBlock, LayupStage } from "../thermal/assembly-design";
import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA } from "../thermal/errors";
import { CRYOGENS } from "../thermal/fluids";
import { conductivityIntegral } from "../thermal/supports";
import { cryogen, cryostatInput, entry, LIB, lookupOf, panelInput, parsed, refTo, SET_COEFFICIENTS } from "./invented-library.test-helpers";
import { materialKey, materialRefsOf, MaterialReferenceError, toAssembly } from "./to-assembly";

const lookup = lookupOf();
const assemblyOf = (input: DesignContentInput, edit?: (draft: DesignContentInput) => void) => toAssembly(parsed(input, edit), lookup);
const blockAt = (a: AssemblyDesign, i: number) => a.layup[i] as LayupBlock;
const stageAt = (a: AssemblyDesign, i: number) => a.layup[i] as LayupStage;
type Draft = DesignContentInput;
type DraftBlock = Extract<Draft["layup"][number], { kind: "block" }>;
type DraftStage = Extract<Draft["layup"][number], { kind: "stage" }>;
const draftBlock = (d: Draft, i: number) => d.layup[i] as DraftBlock;
const draftStage = (d: Draft, i: number) => d.layup[i] as DraftStage;

function close(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}

/** Runs toAssembly and returns the MaterialReferenceError it throws (fails if it throws none or another). */
function referenceError(edit: (draft: Draft) => void, entries = Object.values(LIB)): MaterialReferenceError {
  try {
    toAssembly(parsed(cryostatInput(), edit), lookupOf(entries));
  } catch (error) {
    expect(error).toBeInstanceOf(MaterialReferenceError);
    return error as MaterialReferenceError;
  }
  throw new Error("toAssembly accepted the design");
}

const missing: MaterialRef = { materialId: "not-in-library", version: 1 };

describe("toAssembly: every field lands where the engine expects it", () => {
  it("maps the invented two-stage cryostat field by field, with each library version's own properties", () => {
    const helium = CRYOGENS["helium-4"];
    const nitrogen = CRYOGENS.nitrogen;
    const film = { warmSide: 0.03, coldSide: 0.035, low: { warmSide: 0.025, coldSide: 0.03 }, high: { warmSide: 0.045, coldSide: 0.05 } };
    const expected: AssemblyDesign = {
      geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2, flatEnds: 2 },
      warm: { temperature_K: 293, emissivity: 0.1 },
      cold: { temperature_K: helium.saturationTemperature_K, emissivity: 0.05, cryogen: "helium-4", capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 },
      layup: [
        // The radiation block names a spacer in the form; the model uses none, so none is passed.
        { kind: "block", label: "outer blanket", layers: 30, reflector: film, model: "radiation", layerDensity_per_cm: 20, degradationFactor: 1.5 },
        // The form's 80 K gives way to the cryogen's saturation temperature.
        { kind: "stage", label: "nitrogen shield", temperature_K: nitrogen.saturationTemperature_K, emissivity: { kind: "power", reference: 0.06, referenceTemperature_K: 300, exponent: 0.5 }, cryogen: "nitrogen", capacity_L: 60 },
        {
          kind: "block",
          layers: 20,
          reflector: { warmSide: 0.04, coldSide: 0.04 },
          model: "layers",
          layerDensity_per_cm: 15,
          degradationFactor: 1,
          spacer: { conductance_W_per_m2_K: 0.0364, referenceMeanTemperature_K: 188.5, referenceLayerDensity_per_cm: 20, layerDensityExponent: 2.63 },
        },
        { kind: "stage", label: "cryocooler stage", temperature_K: 20, emissivity: 0.05 },
        { kind: "block", label: "inner blanket", layers: 10, reflector: film, model: "correlation", layerDensity_per_cm: 12, degradationFactor: 2, coefficients: SET_COEFFICIENTS },
      ],
      supports: [
        { label: "outer strap", material: "g10-normal", area_m2: 2e-4, length_m: 0.15, count: 3, from: "warm", to: 0 },
        { material: "stainless-304", area_m2: 1e-5, length_m: 0.3, count: 1, from: 0, to: 1 },
        { label: "neck", material: "stainless-304", area_m2: 5e-5, length_m: 0.5, count: 1, from: "warm", to: "cold" },
      ],
      vacuum: { pressure_Pa: 1e-4, gas: "helium" },
    };
    const assembly = assemblyOf(cryostatInput());
    // toEqual also fails on any extra key with a value (a stray spacer, cryogen or band).
    expect(assembly).toEqual(expected);
    expect(() => validateAssembly(assembly)).not.toThrow();
  });

  it("uses the exact version named: version 1 of an entry is not version 2", () => {
    const v2 = assemblyOf(cryostatInput());
    const v1 = assemblyOf(cryostatInput(), (d) => (draftBlock(d, 0).reflector = refTo(LIB.filmV1)));
    expect(blockAt(v2, 0).reflector.warmSide).toBe(0.03);
    expect(blockAt(v1, 0).reflector).toEqual({ warmSide: 0.05, coldSide: 0.05 });
  });

  it("a planar panel gives the gray parallel-plate shield formula exactly", () => {
    // Q = σA(T_w⁴ − T_c⁴)/[1/ε_w + 1/ε_c − 1 + N(1/ε_a + 1/ε_b − 1)] for N shields with faces
    // ε_a, ε_b between large parallel plates (Incropera, DeWitt, Bergman & Lavine, Fundamentals
    // of Heat and Mass Transfer, 6th ed., Sec. 13.3). Jacket 0.1, vessel 0.05, foil 0.04 both faces.
    const q = estimateAssembly(assemblyOf(panelInput())).stages[0].heatIn.total_W;
    close(q, (SIGMA * 2 * (300 ** 4 - 20 ** 4)) / (1 / 0.1 + 1 / 0.05 - 1 + 12 * (1 / 0.04 + 1 / 0.04 - 1)));
    // The film's two faces differ (0.03 warm side, 0.035 cold side): both enter per shield.
    const film = estimateAssembly(assemblyOf(panelInput(), (d) => (draftBlock(d, 0).reflector = refTo(LIB.film)))).stages[0].heatIn.total_W;
    close(film, (SIGMA * 2 * (300 ** 4 - 20 ** 4)) / (1 / 0.1 + 1 / 0.05 - 1 + 12 * (1 / 0.03 + 1 / 0.035 - 1)));
  });

  it("passes a sphere and a cylinder's flat ends through, each end adding one planar stack of π·r_c²", () => {
    const sphere = assemblyOf(cryostatInput(), (d) => (d.geometry = { kind: "sphere", coldRadius_m: 0.3, warmRadius_m: 0.45 }));
    expect(sphere.geometry).toEqual({ kind: "sphere", coldRadius_m: 0.3, warmRadius_m: 0.45 });
    // Left out, flatEnds is the schema's default 0.
    const bare = assemblyOf(panelInput(), (d) => (d.geometry = { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2 }));
    expect(bare.geometry).toEqual({ kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2, flatEnds: 0 });
    const withEnds = (flatEnds: number) => assemblyOf(panelInput(), (d) => (d.geometry = { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2, flatEnds }));
    const disc = assemblyOf(panelInput(), (d) => (d.geometry = { kind: "planar", area_m2: Math.PI * 0.3 ** 2 }));
    const heat = (a: AssemblyDesign) => estimateAssembly(a).stages.at(-1)!.heatIn.total_W;
    close(heat(withEnds(1)) - heat(bare), heat(disc), 1e-9);
    close(heat(withEnds(2)) - heat(bare), 2 * heat(disc), 1e-9);
  });

  it("a cryogen cold space takes the library entry's saturation temperature and fluid, whatever temperature the form holds", () => {
    // An invented pressurized-bath entry: 78 K is this test's own number, not the 1 atm boiling point.
    const warmNitrogen = cryogen("ln2-pressurized", "nitrogen", 78);
    const a = toAssembly(
      parsed(panelInput(), (d) => (d.cold = { cryogen: refTo(warmNitrogen), temperature_K: 20, finish: refTo(LIB.vessel), capacity_L: 40 })),
      lookupOf([...Object.values(LIB), warmNitrogen]),
    );
    expect(a.cold).toEqual({ temperature_K: 78, emissivity: 0.05, cryogen: "nitrogen", capacity_L: 40, fillFraction: 1, minimumFraction: 0 });
  });

  it("a fixed-temperature cold space keeps its temperature and names no cryogen", () => {
    const a = assemblyOf(panelInput());
    expect(a.cold).toEqual({ temperature_K: 20, emissivity: 0.05, fillFraction: 1, minimumFraction: 0 });
    expect("cryogen" in a.cold).toBe(false);
    expect("capacity_L" in a.cold).toBe(false);
  });

  it("a stage without a cryogen keeps its own temperature; with one, the cryogen's wins and its capacity goes along", () => {
    const a = assemblyOf(cryostatInput());
    expect(Object.keys(stageAt(a, 3)).sort()).toEqual(["emissivity", "kind", "label", "temperature_K"]);
    expect(stageAt(a, 1)).toMatchObject({ temperature_K: CRYOGENS.nitrogen.saturationTemperature_K, cryogen: "nitrogen", capacity_L: 60 });
    const noCapacity = assemblyOf(cryostatInput(), (d) => (draftStage(d, 1).capacity_L = null));
    expect("capacity_L" in stageAt(noCapacity, 1)).toBe(false);
    // Each stage with a cryogen is a sink with its own boil-off; the fixed one has none.
    const stages = estimateAssembly(a).stages;
    expect(stages.map((s) => s.label)).toEqual(["nitrogen shield", "cryocooler stage", "cold vessel"]);
    expect(stages[1].boilOff).toBeUndefined();
    expect(stages[0].boilOff?.holdTime_h).toBeGreaterThan(0);
  });

  it("passes the spacer's solid conduction to a layers block unchanged, and only there", () => {
    const plain = assemblyOf(cryostatInput(), (d) => (draftBlock(d, 2).spacer = refTo(LIB.netPlain)));
    expect(blockAt(plain, 2).spacer).toEqual({ conductance_W_per_m2_K: 0.05 });
    // A reference temperature alone (no layer-density pair) goes along by itself.
    const warmOnly = entry("net-warm", 1, "Polyester netting at 150 K", { kind: "spacer", form: "netting", solidConduction: { conductance_W_per_m2_K: 0.05, referenceMeanTemperature_K: 150 } });
    const withWarmOnly = toAssembly(parsed(cryostatInput(), (d) => (draftBlock(d, 2).spacer = refTo(warmOnly))), lookupOf([...Object.values(LIB), warmOnly]));
    expect(blockAt(withWarmOnly, 2).spacer).toEqual({ conductance_W_per_m2_K: 0.05, referenceMeanTemperature_K: 150 });
    const paper = assemblyOf(cryostatInput(), (d) => (draftBlock(d, 2).spacer = refTo(LIB.paper)));
    expect(blockAt(paper, 2).spacer).toEqual({ conductivity_W_per_m_K: 0.02, thickness_m: 1e-4, contactFactor: 0.01 });
    // A radiation or correlation block ignores its spacer and correlation-set picks, even unresolvable ones.
    const ignored = assemblyOf(cryostatInput(), (d) => {
      Object.assign(draftBlock(d, 0), { spacer: missing, correlationSet: missing });
      Object.assign(draftBlock(d, 4), { spacer: missing });
    });
    expect("spacer" in blockAt(ignored, 0) || "coefficients" in blockAt(ignored, 0)).toBe(false);
    expect("spacer" in blockAt(ignored, 4)).toBe(false);
  });

  it("the engine uses the spacer's reference conditions: the conductance scales as (N̄/N̄_ref)^a", () => {
    // Same scaling as the engine's own (Cunnington, Keller & Glassford, NASA CR-134477, 1974,
    // h_s ∝ N̄^a·T_m): a referenced spacer at 15 layers/cm equals a plain one of 0.0364·(15/20)^2.63.
    const mapped = assemblyOf(cryostatInput());
    const byHand = structuredClone(mapped);
    blockAt(byHand, 2).spacer = { conductance_W_per_m2_K: 0.0364 * (15 / 20) ** 2.63, referenceMeanTemperature_K: 188.5 };
    const a = estimateAssembly(mapped).blocks[1];
    const b = estimateAssembly(byHand).blocks[1];
    close(a.solid_W, b.solid_W, 1e-9);
    close(a.heat_W, b.heat_W, 1e-9);
    expect(a.solid_W).toBeGreaterThan(0);
  });

  it("gives a correlation block the set's coefficients and multiplies its heat by the degradation factor", () => {
    const twice = assemblyOf(cryostatInput());
    const once = assemblyOf(cryostatInput(), (d) => (draftBlock(d, 4).degradationFactor = 1));
    expect(blockAt(twice, 4).coefficients).toEqual(SET_COEFFICIENTS);
    // Between two fixed temperatures (the 20 K stage and the vessel) the block's heat is the factor times the ideal.
    close(estimateAssembly(twice).blocks[2].heat_W, 2 * estimateAssembly(once).blocks[2].heat_W, 1e-12);
  });

  it("builds the reflector's low and high bands from each face's own band, else its nominal model", () => {
    const half = assemblyOf(cryostatInput(), (d) => (draftBlock(d, 0).reflector = refTo(LIB.filmHalfBand)));
    expect(blockAt(half, 0).reflector).toEqual({
      warmSide: 0.03,
      coldSide: 0.032,
      low: { warmSide: 0.02, coldSide: 0.032 },
      high: { warmSide: 0.03, coldSide: 0.06 },
    });
    // The foil has no band (its cold face's low and high are null): no low or high at all.
    const foil = blockAt(assemblyOf(cryostatInput()), 2).reflector;
    expect("low" in foil || "high" in foil).toBe(false);
  });

  it("the engine's band brackets the nominal heat with the film's band, and is absent without any band", () => {
    const band = estimateAssembly(assemblyOf(panelInput(), (d) => (draftBlock(d, 0).reflector = refTo(LIB.film)))).band!;
    expect(band).toHaveLength(1);
    expect(band[0].low_W).toBeLessThan(band[0].nominal_W);
    expect(band[0].high_W).toBeGreaterThan(band[0].nominal_W);
    expect(estimateAssembly(assemblyOf(panelInput())).band).toBeNull();
  });

  it("supports join the stages they name, each carrying count·(A/L)·∫k dT between its two ends", () => {
    const a = assemblyOf(cryostatInput());
    const result = estimateAssembly(a);
    expect(result.supports.map((s) => [s.label, s.from, s.to])).toEqual([
      ["outer strap", "warm wall", "nitrogen shield"],
      ["support 2", "nitrogen shield", "cryocooler stage"],
      ["neck", "warm wall", "cold vessel"],
    ]);
    const t = [293, CRYOGENS.nitrogen.saturationTemperature_K, 20, CRYOGENS["helium-4"].saturationTemperature_K];
    close(result.supports[0].heat_W, 3 * (2e-4 / 0.15) * conductivityIntegral("g10-normal", t[1], t[0]), 1e-12);
    close(result.supports[1].heat_W, (1e-5 / 0.3) * conductivityIntegral("stainless-304", t[2], t[1]), 1e-12);
    close(result.supports[2].heat_W, (5e-5 / 0.5) * conductivityIntegral("stainless-304", t[3], t[0]), 1e-12);
    close(result.stages[1].heatIn.supports_W, result.supports[1].heat_W, 1e-12);
    close(result.stages[2].heatIn.supports_W, result.supports[2].heat_W, 1e-12);
  });

  it("passes the vacuum's pressure and gas", () => {
    const a = assemblyOf(cryostatInput(), (d) => (d.vacuum = { pressure_Pa: 0.02, gas: "argon" }));
    expect(a.vacuum).toEqual({ pressure_Pa: 0.02, gas: "argon" });
  });
});

describe("toAssembly: a bad library reference names the form field", () => {
  const wrongKind = refTo(LIB.g10);
  const cases: [field: string, problem: string, edit: (d: Draft) => void][] = [
    ["warm.finish", "missing", (d) => (d.warm.finish = missing)],
    ["warm.finish", "a reflector", (d) => (d.warm.finish = refTo(LIB.film))],
    ["cold.finish", "missing", (d) => (d.cold.finish = missing)],
    ["cold.finish", "a support material", (d) => (d.cold.finish = wrongKind)],
    ["cold.cryogen", "missing", (d) => (d.cold.cryogen = missing)],
    ["cold.cryogen", "a wall finish", (d) => (d.cold.cryogen = refTo(LIB.vessel))],
    ["layup.0.reflector", "missing", (d) => (draftBlock(d, 0).reflector = missing)],
    ["layup.0.reflector", "a spacer", (d) => (draftBlock(d, 0).reflector = refTo(LIB.netPlain))],
    ["layup.1.cryogen", "missing", (d) => (draftStage(d, 1).cryogen = missing)],
    ["layup.1.cryogen", "a support material", (d) => (draftStage(d, 1).cryogen = refTo(LIB.steel))],
    ["layup.3.finish", "missing", (d) => (draftStage(d, 3).finish = missing)],
    ["layup.3.finish", "a reflector", (d) => (draftStage(d, 3).finish = refTo(LIB.foil))],
    ["layup.2.spacer", "left empty for the layers model", (d) => (draftBlock(d, 2).spacer = null)],
    ["layup.2.spacer", "missing", (d) => (draftBlock(d, 2).spacer = missing)],
    ["layup.2.spacer", "a reflector", (d) => (draftBlock(d, 2).spacer = refTo(LIB.film))],
    ["layup.2.spacer", "a spacer without solid-conduction data", (d) => (draftBlock(d, 2).spacer = refTo(LIB.netBare))],
    ["layup.4.correlationSet", "left empty for the correlation model", (d) => (draftBlock(d, 4).correlationSet = null)],
    ["layup.4.correlationSet", "missing", (d) => (draftBlock(d, 4).correlationSet = missing)],
    ["layup.4.correlationSet", "a cryogen", (d) => (draftBlock(d, 4).correlationSet = refTo(LIB.helium))],
    ["supports.1.material", "missing", (d) => (d.supports![1].material = missing)],
    ["supports.1.material", "a spacer", (d) => (d.supports![1].material = refTo(LIB.paper))],
  ];

  it.each(cases)("%s: %s", (field, _problem, edit) => {
    const error = referenceError(edit);
    expect(error.field).toBe(field);
    expect(error.name).toBe("MaterialReferenceError");
    expect(error.message.startsWith(field)).toBe(true);
  });

  it("a version the library does not hold is missing, even when another version of the entry is there", () => {
    const error = referenceError((d) => (draftBlock(d, 0).reflector = { materialId: LIB.film.materialId, version: 7 }));
    expect(error.field).toBe("layup.0.reflector");
    expect(error.message).toMatch(/film version 7/);
  });

  it("a wrong kind says what the field needs and what the entry is", () => {
    const error = referenceError((d) => (d.warm.finish = refTo(LIB.film)));
    expect(error.message).toMatch(/wall-finish/);
    expect(error.message).toMatch(/"Aluminized polyester film" is a reflector/);
  });

  it("an entry left out of the lookup (not approved, or another organization's) is refused", () => {
    const error = referenceError(() => {}, Object.values(LIB).filter((m) => m !== LIB.nitrogen));
    expect(error.field).toBe("layup.1.cryogen");
  });
});

describe("materialRefsOf", () => {
  it("lists every reference of the design once, in form order", () => {
    const refs = materialRefsOf(parsed(cryostatInput())).map(materialKey);
    expect(refs).toEqual(
      [LIB.jacket, LIB.vessel, LIB.helium, LIB.film, LIB.netPlain, LIB.shieldFinish, LIB.nitrogen, LIB.foil, LIB.netReferenced, LIB.correlationSet, LIB.g10, LIB.steel].map(materialKey),
    );
  });

  it("holds every reference toAssembly looks up", () => {
    for (const input of [cryostatInput(), panelInput()]) {
      const content = parsed(input);
      const asked: string[] = [];
      toAssembly(content, (ref) => {
        asked.push(materialKey(ref));
        return lookup(ref);
      });
      const listed = new Set(materialRefsOf(content).map(materialKey));
      expect(asked.length).toBeGreaterThan(0);
      for (const key of asked) expect(listed).toContain(key);
    }
  });

  it("keeps two versions of one entry apart", () => {
    const content = parsed(cryostatInput(), (d) => (draftBlock(d, 4).reflector = refTo(LIB.filmV1)));
    const keys = materialRefsOf(content).map(materialKey);
    expect(keys).toContain("film@1");
    expect(keys).toContain("film@2");
  });
});
