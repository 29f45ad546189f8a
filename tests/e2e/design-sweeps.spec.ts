import { expect, test, type Page } from "@playwright/test";

// The seeded demo (server/services/demo-designs.ts): the engineer and the helium cryostat.
const ENGINEER = { email: "engineer@kestrelbay.example", password: "frostfold-demo" };
const CRYOSTAT = "250 L helium magnet cryostat";

function watchErrors(page: Page) {
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

test("the engineer draws the cryostat's heat leak against layer density, warm wall temperature and pressure", async ({ page }) => {
  const errors = watchErrors(page);
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ENGINEER.email);
  await page.getByLabel("Password", { exact: true }).fill(ENGINEER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Designs" }).click();
  await page.getByRole("link", { name: CRYOSTAT }).first().click();
  await expect(page.getByRole("heading", { level: 1, name: CRYOSTAT })).toBeVisible();

  const results = page.getByRole("region", { name: "Results" });
  const pick = results.getByLabel("Sweep against");
  await expect(pick).toBeVisible();
  for (const [option, name] of [
    ["Layer density", /and each stage against layer density of inner blanket, .* layers\/cm/],
    ["Warm wall temperature", /and each stage against warm wall temperature, .* K/],
    ["Residual pressure", /and each stage against residual pressure, .* Pa, both on log scales/],
  ] as const) {
    await pick.selectOption({ label: option });
    const chart = results.getByRole("img", { name });
    await expect(chart).toBeVisible();
    // Drawn: the vessel's and the shield's lines (a flat one has no height, so look at its path), and the design's own value marked.
    await expect(chart.locator(".recharts-line-curve")).toHaveCount(2);
    await expect(chart.locator(".recharts-line-curve").first()).toHaveAttribute("d", /^M[\d.]+,[\d.]+C/);
    await expect(chart.getByText("this design")).toBeVisible();
  }

  // Layer density of another block: the outer blanket, outside the nitrogen-cooled shield.
  await pick.selectOption({ label: "Layer density" });
  const block = results.getByLabel("Block", { exact: true });
  await expect(block).toHaveValue("");
  await block.selectOption({ label: "Block 1 (Outer blanket)" });
  const outer = results.getByRole("img", { name: /and each stage against layer density of outer blanket, .* layers\/cm/ });
  await expect(outer).toBeVisible();
  await expect(outer.locator(".recharts-line-curve")).toHaveCount(2);
  await expect(results.getByText("This design: 20 layers/cm")).toBeVisible();
  // The server's own choice again: the block facing the vessel.
  await block.selectOption({ label: "Thickest block facing the vessel" });
  await expect(results.getByRole("img", { name: /against layer density of inner blanket/ })).toBeVisible();
  expect(errors).toEqual([]);
});
