import { writeFile } from "node:fs/promises";
import { failOnConsoleErrors, signIn } from "../support/browser";
import { expect, test, type Page } from "@playwright/test";
import { z } from "zod";
import { boilOff, type CryogenId } from "../../shared/thermal";

// The seeded demo organization (server/db/seed/demo.ts) and its nitrogen dewar design.
const TECHNICIAN = "technician@kestrelbay.example";
const OWNER = "owner@kestrelbay.example";
const VIEWER = "viewer@kestrelbay.example";
const DESIGN = "180 L liquid-nitrogen storage dewar";
/** Invented: the vessel boils off 60 % more than its prediction, above the default 1.25× threshold. */
const RATIO = 1.6;

/** A small seeded generator, so the invented log is the same on every run. */
function noise(seed: number) {
  let a = seed;
  return () => {
    a = (a * 1103515245 + 12345) % 2147483648;
    return a / 2147483648 - 0.5;
  };
}

/**
 * An invented weighing log in a logger's own words: an ISO time, an unrelated room-temperature
 * channel first (so the value column must be mapped by hand), the scale in grams, a barometer.
 * The first hours carry an invented cool-down that decays, then the steady boil-off.
 */
function weighingCsv(ventedMass_kg_per_h: number, opts: { hours: number; brokenLine?: number; stepSeconds?: number }): string {
  const rand = noise(7);
  const start = Date.parse("2026-11-20T06:00:00Z");
  const lines = ["stamp,reading 1,reading 2,baro hPa"];
  let grams = 151_400;
  const step = opts.stepSeconds ?? 60;
  const steps = Math.round((opts.hours * 3600) / step);
  for (let i = 0; i <= steps; i++) {
    const t = i * step;
    if (i > 0) grams -= ventedMass_kg_per_h * (1000 / 3600) * step * (1 + 1.5 * Math.exp((-t * Math.LN2) / 2400));
    const reading = (grams + 2 * rand()).toFixed(1);
    const line = `${new Date(start + t * 1000).toISOString()},${(21 + rand()).toFixed(2)},${reading},${(1011 + 0.3 * rand()).toFixed(1)}`;
    lines.push(lines.length + 1 === opts.brokenLine ? line.replace(reading, "n/a") : line);
  }
  return `${lines.join("\n")}\n`;
}

/** Through the New test form: the nitrogen dewar's latest revision, weighed. */
async function createWeighingTest(page: Page, vessel: string) {
  await page.goto("/tests/new");
  const form = page.getByRole("form", { name: "New boil-off test" });
  await form.getByLabel("Design", { exact: true }).selectOption({ label: DESIGN });
  await expect(form.getByLabel("Stage measured")).toBeEnabled();
  await form.getByLabel("Vessel label or serial").fill(vessel);
  await form.getByRole("button", { name: "Create test" }).click();
  await expect(page.getByRole("heading", { level: 1, name: vessel })).toBeVisible();
}

