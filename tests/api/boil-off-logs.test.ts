import { describe, expect, it } from "vitest";
import { AnalysisSchema, LogPreviewSchema, SeriesSchema, SERIES_MAX_POINTS, TestDetailSchema } from "../../shared/schemas/boil-off-test";
import { createDesign, createTest, gaussian, sha256, storedState, uploadLog, WEIGHING_FIELDS, weighingLog, type Agent } from "../support/boil-off";
import { useTestApp } from "../support/test-app";

/**
 * Logger files through the front door: upload, parse, store (file and parsed series in the S3
 * fake, each with its SHA-256), fit, and every kind of broken file refused with its line or
 * field named and nothing stored.
 */
const t = useTestApp();
/** The same database behind an app whose log limit is 4 KiB, for the size-limit case; `t` resets it. */
const small = useTestApp({ env: { LOG_MAX_BYTES: "4096" }, reset: false });

// Saturated nitrogen at 1 atm: NIST Chemistry WebBook, Thermophysical Properties of Fluid
// Systems (Span et al. 2000 equation of state), the values shared/thermal/fluids.ts carries
// (marked there as from memory). Typed out here so the hand calculation does not call the engine.
const N2 = { latentHeat_J_per_kg: 199_180, liquidDensity_kg_per_m3: 806.08, vapourDensity_kg_per_m3: 4.6079, molarMass_kg_per_mol: 28.0134e-3 };
const N2_VENTED_FACTOR = 1 - N2.vapourDensity_kg_per_m3 / N2.liquidDensity_kg_per_m3; // 0.99428

async function weighingTest(as: "technician" | "engineer" = "technician") {
  const engineer = await t.signInAs("engineer");
  const { design, predicted_W } = await createDesign(engineer);
  const agent: Agent = as === "engineer" ? engineer : await t.signInAs(as);
  const test = await createTest(agent, { designId: design.id, revision: 1, method: "weighing", vesselLabel: "Panel rig PR-1" });
  return { agent, design, predicted_W, test };
}

/** The scale's slope for a vessel leaking `heat_W` into nitrogen, by hand: ṁ_vented = Q·(1 − ρv/ρl)/h_fg. */
const slopeFor = (heat_W: number) => -(heat_W * N2_VENTED_FACTOR) / N2.latentHeat_J_per_kg;

