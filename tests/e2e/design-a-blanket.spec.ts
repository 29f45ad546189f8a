import { expect, test, type Locator, type Page } from "@playwright/test";

// The seeded demo (server/services/demo-designs.ts): the engineer and the nitrogen dewar.
const ENGINEER = { email: "engineer@kestrelbay.example", password: "frostfold-demo" };
const DEWAR = "180 L liquid-nitrogen storage dewar";

/**
 * Console errors and refused requests. A live estimate of a half-made design may be refused
 * (400, with the field named) and the browser logs that as a failed resource; those are kept
 * apart so the test can check they were exactly the expected refusals.
 */
function watchErrors(page: Page) {
  const errors: string[] = [];
  const refusals: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error" && !/status of 400/.test(msg.text())) errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  page.on("response", async (r) => {
    if (r.status() >= 400) refusals.push(`${r.request().method()} ${new URL(r.url()).pathname} ${r.status()} ${await r.text().catch(() => "")}`);
  });
  return { errors, refusals };
}

/** Library names are the library's business: pick the option whose words match. */
async function pickOption(select: Locator, words: RegExp) {
  const label = await select.locator("option").filter({ hasText: words }).first().textContent();
  expect(label, `an option matching ${words}`).toBeTruthy();
  await select.selectOption({ label: label!.trim() });
}

/** The heat into the cold vessel once the results have caught up with the form, in W. */
async function coldHeat(page: Page): Promise<number> {
  const results = page.getByRole("region", { name: "Results" });
  await expect(results.getByText("Up to date with the form")).toBeVisible();
  const text = await results.getByRole("status", { name: "Heat into the cold vessel" }).textContent();
  const match = /(-?[\d.,]+(?:e-?\d+)?)\s*W\b/.exec(text ?? "");
  expect(match, `a heat in W, got "${text}"`).not.toBeNull();
  return Number(match![1].replace(/,/g, ""));
}

