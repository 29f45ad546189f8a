import { describe, expect, it } from "vitest";
import { predictDesign } from "../../../../shared/design/predict";
import { toAssembly, type ResolvedMaterial } from "../../../../shared/design/to-assembly";
import { DesignContentSchema, type MaterialRef } from "../../../../shared/schemas/design";
import type { MaterialKind, MaterialProperties, MaterialSummary } from "../../../../shared/schemas/material";
import { CRYOGENS } from "../../../../shared/thermal/fluids";
import type { LibraryPicks } from "../api/get-library-picks";
import { defaultContent, newBlock, newStage, refOf } from "./default-content";

// Invented library entries as the picks endpoint lists them; emissivities and spacer values are
// made up but plausible (common practice), cryogens copy the engine's own table.
function summary(id: string, name: string, properties: MaterialProperties, version = 1): MaterialSummary {
  return {
    id,
    kind: properties.kind,
    name,
    status: "approved",
    scope: "organization",
    currentVersion: version,
    latestVersion: version,
    draftVersion: null,
    pickable: true,
    updatedAt: "2026-11-30T09:00:00.000Z",
    shown: {
      materialId: id,
      version,
      name,
      properties,
      validRange_K: { min: 4, max: 300 },
      thickness_m: null,
      arealMass_kg_per_m2: null,
      cost_per_m2: null,
      source: { type: "memory", note: "invented for a unit test" },
      changeNote: null,
      status: "approved",
      isCurrent: true,
      proposedBy: null,
      proposedAt: "2026-11-30T09:00:00.000Z",
      decidedBy: null,
      decidedAt: null,
      decisionComment: null,
    },
  };
}

const cryogen = (id: string, fluid: "nitrogen" | "helium-4") => {
  const f = CRYOGENS[fluid];
  return summary(id, f.label, {
    kind: "cryogen",
    fluid,
    saturationTemperature_K: f.saturationTemperature_K,
    latentHeat_J_per_kg: f.latentHeat_J_per_kg,
    liquidDensity_kg_per_m3: f.liquidDensity_kg_per_m3,
    vapourDensity_kg_per_m3: f.vapourDensity_kg_per_m3,
    molarMass_kg_per_mol: f.molarMass_kg_per_mol,
  });
};

const E = {
  foil: summary("foil", "Aluminium foil", { kind: "reflector", form: "foil", warmSide: { model: 0.04 }, coldSide: { model: 0.04 } }),
  film: summary("film", "Aluminized polyester film", { kind: "reflector", form: "film", warmSide: { model: 0.03 }, coldSide: { model: 0.03 } }),
  bareNet: summary("net-bare", "Netting, no data", { kind: "spacer", form: "netting", solidConduction: null }),
  net: summary("net", "Polyester netting", { kind: "spacer", form: "netting", solidConduction: { conductance_W_per_m2_K: 0.05 } }),
  jacket: summary("jacket", "Polished stainless", { kind: "wall-finish", surface: { model: 0.1 } }),
  vessel: summary("vessel", "Polished vessel", { kind: "wall-finish", surface: { model: 0.05 } }),
  helium: cryogen("lhe", "helium-4"),
  nitrogen: cryogen("ln2", "nitrogen"),
};

/** Picks listed in the order given (the endpoint sorts by name; the order matters to these tests). */
function picksOf(entries: MaterialSummary[]): LibraryPicks {
  const picks: LibraryPicks = { reflector: [], spacer: [], "wall-finish": [], "support-material": [], "correlation-set": [], cryogen: [] };
  for (const m of entries) picks[m.kind as MaterialKind].push(m);
  return picks;
}

const everything = () => picksOf([E.foil, E.film, E.bareNet, E.net, E.jacket, E.vessel, E.helium, E.nitrogen]);

/** The lookup the server would build from these picks' current versions. */
function lookupFrom(picks: LibraryPicks) {
  const all = Object.values(picks).flat();
  return (ref: MaterialRef): ResolvedMaterial | undefined => {
    const m = all.find((x) => x.id === ref.materialId && x.currentVersion === ref.version);
    if (!m) return undefined;
    return { materialId: m.id, version: m.shown.version, name: m.name, properties: m.shown.properties, arealMass_kg_per_m2: null, cost_per_m2: null, thickness_m: null, source: "From memory" };
  };
}

