import { z } from "zod";
import { VENT_REFERENCE_CONDITIONS, type VentReference } from "../thermal/boil-off";
import { CRYOGEN_IDS, type CryogenId } from "../thermal/fluids";
import { MINIMUM_FIT_POINTS } from "../thermal/measured-boil-off";
import { IdSchema } from "./common";

/**
 * Boil-off tests: a logged measurement on a vessel, linked to the design revision (and stage)
 * whose prediction it checks. A test is `logging` until a valid log is in, `analysed` once the
 * fit exists, `accepted` when someone signs the analysis off (accepted tests are frozen).
 */
export const TEST_METHODS = ["weighing", "vent-flow", "level"] as const;
export type TestMethod = (typeof TEST_METHODS)[number];
export const TEST_STATUSES = ["logging", "analysed", "accepted"] as const;
export type TestStatus = (typeof TEST_STATUSES)[number];
export const VENT_REFERENCES = Object.keys(VENT_REFERENCE_CONDITIONS) as [VentReference, ...VentReference[]];

// ── The logger file format ──────────────────────────────────────────────────────────────────
// A CSV (comma, semicolon or tab; UTF-8, optional BOM) with a header line naming the columns.
// Time is ISO 8601 (a time without a zone is read as UTC) or elapsed seconds; numbers use a
// decimal point (a decimal comma only in semicolon- or tab-separated files). Every reading
// becomes the series unit of its method: kg, standard L/min at the test's vent reference, or %
// of capacity. Factors are NIST SP 811 (2008), Appendix B.8/B.9; "exact" marks definitions.
export const VALUE_UNITS = {
  kg: { method: "weighing", label: "kg", factor: 1 },
  g: { method: "weighing", label: "g", factor: 1e-3 },
  lb: { method: "weighing", label: "lb", factor: 0.45359237 }, // exact
  "standard-L/min": { method: "vent-flow", label: "standard L/min", factor: 1 },
  // ft³ = 28.316846592 L (exact); only the volume unit changes, the reference state is the test's.
  "standard-ft3/h": { method: "vent-flow", label: "standard ft³/h", factor: 28.316846592 / 60 },
  percent: { method: "level", label: "% of capacity", factor: 1 },
  // Level height over the test's fullScale_mm; assumes a constant cross-section over the window.
  mm: { method: "level", label: "mm of level", factor: null },
} as const satisfies Record<string, { method: TestMethod; label: string; factor: number | null }>;
export type ValueUnit = keyof typeof VALUE_UNITS;
export const VALUE_UNIT_IDS = Object.keys(VALUE_UNITS) as [ValueUnit, ...ValueUnit[]];
export const SERIES_UNITS = { weighing: "kg", "vent-flow": "standard L/min", level: "%" } as const satisfies Record<TestMethod, string>;

export const PRESSURE_UNITS = {
  Pa: 1,
  kPa: 1000,
  hPa: 100,
  mbar: 100,
  torr: 101_325 / 760, // exact by definition
  psi: 6894.757, // lbf/in², NIST SP 811 B.9
} as const;
export type PressureUnit = keyof typeof PRESSURE_UNITS;
export const PRESSURE_UNIT_IDS = Object.keys(PRESSURE_UNITS) as [PressureUnit, ...PressureUnit[]];
/** A barometer reading outside this range is a wrong unit or a broken sensor (the engine's range). */
export const BAROMETRIC_RANGE_PA = { min: 50_000, max: 120_000 } as const;
export const TIME_FORMATS = ["iso", "seconds"] as const;
export type TimeFormat = (typeof TIME_FORMATS)[number];

export const LOG_MAX_BYTES = 200 * 1024 * 1024;
export const ATTACHMENT_MAX_BYTES = 20 * 1024 * 1024;
export const ATTACHMENT_TYPES = ["image/png", "image/jpeg", "image/webp", "application/pdf"] as const;
export const PREVIEW_ROWS = 20;
/** A log (and a window) needs as many readings as the fit does. */
export const MINIMUM_LOG_READINGS = MINIMUM_FIT_POINTS;
/** The most points a chart series carries (LTTB-downsampled on the server). */
export const SERIES_MAX_POINTS = 2000;