describe("POST /api/boil-off-tests/:id/logs", () => {
  it("stores the file and its parsed series in the object store, each with its checksum", async () => {
    const { agent, test } = await weighingTest();
    const log = weighingLog({ rate_kg_per_s: -2e-5, readings: 400, barometer: true });
    const res = await uploadLog(agent, test.id, log.csv, { ...WEIGHING_FIELDS, pressureColumn: "barometer (hPa)" }, "PR-1 2026-11-02.csv");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const detail = TestDetailSchema.parse(res.body);
    expect(detail.status).toBe("analysed");
    expect(detail.testedAt).toBe("2026-11-02T08:00:00.000Z");
    expect(detail.log).toMatchObject({
      filename: "PR-1 2026-11-02.csv",
      contentType: "text/csv",
      size_bytes: Buffer.byteLength(log.csv),
      sha256: sha256(log.csv),
      rows: 400,
      timeColumn: "timestamp",
      valueColumn: "mass (kg)",
      valueUnit: "kg",
      // Neither was sent: read from the first reading and from the column's name.
      timeFormat: "iso",
      pressureColumn: "barometer (hPa)",
      pressureUnit: "hPa",
      firstReadingAt: "2026-11-02T08:00:00.000Z",
      duration_s: 399 * 60,
      seriesUnit: "kg",
      uploadedBy: "Ada Reyes",
    });

    const [file] = await t.ctx.db.query.boilOffTestFiles.findMany();
    expect(file).toMatchObject({ kind: "log", sha256: sha256(log.csv), sizeBytes: Buffer.byteLength(log.csv) });
    // The bytes in the S3 fake are the bytes sent.
    const stored = await t.ctx.objects.getBuffer(file.objectKey);
    expect(stored.toString("utf8")).toBe(log.csv);
    expect(sha256(stored)).toBe(detail.log!.sha256);
    const keys = (await t.ctx.objects.list()).sort();
    expect(keys).toEqual([file.objectKey, (await t.ctx.db.query.boilOffTests.findFirst())!.log!.seriesKey].sort());
    const series = await t.ctx.objects.getBuffer(keys.find((k) => k.includes("/series/"))!);
    expect(sha256(series)).toBe(detail.log!.seriesSha256);
    // Three float64 columns (time, mass, pressure) after a 16-byte header.
    expect(series.length).toBe(16 + 3 * 400 * 8);

    expect(detail.analysis!.barometric).toMatchObject({ source: "log", correctionApplied: false });
    expect(detail.analysis!.barometric!.meanPressure_Pa).toBeGreaterThan(101_250);
    expect(detail.analysis!.barometric!.meanPressure_Pa).toBeLessThan(101_400);
    const actions = (await t.ctx.db.query.auditLog.findMany()).map((e) => e.action);
    expect(actions).toContain("test.log_upload");
  });

  it("recovers an invented log's known rate within its 95 % interval, and the heat leak matches a hand calculation", async () => {
    const { agent, test, predicted_W } = await weighingTest();
    // Invented: the panel leaks 1.3 × its prediction; a 2 g scale noise; 720 readings a minute apart.
    const trueHeat_W = 1.3 * predicted_W;
    const rate = slopeFor(trueHeat_W);
    const sigma = 0.002;
    const n = 720;
    const log = weighingLog({ rate_kg_per_s: rate, readings: n, step_s: 60, noise_kg: sigma, seed: 7 });
    expect((await uploadLog(agent, test.id, log.csv, WEIGHING_FIELDS)).status).toBe(201);
    // The whole log is steady, so fit all of it.
    const res = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 0, end_s: (n - 1) * 60 });
    expect(res.status).toBe(200);
    const a = AnalysisSchema.parse(res.body);
    expect(a).toMatchObject({ suggested: false, points: n, totalPoints: n, degreesOfFreedom: n - 2, rateUnit: "kg/s", method: "weighing", cryogen: "nitrogen" });
    expect(a.interval95[0]).toBeLessThan(rate);
    expect(a.interval95[1]).toBeGreaterThan(rate);
    // Closed form for evenly spaced readings: SE = σ·√12 / (√n · T) with T = n·Δt (large n),
    // exactly σ/√(Σ(t − t̄)²) = σ/(Δt·√(n(n²−1)/12)).
    const expectedSe = sigma / (60 * Math.sqrt((n * (n * n - 1)) / 12));
    expect(a.rateStdError / expectedSe).toBeGreaterThan(0.9);
    expect(a.rateStdError / expectedSe).toBeLessThan(1.1);
    expect(a.residualStdDev / sigma).toBeGreaterThan(0.9);
    expect(a.residualStdDev / sigma).toBeLessThan(1.1);

    // By hand: Q = −slope · h_fg / (1 − ρv/ρl), and its standard error through the same factor.
    const handHeat_W = (-a.rate * N2.latentHeat_J_per_kg) / N2_VENTED_FACTOR;
    expect(a.measuredHeatLeak_W / handHeat_W).toBeCloseTo(1, 10);
    expect(a.measuredHeatLeakStdError_W / ((a.rateStdError * N2.latentHeat_J_per_kg) / N2_VENTED_FACTOR)).toBeCloseTo(1, 10);
    expect(a.ventedGasFactor).toBeCloseTo(0.99428, 5);
    // The true heat lies within the heat's 95 % interval, the ratio is measured over the revision's prediction.
    expect(a.measuredHeatLeakInterval95_W[0]).toBeLessThan(trueHeat_W);
    expect(a.measuredHeatLeakInterval95_W[1]).toBeGreaterThan(trueHeat_W);
    expect(a.predictedHeatLeak_W).toBeCloseTo(predicted_W, 12);
    expect(a.ratio!).toBeCloseTo(a.measuredHeatLeak_W / predicted_W, 12);
    expect(a.ratioStdError!).toBeCloseTo(a.measuredHeatLeakStdError_W / predicted_W, 12);
    expect(a.ratioInterval95![0]).toBeLessThan(1.3);
    expect(a.ratioInterval95![1]).toBeGreaterThan(1.3);
    // Liquid boiled per day by hand: Q/(h_fg·ρl) in m³/s → L/day; over the 100 L capacity for the evaporation rate.
    const litresPerDay = (a.measuredHeatLeak_W / (N2.latentHeat_J_per_kg * N2.liquidDensity_kg_per_m3)) * 1000 * 86_400;
    expect(a.boilOff_L_per_day! / litresPerDay).toBeCloseTo(1, 3);
    expect(a.evaporationRate_percent_per_day! / litresPerDay).toBeCloseTo(1, 10); // 100 L: % per day = L per day

    // The list and the detail carry the same figures.
    const detail = TestDetailSchema.parse((await agent.get(`/api/boil-off-tests/${test.id}`)).body);
    expect(detail.measuredHeatLeak_W).toBe(a.measuredHeatLeak_W);
    expect(detail.ratio).toBe(a.ratio);
    expect(detail.window).toEqual({ start_s: 0, end_s: (n - 1) * 60 });
    expect(detail.windowSuggested).toBe(false);
  });

  it("reads a vent flowmeter's standard litres through the ideal gas at the stated reference, as a hand calculation does", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer);
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "V", ventReference: "standard-20C" });
    const noise = gaussian(3);
    const lines = ["elapsed_s,flow (scfh)"];
    for (let i = 0; i < 200; i++) lines.push(`${i * 30},${(2 + 0.02 * noise()).toFixed(4)}`);
    const res = await uploadLog(engineer, test.id, `${lines.join("\n")}\n`, { timeColumn: "elapsed_s", valueColumn: "flow (scfh)", valueUnit: "standard-ft3/h", timeFormat: "seconds" });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const a = AnalysisSchema.parse((await engineer.get(`/api/boil-off-tests/${test.id}/analysis`)).body);
    expect(a.rateUnit).toBe("standard L/min");
    expect(a.ventReference).toBe("standard-20C");
    // 1 ft³ = 28.316846592 L exactly (NIST SP 811 B.8): ft³/h → L/min.
    const flow_L_per_min = a.rate;
    expect(flow_L_per_min / ((2 * 28.316846592) / 60)).toBeCloseTo(1, 2);
    // By hand: n = pV/(RT) at 20 °C and 101.325 kPa (R = 8.314462618 J/(mol·K), CODATA 2018), m = n·M,
    // then Q = ṁ·h_fg/(1 − ρv/ρl).
    const mass_kg_per_s = ((101_325 * (flow_L_per_min / 1000 / 60)) / (8.314462618 * 293.15)) * N2.molarMass_kg_per_mol;
    expect(a.measuredHeatLeak_W / ((mass_kg_per_s * N2.latentHeat_J_per_kg) / N2_VENTED_FACTOR)).toBeCloseTo(1, 10);
  });

  it("gives about 1.4 L/h of liquid helium per watt (common practice) for a helium level log", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer, "Helium panel", { cryogen: "helium", capacity_L: 250 });
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "level", vesselLabel: "He" });
    const lines = ["time,level (%)"];
    for (let i = 0; i < 100; i++) lines.push(`2026-11-02T08:${String(Math.floor(i / 2)).padStart(2, "0")}:${i % 2 ? "30" : "00"}Z,${(90 - 0.001 * i).toFixed(4)}`);
    const res = await uploadLog(engineer, test.id, `${lines.join("\n")}\n`, { timeColumn: "time", valueColumn: "level (%)", valueUnit: "percent" });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const a = res.body.analysis;
    expect(a.ventedGasFactor).toBeCloseTo(0.866, 3);
    expect(a.boilOff_L_per_day / 24 / a.measuredHeatLeak_W).toBeCloseTo(1.4, 1);
  });

  it("gives the same rate in kg whatever the scale's unit, time format or separator", async () => {
    const { agent, test } = await weighingTest();
    const log = weighingLog({ rate_kg_per_s: -2e-5, readings: 200, seed: 4 });
    expect((await uploadLog(agent, test.id, log.csv, WEIGHING_FIELDS)).status).toBe(201);
    const window = { start_s: 0, end_s: 199 * 60 };
    const reference = AnalysisSchema.parse((await agent.put(`/api/boil-off-tests/${test.id}/window`).send(window)).body).rate;

    const variants: { csv: string; fields: Record<string, string> }[] = [
      { csv: ["elapsed_s;mass (g)", ...log.time_s.map((s, i) => `${s};${(log.mass_kg[i] * 1000).toFixed(2).replace(".", ",")}`)].join("\n"), fields: { timeColumn: "elapsed_s", valueColumn: "mass (g)", valueUnit: "g" } },
      { csv: ["# logger PR-1, firmware 2.1", "Timestamp\tWeight lb", ...log.time_s.map((s, i) => `${new Date(Date.parse("2026-11-02T08:00:00Z") + s * 1000).toISOString().slice(0, 19)}\t${(log.mass_kg[i] / 0.45359237).toFixed(6)}`)].join("\r\n"), fields: { timeColumn: "timestamp", valueColumn: "weight lb", valueUnit: "lb", timeFormat: "iso" } },
    ];
    for (const v of variants) {
      const res = await uploadLog(agent, test.id, v.csv, v.fields);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const a = AnalysisSchema.parse((await agent.put(`/api/boil-off-tests/${test.id}/window`).send(window)).body);
      expect(a.points).toBe(200);
      expect(a.rate / reference).toBeCloseTo(1, 4);
    }
    // Each upload replaced the one before: one log file row, and only its two objects.
    expect((await t.ctx.db.query.boilOffTestFiles.findMany()).map((f) => f.kind)).toEqual(["log"]);
    expect(await t.ctx.objects.list()).toHaveLength(2);
  });
});

