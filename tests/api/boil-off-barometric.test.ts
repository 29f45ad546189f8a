import { describe, expect, it } from "vitest";
import { AnalysisSchema, TestDetailSchema, type Analysis } from "../../shared/schemas/boil-off-test";
import { createDesign, createTest, gaussian, uploadLog, WEIGHING_FIELDS, type Agent } from "../support/boil-off";
import { useTestApp } from "../support/test-app";

/**
 * The barometric correction through the front door: an invented weighing log with a known
 * boil-off and a barometer rising at a known rate, with and without the vessel's tare mass.
 */
const t = useTestApp();

// Saturated nitrogen at 1 atm: NIST Chemistry WebBook, Thermophysical Properties of Fluid
// Systems, the values shared/thermal/fluids.ts carries (marked there as from memory). Typed out
// so the hand calculation does not call the engine.
const N2 = { saturationTemperature_K: 77.355, latentHeat_J_per_kg: 199_180, liquidDensity_kg_per_m3: 806.08, vapourDensity_kg_per_m3: 4.6079, liquidHeatCapacity_J_per_kg_K: 2041 };
/** Clapeyron at the normal boiling point, dT/dp = T·(1/ρv − 1/ρl)/h_fg: 8.3801e-5 K/Pa. */
const N2_DT_DP = (N2.saturationTemperature_K * (1 / N2.vapourDensity_kg_per_m3 - 1 / N2.liquidDensity_kg_per_m3)) / N2.latentHeat_J_per_kg;
const N2_VENTED_FACTOR = 1 - N2.vapourDensity_kg_per_m3 / N2.liquidDensity_kg_per_m3;

// Invented log: 3 W into the bath, 80 kg of liquid on a 40 kg vessel, weighed every minute for
// 10 h (scale noise 2 g); the barometer rises 150 Pa/h from 100.0 kPa (noise 5 Pa).
const HEAT_W = 3;
const TARE_KG = 40;
const START_MASS_KG = 120;
const RATE_KG_PER_S = -(HEAT_W * N2_VENTED_FACTOR) / N2.latentHeat_J_per_kg;
const READINGS = 600;
const STEP_S = 60;

function barometricLog(pressureSlope_Pa_per_s: number) {
  const massNoise = gaussian(31);
  const pressureNoise = gaussian(32);
  const start = Date.parse("2026-11-09T07:00:00Z");
  const lines = ["timestamp,mass (kg),barometer (Pa)"];
  for (let i = 0; i < READINGS; i++) {
    const t_s = i * STEP_S;
    const mass = START_MASS_KG + RATE_KG_PER_S * t_s + 0.002 * massNoise();
    const pressure = 100_000 + pressureSlope_Pa_per_s * t_s + 5 * pressureNoise();
    lines.push(`${new Date(start + t_s * 1000).toISOString()},${mass.toFixed(5)},${pressure.toFixed(1)}`);
  }
  return `${lines.join("\n")}\n`;
}
const WHOLE_LOG = { start_s: 0, end_s: (READINGS - 1) * STEP_S };
const FIELDS = { ...WEIGHING_FIELDS, pressureColumn: "barometer (Pa)", pressureUnit: "Pa" };

async function weighingTest(extra: Record<string, unknown> = {}) {
  const engineer = await t.signInAs("engineer");
  const { design } = await createDesign(engineer, "Barometer panel", { capacity_L: 180 });
  const agent: Agent = await t.signInAs("technician");
  const test = await createTest(agent, { designId: design.id, revision: 1, method: "weighing", vesselLabel: "Panel rig PR-7", ...extra });
  return { agent, engineer, design, test };
}

async function analyse(agent: Agent, testId: string, pressureSlope_Pa_per_s: number): Promise<Analysis> {
  const upload = await uploadLog(agent, testId, barometricLog(pressureSlope_Pa_per_s), FIELDS);
  expect(upload.status, JSON.stringify(upload.body)).toBe(201);
  const window = await agent.put(`/api/boil-off-tests/${testId}/window`).send(WHOLE_LOG);
  expect(window.status, JSON.stringify(window.body)).toBe(200);
  const res = await agent.get(`/api/boil-off-tests/${testId}/analysis`);
  expect(res.status).toBe(200);
  return AnalysisSchema.parse(res.body);
}