test("the engineer designs a two-stage helium cryostat, saves it, compares it and downloads its report", async ({ page }) => {
  const { errors, refusals } = watchErrors(page);
  const name = `Two-stage helium cryostat ${Date.now()}`;

  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ENGINEER.email);
  await page.getByLabel("Password", { exact: true }).fill(ENGINEER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Designs" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Designs" })).toBeVisible();
  await page.getByRole("link", { name: "New design" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "New design" })).toBeVisible();

  await page.getByLabel("Design name").fill(name);
  await page.getByLabel("Vessel (optional)").fill("Test cryostat TC-1");
  const form = page.getByRole("form", { name: "Design" });
  await form.getByLabel("Shape").selectOption("cylinder");
  await form.getByLabel("Cold vessel radius (m)").fill("0.3");
  await form.getByLabel("Warm wall radius (m)").fill("0.4");
  await form.getByLabel("Length (m)").fill("1.2");
  await form.getByLabel("Warm wall temperature (K)").fill("300");

  // Warm block, a liquid-nitrogen-cooled stage, a cold block, all from library entries.
  await pickOption(form.getByRole("group", { name: "Block 1" }).getByLabel("Reflector"), /aluminized polyester film/i);
  await form.getByRole("button", { name: "+ Add cooled stage and block" }).click();
  const stage = form.getByRole("group", { name: "Cooled stage 1" });
  await stage.getByLabel("Stage label").fill("Nitrogen shield");
  await pickOption(stage.getByLabel("Cooled by"), /nitrogen/i);
  const coldBlock = form.getByRole("group", { name: "Block 2" });
  await pickOption(coldBlock.getByLabel("Reflector"), /aluminized polyester film/i);
  await coldBlock.getByLabel("Layers (shields)").fill("10");

  // The cold space still holds the default liquid nitrogen: as cold as the new stage, which the
  // live estimate refuses, naming the field, until the cold space gets its helium.
  const cold = form.getByRole("group", { name: "Cold space" });
  const results = page.getByRole("region", { name: "Results" });
  await expect(results.getByText("Not up to date")).toBeVisible();
  await expect(results.getByRole("listitem").filter({ hasText: /cold\.temperature_K must be a temperature below layup\[1\]\.temperature_K/ })).toBeVisible();
  await cold.getByLabel("A cryogen from the library").check();
  await pickOption(cold.getByLabel("Cryogen", { exact: true }), /helium/i);
  await cold.getByLabel("Capacity (L)").fill("250");

  await expect(results.getByRole("columnheader", { name: "Nitrogen shield" })).toBeVisible();
  await expect(results.getByText("Not up to date")).toBeHidden();
  await expect(results.getByRole("img", { name: /^Wall section, warm to cold/ })).toBeVisible();
  const before = await coldHeat(page);
  await coldBlock.getByLabel("Layers (shields)").fill("30");
  await expect.poll(() => coldHeat(page)).not.toBe(before);
  const after = await coldHeat(page);
  expect(after).toBeLessThan(before);

  await page.getByRole("button", { name: "Create design" }).click();
  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  await expect(page.getByText("Revision 1 of 1")).toBeVisible();

  // A second revision, with its change note.
  await page.getByRole("form", { name: "Design" }).getByRole("group", { name: "Block 2" }).getByLabel("Layers (shields)").fill("35");
  await page.getByRole("button", { name: "Save revision…" }).click();
  const dialog = page.getByRole("dialog", { name: "Save a revision" });
  await dialog.getByLabel("Change note").fill("Five more layers on the cold block");
  await dialog.getByRole("button", { name: "Save revision" }).click();
  await expect(page.getByText("Revision 2 of 2")).toBeVisible();
  await expect(page.getByRole("table", { name: "Revisions, newest first" })).toContainText("Five more layers on the cold block");
  // What changed from revision 1 to 2: the cold block's layer count and nothing else, old → new.
  const changes = page.getByRole("table", { name: "Inputs changed from revision 1 to revision 2" });
  await expect(changes.getByRole("row")).toHaveCount(2);
  await expect(changes.getByRole("row").filter({ hasText: "layers" })).toContainText(/30.*→ 35/);

  // The report of the shown revision: a real PDF that names the design.
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "PDF report" }).click()]);
  const path = await download.path();
  const { readFile } = await import("node:fs/promises");
  const bytes = await readFile(path);
  expect(bytes.subarray(0, 4).toString("latin1")).toBe("%PDF");
  const slug = name.replace(/[^A-Za-z0-9]+/g, "-").toLowerCase();
  expect(download.suggestedFilename()).toContain(slug);
  // pdfkit writes the title into the document info as UTF-16BE when it holds non-ASCII words.
  const utf16be = Buffer.from(name, "utf16le").swap16();
  expect(bytes.includes(Buffer.from(name, "latin1")) || bytes.includes(utf16be)).toBe(true);

  // Side by side with the seeded nitrogen dewar.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Designs" }).click();
  await page.getByRole("checkbox", { name: `Pick ${name} for Compare` }).check();
  await page.getByRole("checkbox", { name: `Pick ${DEWAR} for Compare` }).check();
  await page.getByRole("button", { name: /^Compare/ }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Compare" })).toBeVisible();
  const table = page.getByRole("table", { name: "Compared designs side by side" });
  await expect(table.getByRole("columnheader", { name })).toBeVisible();
  await expect(table.getByRole("columnheader", { name: DEWAR })).toBeVisible();
  await expect(table.getByRole("rowheader", { name: "Heat into cold vessel" })).toBeVisible();
  await page.getByLabel("Price per litre of cryogen (your currency)").fill("5");
  await expect(table.getByRole("row", { name: /Yearly cryogen cost/ })).not.toContainText("set a price");

  // Overview lists it among the recent designs, with its heat into the cold vessel.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Overview" }).click();
  await expect(page.getByRole("heading", { name: "Recent designs" })).toBeVisible();
  const recent = page.getByRole("listitem").filter({ has: page.getByRole("link", { name }) });
  await expect(recent).toContainText(/W into the cold vessel/);

  expect(errors).toEqual([]);
  for (const refusal of refusals) expect(refusal).toMatch(/^POST \/api\/estimate 400 .*cold\.temperature_K must be a temperature below/);
});
