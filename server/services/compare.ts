import type { ResolvedMaterial } from "../../shared/design/to-assembly";
import { materialKey } from "../../shared/design/to-assembly";
import type { CompareResult, DesignContent, RevisionDetail } from "../../shared/schemas/design";
import { findDesign } from "../db/repositories/designs";
import { notFound } from "../errors";
import type { Actor, ServiceContext } from "./context";
import { getRevision } from "./designs";

const DAYS_PER_YEAR = 365.25;

/** Side by side: the latest revision of each design, or the revision named as id:rev. */
export async function compareDesigns(ctx: ServiceContext, actor: Actor, ids: string[], pricePerL?: number): Promise<CompareResult> {
  const items = [];
  for (const spec of ids) {
    const [id, rev] = spec.split(":");
    const design = await findDesign(ctx.db, actor.organizationId, id);
    if (!design) throw notFound(`design ${id}`);
    const detail = await getRevision(ctx, actor, id, rev ? Number(rev) : design.latestRevision);
    items.push(compareItem(detail, pricePerL ?? null));
  }
  return { price_per_L: pricePerL ?? null, items };
}

function compareItem(r: RevisionDetail, pricePerL: number | null) {
  const names = new Map(r.materials.map((m) => [`${m.materialId}@${m.version}`, m.name]));
  const cryogenOf = (layupIndex: number | null) => {
    const item = layupIndex === null ? null : r.content.layup[layupIndex];
    const ref = layupIndex === null ? r.content.cold.cryogen : item?.kind === "stage" ? item.cryogen : null;
    return ref ? names.get(materialKey(ref)) ?? null : null;
  };
  const stages = r.prediction.result.stages.map((s) => ({
    label: s.label,
    heatIn_W: s.heatIn.total_W,
    net_W: s.net_W,
    boilOff_L_per_day: s.boilOff ? s.boilOff.liquidVolume_L_per_day : null,
    cryogen: cryogenOf(s.layupIndex),
  }));
  const withBoilOff = stages.filter((s) => s.boilOff_L_per_day !== null);
  const yearlyBoilOff_L = withBoilOff.length ? withBoilOff.reduce((sum, s) => sum + (s.boilOff_L_per_day as number), 0) * DAYS_PER_YEAR : null;
  const { mass, cost } = blanketMassAndCost(r.content, r.materials);
  return {
    designId: r.designId,
    revision: r.revision,
    name: r.name,
    prediction: r.prediction,
    stages,
    holdTime_h: r.prediction.holdTime_h,
    yearlyBoilOff_L,
    yearlyCryogenCost: yearlyBoilOff_L !== null && pricePerL !== null ? yearlyBoilOff_L * pricePerL : null,
    blanketMass_kg: mass,
    blanketCost: cost,
  };
}

/**
 * Blanket mass and cost: per block, layers × (reflector + spacer areal mass or cost) over the
 * area at mid-gap (planar: the area; cylinder: lateral plus flat ends at the mean radius;
 * sphere: at the mean radius). Null when any block's materials lack the figure.
 */
export function blanketMassAndCost(content: DesignContent, materials: ResolvedMaterial[]): { mass: number | null; cost: number | null } {
  const byKey = new Map(materials.map((m) => [`${m.materialId}@${m.version}`, m]));
  const g = content.geometry;
  const area =
    g.kind === "planar"
      ? g.area_m2
      : g.kind === "cylinder"
        ? 2 * Math.PI * ((g.coldRadius_m + g.warmRadius_m) / 2) * g.length_m + g.flatEnds * Math.PI * ((g.coldRadius_m + g.warmRadius_m) / 2) ** 2
        : 4 * Math.PI * ((g.coldRadius_m + g.warmRadius_m) / 2) ** 2;
  let mass: number | null = 0;
  let cost: number | null = 0;
  for (const item of content.layup) {
    if (item.kind !== "block") continue;
    const parts = [byKey.get(materialKey(item.reflector)), item.spacer ? byKey.get(materialKey(item.spacer)) : undefined].filter((m): m is ResolvedMaterial => !!m);
    const perLayerMass = parts.every((m) => m.arealMass_kg_per_m2 != null) ? parts.reduce((s, m) => s + (m.arealMass_kg_per_m2 as number), 0) : null;
    const perLayerCost = parts.every((m) => m.cost_per_m2 != null) ? parts.reduce((s, m) => s + (m.cost_per_m2 as number), 0) : null;
    mass = mass !== null && perLayerMass !== null ? mass + perLayerMass * item.layers * area : null;
    cost = cost !== null && perLayerCost !== null ? cost + perLayerCost * item.layers * area : null;
  }
  return { mass, cost };
}
