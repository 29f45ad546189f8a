import { createReadStream } from "node:fs";
import { createHash } from "node:crypto";
import { VALUE_UNITS, VALUE_UNIT_IDS, type Analysis, type LogPreview, type LogUploadFields, type Series, type TestDetail, type WindowInput } from "../../shared/schemas/boil-off-test";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/boil-off-tests";
import type { StoredLog } from "../db/schema/boil-off-tests";
import { conflict, invalidInput } from "../errors";
import { newId } from "../ids";
import { decodeSeries, encodeSeries, type StoredSeries } from "../storage/series-codec";
import { getTest, loadTest } from "./boil-off-tests";
import type { Actor, ServiceContext } from "./context";
import { previewLoggerFile } from "./log-preview";
import { parseLoggerFile, type UploadedFile } from "./logger-files";
import { analyseSeries, analysisContextOf as contextOf, resultColumns } from "./test-analysis";
import { safeFilename } from "./test-attachments";

/**
 * A test's log: preview for the column mapping, the validated upload (file and parsed series to
 * the object store, analysis and chart to the row), and moving the steady window.
 */
const frozen = () => conflict("test_accepted", "This test is accepted, so its log and window are frozen. Create a new test to log again.");
const noLog = () => conflict("no_log", "This test has no log yet: upload a logger file first.");

export async function previewLog(ctx: ServiceContext, actor: Actor, id: string, file: UploadedFile): Promise<LogPreview> {
  const { test } = await loadTest(ctx.db, actor, id);
  return previewLoggerFile(file, test.method);
}

/** reading × factor = the series unit; a level in mm becomes % of the gauge's full scale. */
function valueFactor(t: repo.TestRow, fields: LogUploadFields): number {
  const unit = VALUE_UNITS[fields.valueUnit];
  if (unit.method !== t.method) {
    const allowed = VALUE_UNIT_IDS.filter((u) => VALUE_UNITS[u].method === t.method);
    const message = `valueUnit must be one of ${allowed.join(", ")} for a ${t.method} test (got ${fields.valueUnit})`;
    throw invalidInput(message, [{ path: "valueUnit", message }]);
  }
  if (unit.factor !== null) return unit.factor;
  if (t.fullScale_mm === null) {
    const message = "fullScale_mm is required for a level log in mm: set the gauge's full-scale height on the test";
    throw invalidInput(message, [{ path: "fullScale_mm", message }]);
  }
  return 100 / t.fullScale_mm;
}

const keyOf = (actor: Actor, testId: string, kind: "logs" | "series", fileId: string) =>
  `orgs/${actor.organizationId}/tests/${testId}/${kind}/${fileId}.${kind === "logs" ? "csv" : "ffs"}`;

/**
 * Nothing is stored unless the whole file is valid and the analysis runs: the parse and the fit
 * come first, then the two objects, then one transaction for the rows. A failed transaction
 * removes the new objects; a replaced log's objects go after the commit.
 */
