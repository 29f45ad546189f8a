import { predictDesign } from "../../shared/design/predict";
import type { Prediction } from "../../shared/design/prediction";
import { runSweep, sweepPlanOf, SweepRangeError } from "../../shared/design/sweep-ranges";
import { MaterialReferenceError, materialKey, materialRefsOf, toAssembly } from "../../shared/design/to-assembly";
import type {
  CreateDesignInput,
  DesignContent,
  DesignDetail,
  DesignSummary,
  RevisionDetail,
  SaveRevisionInput,
  SweepInput,
  SweepResult,
} from "../../shared/schemas/design";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/designs";
import type { Tx } from "../db/client";
import { conflict, invalidInput, notFound } from "../errors";
import { newId } from "../ids";
import type { Actor, ServiceContext } from "./context";
import { resolveDesignMaterials } from "./design-materials";
import type { VersionLoader } from "../cache/library-cache";

/** Resolves the design's library versions and runs the engine; bad references are a 400 naming the field. */
export async function predictContent(
  db: Tx,
  organizationId: string,
  content: DesignContent,
  keep?: Set<string>,
  options: { sweep?: boolean; load?: VersionLoader } = {},
) {
  const { lookup, list } = await resolveDesignMaterials(db, organizationId, content, keep, options.load);
  try {
    return { prediction: predictDesign(content, lookup, { sweep: options.sweep }), materials: list };
  } catch (error) {
    if (error instanceof MaterialReferenceError) throw invalidInput(error.message, [{ path: error.field, message: error.message }]);
    throw error; // ThermalInputError becomes a 400 in the error handler
  }
}

export async function estimate(ctx: ServiceContext, actor: Actor, content: DesignContent, options: { sweep: boolean }) {
  return predictContent(ctx.db, actor.organizationId, content, undefined, { ...options, load: ctx.libraryCache.load });
}

/**
 * Heat against layer density, warm temperature or pressure over the range the design implies
 * (shared/design/sweep-ranges.ts). A variable that does not apply, or a bad blockIndex, is a 400
 * naming the field; bad references are a 400 naming the form path, as in predictContent.
 */
export async function sweepEstimate(ctx: ServiceContext, actor: Actor, input: SweepInput): Promise<SweepResult> {
  const { lookup } = await resolveDesignMaterials(ctx.db, actor.organizationId, input.content, undefined, ctx.libraryCache.load);
  try {
    const assembly = toAssembly(input.content, lookup);
    const plan = sweepPlanOf(assembly, input.variable, input.blockIndex);
    const points = runSweep(assembly, plan);
    const stageLabels = assembly.layup.flatMap((item, i) => (item.kind === "stage" ? [item.label ?? `stage ${i + 1}`] : []));
    return { variable: plan.variable, unit: plan.unit, designValue: plan.designValue, blockIndex: plan.blockIndex, blockLabel: plan.blockLabel, stageLabels, points };
  } catch (error) {
    if (error instanceof MaterialReferenceError || error instanceof SweepRangeError) throw invalidInput(error.message, [{ path: error.field, message: error.message }]);
    throw error; // ThermalInputError becomes a 400 in the error handler
  }
}

const summaryOf = (row: repo.DesignRow, createdBy: string | null): DesignSummary => ({
  id: row.id,
  name: row.name,
  vesselLabel: row.vesselLabel,
  geometryKind: row.geometryKind,
  latestRevision: row.latestRevision,
  coldHeat_W: row.coldHeat_W,
  boilOff_L_per_day: row.boilOff_L_per_day,
  createdBy,
  updatedAt: row.updatedAt.toISOString(),
});

const revisionDetailOf = (r: repo.RevisionRow, createdBy: string | null): RevisionDetail => ({
  designId: r.designId,
  revision: r.revision,
  name: r.name,
  changeNote: r.changeNote,
  createdBy,
  createdAt: r.createdAt.toISOString(),
  content: r.content,
  materials: r.materials,
  prediction: r.prediction,
});

export async function listDesigns(ctx: ServiceContext, actor: Actor, q?: string): Promise<DesignSummary[]> {
  const rows = await repo.listDesigns(ctx.db, actor.organizationId, q);
  return rows.map((r) => summaryOf(r.design, r.createdBy));
}

export async function getRevision(ctx: ServiceContext, actor: Actor, designId: string, revision: number): Promise<RevisionDetail> {
  const row = await repo.findRevision(ctx.db, actor.organizationId, designId, revision);
  if (!row) throw notFound("design revision");
  return revisionDetailOf(row.revision, row.createdBy);
}

