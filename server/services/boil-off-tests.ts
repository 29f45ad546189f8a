import type { DesignContent } from "../../shared/schemas/design";
import { createHash } from "node:crypto";
import type { CreateTestInput, LogInfo, PatchTestInput, StoredFile, TestDetail, TestMethod, TestStatus, TestSummary } from "../../shared/schemas/boil-off-test";
import { CRYOGEN_IDS, DEFAULT_VENT_REFERENCE, type CryogenId } from "../../shared/thermal";
import type { ResolvedMaterial } from "../../shared/design/to-assembly";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/boil-off-tests";
import { findRevision } from "../db/repositories/designs";
import type { Tx } from "../db/client";
import { conflict, invalidInput, notFound } from "../errors";
import { newId } from "../ids";
import { decodeSeries } from "../storage/series-codec";
import { raiseAlertIfOver } from "./alerts";
import type { Actor, ServiceContext } from "./context";
import { analyseSeries, analysisContextOf, resultColumns } from "./test-analysis";

/** A test of this organization, or a 404 that does not tell whether it exists elsewhere. */
export async function loadTest(db: Tx, actor: Actor, id: string, lock = false) {
  const row = await repo.findTest(db, actor.organizationId, id, lock);
  if (!row) throw notFound("boil-off test");
  return row;
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

const summaryOf = (t: Omit<TestSummary, "testedAt" | "createdAt" | "method" | "status"> & { method: TestSummary["method"]; status: TestStatus; testedAt: Date; createdAt: Date }): TestSummary => ({
  ...t,
  testedAt: t.testedAt.toISOString(),
  createdAt: t.createdAt.toISOString(),
});

export async function listTests(ctx: ServiceContext, actor: Actor, filter: { designId?: string; status?: TestStatus }): Promise<TestSummary[]> {
  return (await repo.listTests(ctx.db, actor.organizationId, filter)).map(summaryOf);
}

const fileOf = (f: repo.TestFileRow, uploadedBy: string | null): StoredFile => ({
  id: f.id,
  filename: f.filename,
  contentType: f.contentType,
  size_bytes: f.sizeBytes,
  sha256: f.sha256,
  uploadedAt: f.uploadedAt.toISOString(),
  uploadedBy,
});

export async function getTest(ctx: ServiceContext, actor: Actor, id: string): Promise<TestDetail> {
  const { test: t, designName, createdBy, acceptedBy } = await loadTest(ctx.db, actor, id);
  const files = await repo.listTestFiles(ctx.db, actor.organizationId, id);
  const logFile = t.log ? files.find((f) => f.file.id === t.log!.fileId) : undefined;
  let log: LogInfo | null = null;
  if (t.log && logFile) {
    const { fileId: _fileId, seriesKey: _key, seriesBytes: _bytes, pressureColumn, pressureUnit, ...mapping } = t.log;
    log = { ...fileOf(logFile.file, logFile.uploadedBy), ...mapping, pressureColumn: pressureColumn ?? null, pressureUnit: pressureUnit ?? null, seriesUnit: t.chart?.unit ?? "" };
  }
  return {
    ...summaryOf({ ...t, designName, createdBy }),
    cryogen: t.cryogen as CryogenId,
    ventReference: t.ventReference,
    capacity_L: t.capacity_L,
    fullScale_mm: t.fullScale_mm,
    tareMass_kg: t.tareMass_kg,
    fillFraction: t.fillFraction,
    ambientTemperature_K: t.ambientTemperature_K,
    ambientPressure_Pa: t.ambientPressure_Pa,
    notes: t.notes,
    log,
    window: t.windowStart_s !== null && t.windowEnd_s !== null ? { start_s: t.windowStart_s, end_s: t.windowEnd_s } : null,
    windowSuggested: t.windowSuggested,
    analysis: t.analysis,
    attachments: files.filter((f) => f.file.kind === "attachment").map((f) => fileOf(f.file, f.uploadedBy)),
    acceptedAt: iso(t.acceptedAt),
    acceptedBy,
  };
}

/** The stage's cryogen as the engine names it, from the exact library version the revision used. */
function stageCryogen(content: DesignContent, materials: ResolvedMaterial[], layupIndex: number | null): CryogenId | null {
  const item = layupIndex === null ? null : content.layup[layupIndex];
  const ref = layupIndex === null ? content.cold.cryogen : item?.kind === "stage" ? item.cryogen : null;
  if (!ref) return null;
  const found = materials.find((m) => m.materialId === ref.materialId && m.version === ref.version);
  const fluid = found?.properties.kind === "cryogen" ? found.properties.fluid : null;
  return fluid && (CRYOGEN_IDS as string[]).includes(fluid) ? fluid : null;
}

function stageCapacity(content: DesignContent, layupIndex: number | null): number | null {
  if (layupIndex === null) return content.cold.capacity_L ?? null;
  const item = content.layup[layupIndex];
  return item?.kind === "stage" ? (item.capacity_L ?? null) : null;
}

export async function createTest(ctx: ServiceContext, actor: Actor, input: CreateTestInput): Promise<TestDetail> {
  const found = await findRevision(ctx.db, actor.organizationId, input.designId, input.revision);
  if (!found) throw notFound("design revision");
  const { content, materials, prediction } = found.revision;
  const stages = prediction.result.stages;
  const stageIndex = input.stageIndex ?? stages.length - 1;
  const listed = stages.map((s, i) => `${i} ${s.label}`).join(", ");
  if (stageIndex >= stages.length) {
    const message = `stageIndex must be from 0 to ${stages.length - 1} for this revision (${listed})`;
    throw invalidInput(message, [{ path: "stageIndex", message }]);
  }
  const stage = stages[stageIndex];
  const cryogen = stageCryogen(content, materials, stage.layupIndex);
  if (!cryogen) {
    const message = `stageIndex ${stageIndex} (${stage.label}) has no cryogen in revision ${input.revision}, so there is no boil-off to measure; pick a stage with one (${listed})`;
    throw invalidInput(message, [{ path: "stageIndex", message }]);
  }
  const capacity_L = input.capacity_L ?? stageCapacity(content, stage.layupIndex);
  if (input.method === "level" && capacity_L === null) {
    const message = "capacity_L is required for a level test: the design gives no capacity for this stage";
    throw invalidInput(message, [{ path: "capacity_L", message }]);
  }
  checkLiquidMassFields(input.method, input);
  const id = newId();
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    await repo.insertTest(tx, actor.organizationId, {
      id,
      designId: input.designId,
      revision: input.revision,
      stageIndex,
      stageLabel: stage.label,
      cryogen,
      predictedHeatLeak_W: stage.net_W,
      predictedEvaporationRate: stage.boilOff?.evaporationRate_percent_per_day ?? null,
      method: input.method,
      vesselLabel: input.vesselLabel,
      ventReference: input.method === "vent-flow" ? (input.ventReference ?? DEFAULT_VENT_REFERENCE) : null,
      capacity_L,
      fullScale_mm: input.fullScale_mm ?? null,
      tareMass_kg: input.tareMass_kg ?? null,
      fillFraction: input.fillFraction ?? null,
      ambientTemperature_K: input.ambientTemperature_K ?? null,
      ambientPressure_Pa: input.ambientPressure_Pa ?? null,
      notes: input.notes ?? "",
      status: "logging",
      testedAt: now,
      createdByUserId: actor.userId,
      createdAt: now,
      updatedAt: now,
    });
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.create", entityType: "boil_off_test", entityId: id, detail: { designId: input.designId, revision: input.revision, stageIndex, method: input.method } }, now);
  });
  return getTest(ctx, actor, id);
}

