import { materialKey, materialRefsOf, type ResolvedMaterial } from "../../shared/design/to-assembly";
import type { DesignContent, MaterialRef } from "../../shared/schemas/design";
import { formatSource } from "../../shared/schemas/material";
import { findVisibleMaterialVersions } from "../db/repositories/designs";
import type { Tx } from "../db/client";
import type { VersionLoader } from "../cache/library-cache";

/**
 * Loads the library versions a design names. Only approved versions of entries this
 * organization can see resolve; a retired entry resolves only where `keep` already held it
 * (an old revision being edited), so retired materials stay out of new designs. The live
 * preview passes the library cache's loader; saves read the database in their transaction.
 */
export async function resolveDesignMaterials(
  db: Tx,
  organizationId: string,
  content: DesignContent,
  keep: Set<string> = new Set(),
  load: VersionLoader = findVisibleMaterialVersions,
) {
  const refs = materialRefsOf(content);
  const rows = await load(db, organizationId, refs);
  const resolved = new Map<string, ResolvedMaterial>();
  for (const { version: v, material: m } of rows) {
    const key = `${v.materialId}@${v.version}`;
    if (v.status !== "approved") continue;
    if (m.retiredAt && !keep.has(key)) continue;
    resolved.set(key, {
      materialId: v.materialId,
      version: v.version,
      name: v.name,
      properties: v.properties,
      arealMass_kg_per_m2: v.arealMassKgPerM2,
      cost_per_m2: v.costPerM2,
      thickness_m: v.thicknessM,
      source: formatSource(v.source),
    });
  }
  return { lookup: (ref: MaterialRef) => resolved.get(materialKey(ref)), list: [...resolved.values()] };
}

/** A revision's own snapshot of its materials, for reproducing it without the library. */
export function lookupFromSnapshot(materials: ResolvedMaterial[]) {
  const byKey = new Map(materials.map((m) => [`${m.materialId}@${m.version}`, m]));
  return (ref: MaterialRef) => byKey.get(materialKey(ref));
}