export async function getDesign(ctx: ServiceContext, actor: Actor, designId: string): Promise<DesignDetail> {
  const design = await repo.findDesign(ctx.db, actor.organizationId, designId);
  if (!design) throw notFound("design");
  const [revisions, latest] = await Promise.all([
    repo.listRevisions(ctx.db, actor.organizationId, designId),
    getRevision(ctx, actor, designId, design.latestRevision),
  ]);
  const creator = revisions[revisions.length - 1]?.createdBy ?? null;
  return {
    ...summaryOf(design, creator),
    revisions: revisions.map((r) => ({
      revision: r.revision,
      name: r.name,
      changeNote: r.changeNote,
      createdBy: r.createdBy,
      createdAt: r.createdAt.toISOString(),
      coldHeat_W: (r.prediction as Prediction).coldHeat_W ?? null,
    })),
    latest,
  };
}

async function writeRevision(
  tx: Tx,
  actor: Actor,
  now: Date,
  p: { designId: string; revision: number; name: string; content: DesignContent; changeNote: string | null; keep?: Set<string> },
) {
  const { prediction, materials } = await predictContent(tx, actor.organizationId, p.content, p.keep);
  await repo.insertRevision(tx, actor.organizationId, {
    id: newId(),
    designId: p.designId,
    revision: p.revision,
    name: p.name,
    content: p.content,
    materials,
    prediction,
    changeNote: p.changeNote,
    createdByUserId: actor.userId,
    createdAt: now,
  });
  return prediction;
}

const headOf = (name: string, content: DesignContent, revision: number, prediction: Prediction, now: Date) => ({
  name,
  geometryKind: content.geometry.kind,
  latestRevision: revision,
  coldHeat_W: prediction.coldHeat_W,
  boilOff_L_per_day: prediction.coldBoilOff_L_per_day,
  updatedAt: now,
});

export async function createDesign(ctx: ServiceContext, actor: Actor, input: CreateDesignInput): Promise<DesignDetail> {
  const id = newId();
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    await repo.insertDesign(tx, actor.organizationId, { id, name: input.name, vesselLabel: input.vesselLabel ?? null, geometryKind: input.content.geometry.kind, latestRevision: 1, createdByUserId: actor.userId, createdAt: now, updatedAt: now });
    const prediction = await writeRevision(tx, actor, now, { designId: id, revision: 1, name: input.name, content: input.content, changeNote: input.changeNote ?? "First revision" });
    await repo.updateDesignHead(tx, actor.organizationId, id, headOf(input.name, input.content, 1, prediction, now));
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "design.create", entityType: "design", entityId: id, detail: { name: input.name } }, now);
  });
  return getDesign(ctx, actor, id);
}

/** A save on a base that is no longer the latest is refused, so nobody overwrites a colleague. */
export async function saveRevision(ctx: ServiceContext, actor: Actor, designId: string, input: SaveRevisionInput): Promise<RevisionDetail> {
  const now = ctx.clock();
  const revision = await ctx.db.transaction(async (tx) => {
    const design = await repo.findDesign(tx, actor.organizationId, designId, true);
    if (!design) throw notFound("design");
    if (input.baseRevision !== design.latestRevision) {
      throw conflict(
        "stale_revision",
        `Revision ${design.latestRevision} was saved after revision ${input.baseRevision}, which your edits started from. Your edits are not saved: open revision ${design.latestRevision}, then apply them again.`,
      );
    }
    // Materials the base revision already used still resolve even if retired since.
    const base = await repo.findRevision(tx, actor.organizationId, designId, design.latestRevision);
    const keep = new Set(base ? materialRefsOf(base.revision.content).map(materialKey) : []);
    const next = design.latestRevision + 1;
    const name = input.name ?? design.name;
    const prediction = await writeRevision(tx, actor, now, { designId, revision: next, name, content: input.content, changeNote: input.changeNote, keep });
    await repo.updateDesignHead(tx, actor.organizationId, designId, headOf(name, input.content, next, prediction, now));
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "design.revise", entityType: "design", entityId: designId, detail: { revision: next, changeNote: input.changeNote } }, now);
    return next;
  });
  return getRevision(ctx, actor, designId, revision);
}

export async function duplicateDesign(ctx: ServiceContext, actor: Actor, designId: string, name?: string): Promise<DesignDetail> {
  const source = await getDesign(ctx, actor, designId);
  const copyName = name ?? `${source.name} (copy)`.slice(0, 120);
  const id = newId();
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    await repo.insertDesign(tx, actor.organizationId, { id, name: copyName, vesselLabel: source.vesselLabel, geometryKind: source.geometryKind, latestRevision: 1, createdByUserId: actor.userId, createdAt: now, updatedAt: now });
    const keep = new Set(materialRefsOf(source.latest.content).map(materialKey));
    const prediction = await writeRevision(tx, actor, now, {
      designId: id,
      revision: 1,
      name: copyName,
      content: source.latest.content,
      changeNote: `Duplicated from ${source.name}, revision ${source.latestRevision}`,
      keep,
    });
    await repo.updateDesignHead(tx, actor.organizationId, id, headOf(copyName, source.latest.content, 1, prediction, now));
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "design.duplicate", entityType: "design", entityId: id, detail: { from: designId, revision: source.latestRevision } }, now);
  });
  return getDesign(ctx, actor, id);
}
