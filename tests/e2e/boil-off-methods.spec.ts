import { expect, test, type BrowserContext, type Locator, type Page } from "@playwright/test";
import { failOnConsoleErrors, signIn } from "../support/browser";
import { z } from "zod";
import { boilOff, measuredHeatLeak, type CryogenId } from "../../shared/thermal";

// The seeded demo organization (server/db/seed/demo.ts) and two of its designs. Every test here
// makes its own tests with their own vessel labels, so the order of specs does not matter.
const TECHNICIAN = "technician@kestrelbay.example";
const OWNER = "owner@kestrelbay.example";
const VIEWER = "viewer@kestrelbay.example";
const HELIUM_DESIGN = "250 L helium magnet cryostat";
const NITROGEN_DESIGN = "180 L liquid-nitrogen storage dewar";

// Each role signs in through the form once for the whole file, and each test starts from that
// session: the suite signs everyone in from one address, under the server's sign-in limit.
const sessions = new Map<string, Awaited<ReturnType<BrowserContext["cookies"]>>>();
test.beforeAll(async ({ browser }) => {
  for (const email of [TECHNICIAN, VIEWER, OWNER]) {
    const context = await browser.newContext();
    await signIn(await context.newPage(), email);
    sessions.set(email, await context.cookies());
    await context.close();
  }
});

async function signedInAs(page: Page, email: string) {
  await page.context().addCookies(sessions.get(email)!);
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1, name: /^Welcome, / })).toBeVisible();
}

/** A small seeded generator, so each invented log is the same on every run. */
function noise(seed: number) {
  let a = seed;
  return () => {
    a = (a * 1103515245 + 12345) % 2147483648;
    return a / 2147483648 - 0.5;
  };
}

/** Elapsed seconds every `step` over `hours`, each line from `row(t, rand)`. */
function elapsedCsv(header: string, hours: number, step: number, seed: number, row: (t: number, rand: () => number) => (string | number)[]): Buffer {
  const rand = noise(seed);
  const lines = [header];
  for (let t = 0; t <= hours * 3600; t += step) lines.push(row(t, rand).join(","));
  return Buffer.from(`${lines.join("\n")}\n`);
}

/** An invented cool-down that decays with a 30-minute half-life before the steady boil-off. */
const settling = (t: number) => 1 + 0.8 * Math.exp((-t * Math.LN2) / 1800);

/** Through the New test form, on the design's latest revision and its cold vessel. */
async function createTest(page: Page, opts: { design: string; method: string; vessel: string; fill?: (form: Locator) => Promise<void> }) {
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  await page.getByRole("link", { name: "New test" }).click();
  const form = page.getByRole("form", { name: "New boil-off test" });
  await form.getByLabel("Design", { exact: true }).selectOption({ label: opts.design });
  await expect(form.getByLabel("Stage measured")).toBeEnabled();
  await form.getByLabel(opts.method).check();
  await form.getByLabel("Vessel label or serial").fill(opts.vessel);
  await opts.fill?.(form);
  await form.getByRole("button", { name: "Create test" }).click();
  await expect(page.getByRole("heading", { level: 1, name: opts.vessel })).toBeVisible();
  await expect(page.getByText("Awaiting log")).toBeVisible();
  const testId = new URL(page.url()).pathname.split("/").pop()!;
  // The prediction the test checks, read through the API the page uses, sets the invented rates.
  const detail = z
    .object({ predictedHeatLeak_W: z.number().positive(), cryogen: z.string(), capacity_L: z.number().nullable() })
    .parse(await (await page.request.get(`/api/boil-off-tests/${testId}`)).json());
  return { testId, predicted_W: detail.predictedHeatLeak_W, cryogen: detail.cryogen as CryogenId, capacity_L: detail.capacity_L };
}

async function chooseLog(page: Page, name: string, buffer: Buffer) {
  await page.getByLabel("Logger file (CSV)").setInputFiles({ name, mimeType: "text/csv", buffer });
  await expect(page.getByRole("table", { name: "First rows of the logger file" })).toBeVisible();
}

