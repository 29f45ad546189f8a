import { and, desc, eq, inArray, isNull, like, or } from "drizzle-orm";
import type { Tx } from "../client";
import { designRevisions, designs } from "../schema/designs";
import { materials, materialVersions, users } from "../schema";

export type DesignRow = typeof designs.$inferSelect;
export type RevisionRow = typeof designRevisions.$inferSelect;
type NewRevision = Omit<typeof designRevisions.$inferInsert, "organizationId">;

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function listDesigns(db: Tx, organizationId: string, q?: string) {
  const where = q ? and(eq(designs.organizationId, organizationId), like(designs.name, `%${escapeLike(q)}%`)) : eq(designs.organizationId, organizationId);
  return db
    .select({ design: designs, createdBy: users.name })
    .from(designs)
    .leftJoin(users, eq(users.id, designs.createdByUserId))
    .where(where)
    .orderBy(desc(designs.updatedAt))
    .limit(1000);
}

export async function findDesign(db: Tx, organizationId: string, id: string, lock = false) {
  const query = db.select().from(designs).where(and(eq(designs.organizationId, organizationId), eq(designs.id, id))).limit(1);
  const [row] = lock ? await query.for("update") : await query;
  return row ?? null;
}

export async function listRevisions(db: Tx, organizationId: string, designId: string) {
  return db
    .select({
      revision: designRevisions.revision,
      name: designRevisions.name,
      changeNote: designRevisions.changeNote,
      createdAt: designRevisions.createdAt,
      createdBy: users.name,
      prediction: designRevisions.prediction,
    })
    .from(designRevisions)
    .leftJoin(users, eq(users.id, designRevisions.createdByUserId))
    .where(and(eq(designRevisions.organizationId, organizationId), eq(designRevisions.designId, designId)))
    .orderBy(desc(designRevisions.revision));
}

export async function findRevision(db: Tx, organizationId: string, designId: string, revision: number) {
  const [row] = await db
    .select({ revision: designRevisions, createdBy: users.name })
    .from(designRevisions)
    .leftJoin(users, eq(users.id, designRevisions.createdByUserId))
    .where(and(eq(designRevisions.organizationId, organizationId), eq(designRevisions.designId, designId), eq(designRevisions.revision, revision)))
    .limit(1);
  return row ?? null;
}

export async function insertDesign(db: Tx, organizationId: string, row: Omit<typeof designs.$inferInsert, "organizationId">) {
  await db.insert(designs).values({ ...row, organizationId });
}

export async function insertRevision(db: Tx, organizationId: string, row: NewRevision) {
  await db.insert(designRevisions).values({ ...row, organizationId });
}

export async function updateDesignHead(
  db: Tx,
  organizationId: string,
  id: string,
  patch: { name: string; geometryKind: "planar" | "cylinder" | "sphere"; latestRevision: number; coldHeat_W: number | null; boilOff_L_per_day: number | null; updatedAt: Date },
) {
  await db.update(designs).set(patch).where(and(eq(designs.organizationId, organizationId), eq(designs.id, id)));
}

/**
 * The library versions a design names, as this organization sees them (its own and the seed),
 * with the entry's state: a retired entry still resolves so old revisions reproduce.
 */
export async function findVisibleMaterialVersions(db: Tx, organizationId: string, refs: { materialId: string; version: number }[]) {
  if (refs.length === 0) return [];
  const ids = [...new Set(refs.map((r) => r.materialId))];
  const rows = await db
    .select({ version: materialVersions, material: materials })
    .from(materialVersions)
    .innerJoin(materials, eq(materials.id, materialVersions.materialId))
    .where(and(inArray(materialVersions.materialId, ids), or(eq(materials.organizationId, organizationId), isNull(materials.organizationId))));
  const wanted = new Set(refs.map((r) => `${r.materialId}@${r.version}`));
  return rows.filter((r) => wanted.has(`${r.version.materialId}@${r.version.version}`));
}