// ── Inputs ──────────────────────────────────────────────────────────────────────────────────
const num = (field: string, unit: string, min: number, max: number, exclusiveMin = false) => {
  const range = `${exclusiveMin ? "above" : "from"} ${min}${exclusiveMin ? " and at most" : " to"} ${max}${unit ? ` ${unit}` : ""}`;
  const base = z.number({ error: `${field} must be a number ${range}` });
  return (exclusiveMin ? base.gt(min, `${field} must be ${range}`) : base.min(min, `${field} must be ${range}`)).max(max, `${field} must be ${range}`);
};
const whole = (field: string, min: number, max: number) => {
  const message = `${field} must be a whole number from ${min} to ${max}`;
  return z.number({ error: message }).int(message).min(min, message).max(max, message);
};
const NotesSchema = z.string({ error: "notes must be text" }).trim().max(5000, "notes must be at most 5000 characters");
const methodSchema = z.enum(TEST_METHODS, { error: `method must be one of ${TEST_METHODS.join(", ")}` });
/** The ranges the form shows beside the two fields. */
export const TARE_MASS_RANGE_KG = { min: 0, max: 100_000 } as const;
const TareMassSchema = num("tareMass_kg", "kg", TARE_MASS_RANGE_KG.min, TARE_MASS_RANGE_KG.max);
const FillFractionSchema = num("fillFraction", "", 0, 1, true);

export const CreateTestInputSchema = z.object({
  designId: IdSchema,
  revision: whole("revision", 1, 1_000_000),
  /** Index into the revision's prediction.result.stages; the cold vessel (the last) by default. */
  stageIndex: whole("stageIndex", 0, 50).optional(),
  method: methodSchema,
  vesselLabel: z.string({ error: "vesselLabel is required: the vessel's label or serial" }).trim().min(1, "vesselLabel must be 1 to 120 characters").max(120, "vesselLabel must be 1 to 120 characters"),
  /** The reference state of a vent flowmeter's "standard" litres (vent-flow only). */
  ventReference: z.enum(VENT_REFERENCES, { error: `ventReference must be one of ${VENT_REFERENCES.join(", ")}` }).optional(),
  ambientTemperature_K: num("ambientTemperature_K", "K", 200, 350).optional(),
  ambientPressure_Pa: num("ambientPressure_Pa", "Pa", BAROMETRIC_RANGE_PA.min, BAROMETRIC_RANGE_PA.max).optional(),
  notes: NotesSchema.optional(),
  /** Vessel capacity; the design's capacity for the stage when left out (level needs one). */
  capacity_L: num("capacity_L", "L", 0, 1e6, true).optional(),
  /** Level gauge height that reads full; needed for a level log in mm. */
  fullScale_mm: num("fullScale_mm", "mm", 0, 1e5, true).optional(),
  /** Weighing: the empty vessel's mass, so reading − tare is the liquid (for the barometric correction). */
  tareMass_kg: TareMassSchema.optional(),
  /** Vent-flow: the share of the capacity filled at the first reading (for the barometric correction). */
  fillFraction: FillFractionSchema.optional(),
});
export type CreateTestInput = z.infer<typeof CreateTestInputSchema>;

/** At least one field; null clears the tare mass or the fill fraction. */
export const PatchTestInputSchema = z
  .object({ notes: NotesSchema.optional(), tareMass_kg: TareMassSchema.nullable().optional(), fillFraction: FillFractionSchema.nullable().optional() })
  .refine((p) => p.notes !== undefined || p.tareMass_kg !== undefined || p.fillFraction !== undefined, { path: ["notes"], message: "send notes, tareMass_kg or fillFraction" });
export type PatchTestInput = z.infer<typeof PatchTestInputSchema>;

// Multipart form fields arrive as strings; an empty optional field counts as left out.
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const columnName = (field: string) =>
  z.string({ error: `${field} is required: a column name from the file's header` }).trim().min(1, `${field} must name a column of the header`).max(200, `${field} must be at most 200 characters`);
export const LogUploadFieldsSchema = z
  .object({
    timeColumn: columnName("timeColumn"),
    valueColumn: columnName("valueColumn"),
    valueUnit: z.enum(VALUE_UNIT_IDS, { error: `valueUnit must be one of ${VALUE_UNIT_IDS.join(", ")}` }),
    /** Read from the first reading when left out: an ISO 8601 time, else elapsed seconds. */
    timeFormat: z.preprocess(blankToUndefined, z.enum(TIME_FORMATS, { error: 'timeFormat must be "iso" (ISO 8601 timestamps) or "seconds" (elapsed seconds)' }).optional()),
    pressureColumn: z.preprocess(blankToUndefined, columnName("pressureColumn").optional()),
    /** With pressureColumn; read from the column's name or the size of its first reading when left out. */
    pressureUnit: z.preprocess(blankToUndefined, z.enum(PRESSURE_UNIT_IDS, { error: `pressureUnit must be one of ${PRESSURE_UNIT_IDS.join(", ")}` }).optional()),
  })
  .superRefine((f, ctx) => {
    if (f.pressureUnit && !f.pressureColumn) ctx.addIssue({ code: "custom", path: ["pressureColumn"], message: "pressureColumn is required with pressureUnit: the header name of the barometer column" });
    const names = [f.timeColumn, f.valueColumn, f.pressureColumn].filter(Boolean).map((n) => n!.toLowerCase());
    if (new Set(names).size !== names.length) ctx.addIssue({ code: "custom", path: ["valueColumn"], message: "timeColumn, valueColumn and pressureColumn must be different columns" });
  });