async function uploadAndAnalyse(page: Page) {
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  await expect(page.getByText("Analysed", { exact: true })).toBeVisible();
  await expect(page.locator("figure").filter({ hasText: "Shaded: the steady window" }).locator(".recharts-line path.recharts-line-curve").first()).toHaveAttribute("d", /^M/);
}

const comparisonOf = (page: Page) => page.locator("dl[aria-label='Measured against predicted']");

/** The measured/predicted ratio as the page shows it. */
async function shownRatio(page: Page): Promise<number> {
  const comparison = comparisonOf(page);
  await expect(comparison).toContainText(/Measured \/ predicted\s*[\d.]+×/);
  return Number(/Measured \/ predicted\s*([\d.]+)×/.exec((await comparison.textContent()) ?? "")![1]);
}

test("a technician logs a vent-flow test in standard L/min against elapsed seconds and sees measured against predicted", async ({ page }) => {
  const vessel = `Cryostat MC-250 vent line (e2e ${Date.now()})`;
  const errors = failOnConsoleErrors(page);
  await signedInAs(page, TECHNICIAN);
  const created = await createTest(page, {
    design: HELIUM_DESIGN,
    method: "Vent-gas flowmeter",
    vessel,
    fill: (form) => form.getByLabel("Flowmeter reference conditions").selectOption({ label: "0 °C and 101.325 kPa (normal conditions)" }).then(() => undefined),
  });
  // Invented: the vessel vents 10 % more than its prediction, at 0 °C and 101.325 kPa.
  const ratio = 1.1;
  const flow = boilOff({ heat_W: ratio * created.predicted_W, cryogen: created.cryogen, ventReference: "normal-0C" }).ventFlow_standard_L_per_min;
  // Before any log, the starting fill can already go on the test (the barometric correction's
  // liquid mass); out of range is refused beside the field, as typed.
  const fill = page.getByRole("form", { name: "Liquid in the vessel" }).getByLabel("Starting fill fraction");
  await fill.fill("1.2");
  await page.getByRole("button", { name: "Save the starting fill fraction" }).click();
  await expect(page.getByText("fillFraction must be above 0 and at most 1")).toBeVisible();
  await expect(fill).toHaveValue("1.2");
  await fill.fill("0.9");
  await page.getByRole("button", { name: "Save the starting fill fraction" }).click();
  await expect(page.getByText("Saved.", { exact: true })).toBeVisible();

  // A room channel first, so the flow column is mapped by hand.
  const csv = elapsedCsv("elapsed_s,ch1 room degC,ch2 vent", 12, 30, 11, (t, rand) => [t, (21 + rand()).toFixed(2), (flow * settling(t) * (1 + 0.01 * rand())).toFixed(5)]);
  await chooseLog(page, "mc250-vent.csv", csv);
  await expect(page.getByLabel("Time column")).toHaveValue("elapsed_s");
  await expect(page.getByLabel("Time format")).toHaveValue("seconds");
  await expect(page.getByLabel("Barometer column (optional)")).toHaveValue("");
  await page.getByLabel("Reading column").selectOption("ch2 vent");
  await page.getByLabel("Reading unit").selectOption({ label: "standard L/min" });
  await uploadAndAnalyse(page);

  const fit = page.getByRole("definition").filter({ hasText: /standard L\/min ± / });
  await expect(fit).toBeVisible();
  await expect(page.locator("dl[aria-label='Fit']")).toContainText("0 °C and 101.325 kPa (normal conditions)");
  const comparison = comparisonOf(page);
  await expect(comparison).toContainText("Predicted (");
  await expect(comparison).toContainText("95 %");
  expect(await shownRatio(page)).toBeCloseTo(ratio, 1);
  // No barometer in this log, so nothing about the liquid is asked for.
  await expect(page.getByText("Not applied: no barometer column in the log, so no pressure trend.")).toBeVisible();
  await expect(page.getByRole("button", { name: "Set the starting fill fraction" })).toHaveCount(0);
  await expect(page.getByRole("region", { name: "Liquid in the vessel" }).getByLabel("Starting fill fraction")).toHaveValue("0.9");
  expect(errors).toEqual([]);
});

