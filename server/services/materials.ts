import type { Cryogen, CryogenList } from "../../shared/schemas/cryogen";
import {
  formatSource,
  type ApprovalInput,
  type MaterialDetail,
  type MaterialList,
  type MaterialListQuery,
  type MaterialSummary,
  type MaterialVersion,
  type MaterialVersionInput,
} from "../../shared/schemas/material";
import { CRYOGENS, ventedGasFactor } from "../../shared/thermal/fluids";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/materials";
import type { Tx } from "../db/client";
import { AppError, conflict, invalidInput, notFound } from "../errors";
import { newId } from "../ids";
import { isDuplicateKey } from "./auth";
import type { Actor, ServiceContext } from "./context";

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function toVersion(material: repo.MaterialRow, row: repo.VersionWithPeople): MaterialVersion {
  const v = row.version;
  return {
    materialId: v.materialId,
    version: v.version,
    status: v.status,
    isCurrent: material.currentVersion === v.version,
    name: v.name,
    properties: v.properties,
    validRange_K: { min: v.validMinK, max: v.validMaxK },
    thickness_m: v.thicknessM,
    arealMass_kg_per_m2: v.arealMassKgPerM2,
    cost_per_m2: v.costPerM2,
    source: v.source,
    changeNote: v.changeNote,
    proposedBy: row.proposedBy,
    proposedAt: v.proposedAt.toISOString(),
    decidedBy: row.decidedBy,
    decidedAt: iso(v.decidedAt),
    decisionComment: v.decisionComment,
  };
}

export function toSummary(material: repo.MaterialRow, shown: repo.VersionWithPeople): MaterialSummary {
  return {
    id: material.id,
    kind: material.kind,
    name: material.name,
    status: material.status,
    scope: material.organizationId === null ? "seed" : "organization",
    currentVersion: material.currentVersion,
    latestVersion: material.latestVersion,
    draftVersion: material.draftVersion,
    pickable: material.status === "approved",
    updatedAt: material.updatedAt.toISOString(),
    shown: toVersion(material, shown),
  };
}

/** The version's columns from a validated input. */
export function versionColumns(input: MaterialVersionInput) {
  return {
    name: input.name,
    properties: input.properties,
    validMinK: input.validRange_K.min,
    validMaxK: input.validRange_K.max,
    thicknessM: input.thickness_m ?? null,
    arealMassKgPerM2: input.arealMass_kg_per_m2 ?? null,
    costPerM2: input.cost_per_m2 ?? null,
    source: input.source,
  };
}

const seedReadOnly = () =>
  new AppError(403, "seed_read_only", "Seed entries are shared by every organization and cannot be changed. Copy the entry into your library to adjust it.");
const nameTaken = (name: string) => conflict("name_taken", `The library already has an entry named "${name}". Pick another name (names are unique, ignoring case).`);

export async function assertNameFree(tx: Tx, organizationId: string, name: string, exceptMaterialId?: string) {
  if ((await repo.findNamesInUse(tx, organizationId, [name], exceptMaterialId)).length > 0) throw nameTaken(name);
}

/** A change the caller may make: the entry must be its organization's own, not the seed's. */
async function lockOwn(tx: Tx, actor: Actor, id: string) {
  const found = await repo.findVisibleMaterial(tx, actor.organizationId, id, true);
  if (!found) throw notFound("library entry");
  if (found.material.organizationId === null) throw seedReadOnly();
  return found.material;
}

async function audit(tx: Tx, actor: Actor, action: string, materialId: string, detail: Record<string, unknown>, now: Date) {
  await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action, entityType: "material", entityId: materialId, detail }, now);
}

/** Unique-name races end at the index; say it the same way as the check before it. */
async function withNameGuard<T>(name: string | (() => string), work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (isDuplicateKey(error)) throw nameTaken(typeof name === "string" ? name : name());
    throw error;
  }
}

export async function listMaterials(ctx: ServiceContext, actor: Actor, filter: MaterialListQuery): Promise<MaterialList> {
  const rows = await repo.listMaterials(ctx.db, actor.organizationId, filter);
  return { materials: rows.map((r) => toSummary(r.material, r)) };
}