/** The tare mass belongs to a weighing test and the fill fraction to a vent-flow test. */
function checkLiquidMassFields(method: TestMethod, fields: { tareMass_kg?: number | null; fillFraction?: number | null }) {
  const issues = [];
  if (fields.tareMass_kg != null && method !== "weighing") issues.push({ path: "tareMass_kg", message: `tareMass_kg applies to a weighing test only (this one is ${method})` });
  if (fields.fillFraction != null && method !== "vent-flow") issues.push({ path: "fillFraction", message: `fillFraction applies to a vent-flow test only (this one is ${method})` });
  if (issues.length > 0) throw invalidInput(issues.map((i) => i.message).join("; "), issues);
}

/**
 * Notes, and the tare mass or fill fraction the barometric correction needs. Changing either
 * re-runs the analysis on the stored series (read outside the transaction, like a window move);
 * an accepted test keeps its figures, so only its notes change.
 */
export async function updateTest(ctx: ServiceContext, actor: Actor, id: string, patch: PatchTestInput): Promise<TestDetail> {
  const { test } = await loadTest(ctx.db, actor, id);
  const figures: { tareMass_kg?: number | null; fillFraction?: number | null } = {};
  if (patch.tareMass_kg !== undefined) figures.tareMass_kg = patch.tareMass_kg;
  if (patch.fillFraction !== undefined) figures.fillFraction = patch.fillFraction;
  const changesFigures = Object.keys(figures).length > 0;
  if (changesFigures) {
    if (test.status === "accepted") throw conflict("test_accepted", "This test is accepted, so its figures are frozen. Only its notes can change.");
    checkLiquidMassFields(test.method, figures);
  }
  const result = changesFigures && test.log ? await reanalyse(ctx, { ...test, ...figures }) : null;
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    const { test: current } = await loadTest(tx, actor, id, true);
    if (changesFigures && current.status === "accepted") throw conflict("test_accepted", "This test is accepted, so its figures are frozen. Only its notes can change.");
    if (result && current.log?.fileId !== test.log?.fileId) throw conflict("log_replaced", "A new log was uploaded meanwhile. Send the change again.");
    await repo.updateTest(tx, actor.organizationId, id, { ...(patch.notes !== undefined ? { notes: patch.notes } : {}), ...figures, ...(result ?? {}), updatedAt: now });
    const detail = { ...(patch.notes !== undefined ? { notesLength: patch.notes.length } : {}), ...figures, ...(result ? { ratio: result.ratio } : {}) };
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: changesFigures ? "test.update" : "test.notes", entityType: "boil_off_test", entityId: id, detail }, now);
  });
  return getTest(ctx, actor, id);
}