test("a technician logs a level-gauge test in % of the capacity entered on the test and sees measured against predicted", async ({ page }) => {
  const vessel = `Cryostat MC-250 level gauge (e2e ${Date.now()})`;
  const errors = failOnConsoleErrors(page);
  await signedInAs(page, TECHNICIAN);
  // Invented: the vessel holds 200 L below the gauge's top, not the design's 250 L; the level
  // method needs the capacity to turn % into litres.
  const capacity_L = 200;
  const created = await createTest(page, { design: HELIUM_DESIGN, method: "Level gauge", vessel, fill: (form) => form.getByLabel("Capacity (L)").fill(String(capacity_L)) });
  expect(created.capacity_L).toBe(capacity_L);
  await expect(page.getByRole("definition").filter({ hasText: /^200 L$/ })).toBeVisible();
  const ratio = 0.9;
  const litresPerHour = boilOff({ heat_W: ratio * created.predicted_W, cryogen: created.cryogen }).liquidVolume_L_per_h;
  const percentPerSecond = (litresPerHour / capacity_L) * 100 / 3600;
  let level = 92;
  const csv = elapsedCsv("t_s,He level %", 24, 60, 5, (t, rand) => {
    if (t > 0) level -= percentPerSecond * 60 * settling(t);
    return [t, (level + 0.002 * rand()).toFixed(4)];
  });
  await chooseLog(page, "mc250-level.csv", csv);
  await page.getByLabel("Time column").selectOption("t_s");
  await page.getByLabel("Time format").selectOption({ label: "Seconds from the start" });
  await page.getByLabel("Reading column").selectOption("He level %");
  await page.getByLabel("Reading unit").selectOption({ label: "% of capacity" });
  await uploadAndAnalyse(page);

  await expect(page.getByRole("definition").filter({ hasText: /%\/h ± / })).toBeVisible();
  await expect(comparisonOf(page)).toContainText("95 %");
  expect(await shownRatio(page)).toBeCloseTo(ratio, 1);
  await expect(page.getByText("Normal evaporation rate, measured")).toBeVisible();
  // A level gauge reads the liquid itself: no liquid-mass figure to set.
  await expect(page.getByRole("heading", { name: "Liquid in the vessel" })).toHaveCount(0);
  expect(errors).toEqual([]);
});