test("a technician logs a weighing test over its prediction, and the owner finds the alert e-mail", async ({ page, browser }) => {
  const vessel = `Storage dewar SD-180 (e2e ${Date.now()})`;
  const errors = failOnConsoleErrors(page, /status of (401|400)/);
  await signIn(page, TECHNICIAN);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Tests", exact: true })).toBeVisible();
  await page.getByRole("link", { name: "New test" }).click();

  const form = page.getByRole("form", { name: "New boil-off test" });
  await form.getByLabel("Design", { exact: true }).selectOption({ label: DESIGN });
  await expect(form.getByLabel("Revision")).toBeEnabled();
  await expect(form.getByLabel("Stage measured")).toBeEnabled();
  await form.getByLabel("Weighing").check();
  // A missing vessel label is refused by the shared schema, naming the field; the design stays picked.
  await form.getByRole("button", { name: "Create test" }).click();
  await expect(form.getByText(/vesselLabel must be 1 to 120 characters/)).toBeVisible();
  await expect(form.getByLabel("Design", { exact: true })).toHaveValue(/.+/);
  await form.getByLabel("Vessel label or serial").fill(vessel);
  await form.getByLabel(/^Ambient temperature/).fill("294");
  await form.getByRole("button", { name: "Create test" }).click();
  await expect(page.getByRole("heading", { level: 1, name: vessel })).toBeVisible();
  await expect(page.getByText("Awaiting log")).toBeVisible();

  // The prediction the test checks, read through the API the page uses, sets the invented rate.
  const testId = new URL(page.url()).pathname.split("/").pop()!;
  const detail = z
    .object({ predictedHeatLeak_W: z.number(), cryogen: z.string() })
    .parse(await (await page.request.get(`/api/boil-off-tests/${testId}`)).json());
  const vented = boilOff({ heat_W: RATIO * detail.predictedHeatLeak_W, cryogen: detail.cryogen as CryogenId }).ventedMass_kg_per_h;

  // A broken file first: text in the reading column on line 5. Refused with the line named,
  // nothing stored, and the mapping the technician chose is still there.
  const fileInput = page.getByLabel("Logger file (CSV)");
  await fileInput.setInputFiles({ name: "sd180-broken.csv", mimeType: "text/csv", buffer: Buffer.from(weighingCsv(vented, { hours: 2, brokenLine: 5 })) });
  await expect(page.getByRole("table", { name: "First rows of the logger file" })).toBeVisible();
  await page.getByLabel("Reading column").selectOption("reading 2");
  await page.getByLabel("Reading unit").selectOption({ label: "g" });
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "The log was not stored" })).toContainText("line 5");
  await expect(page.getByLabel("Reading column")).toHaveValue("reading 2");
  await expect(page.getByLabel("Reading unit")).toHaveValue("g");
  await expect(page.getByText("Awaiting log")).toBeVisible();

  // The real log: time and barometer are detected, the value column and its unit mapped by hand.
  await fileInput.setInputFiles({ name: "sd180-weighing.csv", mimeType: "text/csv", buffer: Buffer.from(weighingCsv(vented, { hours: 24 })) });
  await expect(page.getByLabel("Time column")).toHaveValue("stamp");
  await expect(page.getByLabel("Time format")).toHaveValue("iso");
  await expect(page.getByLabel("Barometer column (optional)")).toHaveValue("baro hPa");
  await expect(page.getByLabel("Barometer unit")).toHaveValue("hPa");
  await expect(page.getByLabel("Reading column")).toHaveValue("reading 1");
  await page.getByLabel("Reading column").selectOption("reading 2");
  await page.getByLabel("Reading unit").selectOption({ label: "g" });
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  await expect(page.getByText("Analysed", { exact: true })).toBeVisible();

  // The chart is drawn with the suggested window; the technician moves its start to 6 h and refits.
  const chart = page.locator("figure").filter({ hasText: "Shaded: the steady window" });
  await expect(chart.locator(".recharts-line path.recharts-line-curve").first()).toHaveAttribute("d", /^M/);
  await expect(chart.locator(".recharts-reference-area").first()).toBeVisible();
  const fit = page.getByRole("definition").filter({ hasText: /suggested|set by hand/ }).first();
  await expect(fit).toContainText("suggested");
  await page.getByLabel("Window start").fill("21600");
  await page.getByRole("button", { name: "Set window and refit" }).click();
  await expect(fit).toContainText("set by hand");
  await expect(fit).toContainText(/^5\.99\d* h to /);
  await expect(page.locator("figure").filter({ hasText: "Residuals:" }).locator(".recharts-scatter-symbol").first()).toBeVisible();

  // Measured against predicted: about 1.6× with its interval, flagged over the 1.25× threshold.
  const comparison = page.locator("dl[aria-label='Measured against predicted']");
  await expect(comparison).toContainText(/Measured \/ predicted\s*1\.(5[5-9]|6)\d*×/);
  await expect(comparison).toContainText("95 %");
  await expect(page.getByText("Over the alert threshold of 1.25×")).toBeVisible();
  await expect(page.getByRole("heading", { name: "Cautions" })).toBeVisible();
  // A photo of the scale display and a note go with the test; the photo downloads byte for byte.
  const photo = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==", "base64");
  await page.getByLabel("Add an attachment").setInputFiles({ name: "scale-display.png", mimeType: "image/png", buffer: photo });
  const attachment = page.getByRole("list", { name: "Attachments" }).getByRole("link", { name: "scale-display.png" });
  await expect(attachment).toBeVisible();
  const download = await page.request.get((await attachment.getAttribute("href"))!);
  expect(download.status()).toBe(200);
  expect(Buffer.from(await download.body()).equals(photo)).toBe(true);
  await page.getByLabel("Notes", { exact: true }).fill("Scale zeroed before the fill; vent line clear. (Invented e2e note.)");
  await page.getByRole("button", { name: "Save notes" }).click();
  await expect(page.getByText("Saved.")).toBeVisible();

  await page.getByRole("button", { name: "Accept the analysis" }).click();
  await expect(page.getByText("Analysis accepted")).toBeVisible();
  // Accepted is frozen: the window's sliders stay for reading but no longer move, and the log cannot be replaced.
  await expect(page.getByLabel("Window start")).toBeDisabled();
  await expect(page.getByRole("button", { name: "Set window and refit" })).toHaveCount(0);
  await expect(page.getByLabel(/Replace the log/)).toHaveCount(0);
  await page.reload();
  await expect(page.getByLabel("Notes", { exact: true })).toHaveValue(/Scale zeroed before the fill/);
  expect(errors).toEqual([]);

  // The owner: the open alert on Overview, and the e-mail caught in the local outbox.
  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  const ownerErrors = failOnConsoleErrors(owner);
  await signIn(owner, OWNER);
  const alert = owner.getByRole("list", { name: "Open alerts" }).getByRole("listitem").filter({ hasText: vessel });
  await expect(alert).toContainText(/1\.6\d*× its prediction/);

  // Owners set the threshold; a value out of range is refused naming the field and the range, as typed.
  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  const threshold = owner.getByRole("form", { name: "Alert threshold" }).getByLabel(/^Alert threshold/);
  await expect(threshold).toHaveValue("1.25");
  await threshold.fill("0.5");
  await owner.getByRole("button", { name: "Save threshold" }).click();
  await expect(owner.getByText("threshold must be from 1 to 10 (measured over predicted)")).toBeVisible();
  await expect(threshold).toHaveValue("0.5");
  // The table marks the new test's ratio as over the threshold in words, not colour alone.
  await expect(owner.getByRole("table", { name: "Boil-off tests" }).getByRole("row").filter({ hasText: vessel })).toContainText("(over 1.25×)");

  // Calibration from the demo detector dewar's accepted test (invented, 40 % over), saved as a new revision.
  await owner.getByRole("table", { name: "Boil-off tests" }).getByRole("link", { name: "Detector dewar DD-3" }).click();
  const calibration = owner.locator("section").filter({ has: owner.getByRole("heading", { name: "Calibration of the design" }) });
  await expect(calibration).toContainText(/Implied degradation factor: 1\.4\d* ± [\d.]+ from 1 accepted test/);
  await calibration.getByRole("button", { name: "Save as a new revision" }).click();
  const saved = calibration.getByRole("link", { name: /^revision \d+$/ });
  await expect(saved).toHaveAttribute("href", /\/designs\/.+\?revision=\d+/);

  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Outbox" }).click();
  const mail = owner.getByRole("article").filter({ has: owner.getByRole("heading", { name: `Boil-off test over its prediction: ${vessel} at 1.6`, exact: false }) });
  await expect(mail.filter({ hasText: "To owner@kestrelbay.example" })).toBeVisible();
  await expect(mail.first()).toContainText(`/tests/${testId}`);

  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Overview" }).click();
  await owner.getByRole("button", { name: `Acknowledge the alert on ${vessel}` }).click();
  await expect(owner.getByRole("list", { name: "Open alerts" }).getByRole("listitem").filter({ hasText: vessel })).toHaveCount(0);
  await ownerContext.close();
  expect(ownerErrors).toEqual([]);
});

