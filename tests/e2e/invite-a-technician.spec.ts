import { expect, test, type Page } from "@playwright/test";

const OWNER = { email: "owner@kestrelbay.example", password: "frostfold-demo" };

function failOnConsoleErrors(page: Page) {
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") errors.push(msg.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  return errors;
}

test("the owner invites a technician, who joins through the link in the caught e-mail", async ({ page, browser }) => {
  // A fresh address each run, so a reused server never answers "already a member".
  const email = `rosa.technician.${Date.now()}@kestrelbay.example`;
  const ownerErrors = failOnConsoleErrors(page);

  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(OWNER.email);
  await page.getByLabel("Password", { exact: true }).fill(OWNER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  const nav = page.getByRole("navigation", { name: "Main" });
  await nav.getByRole("link", { name: "Team" }).click();

  const inviteForm = page.getByRole("form", { name: "Invite a member" });
  await inviteForm.getByLabel("E-mail to invite").fill(email);
  await inviteForm.getByLabel("Role", { exact: true }).selectOption("technician");
  await inviteForm.getByRole("button", { name: "Send invitation" }).click();
  await expect(inviteForm.getByRole("status")).toContainText(`Invitation sent to ${email}`);
  await expect(page.getByRole("list", { name: "Pending invitations" })).toContainText(email);

  await nav.getByRole("link", { name: "Outbox" }).click();
  const message = page.getByRole("article").filter({ hasText: email });
  await expect(message.getByRole("heading", { name: /You are invited to Kestrel Bay Research Station/ })).toBeVisible();
  const link = message.getByRole("link", { name: /\/invitations\/accept\?token=/ });
  const href = await link.getAttribute("href");
  expect(href).toBeTruthy();

  // The invitee is another person with another browser: follow the link there.
  const inviteeContext = await browser.newContext();
  const invitee = await inviteeContext.newPage();
  const inviteeErrors = failOnConsoleErrors(invitee);
  await invitee.goto(href!);
  await expect(invitee.getByRole("heading", { level: 1, name: "Join your team on Frostfold" })).toBeVisible();
  await expect(invitee.getByText(/as a technician/)).toBeVisible();
  await expect(invitee.getByText(email)).toBeVisible();
  await invitee.getByLabel("Your name").fill("Rosa Technician");
  await invitee.getByLabel("Password", { exact: true }).fill("cold-hands-warm-tea");
  await invitee.getByRole("button", { name: "Join Kestrel Bay Research Station" }).click();

  await expect(invitee.getByRole("heading", { level: 1, name: "Welcome, Rosa Technician" })).toBeVisible();
  const account = invitee.getByRole("region", { name: "Signed in as" });
  await expect(account).toContainText("Kestrel Bay Research Station");
  await expect(account).toContainText(/Role:\s*technician/i);
  await expect(invitee.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Outbox" })).toHaveCount(0);

  // Back with the owner: the invitation has become a member.
  await nav.getByRole("link", { name: "Team" }).click();
  await expect(page.getByRole("combobox", { name: "Role for Rosa Technician" })).toHaveValue("technician");
  await expect(page.getByRole("list", { name: "Pending invitations" })).toHaveCount(0);

  await inviteeContext.close();
  expect(ownerErrors).toEqual([]);
  expect(inviteeErrors).toEqual([]);
});
