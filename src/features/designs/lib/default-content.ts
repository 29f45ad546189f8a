import type { DesignContentInput, MaterialRef } from "../../../../shared/schemas/design";
import type { MaterialSummary } from "../../../../shared/schemas/material";
import type { LibraryPicks } from "../api/get-library-picks";

export const refOf = (m: MaterialSummary): MaterialRef => ({ materialId: m.id, version: m.currentVersion as number });

const first = (list: MaterialSummary[], prefer?: (m: MaterialSummary) => boolean) => list.find((m) => prefer?.(m) ?? false) ?? list[0];

type Block = Extract<DesignContentInput["layup"][number], { kind: "block" }>;
type Stage = Extract<DesignContentInput["layup"][number], { kind: "stage" }>;

/**
 * A new block: the library's first film reflector, with a spacer that has solid-conduction
 * data so the layer-by-layer model works from the start. 20 layers/cm is a common blanket.
 */
export function newBlock(picks: LibraryPicks, like?: Block): Block {
  if (like) return { ...like, label: undefined };
  const reflector = first(picks.reflector, (m) => m.shown.properties.kind === "reflector" && m.shown.properties.form === "film");
  const spacer = first(picks.spacer, (m) => m.shown.properties.kind === "spacer" && m.shown.properties.solidConduction != null);
  const layered = spacer?.shown.properties.kind === "spacer" && spacer.shown.properties.solidConduction != null;
  return {
    kind: "block",
    layers: 20,
    reflector: reflector ? refOf(reflector) : (undefined as never),
    spacer: spacer ? refOf(spacer) : null,
    layerDensity_per_cm: 20,
    model: layered ? "layers" : "radiation",
    correlationSet: null,
    degradationFactor: 1,
  };
}

export function newStage(picks: LibraryPicks, index: number): Stage {
  const nitrogen = picks.cryogen.find((m) => m.shown.properties.kind === "cryogen" && m.shown.properties.fluid === "nitrogen");
  const t = nitrogen?.shown.properties.kind === "cryogen" ? nitrogen.shown.properties.saturationTemperature_K : 77;
  const finish = picks["wall-finish"][0];
  return {
    kind: "stage",
    label: `Shield ${index}`,
    temperature_K: t,
    cryogen: nitrogen ? refOf(nitrogen) : null,
    capacity_L: null,
    finish: finish ? refOf(finish) : (undefined as never),
  };
}

/** A plain starting point: a cylinder at room temperature around a liquid-nitrogen vessel, one block. */
export function defaultContent(picks: LibraryPicks): DesignContentInput {
  const finish = picks["wall-finish"][0];
  const nitrogen = picks.cryogen.find((m) => m.shown.properties.kind === "cryogen" && m.shown.properties.fluid === "nitrogen") ?? picks.cryogen[0];
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.25, warmRadius_m: 0.3, length_m: 1, flatEnds: 2 },
    warm: { temperature_K: 293, finish: finish ? refOf(finish) : (undefined as never) },
    cold: {
      cryogen: nitrogen ? refOf(nitrogen) : null,
      temperature_K: nitrogen ? null : 77,
      finish: finish ? refOf(finish) : (undefined as never),
      capacity_L: 180,
      fillFraction: 1,
      minimumFraction: 0.1,
    },
    layup: [newBlock(picks)],
    supports: [],
    vacuum: { pressure_Pa: 1e-3, gas: "nitrogen" },
    targetColdHeat_W: null,
  };
}
