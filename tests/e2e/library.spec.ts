import { expect, test } from "@playwright/test";
import { failOnConsoleErrors, signIn } from "../support/browser";

// The seeded demo organization (server/db/seed/demo.ts): one person per role.
const ENGINEER = "engineer@kestrelbay.example";
const OWNER = "owner@kestrelbay.example";
const VIEWER = "viewer@kestrelbay.example";

// The one expected console line: the 401 GET /api/auth/me answers a signed-out visitor.

test("an engineer proposes a reflector, the owner approves it, and its emissivity chart is drawn", async ({ page, browser }) => {
  const name = `Test aluminized polyester film, double-sided ${Date.now()}`;
  const engineerErrors = failOnConsoleErrors(page);
  await signIn(page, ENGINEER);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Library" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Library" })).toBeVisible();
  await page.getByRole("link", { name: "Propose a new entry" }).click();

  const form = page.getByRole("form", { name: "Propose a new entry" });
  await form.getByLabel("Name", { exact: true }).fill(name);
  await form.getByLabel("Both faces: model").selectOption("table");
  const points = [["4.2", "0.015"], ["77", "0.02"], ["300", "0.035"]];
  await form.getByRole("button", { name: "Add a point" }).click();
  for (const [i, [t, e]] of points.entries()) {
    await form.getByLabel(`Point ${i + 1}: temperature, K`).fill(t);
    await form.getByLabel(`Point ${i + 1}: emissivity`).fill(e);
  }
  await form.getByLabel("Author(s)").fill("Kestrel Bay materials group");
  await form.getByLabel("Title", { exact: true }).fill("Calorimeter emissivity notes");

  // Without a valid range the shared schema refuses it, naming the field and its range.
  await form.getByRole("button", { name: "Propose entry" }).click();
  await expect(form.getByText("validRange_K.min must be a number in K").first()).toBeVisible();
  await expect(form.getByLabel("Name", { exact: true })).toHaveValue(name);

  await form.getByLabel("Valid from, K").fill("4.2");
  await form.getByLabel("Valid to, K").fill("300");
  await form.getByRole("button", { name: "Propose entry" }).click();

  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  const status = page.getByRole("region", { name: "Entry status" });
  await expect(status.getByText("Draft", { exact: true })).toBeVisible();
  // An engineer proposes, an owner decides.
  await expect(page.getByRole("button", { name: /^Approve version/ })).toHaveCount(0);
  const entryUrl = page.url();

  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  const ownerErrors = failOnConsoleErrors(owner);
  await signIn(owner, OWNER);
  await owner.goto(entryUrl);
  await expect(owner.getByRole("heading", { level: 1, name })).toBeVisible();
  await owner.getByRole("button", { name: "Approve version 1" }).click();
  const ownerStatus = owner.getByRole("region", { name: "Entry status" });
  await expect(ownerStatus.getByText("Approved", { exact: true })).toBeVisible();
  await expect(owner.getByRole("button", { name: "Approve version 1" })).toHaveCount(0);

  // The chart: recharts' svg with a drawn line, and the three tabulated points marked.
  const chart = owner.locator("figure").filter({ hasText: "Emissivity of" });
  await expect(chart.locator("svg.recharts-surface").first()).toBeVisible();
  await expect(chart.locator(".recharts-line path.recharts-line-curve").first()).toHaveAttribute("d", /^M/);
  // At least the three tabulated points are marked (a face drawn twice marks them twice).
  await expect(chart.locator(".recharts-scatter-symbol").nth(2)).toBeVisible();
  await ownerContext.close();

  await page.reload();
  await expect(status.getByText("Approved", { exact: true })).toBeVisible();
  await expect(page.getByRole("link", { name: "Propose a change" })).toBeVisible();
  expect(engineerErrors).toEqual([]);
  expect(ownerErrors).toEqual([]);
});

test("a viewer reads the library but is offered nothing to propose", async ({ page }) => {
  const errors = failOnConsoleErrors(page);
  await signIn(page, VIEWER);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Library" }).click();
  const table = page.getByRole("table", { name: /Library entries/ });
  await expect(table.getByRole("link", { name: "Bright aluminium foil" })).toBeVisible();
  await expect(page.getByRole("link", { name: /Propose/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /Propose/ })).toHaveCount(0);
  await expect(page.getByRole("navigation", { name: "Library" }).getByRole("link", { name: "Import CSV" })).toHaveCount(0);

  await table.getByRole("link", { name: "Bright aluminium foil" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Bright aluminium foil" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Entry status" }).getByText("Approved", { exact: true })).toBeVisible();
  await expect(page.locator(".recharts-line path.recharts-line-curve").first()).toBeVisible();
  await expect(page.getByRole("link", { name: /Propose/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /Copy to our library|Retire|Approve/ })).toHaveCount(0);
  expect(errors).toEqual([]);
});