test("a weighing log with a rising barometer: the correction waits for the tare, which the technician sets on the test page", async ({ page, browser }) => {
  const vessel = `Storage dewar SD-180, barometer (e2e ${Date.now()})`;
  // The 409 is the deliberate refusal once the test is accepted behind the page's back.
  const errors = failOnConsoleErrors(page, /status of (401|409)/);
  await signedInAs(page, TECHNICIAN);
  const created = await createTest(page, { design: NITROGEN_DESIGN, method: "Weighing", vessel });
  expect(created.cryogen).toBe("nitrogen");

  // Invented: an empty vessel of 62.5 kg holding 140 kg of liquid nitrogen, venting 0.9× the
  // prediction while the barometer climbs steadily; the liquid warming with it takes another
  // 0.15× that the vent never sees, so the corrected heat leak is 1.05× the prediction.
  const tare_kg = 62.5;
  const liquid_kg = 140;
  const perPascal = measuredHeatLeak({ method: "weighing", rate: 0, rateStdError: 0, cryogen: created.cryogen, pressureTrend: { slope_Pa_per_s: 1, stdError_Pa_per_s: 0 }, liquidMass_kg: liquid_kg });
  if (!perPascal.barometricCorrection.applied) throw new Error("the engine did not apply the correction");
  const storage_J_per_Pa = perPascal.barometricCorrection.correction_W;
  const correction_W = 0.15 * created.predicted_W;
  const pressureSlope_Pa_per_s = correction_W / storage_J_per_Pa;
  expect(pressureSlope_Pa_per_s * 3600, "an invented barometer moving like weather, under 10 hPa/h").toBeLessThan(1000);
  const vented_kg_per_s = boilOff({ heat_W: 0.9 * created.predicted_W, cryogen: created.cryogen }).ventedMass_kg_per_h / 3600;
  let mass = tare_kg + liquid_kg;
  const csv = elapsedCsv("elapsed_s,scale_kg,baro_hPa", 24, 60, 3, (t, rand) => {
    if (t > 0) mass -= vented_kg_per_s * 60 * settling(t);
    return [t, (mass + 0.001 * rand()).toFixed(4), ((100_650 + pressureSlope_Pa_per_s * t) / 100 + 0.02 * rand()).toFixed(3)];
  });
  await chooseLog(page, "sd180-baro.csv", csv);
  await expect(page.getByLabel("Time column")).toHaveValue("elapsed_s");
  await expect(page.getByLabel("Time format")).toHaveValue("seconds");
  await expect(page.getByLabel("Reading column")).toHaveValue("scale_kg");
  await expect(page.getByLabel("Reading unit")).toHaveValue("kg");
  await expect(page.getByLabel("Barometer column (optional)")).toHaveValue("baro_hPa");
  await expect(page.getByLabel("Barometer unit")).toHaveValue("hPa");
  await uploadAndAnalyse(page);

  // Not applied, and why: the scale reading includes the vessel. The reason points at the field.
  await expect(page.getByRole("term").filter({ hasText: "Pressure trend" })).toBeVisible();
  const notApplied = page.getByRole("definition").filter({ hasText: /^Not applied: / });
  await expect(notApplied).toContainText("no tare mass on the test");
  await expect(notApplied).toContainText("under Liquid in the vessel below");
  expect(await shownRatio(page)).toBeCloseTo(0.9, 1);
  const tare = page.getByRole("form", { name: "Liquid in the vessel" }).getByLabel("Empty vessel mass (kg)");
  await expect(tare).toHaveValue("");
  await notApplied.getByRole("button", { name: "Set the empty vessel mass" }).click();
  await expect(tare).toBeFocused();

  // A mass that is not a number is refused beside the field and stays as typed.
  await tare.fill("sixty");
  const save = page.getByRole("button", { name: "Save and re-run the analysis" });
  await save.click();
  await expect(page.getByText("tareMass_kg must be a number from 0 to 100000 kg")).toBeVisible();
  await expect(tare).toHaveValue("sixty");
  await expect(tare).toHaveAttribute("aria-invalid", "true");

  await tare.fill(String(tare_kg));
  await save.click();
  await expect(page.getByText("Saved; the analysis was re-run.")).toBeVisible();
  // Applied: a figure in W with its standard error, added to the vented heat.
  const applied = page.getByRole("definition").filter({ hasText: /included above/ });
  await expect(applied).toContainText(/^\+[\d.]+ W ± [\d.]+ W, included above; 1\d\d kg of liquid; uncorrected [\d.]+ W$/);
  const [, shownCorrection, shownError] = /^\+([\d.]+) W ± ([\d.]+) W/.exec((await applied.textContent()) ?? "")!;
  expect(Number(shownCorrection) / correction_W).toBeCloseTo(1, 1);
  expect(Number(shownError)).toBeGreaterThan(0);
  await expect(notApplied).toHaveCount(0);
  expect(await shownRatio(page)).toBeCloseTo(1.05, 1);
  await page.reload();
  await expect(tare).toHaveValue(String(tare_kg));
  await expect(applied).toBeVisible();

  // A colleague accepts the test meanwhile; the technician's next change is refused with a 409,
  // said plainly, and what was typed stays.
  const accepted = await page.request.post(`/api/boil-off-tests/${created.testId}/accept`, { headers: { Origin: new URL(page.url()).origin } });
  expect(accepted.status()).toBe(200);
  await tare.fill("63");
  await save.click();
  const refusal = page.getByRole("alert").filter({ hasText: "The empty vessel mass was not saved" });
  await expect(refusal).toContainText("This test is accepted, so its figures are frozen.");
  await expect(tare).toHaveValue("63");
  await expect(page.getByText("Analysis accepted")).toBeVisible();
  await expect(save).toBeDisabled();
  expect(errors).toEqual([]);

  // A viewer sees the figure and no control for it.
  const viewerContext = await browser.newContext();
  const viewer = await viewerContext.newPage();
  const viewerErrors = failOnConsoleErrors(viewer);
  await signedInAs(viewer, VIEWER);
  await viewer.goto(`/tests/${created.testId}`);
  await expect(viewer.getByRole("heading", { level: 1, name: vessel })).toBeVisible();
  const figure = viewer.locator("dl[aria-label='Liquid in the vessel']");
  await expect(figure).toContainText(/Empty vessel mass\s*62\.5 kg/);
  await expect(viewer.getByLabel(/Empty vessel mass/)).toHaveCount(0);
  await expect(viewer.getByRole("button", { name: /empty vessel mass|re-run/i })).toHaveCount(0);
  // In US customary the same stored tare reads in pounds (62.5 kg = 137.79 lb; 1 lb = 0.45359237 kg exactly, NIST SP 811 (2008), Appendix B.8).
  await viewer.getByText("US customary").click();
  await expect(figure).toContainText(/Empty vessel mass\s*137\.79 lb/);
  // Back to SI: the preference is stored, and other journeys sign in as the same viewer.
  await viewer.getByText("SI", { exact: true }).click();
  await expect(figure).toContainText(/Empty vessel mass\s*62\.5 kg/);
  await viewerContext.close();
  expect(viewerErrors).toEqual([]);
});