describe("the steady window and the chart", () => {
  /** An invented cool-down: an extra loss three times the steady one that halves every 30 minutes. */
  function coolDownLog(rate: number) {
    const noise = gaussian(11);
    const lines = ["timestamp,mass (kg)"];
    let mass = 150;
    for (let i = 0; i < 5000; i++) {
      const t_s = i * 30;
      if (i > 0) mass += rate * 30 * (1 + 3 * Math.exp((-t_s * Math.LN2) / 1800));
      lines.push(`${new Date(Date.parse("2026-11-02T08:00:00Z") + t_s * 1000).toISOString()},${(mass + 0.001 * noise()).toFixed(5)}`);
    }
    return `${lines.join("\n")}\n`;
  }

  it("suggests a window past the cool-down, downsamples the chart, and moves the window when asked", async () => {
    const { agent, test, predicted_W } = await weighingTest();
    const rate = slopeFor(predicted_W);
    const up = await uploadLog(agent, test.id, coolDownLog(rate), WEIGHING_FIELDS);
    expect(up.status).toBe(201);
    const suggested = AnalysisSchema.parse((await (await t.signInAs("viewer")).get(`/api/boil-off-tests/${test.id}/analysis`)).body);
    expect(suggested.suggested).toBe(true);
    expect(suggested.suggestedWindow).toEqual(suggested.window);
    // Past four half-lives (2 h) the extra loss is under 19 % of the steady one, and what is left
    // of it inside the window biases the fit by under 1 %.
    expect(suggested.window.start_s).toBeGreaterThan(2 * 3600);
    expect(suggested.window.end_s).toBe(4999 * 30);
    expect(suggested.rate / rate).toBeGreaterThan(0.99);
    expect(suggested.rate / rate).toBeLessThan(1.01);
    expect(suggested.ratio!).toBeGreaterThan(0.98);
    expect(suggested.ratio!).toBeLessThan(1.02);

    const chart = SeriesSchema.parse((await agent.get(`/api/boil-off-tests/${test.id}/series`)).body);
    expect(chart.totalPoints).toBe(5000);
    expect(chart.points.length).toBeLessThanOrEqual(SERIES_MAX_POINTS);
    expect(chart.points.length).toBeGreaterThan(SERIES_MAX_POINTS - 10);
    // LTTB keeps the first and last readings and picks real readings in between.
    expect(chart.points[0][0]).toBe(0);
    expect(chart.points[0][1]).toBeCloseTo(150, 2);
    expect(chart.points.at(-1)![0]).toBe(4999 * 30);
    expect(chart.window).toEqual(suggested.window);
    expect(chart.fit.start[0]).toBe(suggested.window.start_s);
    expect(chart.fit.end[1]).toBeCloseTo(suggested.intercept + suggested.slope * suggested.window.end_s, 9);
    expect(chart.residuals.length).toBeLessThanOrEqual(SERIES_MAX_POINTS);
    expect(Math.max(...chart.residuals.map(([, r]) => Math.abs(r)))).toBeLessThan(0.01);

    // Moving the window into the cool-down fits a steeper loss, and the chart follows.
    const moved = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 0, end_s: 3600 });
    expect(moved.status).toBe(200);
    const early = AnalysisSchema.parse(moved.body);
    expect(early).toMatchObject({ suggested: false, window: { start_s: 0, end_s: 3600 }, suggestedWindow: suggested.window, points: 121 });
    expect(early.ratio!).toBeGreaterThan(2);
    expect(SeriesSchema.parse((await agent.get(`/api/boil-off-tests/${test.id}/series`)).body).window).toEqual({ start_s: 0, end_s: 3600 });
    // DELETE /window goes back to the suggestion.
    const back = await agent.delete(`/api/boil-off-tests/${test.id}/window`);
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ suggested: true, window: suggested.window });
    expect(TestDetailSchema.parse((await agent.get(`/api/boil-off-tests/${test.id}`)).body).windowSuggested).toBe(true);
  });

  it("refuses a window with fewer than 10 readings, naming the window, and keeps the analysis", async () => {
    const { agent, test } = await weighingTest();
    expect((await uploadLog(agent, test.id, weighingLog({ rate_kg_per_s: -2e-5, readings: 100 }).csv, WEIGHING_FIELDS)).status).toBe(201);
    const before = await storedState(t);
    const narrow = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 600, end_s: 1080 });
    expect(narrow.status).toBe(400);
    expect(narrow.body.error.fields).toEqual([{ path: "window", message: "the window 600 to 1080 s holds 9 readings; a fit needs at least 10 (the log runs from 0 to 5940 s)" }]);
    const beyond = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 10_000, end_s: 20_000 });
    expect(beyond.status).toBe(400);
    expect(beyond.body.error.fields[0].message).toMatch(/holds 0 readings/);
    const backwards = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 600, end_s: 300 });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields).toEqual([{ path: "end_s", message: "end_s must be after start_s (seconds from the first reading)" }]);
    const text = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: "soon", end_s: 300 });
    expect(text.status).toBe(400);
    expect(text.body.error.fields[0].path).toBe("start_s");
    expect(await storedState(t)).toEqual(before);
  });
});