export async function getMaterial(ctx: ServiceContext, actor: Actor, id: string): Promise<MaterialDetail> {
  const found = await repo.findVisibleMaterial(ctx.db, actor.organizationId, id);
  if (!found) throw notFound("library entry");
  const { material } = found;
  const versions = await repo.listVersions(ctx.db, actor.organizationId, id);
  const shown = versions.find((v) => v.version.version === (material.currentVersion ?? material.latestVersion)) ?? versions[0];
  return {
    ...toSummary(material, shown),
    versions: versions.map((v) => toVersion(material, v)),
    copiedFrom: material.copiedFromMaterialId ? { materialId: material.copiedFromMaterialId, version: material.copiedFromVersion ?? 1 } : null,
    retired: material.retiredAt ? { at: material.retiredAt.toISOString(), by: found.retiredBy, comment: material.retireComment } : null,
  };
}

/** Any version of a visible entry, retired or not: old designs must still resolve. */
export async function getMaterialVersion(ctx: ServiceContext, actor: Actor, id: string, version: number): Promise<MaterialVersion> {
  const found = await repo.findVisibleMaterial(ctx.db, actor.organizationId, id);
  if (!found) throw notFound("library entry");
  const row = await repo.findVersion(ctx.db, actor.organizationId, id, version);
  if (!row) throw notFound(`version ${version} of this library entry`);
  return toVersion(found.material, row);
}

/** Rows for a new draft entry in the caller's organization (create, copy and import share them). */
export function newEntryRows(actor: Actor, input: MaterialVersionInput, now: Date, extra: { changeNote: string; copiedFrom?: { materialId: string; version: number } }) {
  const id = newId();
  const material: repo.NewMaterialRow = {
    id,
    kind: input.properties.kind,
    name: input.name,
    status: "draft",
    currentVersion: null,
    latestVersion: 1,
    draftVersion: 1,
    copiedFromMaterialId: extra.copiedFrom?.materialId ?? null,
    copiedFromVersion: extra.copiedFrom?.version ?? null,
    createdAt: now,
    updatedAt: now,
  };
  const version: repo.NewMaterialVersionRow = {
    id: newId(),
    materialId: id,
    version: 1,
    status: "draft",
    ...versionColumns(input),
    changeNote: extra.changeNote,
    proposedByUserId: actor.userId,
    proposedAt: now,
  };
  return { id, material, version };
}

export async function createMaterial(ctx: ServiceContext, actor: Actor, input: MaterialVersionInput): Promise<MaterialDetail> {
  const now = ctx.clock();
  const rows = newEntryRows(actor, input, now, { changeNote: input.changeNote || "First version" });
  await withNameGuard(input.name, () =>
    ctx.db.transaction(async (tx) => {
      await assertNameFree(tx, actor.organizationId, input.name);
      await repo.insertMaterials(tx, actor.organizationId, [rows.material]);
      await repo.insertVersions(tx, actor.organizationId, [rows.version]);
      await audit(tx, actor, "material.create", rows.id, { version: 1, name: input.name, kind: input.properties.kind }, now);
    }),
  );
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, rows.id);
}

function assertSameKind(material: repo.MaterialRow, input: MaterialVersionInput) {
  if (input.properties.kind !== material.kind) {
    const message = `properties.kind must stay ${material.kind}: an entry's kind cannot change (create a new entry instead)`;
    throw invalidInput(message, [{ path: "properties.kind", message }]);
  }
}