/** The analysis with the row's current window (or the suggestion), from the stored series. */
async function reanalyse(ctx: ServiceContext, test: repo.TestRow) {
  const log = test.log!;
  const stored = await ctx.objects.getBuffer(log.seriesKey);
  if (createHash("sha256").update(stored).digest("hex") !== log.seriesSha256) throw new Error(`the stored series ${log.seriesKey} does not match its SHA-256`);
  const chosen = !test.windowSuggested && test.windowStart_s !== null && test.windowEnd_s !== null ? { start_s: test.windowStart_s, end_s: test.windowEnd_s } : null;
  const { analysis, chart } = analyseSeries(decodeSeries(stored), analysisContextOf(test, log.firstReadingAt, log.suggestedWindow), chosen);
  return resultColumns(analysis, chart, chosen === null);
}

/** Rows go in one transaction; the objects after it commits (an orphan object harms nobody, a dangling row would). */
export async function deleteTest(ctx: ServiceContext, actor: Actor, id: string): Promise<void> {
  const now = ctx.clock();
  const keys = await ctx.db.transaction(async (tx) => {
    const { test } = await loadTest(tx, actor, id, true);
    const files = await repo.listTestFiles(tx, actor.organizationId, id);
    await repo.deleteTest(tx, actor.organizationId, id);
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.delete", entityType: "boil_off_test", entityId: id, detail: { vesselLabel: test.vesselLabel, files: files.length } }, now);
    return [...files.map((f) => f.file.objectKey), ...(test.log ? [test.log.seriesKey] : [])];
  });
  await ctx.objects.delete(keys).catch((error: Error) => ctx.logger.warn({ err: error, keys }, "objects of a deleted test were left in the store"));
}

/** Signs the analysis off; an accepted test is frozen, and one over the threshold raises an alert. */
export async function acceptTest(ctx: ServiceContext, actor: Actor, id: string): Promise<TestDetail> {
  const now = ctx.clock();
  const alerted = await ctx.db.transaction(async (tx) => {
    const { test, designName } = await loadTest(tx, actor, id, true);
    if (test.status === "accepted") throw conflict("already_accepted", "This test is already accepted.");
    if (test.status !== "analysed" || !test.analysis) throw conflict("no_analysis", "Upload a logger file first: there is no analysis to accept.");
    await repo.updateTest(tx, actor.organizationId, id, { status: "accepted", acceptedAt: now, acceptedByUserId: actor.userId, updatedAt: now });
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.accept", entityType: "boil_off_test", entityId: id, detail: { ratio: test.ratio, window: test.analysis.window } }, now);
    return raiseAlertIfOver(ctx, tx, actor, { test, designName, analysis: test.analysis }, now);
  });
  if (alerted) ctx.outbox.kick();
  return getTest(ctx, actor, id);
}