describe("the stored series", () => {
  it("is checked against its SHA-256 before a refit, and a damaged one changes nothing", async () => {
    const { agent, test } = await weighingTest();
    expect((await uploadLog(agent, test.id, weighingLog({ rate_kg_per_s: -2e-5, readings: 100 }).csv, WEIGHING_FIELDS)).status).toBe(201);
    const row = (await t.ctx.db.query.boilOffTests.findFirst())!;
    const damaged = await t.ctx.objects.getBuffer(row.log!.seriesKey);
    damaged[100] ^= 0xff;
    await t.ctx.objects.put(row.log!.seriesKey, damaged, { contentLength: damaged.length, contentType: "application/octet-stream", sha256: "damaged" });
    const before = await storedState(t);
    const res = await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 0, end_s: 3000 });
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe("internal");
    expect(await storedState(t)).toEqual(before);
  });
});

describe("POST /api/boil-off-tests/:id/logs/preview", () => {
  it("shows the first rows and detects the time, value and barometer columns with their units", async () => {
    const { agent, test } = await weighingTest();
    const log = weighingLog({ rate_kg_per_s: -2e-5, readings: 50, barometer: true });
    const res = await agent.post(`/api/boil-off-tests/${test.id}/logs/preview`).attach("file", Buffer.from(log.csv), "log.csv");
    expect(res.status).toBe(200);
    const preview = LogPreviewSchema.parse(res.body);
    expect(preview.header).toEqual(["timestamp", "mass (kg)", "barometer (hPa)"]);
    expect(preview.rows).toHaveLength(20);
    expect(preview.delimiter).toBe(",");
    expect(preview.detected).toEqual({ timeColumn: "timestamp", timeFormat: "iso", valueColumn: "mass (kg)", valueUnit: "kg", pressureColumn: "barometer (hPa)", pressureUnit: "hPa" });
    // A preview stores nothing.
    expect(await t.ctx.objects.list()).toEqual([]);
    expect((await t.ctx.db.query.boilOffTests.findFirst())!.status).toBe("logging");
  });
});