/** The hand formula m·c_p·(dT/dp)·(dp/dt), m the mean of the true masses over the whole log less the tare. */
function handCorrection_W(pressureSlope_Pa_per_s: number) {
  const meanMass = START_MASS_KG + (RATE_KG_PER_S * WHOLE_LOG.end_s) / 2;
  return (meanMass - TARE_KG) * N2.liquidHeatCapacity_J_per_kg_K * N2_DT_DP * pressureSlope_Pa_per_s;
}

describe("GET /api/boil-off-tests/:id/analysis, barometric correction", () => {
  it("with a tare mass, adds m·c_p·(dT/dp)·(dp/dt) for a rising barometer, within its uncertainty", async () => {
    const { agent, test } = await weighingTest({ tareMass_kg: TARE_KG });
    expect(test.tareMass_kg).toBe(TARE_KG);
    const slope = 150 / 3600;
    const a = await analyse(agent, test.id, slope);

    expect(a.pressureTrend!.slope_Pa_per_s).toBeCloseTo(slope, 4);
    expect(a.barometricCorrectionApplied).toBe(true);
    expect(a.barometric?.correctionApplied).toBe(true);
    const c = a.barometricCorrection!;
    if (!c.applied) throw new Error(`expected the correction to be applied: ${c.reason}`);
    // About 79.7 kg × 2041 J/(kg·K) × 8.38e-5 K/Pa × 0.04167 Pa/s ≈ 0.568 W.
    const expected = handCorrection_W(slope);
    expect(expected).toBeGreaterThan(0.56);
    expect(expected).toBeLessThan(0.58);
    expect(Math.abs(c.correction_W - expected)).toBeLessThan(3 * c.correctionStdError_W);
    expect(c.correctionStdError_W).toBeGreaterThan(0);
    expect(c.liquidMass_kg).toBeCloseTo(START_MASS_KG + (RATE_KG_PER_S * WHOLE_LOG.end_s) / 2 - TARE_KG, 2);

    // The uncorrected heat is the vented one (3 W invented); the corrected one adds the correction.
    expect(Math.abs(a.uncorrectedHeatLeak_W! - HEAT_W)).toBeLessThan(3 * a.uncorrectedHeatLeakStdError_W!);
    expect(a.measuredHeatLeak_W).toBeCloseTo(a.uncorrectedHeatLeak_W! + c.correction_W, 10);
    expect(a.measuredHeatLeakStdError_W).toBeCloseTo(Math.hypot(a.uncorrectedHeatLeakStdError_W!, c.correctionStdError_W), 12);
    // The list and the row carry the corrected figure.
    const row = await t.ctx.db.query.boilOffTests.findFirst();
    expect(row!.measuredHeatLeak_W).toBeCloseTo(a.measuredHeatLeak_W, 10);
  });

  it("takes heat off for a falling barometer", async () => {
    const { agent, test } = await weighingTest({ tareMass_kg: TARE_KG });
    const a = await analyse(agent, test.id, -150 / 3600);
    expect(a.barometricCorrection?.applied).toBe(true);
    expect(a.measuredHeatLeak_W).toBeLessThan(a.uncorrectedHeatLeak_W!);
  });

  it("without a tare mass, reports the trend but not the correction, and says why", async () => {
    const { agent, test } = await weighingTest();
    const a = await analyse(agent, test.id, 150 / 3600);
    expect(a.pressureTrend!.slope_Pa_per_s).toBeCloseTo(150 / 3600, 4);
    expect(a.barometricCorrectionApplied).toBe(false);
    expect(a.barometricCorrection).toEqual({ applied: false, reason: expect.stringContaining("no tare mass") });
    expect(a.measuredHeatLeak_W).toBe(a.uncorrectedHeatLeak_W);
  });

  it("a tare mass set later re-runs the analysis; clearing it takes the correction off", async () => {
    const { agent, test } = await weighingTest();
    await analyse(agent, test.id, 150 / 3600);
    const set = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ tareMass_kg: TARE_KG });
    expect(set.status, JSON.stringify(set.body)).toBe(200);
    const detail = TestDetailSchema.parse(set.body);
    expect(detail.tareMass_kg).toBe(TARE_KG);
    expect(detail.analysis?.barometricCorrection?.applied).toBe(true);
    // The chosen window stays.
    expect(detail.analysis?.window).toEqual(WHOLE_LOG);
    expect(detail.windowSuggested).toBe(false);

    const cleared = TestDetailSchema.parse((await agent.patch(`/api/boil-off-tests/${test.id}`).send({ tareMass_kg: null })).body);
    expect(cleared.tareMass_kg).toBeNull();
    expect(cleared.analysis?.barometricCorrection?.applied).toBe(false);
  });

  it("an accepted test keeps its tare mass and figures (409); its notes still change", async () => {
    const { agent, test } = await weighingTest({ tareMass_kg: TARE_KG });
    await analyse(agent, test.id, 150 / 3600);
    await agent.post(`/api/boil-off-tests/${test.id}/accept`).expect(200);
    const before = await t.ctx.db.query.boilOffTests.findFirst();
    const frozen = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ tareMass_kg: 10 });
    expect(frozen.status).toBe(409);
    expect(await t.ctx.db.query.boilOffTests.findFirst()).toEqual(before);
    const notes = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ notes: "tare from the vessel's plate" });
    expect(notes.status).toBe(200);
    expect(TestDetailSchema.parse(notes.body)).toMatchObject({ notes: "tare from the vessel's plate", tareMass_kg: TARE_KG });
  });
});

