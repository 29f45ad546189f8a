import { expect, type Page } from "@playwright/test";

/** Every demo account's password (server/db/seed/demo.ts). */
export const DEMO_PASSWORD = "frostfold-demo";

/**
 * Collects the page's console errors and uncaught exceptions; a spec expects the list empty at
 * its end. `allowed` names the lines a spec expects: by default the 401 that GET /api/auth/me
 * answers a signed-out visitor.
 */
export function failOnConsoleErrors(page: Page, allowed = /status of 401/) {
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error" && !allowed.test(msg.text())) errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

/** Signs a demo person in from the sign-in page and waits for Overview's welcome. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { level: 1, name: /^Welcome, / })).toBeVisible();
}