export type LogUploadFields = z.infer<typeof LogUploadFieldsSchema>;

export const WindowInputSchema = z
  .object({ start_s: num("start_s", "s", 0, 1e9), end_s: num("end_s", "s", 0, 1e9) })
  .refine((w) => w.end_s > w.start_s, { path: ["end_s"], message: "end_s must be after start_s (seconds from the first reading)" });
export type WindowInput = z.infer<typeof WindowInputSchema>;

export const TestParamsSchema = z.object({ id: IdSchema });
export const AttachmentParamsSchema = z.object({ id: IdSchema, attachmentId: IdSchema });
export const TestListQuerySchema = z.object({
  designId: IdSchema.optional(),
  status: z.enum(TEST_STATUSES, { error: `status must be one of ${TEST_STATUSES.join(", ")}` }).optional(),
});

// ── Responses ───────────────────────────────────────────────────────────────────────────────
const pair = z.tuple([z.number(), z.number()]);
const WindowSchema = z.object({ start_s: z.number(), end_s: z.number() });

export const TestSummarySchema = z.object({
  id: IdSchema,
  designId: IdSchema,
  designName: z.string(),
  revision: z.number().int(),
  stageIndex: z.number().int(),
  stageLabel: z.string(),
  vesselLabel: z.string(),
  method: methodSchema,
  status: z.enum(TEST_STATUSES),
  /** The first reading's time for an ISO log, else when the test was created. */
  testedAt: z.string(),
  measuredHeatLeak_W: z.number().nullable(),
  predictedHeatLeak_W: z.number().nullable(),
  ratio: z.number().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
});
export type TestSummary = z.infer<typeof TestSummarySchema>;