/** An invented log of one method's readings (`value(t)` plus noise) beside the rising barometer. */
function methodLog(header: string, value: (t_s: number) => number, noise: number) {
  const valueNoise = gaussian(41);
  const pressureNoise = gaussian(42);
  const lines = [`elapsed_s,${header},barometer (Pa)`];
  for (let i = 0; i < READINGS; i++) {
    const t_s = i * STEP_S;
    lines.push(`${t_s},${(value(t_s) + noise * valueNoise()).toFixed(5)},${(100_000 + (150 / 3600) * t_s + 5 * pressureNoise()).toFixed(1)}`);
  }
  return `${lines.join("\n")}\n`;
}

describe("the liquid mass of the level and vent-flow methods", () => {
  it("level: the mean level over the window × capacity × liquid density", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer, "Level panel", { capacity_L: 180 });
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "level", vesselLabel: "Level rig LR-1" });
    // 80 % falling 1 % an hour: the mean over the 10 h log is 80 − 9.983/2 = 75.008 %.
    const upload = await uploadLog(engineer, test.id, methodLog("level (%)", (t_s) => 80 - t_s / 3600, 0.01), { timeColumn: "elapsed_s", valueColumn: "level (%)", valueUnit: "percent", pressureColumn: "barometer (Pa)", pressureUnit: "Pa" });
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    await engineer.put(`/api/boil-off-tests/${test.id}/window`).send(WHOLE_LOG).expect(200);
    const a = AnalysisSchema.parse((await engineer.get(`/api/boil-off-tests/${test.id}/analysis`)).body);
    const c = a.barometricCorrection!;
    if (!c.applied) throw new Error(`expected the correction to be applied: ${c.reason}`);
    const meanLevel = 80 - WHOLE_LOG.end_s / 3600 / 2;
    expect(c.liquidMass_kg).toBeCloseTo((meanLevel / 100) * 0.18 * N2.liquidDensity_kg_per_m3, 1);
    expect(Math.abs(c.correction_W - c.liquidMass_kg * N2.liquidHeatCapacity_J_per_kg_K * N2_DT_DP * (150 / 3600))).toBeLessThan(3 * c.correctionStdError_W);
  });

  it("vent-flow: the starting fill × capacity × liquid density, less the boil-off up to the window's middle", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer, "Vent panel", { capacity_L: 180 });
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "Vent rig VR-1", fillFraction: 0.9 });
    const upload = await uploadLog(engineer, test.id, methodLog("flow (standard L/min)", () => 2, 0.02), { timeColumn: "elapsed_s", valueColumn: "flow (standard L/min)", valueUnit: "standard-L/min", pressureColumn: "barometer (Pa)", pressureUnit: "Pa" });
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    await engineer.put(`/api/boil-off-tests/${test.id}/window`).send(WHOLE_LOG).expect(200);
    const a = AnalysisSchema.parse((await engineer.get(`/api/boil-off-tests/${test.id}/analysis`)).body);
    const c = a.barometricCorrection!;
    if (!c.applied) throw new Error(`expected the correction to be applied: ${c.reason}`);
    // 0.9 × 180 L of liquid nitrogen, less what the vented heat boiled off over the first 5 h.
    const boiledOff_kg = (a.uncorrectedHeatLeak_W! / N2.latentHeat_J_per_kg) * (WHOLE_LOG.end_s / 2);
    expect(c.liquidMass_kg).toBeCloseTo(0.9 * 0.18 * N2.liquidDensity_kg_per_m3 - boiledOff_kg, 6);
    expect(a.measuredHeatLeak_W).toBeGreaterThan(a.uncorrectedHeatLeak_W!);
  });

  it("vent-flow without a fill fraction says why the correction is not applied", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer, "Vent panel", { capacity_L: 180 });
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "Vent rig VR-3" });
    const upload = await uploadLog(engineer, test.id, methodLog("flow (standard L/min)", () => 2, 0.02), { timeColumn: "elapsed_s", valueColumn: "flow (standard L/min)", valueUnit: "standard-L/min", pressureColumn: "barometer (Pa)", pressureUnit: "Pa" });
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    expect(AnalysisSchema.parse((await engineer.get(`/api/boil-off-tests/${test.id}/analysis`)).body).barometricCorrection).toEqual({ applied: false, reason: expect.stringContaining("fill fraction") });
  });
});

