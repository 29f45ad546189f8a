import { bigint, boolean, char, double, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import type { Analysis, LogUploadFields, Series, TimeFormat } from "../../../shared/schemas/boil-off-test";
import { TEST_METHODS, TEST_STATUSES, VENT_REFERENCES } from "../../../shared/schemas/boil-off-test";
import { datetimeMs, organizationId, rowId, userReference } from "./columns";
import { designReference } from "./designs";
import { jsonText } from "./json-text";

/** What the test row remembers of its current log: the mapping used and the parsed series object. */
export interface StoredLog extends Omit<LogUploadFields, "timeFormat"> {
  /** As sent, or as read from the file's first reading. */
  timeFormat: TimeFormat;
  fileId: string;
  rows: number;
  firstReadingAt: string | null;
  duration_s: number;
  seriesKey: string;
  seriesSha256: string;
  seriesBytes: number;
  /** Frostfold's suggested window for this log (absent on rows written before it was kept). */
  suggestedWindow?: { start_s: number; end_s: number };
}

/**
 * One boil-off test. It points at an immutable design revision and stage, so the prediction it
 * is compared with never moves. The prediction's figures, the latest analysis and the chart
 * (already downsampled) are kept on the row, so reads never touch the object store.
 */
export const boilOffTests = mysqlTable(
  "boil_off_tests",
  {
    id: rowId(),
    organizationId: organizationId(),
    designId: designReference(),
    revision: int("revision").notNull(),
    stageIndex: int("stage_index").notNull(),
    stageLabel: varchar("stage_label", { length: 120 }).notNull(),
    cryogen: varchar("cryogen", { length: 32 }).notNull(),
    /** The stage's net heat in the revision's prediction (what its boil-off is worked from). */
    predictedHeatLeak_W: double("predicted_heat_leak_w"),
    predictedEvaporationRate: double("predicted_evaporation_rate_percent_per_day"),
    method: mysqlEnum("method", TEST_METHODS).notNull(),
    vesselLabel: varchar("vessel_label", { length: 120 }).notNull(),
    ventReference: mysqlEnum("vent_reference", VENT_REFERENCES),
    /** The test's own capacity, else the design's for that stage. */
    capacity_L: double("capacity_l"),
    fullScale_mm: double("full_scale_mm"),
    /** Weighing: the empty vessel's mass; vent-flow: the share of the capacity filled at the first reading. */
    tareMass_kg: double("tare_mass_kg"),
    fillFraction: double("fill_fraction"),
    ambientTemperature_K: double("ambient_temperature_k"),
    ambientPressure_Pa: double("ambient_pressure_pa"),
    notes: text("notes").notNull(),
    status: mysqlEnum("status", TEST_STATUSES).notNull(),
    log: jsonText<StoredLog>("log_info"),
    windowStart_s: double("window_start_s"),
    windowEnd_s: double("window_end_s"),
    windowSuggested: boolean("window_suggested").notNull().default(true),
    analysis: jsonText<Analysis>("analysis"),
    chart: jsonText<Series>("chart"),
    measuredHeatLeak_W: double("measured_heat_leak_w"),
    ratio: double("ratio"),
    testedAt: datetimeMs("tested_at").notNull(),
    acceptedAt: datetimeMs("accepted_at"),
    acceptedByUserId: userReference("accepted_by_user_id"),
    createdByUserId: userReference("created_by_user_id"),
    createdAt: datetimeMs("created_at").notNull(),
    updatedAt: datetimeMs("updated_at").notNull(),
  },
  (t) => [index("boil_off_tests_org_idx").on(t.organizationId, t.testedAt), index("boil_off_tests_design_idx").on(t.organizationId, t.designId)],
);

/** Logger files and attachments: the bytes live in the object store under object_key. */
export const boilOffTestFiles = mysqlTable(
  "boil_off_test_files",
  {
    id: rowId(),
    organizationId: organizationId(),
    testId: varchar("test_id", { length: 32 })
      .notNull()
      .references(() => boilOffTests.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", ["log", "attachment"]).notNull(),
    filename: varchar("filename", { length: 255 }).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    sizeBytes: bigint("size_bytes", { mode: "number", unsigned: true }).notNull(),
    sha256: char("sha256", { length: 64 }).notNull(),
    objectKey: varchar("object_key", { length: 300 }).notNull(),
    uploadedByUserId: userReference("uploaded_by_user_id"),
    uploadedAt: datetimeMs("uploaded_at").notNull(),
  },
  (t) => [index("boil_off_test_files_test_idx").on(t.organizationId, t.testId, t.kind)],
);

/** Open until acknowledged; shown on Overview. The figures are copied so the alert reads alone. */
export const alerts = mysqlTable(
  "alerts",
  {
    id: rowId(),
    organizationId: organizationId(),
    testId: varchar("test_id", { length: 32 })
      .notNull()
      .references(() => boilOffTests.id, { onDelete: "cascade" }),
    ratio: double("ratio").notNull(),
    threshold: double("threshold").notNull(),
    measuredHeatLeak_W: double("measured_heat_leak_w").notNull(),
    predictedHeatLeak_W: double("predicted_heat_leak_w").notNull(),
    message: varchar("message", { length: 500 }).notNull(),
    createdAt: datetimeMs("created_at").notNull(),
    acknowledgedAt: datetimeMs("acknowledged_at"),
    acknowledgedByUserId: userReference("acknowledged_by_user_id"),
  },
  (t) => [index("alerts_org_open_idx").on(t.organizationId, t.acknowledgedAt)],
);