test("the owner deletes a test and it leaves the tests table; a technician is offered no delete", async ({ page, browser }) => {
  const vessel = `Storage dewar SD-180, to delete (e2e ${Date.now()})`;
  const errors = failOnConsoleErrors(page);
  await signedInAs(page, TECHNICIAN);
  await createTest(page, { design: NITROGEN_DESIGN, method: "Weighing", vessel });
  await expect(page.getByRole("button", { name: /Delete/ })).toHaveCount(0);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  const technicianTable = page.getByRole("table", { name: "Boil-off tests" });
  await expect(technicianTable.getByRole("row").filter({ hasText: vessel })).toHaveCount(1);
  await expect(page.getByRole("button", { name: /Delete/ })).toHaveCount(0);
  expect(errors).toEqual([]);

  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  const ownerErrors = failOnConsoleErrors(owner);
  await signedInAs(owner, OWNER);
  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  const table = owner.getByRole("table", { name: "Boil-off tests" });
  await table.getByRole("link", { name: vessel }).click();
  await expect(owner.getByRole("heading", { level: 1, name: vessel })).toBeVisible();
  await owner.getByRole("button", { name: "Delete this test" }).click();
  const dialog = owner.getByRole("dialog", { name: `Delete the test of ${vessel}?` });
  await dialog.getByRole("button", { name: "Delete test" }).click();
  await expect(owner.getByRole("heading", { level: 1, name: "Tests", exact: true })).toBeVisible();
  await expect(table.getByRole("link", { name: "Magnet cryostat MC-250", exact: true })).toBeVisible();
  await expect(table.getByRole("row").filter({ hasText: vessel })).toHaveCount(0);
  await owner.reload();
  await expect(table.getByRole("link", { name: "Magnet cryostat MC-250", exact: true })).toBeVisible();
  await expect(table.getByRole("row").filter({ hasText: vessel })).toHaveCount(0);
  await ownerContext.close();
  expect(ownerErrors).toEqual([]);

  // The technician's table loses it too.
  await page.reload();
  await expect(technicianTable.getByRole("link", { name: "Magnet cryostat MC-250", exact: true })).toBeVisible();
  await expect(technicianTable.getByRole("row").filter({ hasText: vessel })).toHaveCount(0);
});