describe("broken logger files: a 4xx naming the line or field, and nothing stored", () => {
  const header = "timestamp,mass (kg)";
  const row = (i: number, mass = 150 - 0.001 * i) => `${new Date(Date.parse("2026-11-02T08:00:00Z") + i * 60_000).toISOString()},${mass.toFixed(4)}`;
  const rows = (n: number) => Array.from({ length: n }, (_, i) => row(i));
  const csv = (lines: string[]) => `${lines.join("\n")}\n`;
  const good = rows(30);

  const cases: { name: string; file: string | Buffer; fields?: Record<string, string>; status?: number; path: string; message: RegExp }[] = [
    { name: "a time column that is not in the header", file: csv([header, ...good]), fields: { ...WEIGHING_FIELDS, timeColumn: "time" }, path: "line 1, timeColumn", message: /timeColumn "time" is not a column of the header \(its columns: "timestamp", "mass \(kg\)"\)/ },
    { name: "a value column that is not in the header", file: csv(["timestamp,weight", ...good]), path: "line 1, valueColumn", message: /valueColumn "mass \(kg\)" is not a column/ },
    { name: "a missing value column field", file: csv([header, ...good]), fields: { timeColumn: "timestamp", valueUnit: "kg" }, path: "valueColumn", message: /valueColumn is required/ },
    { name: "a level unit on a weighing test", file: csv([header, ...good]), fields: { ...WEIGHING_FIELDS, valueUnit: "percent" }, path: "valueUnit", message: /valueUnit must be one of kg, g, lb for a weighing test/ },
    { name: "an unknown unit", file: csv([header, ...good]), fields: { ...WEIGHING_FIELDS, valueUnit: "stone" }, path: "valueUnit", message: /valueUnit must be one of/ },
    { name: "the same column twice", file: csv([header, ...good]), fields: { ...WEIGHING_FIELDS, valueColumn: "timestamp" }, path: "valueColumn", message: /must be different columns/ },
    { name: "text in the number column", file: csv([header, ...good.slice(0, 5), row(5).replace(/,.*/, ",about 150"), ...good.slice(6)]), path: "line 7, mass (kg)", message: /line 7: mass \(kg\) must be a number \(got "about 150"\)/ },
    { name: "an empty cell in the number column", file: csv([header, ...good.slice(0, 3), row(3).replace(/,.*/, ","), ...good.slice(4)]), path: "line 5, mass (kg)", message: /got an empty cell/ },
    { name: "text in the time column", file: csv([header, ...good.slice(0, 8), "yesterday,149.9", ...good.slice(9)]), path: "line 10, timestamp", message: /timestamp must be an ISO 8601 time/ },
    { name: "a line with too few cells", file: csv([header, ...good.slice(0, 2), "2026-11-02T08:02:00Z", ...good.slice(3)]), path: "line 4", message: /this line has 1 cell, the header 2 or more/ },
    { name: "time that goes backwards", file: csv([header, ...good.slice(0, 10), row(4), ...good.slice(11)]), path: "line 12, timestamp", message: /line 12: the time goes back from line 11's/ },
    { name: "time that repeats", file: csv([header, ...good.slice(0, 10), row(9), ...good.slice(11)]), path: "line 12, timestamp", message: /line 12: the time repeats line 11's/ },
    { name: "elapsed seconds that repeat", file: csv(["elapsed_s,mass (kg)", ...Array.from({ length: 20 }, (_, i) => `${i < 12 ? i * 10 : (i - 1) * 10},${150 - i * 0.01}`)]), fields: { ...WEIGHING_FIELDS, timeColumn: "elapsed_s" }, path: "line 14, elapsed_s", message: /line 14: the time repeats line 13's \(110\)/ },
    { name: "an empty file", file: "", path: "line 1", message: /line 1: the file is empty/ },
    { name: "a file of blank lines", file: "\n\n  \n", path: "line 1", message: /only blank lines/ },
    { name: "a one-line file", file: `${header}\n`, path: "line 1", message: /line 1: the file has a header but no readings below it/ },
    { name: "a one-line file without a line end", file: row(0), fields: { ...WEIGHING_FIELDS, timeColumn: row(0).split(",")[0], valueColumn: row(0).split(",")[1] }, path: "line 1", message: /header but no readings/ },
    { name: "fewer readings than a fit needs", file: csv([header, ...good.slice(0, 9)]), path: "line 1", message: /the file holds 9 readings; a fit needs at least 10/ },
    { name: "a binary file", file: Buffer.concat([Buffer.from("89504e470d0a1a0a0000000d49484452", "hex"), Buffer.alloc(64, 7)]), path: "line 3", message: /this is not a text CSV file \(binary data at byte 8\)/ },
    { name: "binary data after a good start", file: Buffer.concat([Buffer.from(csv([header, ...good])), Buffer.from([0, 1, 2, 3])]), path: "line 32", message: /binary data at byte/ },
    { name: "binary data past the first 256 KiB", file: Buffer.concat([Buffer.from(csv([header, ...rows(7000)])), Buffer.from([0x50, 0x4b, 0x03, 0x04, 0, 0]), Buffer.from("\n")]), path: "line 7002", message: /line 7002: this is not a text CSV file \(binary data at byte \d+\)/ },
    { name: "a file that is not UTF-8", file: Buffer.from([0x74, 0x69, 0x6d, 0x65, 0xff, 0xfe, 0x2c, 0x6d, 0x0a]), path: "line 1", message: /not a UTF-8 text CSV/ },
    { name: "a barometer in the wrong unit", file: csv(["timestamp,mass (kg),p", ...good.map((l) => `${l},1013.2`)]), fields: { ...WEIGHING_FIELDS, pressureColumn: "p", pressureUnit: "kPa" }, path: "line 2, p", message: /p must be a barometric pressure from 50 to 120 kPa \(1013 kPa after conversion; check pressureUnit\)/ },
    { name: "a barometer whose unit cannot be read", file: csv(["timestamp,mass (kg),p", ...good.map((l) => `${l},3`)]), fields: { ...WEIGHING_FIELDS, pressureColumn: "p" }, path: "line 2, pressureUnit", message: /pressureUnit cannot be read from the column "p"/ },
    { name: "an unclosed quote", file: csv([header, ...good.slice(0, 3), `"2026-11-02T08:03:00Z,149`, ...good.slice(4)]), path: "line 5", message: /line 5: a quote \("\) opens on this line and is never closed/ },
  ];

  for (const c of cases) {
    it(c.name, async () => {
      const { agent, test } = await weighingTest();
      const before = await storedState(t);
      const res = await uploadLog(agent, test.id, c.file, c.fields ?? WEIGHING_FIELDS);
      expect(res.status, JSON.stringify(res.body)).toBe(c.status ?? 400);
      const fields = res.body.error.fields as { path: string; message: string }[];
      expect(fields.map((f) => f.path)).toContain(c.path);
      const named = fields.find((f) => f.path === c.path)!;
      expect(`${named.message} | ${res.body.error.message}`).toMatch(c.message);
      expect(await storedState(t)).toEqual(before);
    });
  }

  it("names many bad lines at once, up to a screenful", async () => {
    const { agent, test } = await weighingTest();
    const lines = [header, ...good.map((l, i) => (i % 2 ? l.replace(/,.*/, ",n/a") : l))];
    const res = await uploadLog(agent, test.id, csv(lines), WEIGHING_FIELDS);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path).slice(0, 3)).toEqual(["line 3, mass (kg)", "line 5, mass (kg)", "line 7, mass (kg)"]);
    expect(res.body.error.message).toMatch(/^The log was not stored \(15 problems\): line 3: mass \(kg\) must be a number/);
    expect(res.body.error.message).toMatch(/and 10 more\. Nothing was changed\.$/);
  });

  it("stops reading a plainly wrong file after 200 problems", async () => {
    const { agent, test } = await weighingTest();
    const before = await storedState(t);
    const lines = [header, ...rows(5000).map((l) => l.replace(/,.*/, ",—"))];
    const res = await uploadLog(agent, test.id, csv(lines), WEIGHING_FIELDS);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveLength(20);
    expect(res.body.error.message).toMatch(/^The log was not stored \(200\+ problems\): line 2: mass \(kg\) must be a number \(got "—"\)/);
    expect(await storedState(t)).toEqual(before);
  });

  it("refuses an upload without a file", async () => {
    const { agent, test } = await weighingTest();
    const before = await storedState(t);
    let req = agent.post(`/api/boil-off-tests/${test.id}/logs`);
    for (const [k, v] of Object.entries(WEIGHING_FIELDS)) req = req.field(k, v);
    const res = await req;
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "file", message: "a file is required" }]);
    const wrongField = await agent.post(`/api/boil-off-tests/${test.id}/logs`).attach("upload", Buffer.from(csv([header, ...good])), "log.csv");
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.fields[0].path).toBe("file");
    expect(await storedState(t)).toEqual(before);
  });

  it("a file over the size limit (413, naming the file)", async () => {
    const { test } = await weighingTest();
    const agent = await small.signInAs("technician");
    const before = await storedState(t);
    const big = csv([header, ...rows(200)]);
    expect(Buffer.byteLength(big)).toBeGreaterThan(4096);
    const res = await uploadLog(agent, test.id, big, WEIGHING_FIELDS);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: "too_large", fields: [{ path: "file", message: "at most 4 KB" }] });
    expect(await storedState(t)).toEqual(before);
    expect(await small.ctx.objects.list()).toEqual([]);
    // Under the limit the same app takes it.
    expect((await uploadLog(agent, test.id, csv([header, ...rows(50)]), WEIGHING_FIELDS)).status).toBe(201);
    expect(await small.ctx.objects.list()).toHaveLength(2);
  });
});