describe("tareMass_kg and fillFraction input", () => {
  it("refuses out-of-range figures with the field and its range, and stores nothing", async () => {
    const { agent, design, test } = await weighingTest();
    const before = await t.ctx.db.query.boilOffTests.findMany();

    const badTare = await agent.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "weighing", vesselLabel: "X", tareMass_kg: -1 });
    expect(badTare.status).toBe(400);
    expect(badTare.body.error.fields[0]).toEqual({ path: "tareMass_kg", message: "tareMass_kg must be from 0 to 100000 kg" });

    const badFill = await agent.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "X", fillFraction: 1.5 });
    expect(badFill.status).toBe(400);
    expect(badFill.body.error.fields[0]).toEqual({ path: "fillFraction", message: "fillFraction must be above 0 and at most 1" });

    const wrongMethod = await agent.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "level", vesselLabel: "X", fillFraction: 0.9 });
    expect(wrongMethod.status).toBe(400);
    expect(wrongMethod.body.error.fields[0]).toEqual({ path: "fillFraction", message: "fillFraction applies to a vent-flow test only (this one is level)" });

    const badPatch = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ tareMass_kg: "heavy" });
    expect(badPatch.status).toBe(400);
    expect(badPatch.body.error.fields[0].path).toBe("tareMass_kg");
    const wrongPatch = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ fillFraction: 0.5 });
    expect(wrongPatch.status).toBe(400);
    expect(wrongPatch.body.error.fields[0].path).toBe("fillFraction");

    expect(await t.ctx.db.query.boilOffTests.findMany()).toEqual(before);
  });

  it("a vent-flow test keeps its starting fill fraction", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer, "Vent panel", { capacity_L: 180 });
    const test = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "Vent rig VR-2", fillFraction: 0.9 });
    expect(test.fillFraction).toBe(0.9);
    expect(test.tareMass_kg).toBeNull();
  });
});
