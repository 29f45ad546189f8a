import { expect, test, type Page } from "@playwright/test";

const OWNER = { email: "owner@kestrelbay.example", password: "frostfold-demo" };
const VIEWER = { email: "viewer@kestrelbay.example", name: "Jun Halvorsen", password: "frostfold-demo" };
const NEW_PASSWORD = "north-wind-blanket-42";

function failOnConsoleErrors(page: Page) {
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

async function signIn(page: Page, email: string, password: string) {
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

// Other specs sign in as the viewer with the demo password: put it back through the same
// reset flow, over HTTP, even when the test failed half-way.
test.afterAll(async ({ playwright }, testInfo) => {
  const baseURL = testInfo.project.use.baseURL!;
  const api = await playwright.request.newContext({ baseURL, extraHTTPHeaders: { Origin: new URL(baseURL).origin } });
  expect((await api.post("/api/auth/password-reset", { data: { email: VIEWER.email } })).status()).toBe(202);
  expect((await api.post("/api/auth/sign-in", { data: OWNER })).ok()).toBe(true);
  const { messages } = (await (await api.get("/api/outbox")).json()) as { messages: { to: string; subject: string; links: string[]; createdAt: string }[] };
  const newest = messages
    .filter((m) => m.to === VIEWER.email && /reset/i.test(m.subject))
    .sort((a, b) => b.createdAt.localeCompare(a.createdAt))[0];
  const token = new URL(newest.links[0]).searchParams.get("token");
  expect((await api.post("/api/auth/password-reset/confirm", { data: { token, password: VIEWER.password } })).ok()).toBe(true);
  await api.dispose();
});

test("a viewer who forgot the password sets a new one with the link an owner finds in the outbox", async ({ page, browser }) => {
  const viewerErrors = failOnConsoleErrors(page);
  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Reset your password" })).toBeVisible();
  await page.getByLabel("E-mail").fill(VIEWER.email);
  await page.getByRole("button", { name: "Send reset link" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Check your e-mail" })).toBeVisible();

  // Mail goes to the local SMTP fake, so an owner reads it in the Outbox, in another browser.
  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  const ownerErrors = failOnConsoleErrors(owner);
  await owner.goto("/sign-in");
  await signIn(owner, OWNER.email, OWNER.password);
  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Outbox" }).click();
  // Newest first: the first reset message for the viewer is the one just requested.
  const message = owner.getByRole("article").filter({ hasText: VIEWER.email }).filter({ hasText: "Reset your Frostfold password" }).first();
  const href = await message.getByRole("link", { name: /\/reset-password\/confirm\?token=/ }).getAttribute("href");
  expect(href).toBeTruthy();
  await ownerContext.close();

  await page.goto(href!);
  await expect(page.getByRole("heading", { level: 1, name: "Set a new password" })).toBeVisible();
  await page.getByLabel("New password").fill(NEW_PASSWORD);
  await page.getByRole("button", { name: "Set new password" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Password changed" })).toBeVisible();

  await page.getByRole("link", { name: "Go to sign in" }).click();
  await signIn(page, VIEWER.email, NEW_PASSWORD);
  await expect(page.getByRole("heading", { level: 1, name: `Welcome, ${VIEWER.name}` })).toBeVisible();

  expect(viewerErrors).toEqual([]);
  expect(ownerErrors).toEqual([]);
});