/** A proposed change: a new draft version; the approved one stays current until an owner decides. */
export async function proposeVersion(ctx: ServiceContext, actor: Actor, id: string, input: MaterialVersionInput): Promise<MaterialDetail> {
  const now = ctx.clock();
  await withNameGuard(input.name, () =>
    ctx.db.transaction(async (tx) => {
      const material = await lockOwn(tx, actor, id);
      if (material.status === "retired") throw conflict("retired", "This entry is retired; copy it to start a new one.");
      if (material.draftVersion !== null) {
        throw conflict("draft_open", `Version ${material.draftVersion} is still a draft: edit it, or have an owner approve or reject it first.`);
      }
      assertSameKind(material, input);
      await assertNameFree(tx, actor.organizationId, input.name, id);
      const version = material.latestVersion + 1;
      await repo.insertVersions(tx, actor.organizationId, [
        { id: newId(), materialId: id, version, status: "draft", ...versionColumns(input), changeNote: input.changeNote ?? null, proposedByUserId: actor.userId, proposedAt: now },
      ]);
      await repo.updateMaterial(tx, actor.organizationId, id, {
        latestVersion: version,
        draftVersion: version,
        status: material.currentVersion === null ? "draft" : material.status,
        ...(material.currentVersion === null ? { name: input.name } : {}),
        updatedAt: now,
      });
      await audit(tx, actor, "material.propose", id, { version, changeNote: input.changeNote }, now);
    }),
  );
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, id);
}

/** Replaces an open draft in place. Approved and rejected versions are history: 409. */
export async function replaceDraft(ctx: ServiceContext, actor: Actor, id: string, version: number, input: MaterialVersionInput): Promise<MaterialDetail> {
  const now = ctx.clock();
  await withNameGuard(input.name, () =>
    ctx.db.transaction(async (tx) => {
      const material = await lockOwn(tx, actor, id);
      const existing = await repo.findVersion(tx, actor.organizationId, id, version);
      if (!existing) throw notFound(`version ${version} of this library entry`);
      if (existing.version.status !== "draft") {
        throw conflict("version_immutable", `Version ${version} is ${existing.version.status} and can no longer change. Propose a new version instead.`);
      }
      assertSameKind(material, input);
      await assertNameFree(tx, actor.organizationId, input.name, id);
      const changed = await repo.replaceDraftVersion(tx, actor.organizationId, id, version, {
        ...versionColumns(input),
        changeNote: input.changeNote ?? existing.version.changeNote,
        proposedByUserId: actor.userId,
        proposedAt: now,
      });
      if (!changed) throw conflict("version_immutable", `Version ${version} is no longer a draft.`);
      await repo.updateMaterial(tx, actor.organizationId, id, { ...(material.currentVersion === null ? { name: input.name } : {}), updatedAt: now });
      await audit(tx, actor, "material.edit_draft", id, { version }, now);
    }),
  );
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, id);
}

/** An owner's decision on the open draft: approving makes it current, rejecting keeps it with the comment. */
export async function decideDraft(ctx: ServiceContext, actor: Actor, id: string, input: ApprovalInput): Promise<MaterialDetail> {
  const now = ctx.clock();
  let draftName = "";
  await withNameGuard(() => draftName, () =>
    ctx.db.transaction(async (tx) => {
      const material = await lockOwn(tx, actor, id);
      const version = material.draftVersion;
      if (version === null) throw conflict("no_draft", "This entry has no draft waiting for a decision.");
      if (input.version !== undefined && input.version !== version) {
        throw conflict("stale_draft", `The open draft is version ${version}, not ${input.version}: reload and look again.`);
      }
      const draft = (await repo.findVersion(tx, actor.organizationId, id, version))!;
      draftName = draft.version.name;
      const comment = input.comment || null;
      if (input.decision === "approve") {
        await assertNameFree(tx, actor.organizationId, draft.version.name, id);
        await repo.decideDraftVersion(tx, actor.organizationId, id, version, { status: "approved", decidedByUserId: actor.userId, decidedAt: now, decisionComment: comment });
        await repo.updateMaterial(tx, actor.organizationId, id, { currentVersion: version, draftVersion: null, status: "approved", name: draft.version.name, updatedAt: now });
      } else {
        await repo.decideDraftVersion(tx, actor.organizationId, id, version, { status: "rejected", decidedByUserId: actor.userId, decidedAt: now, decisionComment: comment });
        await repo.updateMaterial(tx, actor.organizationId, id, { draftVersion: null, status: material.currentVersion === null ? "rejected" : "approved", updatedAt: now });
      }
      await audit(tx, actor, input.decision === "approve" ? "material.approve" : "material.reject", id, { version, comment }, now);
    }),
  );
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, id);
}

