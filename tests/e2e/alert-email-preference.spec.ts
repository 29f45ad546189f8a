import { expect, test, type Page } from "@playwright/test";

// The demo owner and technician (server/db/seed/demo.ts). The owner's choice is put back at the
// end: the boil-off spec expects the owner to receive its alert e-mail.
const PASSWORD = "frostfold-demo";

async function signIn(page: Page, email: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Team" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Team" })).toBeVisible();
}

test("an owner turns alert e-mails off and on again on the Team page; a technician is told they receive none", async ({ page, browser }) => {
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  await signIn(page, "owner@kestrelbay.example");
  const box = page.getByRole("checkbox", { name: "E-mail me when an accepted boil-off test exceeds the alert threshold" });
  await expect(box).toBeChecked();
  const saved = page.waitForResponse((r) => r.url().endsWith("/api/auth/me/preferences") && r.request().method() === "PATCH");
  await box.uncheck();
  expect((await saved).status()).toBe(200);
  await page.reload();
  await expect(page.getByRole("checkbox", { name: "E-mail me when an accepted boil-off test exceeds the alert threshold" })).not.toBeChecked();
  const savedAgain = page.waitForResponse((r) => r.url().endsWith("/api/auth/me/preferences") && r.request().method() === "PATCH");
  await page.getByRole("checkbox", { name: "E-mail me when an accepted boil-off test exceeds the alert threshold" }).check();
  expect((await savedAgain).status()).toBe(200);
  await page.reload();
  await expect(page.getByRole("checkbox", { name: "E-mail me when an accepted boil-off test exceeds the alert threshold" })).toBeChecked();

  const other = await browser.newPage();
  await signIn(other, "technician@kestrelbay.example");
  await expect(other.getByText("your role receives none")).toBeVisible();
  await expect(other.getByRole("checkbox", { name: /E-mail me when/ })).toHaveCount(0);
  await other.close();
  expect(errors).toEqual([]);
});