export const StoredFileSchema = z.object({
  id: IdSchema,
  filename: z.string(),
  contentType: z.string(),
  size_bytes: z.number().int(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  uploadedAt: z.string(),
  uploadedBy: z.string().nullable(),
});
export type StoredFile = z.infer<typeof StoredFileSchema>;

export const LogInfoSchema = StoredFileSchema.extend({
  rows: z.number().int(),
  timeColumn: z.string(),
  valueColumn: z.string(),
  valueUnit: z.enum(VALUE_UNIT_IDS),
  timeFormat: z.enum(TIME_FORMATS),
  pressureColumn: z.string().nullable(),
  pressureUnit: z.enum(PRESSURE_UNIT_IDS).nullable(),
  firstReadingAt: z.string().nullable(),
  duration_s: z.number(),
  seriesUnit: z.string(),
  seriesSha256: z.string(),
});
export type LogInfo = z.infer<typeof LogInfoSchema>;

export const AnalysisSchema = z.object({
  window: WindowSchema,
  /** True while the window is Frostfold's suggestion, false once someone set it. */
  suggested: z.boolean(),
  /** Frostfold's suggested steady window for this log, whatever window is in use (absent on analyses stored before it was kept). */
  suggestedWindow: WindowSchema.optional(),
  method: methodSchema,
  cryogen: z.enum(CRYOGEN_IDS as [CryogenId, ...CryogenId[]]),
  stageIndex: z.number().int(),
  stageLabel: z.string(),
  seriesUnit: z.string(),
  points: z.number().int(),
  totalPoints: z.number().int(),
  /** The boil-off signal: a slope (weighing kg/s, level %/s) or the mean vent flow (standard L/min). */
  rate: z.number(),
  rateStdError: z.number(),
  interval95: pair,
  rateUnit: z.string(),
  /** The fitted line value = intercept + slope·t, over the window, for every method. */
  slope: z.number(),
  slopeStdError: z.number(),
  intercept: z.number(),
  residualStdDev: z.number(),
  degreesOfFreedom: z.number().int(),
  measuredHeatLeak_W: z.number(),
  measuredHeatLeakStdError_W: z.number(),
  measuredHeatLeakInterval95_W: pair,
  predictedHeatLeak_W: z.number().nullable(),
  ratio: z.number().nullable(),
  ratioStdError: z.number().nullable(),
  ratioInterval95: pair.nullable(),
  capacity_L: z.number().nullable(),
  evaporationRate_percent_per_day: z.number().nullable(),
  predictedEvaporationRate_percent_per_day: z.number().nullable(),
  boilOff_L_per_day: z.number().nullable(),
  ventReference: z.enum(VENT_REFERENCES).nullable(),
  ventReferenceLabel: z.string().nullable(),
  ventedGasFactor: z.number(),
  barometric: z
    .object({ meanPressure_Pa: z.number(), source: z.enum(["log", "test"]), saturationTemperatureShift_K: z.number(), correctionApplied: z.boolean() })
    .nullable(),
  // The fields below are absent on analyses stored before the barometric correction existed.
  /** The heat leak from the boil-off rate alone; measuredHeatLeak_W adds the barometric correction when applied. */
  uncorrectedHeatLeak_W: z.number().optional(),
  uncorrectedHeatLeakStdError_W: z.number().optional(),
  /** Least-squares slope of the log's barometer column over the window; null without one. */
  pressureTrend: z.object({ slope_Pa_per_s: z.number(), stdError_Pa_per_s: z.number() }).nullable().optional(),
  barometricCorrectionApplied: z.boolean().optional(),
  barometricCorrection: z
    .discriminatedUnion("applied", [
      z.object({
        applied: z.literal(true),
        /** m·c_p·(dT_sat/dp)·(dp/dt), W: positive while the pressure rises. */
        correction_W: z.number(),
        correctionStdError_W: z.number(),
        liquidMass_kg: z.number(),
        /** How the liquid mass was found (readings − tare, mean level × capacity, fill × capacity). */
        liquidMassBasis: z.string(),
        liquidHeatCapacity_J_per_kg_K: z.number(),
        saturationTemperatureSlope_K_per_Pa: z.number(),
      }),
      z.object({ applied: z.literal(false), reason: z.string() }),
    ])
    .optional(),
  warnings: z.array(z.string()),
  uncertaintyNote: z.string(),
});
export type Analysis = z.infer<typeof AnalysisSchema>;

export const TestDetailSchema = TestSummarySchema.extend({
  cryogen: z.enum(CRYOGEN_IDS as [CryogenId, ...CryogenId[]]),
  ventReference: z.enum(VENT_REFERENCES).nullable(),
  capacity_L: z.number().nullable(),
  fullScale_mm: z.number().nullable(),
  tareMass_kg: z.number().nullable(),
  fillFraction: z.number().nullable(),
  ambientTemperature_K: z.number().nullable(),
  ambientPressure_Pa: z.number().nullable(),
  notes: z.string(),
  log: LogInfoSchema.nullable(),
  window: WindowSchema.nullable(),
  windowSuggested: z.boolean(),
  analysis: AnalysisSchema.nullable(),
  attachments: z.array(StoredFileSchema),
  acceptedAt: z.string().nullable(),
  acceptedBy: z.string().nullable(),
});
export type TestDetail = z.infer<typeof TestDetailSchema>;

export const SeriesSchema = z.object({
  unit: z.string(),
  totalPoints: z.number().int(),
  firstReadingAt: z.string().nullable(),
  /** [seconds from the first reading, value], at most SERIES_MAX_POINTS. */
  points: z.array(pair),
  pressure_Pa: z.array(pair).nullable(),
  window: WindowSchema,
  suggested: z.boolean(),
  /** The fitted line's two end points, at the window's start and end. */
  fit: z.object({ start: pair, end: pair }),
  /** value − fitted line inside the window, downsampled the same way. */
  residuals: z.array(pair),
});
export type Series = z.infer<typeof SeriesSchema>;

export const LogPreviewSchema = z.object({
  header: z.array(z.string()),
  rows: z.array(z.array(z.string())),
  delimiter: z.enum([",", ";", "\t"]),
  detected: z.object({
    timeColumn: z.string().nullable(),
    timeFormat: z.enum(TIME_FORMATS).nullable(),
    valueColumn: z.string().nullable(),
    valueUnit: z.enum(VALUE_UNIT_IDS).nullable(),
    pressureColumn: z.string().nullable(),
    pressureUnit: z.enum(PRESSURE_UNIT_IDS).nullable(),
  }),
});
export type LogPreview = z.infer<typeof LogPreviewSchema>;

// ── Calibration ─────────────────────────────────────────────────────────────────────────────
export const CalibrationSchema = z.object({
  designId: IdSchema,
  latestRevision: z.number().int(),
  tests: z.array(z.object({ id: IdSchema, revision: z.number().int(), stageLabel: z.string(), vesselLabel: z.string(), ratio: z.number(), ratioStdError: z.number(), acceptedAt: z.string() })),
  /** Inverse-variance weighted mean of the accepted tests' measured/predicted ratios; null without tests. */
  factor: z.number().nullable(),
  factorStdError: z.number().nullable(),
  method: z.string(),
});
export type Calibration = z.infer<typeof CalibrationSchema>;
export const ApplyCalibrationInputSchema = z.object({ baseRevision: whole("baseRevision", 1, 1_000_000) });
