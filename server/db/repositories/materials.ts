import { and, asc, desc, eq, inArray, isNull, like, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import type { MaterialListQuery } from "../../../shared/schemas/material";
import type { Tx } from "../client";
import { materials, materialVersions, users } from "../schema";

export type MaterialRow = typeof materials.$inferSelect;
export type MaterialVersionRow = typeof materialVersions.$inferSelect;
export type NewMaterialRow = Omit<typeof materials.$inferInsert, "organizationId">;
export type NewMaterialVersionRow = typeof materialVersions.$inferInsert;
export interface VersionWithPeople {
  version: MaterialVersionRow;
  proposedBy: string | null;
  decidedBy: string | null;
}

const proposer = alias(users, "proposer");
const decider = alias(users, "decider");
const retirer = alias(users, "retirer");

/** An organization sees its own entries and the global seed (organization_id NULL). */
const visibleTo = (organizationId: string) => or(eq(materials.organizationId, organizationId), isNull(materials.organizationId))!;
const ownedBy = (organizationId: string) => eq(materials.organizationId, organizationId);
// Version rows carry no organization: scope them through their entry.
const versionsOwnedBy = (db: Tx, organizationId: string) =>
  inArray(materialVersions.materialId, db.select({ id: materials.id }).from(materials).where(ownedBy(organizationId)));

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Entries with the version a list shows: the current approved one, else the latest. */
export async function listMaterials(db: Tx, organizationId: string, filter: MaterialListQuery) {
  const where: SQL[] = [visibleTo(organizationId)];
  if (filter.kind) where.push(eq(materials.kind, filter.kind));
  if (filter.status) where.push(eq(materials.status, filter.status));
  if (filter.scope === "seed") where.push(isNull(materials.organizationId));
  if (filter.scope === "organization") where.push(ownedBy(organizationId));
  if (filter.q) where.push(like(materials.name, `%${escapeLike(filter.q)}%`));
  const rows = await db
    .select({ material: materials, version: materialVersions, proposedBy: proposer.name, decidedBy: decider.name })
    .from(materials)
    .innerJoin(
      materialVersions,
      and(eq(materialVersions.materialId, materials.id), eq(materialVersions.version, sql`coalesce(${materials.currentVersion}, ${materials.latestVersion})`)),
    )
    .leftJoin(proposer, eq(proposer.id, materialVersions.proposedByUserId))
    .leftJoin(decider, eq(decider.id, materialVersions.decidedByUserId))
    .where(and(...where))
    .orderBy(asc(materials.kind), asc(materials.name))
    .limit(5000);
  return rows;
}

/** One visible entry (own or seed); `lock` takes a row lock for a change in a transaction. */
export async function findVisibleMaterial(db: Tx, organizationId: string, id: string, lock = false) {
  const query = db
    .select({ material: materials, retiredBy: retirer.name })
    .from(materials)
    .leftJoin(retirer, eq(retirer.id, materials.retiredByUserId))
    .where(and(visibleTo(organizationId), eq(materials.id, id)))
    .limit(1);
  const [row] = lock ? await query.for("update") : await query;
  return row ?? null;
}

export async function listVersions(db: Tx, organizationId: string, materialId: string): Promise<VersionWithPeople[]> {
  return db
    .select({ version: materialVersions, proposedBy: proposer.name, decidedBy: decider.name })
    .from(materialVersions)
    .innerJoin(materials, eq(materials.id, materialVersions.materialId))
    .leftJoin(proposer, eq(proposer.id, materialVersions.proposedByUserId))
    .leftJoin(decider, eq(decider.id, materialVersions.decidedByUserId))
    .where(and(visibleTo(organizationId), eq(materialVersions.materialId, materialId)))
    .orderBy(desc(materialVersions.version));
}

export async function findVersion(db: Tx, organizationId: string, materialId: string, version: number): Promise<VersionWithPeople | null> {
  const [row] = await db
    .select({ version: materialVersions, proposedBy: proposer.name, decidedBy: decider.name })
    .from(materialVersions)
    .innerJoin(materials, eq(materials.id, materialVersions.materialId))
    .leftJoin(proposer, eq(proposer.id, materialVersions.proposedByUserId))
    .leftJoin(decider, eq(decider.id, materialVersions.decidedByUserId))
    .where(and(visibleTo(organizationId), eq(materialVersions.materialId, materialId), eq(materialVersions.version, version)))
    .limit(1);
  return row ?? null;
}

/** Visible entries already using any of these names (case-insensitive by collation). */
export async function findNamesInUse(db: Tx, organizationId: string, names: string[], exceptMaterialId?: string) {
  if (names.length === 0) return [];
  const rows = await db
    .select({ id: materials.id, name: materials.name })
    .from(materials)
    .where(and(visibleTo(organizationId), inArray(materials.name, names)));
  return rows.filter((r) => r.id !== exceptMaterialId);
}

export async function insertMaterials(db: Tx, organizationId: string, rows: NewMaterialRow[]) {
  if (rows.length > 0) await db.insert(materials).values(rows.map((r) => ({ ...r, organizationId })));
}

/** The caller has checked that every version's entry belongs to organizationId (the rows carry no organization). */
export async function insertVersions(db: Tx, organizationId: string, rows: NewMaterialVersionRow[]) {
  if (rows.length === 0) return;
  const owned = await db
    .select({ id: materials.id })
    .from(materials)
    .where(and(ownedBy(organizationId), inArray(materials.id, [...new Set(rows.map((r) => r.materialId))])));
  if (owned.length !== new Set(rows.map((r) => r.materialId)).size) throw new Error("insertVersions: an entry is not the organization's own");
  await db.insert(materialVersions).values(rows);
}

export async function updateMaterial(db: Tx, organizationId: string, id: string, patch: Partial<Omit<NewMaterialRow, "id">>) {
  const [result] = await db.update(materials).set(patch).where(and(ownedBy(organizationId), eq(materials.id, id)));
  return result.affectedRows > 0;
}

/** Only a draft row can change: the status condition is what keeps approved versions immutable. */
export async function replaceDraftVersion(
  db: Tx,
  organizationId: string,
  materialId: string,
  version: number,
  patch: Omit<NewMaterialVersionRow, "id" | "materialId" | "version" | "status" | "decidedAt" | "decidedByUserId" | "decisionComment">,
) {
  const [result] = await db
    .update(materialVersions)
    .set(patch)
    .where(and(versionsOwnedBy(db, organizationId), eq(materialVersions.materialId, materialId), eq(materialVersions.version, version), eq(materialVersions.status, "draft")));
  return result.affectedRows > 0;
}

export async function decideDraftVersion(
  db: Tx,
  organizationId: string,
  materialId: string,
  version: number,
  decision: { status: "approved" | "rejected"; decidedByUserId: string; decidedAt: Date; decisionComment: string | null },
) {
  const [result] = await db
    .update(materialVersions)
    .set(decision)
    .where(and(versionsOwnedBy(db, organizationId), eq(materialVersions.materialId, materialId), eq(materialVersions.version, version), eq(materialVersions.status, "draft")));
  return result.affectedRows > 0;
}

// ── The global seed ─────────────────────────────────────────────────────────────────────────
// Seed entries belong to no organization, so these are the only functions without one; only
// server/db/seed/library.ts calls them.

export async function findSeedMaterial(db: Tx, id: string) {
  const [row] = await db
    .select({ material: materials, version: materialVersions })
    .from(materials)
    .innerJoin(materialVersions, and(eq(materialVersions.materialId, materials.id), eq(materialVersions.version, materials.latestVersion)))
    .where(and(isNull(materials.organizationId), eq(materials.id, id)))
    .limit(1);
  return row ?? null;
}

export async function insertSeedMaterial(db: Tx, row: NewMaterialRow, version: NewMaterialVersionRow) {
  await db.insert(materials).values({ ...row, organizationId: null });
  await db.insert(materialVersions).values(version);
}

export async function addSeedVersion(db: Tx, id: string, version: NewMaterialVersionRow, patch: Partial<NewMaterialRow>) {
  await db.insert(materialVersions).values(version);
  await db.update(materials).set(patch).where(and(isNull(materials.organizationId), eq(materials.id, id)));
}
