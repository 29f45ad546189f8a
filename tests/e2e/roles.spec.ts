import { expect, test, type Page } from "@playwright/test";

// The seeded demo organization (server/db/seed/demo.ts): one person per role.
const PASSWORD = "frostfold-demo";
const PEOPLE = [
  { role: "owner", email: "owner@kestrelbay.example", name: "Maren Okafor", managesTeam: true, readsOutbox: true },
  { role: "engineer", email: "engineer@kestrelbay.example", name: "Tomas Lindqvist", managesTeam: false, readsOutbox: false },
  { role: "technician", email: "technician@kestrelbay.example", name: "Ada Reyes", managesTeam: false, readsOutbox: false },
  { role: "viewer", email: "viewer@kestrelbay.example", name: "Jun Halvorsen", managesTeam: false, readsOutbox: false },
] as const;

// An unexpected console error is a bug. The one expected line: the browser logs the 401 that
// GET /api/auth/me answers a signed-out visitor.
function failOnConsoleErrors(page: Page) {
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error" && !/status of 401/.test(msg.text())) errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

async function signIn(page: Page, email: string, password = PASSWORD) {
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

test.describe("what each role may do", () => {
  for (const person of PEOPLE) {
    test(`${person.role} sees the team${person.managesTeam ? " with its controls and the outbox" : " read-only and no outbox"}`, async ({ page }) => {
      const errors = failOnConsoleErrors(page);
      await page.goto("/sign-in");
      await signIn(page, person.email);
      await expect(page.getByRole("heading", { level: 1, name: `Welcome, ${person.name}` })).toBeVisible();

      const account = page.getByRole("region", { name: "Signed in as" });
      await expect(account).toContainText(person.name);
      await expect(account).toContainText("Kestrel Bay Research Station");
      await expect(account).toContainText(new RegExp(`Role:\\s*${person.role}`, "i"));

      const nav = page.getByRole("navigation", { name: "Main" });
      await expect(nav.getByRole("link", { name: "Outbox" })).toHaveCount(person.readsOutbox ? 1 : 0);
      await nav.getByRole("link", { name: "Team" }).click();
      await expect(page.getByRole("heading", { level: 1, name: "Team" })).toBeVisible();

      const members = page.getByRole("table", { name: "Members and their roles" });
      await expect(members.getByRole("rowheader", { name: /Maren Okafor/ })).toBeVisible();
      await expect(members.getByRole("rowheader", { name: /Jun Halvorsen/ })).toBeVisible();
      const inviteForm = page.getByRole("form", { name: "Invite a member" });
      const roleSelects = members.getByRole("combobox", { name: /^Role for / });
      const removeButtons = members.getByRole("button", { name: /^Remove / });

      if (person.managesTeam) {
        await expect(inviteForm).toBeVisible();
        // Other specs may have added members: check every seeded person, not a total.
        for (const other of PEOPLE) {
          await expect(members.getByRole("combobox", { name: `Role for ${other.name}` })).toHaveValue(other.role);
          await expect(members.getByRole("button", { name: `Remove ${other.name}` })).toBeVisible();
        }

        await nav.getByRole("link", { name: "Outbox" }).click();
        await expect(page.getByRole("heading", { level: 1, name: "Outbox" })).toBeVisible();
        await expect(page.getByText("Mail stays on this machine")).toBeVisible();
      } else {
        await expect(inviteForm).toHaveCount(0);
        await expect(roleSelects).toHaveCount(0);
        await expect(removeButtons).toHaveCount(0);
        await expect(members.getByRole("row", { name: /Ada Reyes/ }).getByRole("cell", { name: "Technician", exact: true })).toBeVisible();

        // Typing the address does not open it either; the server refuses it as well.
        await page.goto("/outbox");
        await expect(page.getByText("Owners only")).toBeVisible();
      }

      await page.getByRole("button", { name: "Sign out" }).click();
      await expect(page).toHaveURL(/\/sign-in$/);
      await expect(page.getByRole("heading", { level: 1, name: "Sign in to Frostfold" })).toBeVisible();
      expect(errors).toEqual([]);
    });
  }

  test("a signed-out visitor is sent to sign in and brought back to the page asked for", async ({ page }) => {
    const errors = failOnConsoleErrors(page);
    await page.goto("/team");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fteam$/);
    await signIn(page, "viewer@kestrelbay.example");
    await expect(page).toHaveURL(/\/team$/);
    await expect(page.getByRole("heading", { level: 1, name: "Team" })).toBeVisible();
    expect(errors).toEqual([]);
  });

  test("a wrong password is refused with a message beside the form", async ({ page }) => {
    const errors = failOnConsoleErrors(page);
    await page.goto("/sign-in");
    await signIn(page, "viewer@kestrelbay.example", "not-the-password");
    await expect(page.getByRole("alert")).toContainText("Sign-in failed");
    await expect(page).toHaveURL(/\/sign-in$/);
    expect(errors).toEqual([]);
  });
});