/** Retired entries cannot be picked for new designs; every version still resolves for old ones. */
export async function retireMaterial(ctx: ServiceContext, actor: Actor, id: string, comment: string | null): Promise<MaterialDetail> {
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    const material = await lockOwn(tx, actor, id);
    if (material.status === "retired") throw conflict("retired", "This entry is already retired.");
    if (material.currentVersion === null) throw conflict("not_approved", "Only an approved entry can be retired; reject its draft instead.");
    // A pending change to something no longer used is moot: close it, saying why.
    if (material.draftVersion !== null) {
      await repo.decideDraftVersion(tx, actor.organizationId, id, material.draftVersion, { status: "rejected", decidedByUserId: actor.userId, decidedAt: now, decisionComment: "Rejected because the entry was retired." });
    }
    await repo.updateMaterial(tx, actor.organizationId, id, { status: "retired", draftVersion: null, retiredAt: now, retiredByUserId: actor.userId, retireComment: comment, updatedAt: now });
    await audit(tx, actor, "material.retire", id, { version: material.currentVersion, comment, closedDraft: material.draftVersion }, now);
  });
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, id);
}

/** A seed (or own) entry's current version as a new draft in the caller's organization. */
export async function copyMaterial(ctx: ServiceContext, actor: Actor, id: string, name: string | undefined): Promise<MaterialDetail> {
  const now = ctx.clock();
  const found = await repo.findVisibleMaterial(ctx.db, actor.organizationId, id);
  if (!found) throw notFound("library entry");
  const from = found.material;
  if (from.currentVersion === null) throw conflict("not_approved", "This entry has no approved version to copy yet.");
  const source = (await repo.findVersion(ctx.db, actor.organizationId, id, from.currentVersion))!;
  const input = toVersion(from, source);
  const newName = name ?? (await freeCopyName(ctx.db, actor.organizationId, input.name));
  const rows = newEntryRows(actor, { ...input, name: newName }, now, {
    changeNote: `Copied from "${input.name}" version ${input.version}`,
    copiedFrom: { materialId: id, version: input.version },
  });
  await withNameGuard(newName, () =>
    ctx.db.transaction(async (tx) => {
      await assertNameFree(tx, actor.organizationId, newName);
      await repo.insertMaterials(tx, actor.organizationId, [rows.material]);
      await repo.insertVersions(tx, actor.organizationId, [rows.version]);
      await audit(tx, actor, "material.copy", rows.id, { fromMaterialId: id, fromVersion: input.version, name: newName }, now);
    }),
  );
  ctx.libraryCache.changed();
  return getMaterial(ctx, actor, rows.id);
}

async function freeCopyName(db: Tx, organizationId: string, name: string): Promise<string> {
  const candidates = ["(copy)", ...Array.from({ length: 19 }, (_, i) => `(copy ${i + 2})`)].map((suffix) => `${name.slice(0, 119 - suffix.length)} ${suffix}`);
  const taken = new Set((await repo.findNamesInUse(db, organizationId, candidates)).map((r) => r.name.toLowerCase()));
  const free = candidates.find((c) => !taken.has(c.toLowerCase()));
  if (!free) throw conflict("name_taken", "Too many copies of this entry already: pass a name for the copy.");
  return free;
}

/** The approved, unretired cryogens the organization sees, with the vented-gas factor worked out. */
export async function listCryogens(ctx: ServiceContext, actor: Actor): Promise<CryogenList> {
  const rows = await repo.listMaterials(ctx.db, actor.organizationId, { kind: "cryogen", status: "approved" });
  const cryogens: Cryogen[] = [];
  for (const row of rows) {
    const p = row.version.properties;
    if (p.kind !== "cryogen") continue;
    const { kind: _kind, ...props } = p;
    cryogens.push({
      materialId: row.material.id,
      version: row.version.version,
      scope: row.material.organizationId === null ? "seed" : "organization",
      label: row.version.name,
      ...props,
      // The engine's own formula, fed with this entry's densities rather than its table's.
      ventedGasFactor: ventedGasFactor({ ...CRYOGENS[p.fluid], ...props }),
      source: row.version.source,
      sourceText: formatSource(row.version.source),
    });
  }
  return { cryogens };
}