test("a viewer reads the tests and a test's analysis but is offered nothing to change", async ({ page }) => {
  const errors = failOnConsoleErrors(page);
  await signIn(page, VIEWER);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Tests", exact: true }).click();
  const table = page.getByRole("table", { name: "Boil-off tests" });
  await expect(table.getByRole("link", { name: "Magnet cryostat MC-250" })).toBeVisible();
  await expect(page.getByRole("link", { name: "New test" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Save threshold" })).toHaveCount(0);

  // The demo's vent-flow test is analysed but not accepted: a technician could still move its window.
  await table.getByRole("link", { name: "Magnet cryostat MC-250" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Magnet cryostat MC-250" })).toBeVisible();
  await expect(page.locator(".recharts-line path.recharts-line-curve").first()).toBeVisible();
  await expect(page.locator("dl[aria-label='Measured against predicted']")).toContainText(/Measured \/ predicted\s*1\.[01]\d*×/);
  await expect(page.getByLabel("Window start")).toBeDisabled();
  // US customary: the heat leaks in Btu/h and the flow in standard ft³/h, from the same stored SI figures.
  await page.getByText("US customary").click();
  await expect(page.locator("dl[aria-label='Measured against predicted']")).toContainText("Btu/h");
  await expect(page.getByRole("definition").filter({ hasText: "standard ft³/h" }).first()).toBeVisible();
  // Back to SI: the preference is stored, and other journeys sign in as the same viewer.
  await page.getByText("SI", { exact: true }).click();
  await expect(page.locator("dl[aria-label='Measured against predicted']")).toContainText(/\d W/);
  await expect(page.getByLabel(/Logger file|Replace the log/)).toHaveCount(0);
  await expect(page.getByRole("button", { name: /Accept|Set window|Save notes|Delete|Save as a new revision/ })).toHaveCount(0);
  expect(errors).toEqual([]);
});

test("a 1,000,000-reading log uploads with a progress bar and is drawn downsampled", async ({ page }, testInfo) => {
  test.setTimeout(120_000);
  const vessel = `Storage dewar SD-180, long log (e2e ${Date.now()})`;
  const errors = failOnConsoleErrors(page);
  await signIn(page, TECHNICIAN);
  await createWeighingTest(page, vessel);
  // 1,000,001 readings a tenth of a second apart (about 48 MB), from a file on disk like a real one.
  const file = testInfo.outputPath("sd180-long.csv");
  await writeFile(file, weighingCsv(0.05, { hours: 1_000_000 / 10 / 3600, stepSeconds: 0.1 }));
  await page.getByLabel("Logger file (CSV)").setInputFiles(file);
  await page.getByLabel("Reading column").selectOption("reading 2");
  await page.getByLabel("Reading unit").selectOption({ label: "g" });
  // Every value the bar shows is recorded in the page, so the steps between 0 and 100 are seen
  // however fast the upload runs on loopback.
  await page.evaluate(() => {
    const shown: number[] = [];
    Object.assign(window, { progressShown: shown });
    new MutationObserver(() => {
      const bar = document.querySelector<HTMLProgressElement>("progress[aria-label='Log upload']");
      if (bar) shown.push(bar.value);
    }).observe(document.body, { subtree: true, attributes: true, childList: true });
  });
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  const bar = page.getByRole("progressbar", { name: "Log upload" });
  await expect(bar).toBeVisible();
  // Past the last byte the bar is full and says the server is still checking and fitting.
  await expect(page.getByText(/^Sent 4\d MB; checking every line and fitting…$/)).toBeVisible({ timeout: 60_000 });
  await expect(bar).toHaveAttribute("value", "100");
  await expect(page.getByText("Analysed", { exact: true })).toBeVisible({ timeout: 90_000 });
  await expect(bar).toHaveCount(0);
  const shown = await page.evaluate(() => (window as unknown as { progressShown: number[] }).progressShown);
  expect(shown.some((v) => v > 0 && v < 100), `bar values ${[...new Set(shown)].join(", ")}`).toBe(true);
  await expect(page.locator("figure").filter({ hasText: "Shaded: the steady window" })).toContainText(/1,000,001 readings, drawn as [12],?\d{3} points/);
  expect(errors).toEqual([]);
});