export async function ingestLog(ctx: ServiceContext, actor: Actor, id: string, file: UploadedFile, fields: LogUploadFields): Promise<TestDetail> {
  const { test } = await loadTest(ctx.db, actor, id);
  if (test.status === "accepted") throw frozen();
  const parsed = await parseLoggerFile(file, {
    timeColumn: fields.timeColumn,
    valueColumn: fields.valueColumn,
    pressureColumn: fields.pressureColumn,
    timeFormat: fields.timeFormat,
    valueFactor: valueFactor(test, fields),
    pressureUnit: fields.pressureUnit,
  });
  const series: StoredSeries = { time: parsed.time, value: parsed.value, pressure: parsed.pressure };
  const firstReadingAt = parsed.firstReadingAt?.toISOString() ?? null;
  const { analysis, chart } = analyseSeries(series, contextOf(test, firstReadingAt), null);

  const fileId = newId();
  const logKey = keyOf(actor, id, "logs", fileId);
  const seriesKey = keyOf(actor, id, "series", fileId);
  const encoded = encodeSeries(series);
  const seriesSha256 = createHash("sha256").update(encoded).digest("hex");
  const puts = await Promise.allSettled([
    ctx.objects.put(logKey, createReadStream(file.path), { contentLength: file.size, contentType: "text/csv", sha256: parsed.sha256 }),
    ctx.objects.put(seriesKey, encoded, { contentLength: encoded.length, contentType: "application/octet-stream", sha256: seriesSha256 }),
  ]);
  const failed = puts.find((p): p is PromiseRejectedResult => p.status === "rejected");
  if (failed) {
    await ctx.objects.delete([logKey, seriesKey]).catch(() => {});
    throw failed.reason;
  }

  const log: StoredLog = { ...fields, timeFormat: parsed.timeFormat, pressureUnit: parsed.pressureUnit ?? undefined, fileId, rows: parsed.rows, firstReadingAt, duration_s: parsed.time[parsed.rows - 1], seriesKey, seriesSha256, seriesBytes: encoded.length, suggestedWindow: analysis.suggestedWindow };
  const filename = safeFilename(file.originalName, "log.csv");
  const now = ctx.clock();
  let oldKeys: string[];
  try {
    oldKeys = await ctx.db.transaction(async (tx) => {
      const { test: current } = await loadTest(tx, actor, id, true);
      if (current.status === "accepted") throw frozen();
      const old = await repo.listTestFiles(tx, actor.organizationId, id, "log");
      await repo.deleteTestFiles(tx, actor.organizationId, old.map((f) => f.file.id));
      await repo.insertTestFile(tx, actor.organizationId, {
        id: fileId,
        testId: id,
        kind: "log",
        filename,
        contentType: "text/csv",
        sizeBytes: file.size,
        sha256: parsed.sha256,
        objectKey: logKey,
        uploadedByUserId: actor.userId,
        uploadedAt: now,
      });
      await repo.updateTest(tx, actor.organizationId, id, {
        ...resultColumns(analysis, chart, true),
        log,
        status: "analysed",
        testedAt: parsed.firstReadingAt ?? current.createdAt,
        updatedAt: now,
      });
      await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.log_upload", entityType: "boil_off_test", entityId: id, detail: { filename, sha256: parsed.sha256, rows: parsed.rows, replaced: old.length } }, now);
      return [...old.map((f) => f.file.objectKey), ...(current.log ? [current.log.seriesKey] : [])];
    });
  } catch (error) {
    await ctx.objects.delete([logKey, seriesKey]).catch(() => {});
    throw error;
  }
  await ctx.objects.delete(oldKeys).catch((error: Error) => ctx.logger.warn({ err: error, keys: oldKeys }, "a replaced log's objects were left in the store"));
  return getTest(ctx, actor, id);
}

/**
 * The series object is read outside the transaction; the row is then updated only if the log is
 * still the same. A null window goes back to Frostfold's suggestion.
 */
export async function setWindow(ctx: ServiceContext, actor: Actor, id: string, window: WindowInput | null): Promise<Analysis> {
  const { test } = await loadTest(ctx.db, actor, id);
  if (test.status === "accepted") throw frozen();
  if (!test.log) throw noLog();
  const stored = await ctx.objects.getBuffer(test.log.seriesKey);
  // The object store is trusted no further than its checksum.
  if (createHash("sha256").update(stored).digest("hex") !== test.log.seriesSha256) throw new Error(`the stored series ${test.log.seriesKey} does not match its SHA-256`);
  const series = decodeSeries(stored);
  const { analysis, chart } = analyseSeries(series, contextOf(test, test.log.firstReadingAt, test.log.suggestedWindow), window);
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    const { test: current } = await loadTest(tx, actor, id, true);
    if (current.status === "accepted") throw frozen();
    if (current.log?.fileId !== test.log!.fileId) throw conflict("log_replaced", "A new log was uploaded while the window was being set. Set the window again on the new log.");
    await repo.updateTest(tx, actor.organizationId, id, { ...resultColumns(analysis, chart, window === null), updatedAt: now });
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.window", entityType: "boil_off_test", entityId: id, detail: { ...(window ?? { suggested: true }), ratio: analysis.ratio } }, now);
  });
  return analysis;
}

export async function getAnalysis(ctx: ServiceContext, actor: Actor, id: string): Promise<Analysis> {
  const { test } = await loadTest(ctx.db, actor, id);
  if (!test.analysis) throw noLog();
  return test.analysis;
}

/** Served from the row: the chart was downsampled when the log or the window last changed. */
export async function getSeries(ctx: ServiceContext, actor: Actor, id: string): Promise<Series> {
  const { test } = await loadTest(ctx.db, actor, id);
  if (!test.chart) throw noLog();
  return test.chart;
}