describe("defaultContent", () => {
  it("is a valid design the engine can estimate straight away", () => {
    const picks = everything();
    const content = DesignContentSchema.parse(defaultContent(picks));
    const p = predictDesign(content, lookupFrom(picks));
    expect(p.coldHeat_W).toBeGreaterThan(0);
    expect(p.holdTime_h).toBeGreaterThan(0);
    expect(p.sweep!.layupIndex).toBe(0);
  });

  it("puts a liquid-nitrogen vessel inside a room-temperature cylinder with two flat ends", () => {
    const picks = everything();
    const d = defaultContent(picks);
    expect(d.geometry).toEqual({ kind: "cylinder", coldRadius_m: 0.25, warmRadius_m: 0.3, length_m: 1, flatEnds: 2 });
    expect(d.cold.cryogen).toEqual({ materialId: "ln2", version: 1 });
    expect(d.cold.temperature_K).toBeNull();
    expect(d.warm.finish).toEqual(refOf(E.jacket));
    expect(d.cold.finish).toEqual(refOf(E.jacket));
    // On the engine's side the vessel is at nitrogen's boiling point with the nitrogen fluid.
    const a = toAssembly(DesignContentSchema.parse(d), lookupFrom(picks));
    expect(a.cold).toMatchObject({ temperature_K: CRYOGENS.nitrogen.saturationTemperature_K, cryogen: "nitrogen", capacity_L: 180, fillFraction: 1, minimumFraction: 0.1 });
  });

  it("takes the first cryogen without a nitrogen entry, and a fixed 77 K without any cryogen", () => {
    const heliumOnly = defaultContent(picksOf([E.film, E.net, E.jacket, E.helium]));
    expect(heliumOnly.cold.cryogen).toEqual(refOf(E.helium));
    const none = defaultContent(picksOf([E.film, E.net, E.jacket]));
    expect(none.cold).toMatchObject({ cryogen: null, temperature_K: 77 });
    // The schema requires a temperature exactly when there is no cryogen: both are valid.
    expect(DesignContentSchema.safeParse(heliumOnly).success).toBe(true);
    expect(DesignContentSchema.safeParse(none).success).toBe(true);
  });
});

describe("newBlock", () => {
  it("prefers a film reflector and a spacer with solid-conduction data, and then models layer by layer", () => {
    const b = newBlock(everything());
    expect(b).toEqual({
      kind: "block",
      layers: 20,
      reflector: refOf(E.film),
      spacer: refOf(E.net),
      layerDensity_per_cm: 20,
      model: "layers",
      correlationSet: null,
      degradationFactor: 1,
    });
  });

  it("falls back to pure radiation when no spacer has solid-conduction data, and to the first reflector", () => {
    const withBare = newBlock(picksOf([E.foil, E.bareNet]));
    expect(withBare).toMatchObject({ reflector: refOf(E.foil), spacer: refOf(E.bareNet), model: "radiation" });
    expect(newBlock(picksOf([E.foil]))).toMatchObject({ spacer: null, model: "radiation" });
  });

  it("copies a block it is given, without its label", () => {
    const like = { ...newBlock(everything()), label: "outer", layers: 45 };
    const copy = newBlock(everything(), like);
    expect(copy).toEqual({ ...like, label: undefined });
    expect(copy).not.toBe(like);
  });
});

describe("newStage", () => {
  it("is a nitrogen-cooled shield at nitrogen's saturation temperature", () => {
    const s = newStage(everything(), 2);
    expect(s).toEqual({ kind: "stage", label: "Shield 2", temperature_K: CRYOGENS.nitrogen.saturationTemperature_K, cryogen: refOf(E.nitrogen), capacity_L: null, finish: refOf(E.jacket) });
  });

  it("is a fixed 77 K shield without a nitrogen entry", () => {
    expect(newStage(picksOf([E.helium, E.vessel]), 1)).toMatchObject({ temperature_K: 77, cryogen: null, finish: refOf(E.vessel) });
  });

  it("between two new blocks gives a valid design whose shield is a sink with boil-off", () => {
    const picks = everything();
    const d = defaultContent(picks);
    d.cold.cryogen = refOf(E.helium);
    d.layup = [newBlock(picks), newStage(picks, 1), newBlock(picks)];
    const p = predictDesign(DesignContentSchema.parse(d), lookupFrom(picks));
    expect(p.result.stages.map((s) => s.label)).toEqual(["Shield 1", "cold vessel"]);
    expect(p.result.stages[0].boilOff!.liquidVolume_L_per_day).toBeGreaterThan(0);
    expect(p.sweep!.layupIndex).toBe(2);
  });
});

describe("refOf", () => {
  it("names the current approved version, not a newer draft", () => {
    const drafted: MaterialSummary = { ...summary("film", "Film", E.film.shown.properties, 2), latestVersion: 3, draftVersion: 3 };
    expect(refOf(drafted)).toEqual({ materialId: "film", version: 2 });
  });
});
