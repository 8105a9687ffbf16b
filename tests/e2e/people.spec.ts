import { expect, test } from "@playwright/test";
import { firstLink, lastOutboxId, openE2eDatabase, waitForMessage } from "./support/outbox";
import { signIn } from "./support/session";

/**
 * Issue 8: an admin invites a council member; the invitation goes through SMTP to Leeway's local
 * server; the invitee follows the link, sets a password, signs in and sees only what council sees.
 */
const invitee = { name: "Wren Halloway", email: "wren.halloway@council.example", password: "tidewater-lantern-42" };
const db = openE2eDatabase();
test.afterAll(() => db.close());

test("an admin invites a council member, who sets a password from the e-mailed link and sees only the council pages", async ({ page, browser }) => {
  const before = await lastOutboxId(db);
  await signIn(page, "admin");
  await page.getByRole("link", { name: "People" }).click();
  await page.getByLabel("Name").fill(invitee.name);
  await page.getByLabel("E-mail").fill(invitee.email);
  await page.getByLabel("Role", { exact: true }).selectOption("council");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByTestId("invite-result")).toContainText(`E-mail sent to ${invitee.email}`);
  await expect(page.getByTestId(`person-${invitee.email}`)).toContainText("Invited · link valid until");

  const message = await waitForMessage(db, { to: invitee.email, afterId: before });
  expect(message.subject).toBe("You are invited to Leeway");
  const link = firstLink(message);
  expect(link.pathname).toMatch(/^\/invite\/[A-Za-z0-9_-]{43}$/);

  // The admin's outbox page shows the same message.
  await page.getByRole("link", { name: "Outbox" }).click();
  await page.getByRole("row", { name: new RegExp(invitee.email) }).getByRole("link").first().click();
  await expect(page.getByTestId("message-to")).toHaveText(invitee.email);
  await expect(page.getByTestId("message-text")).toContainText(link.pathname);
  await page.screenshot({ path: "tests/artifacts/outbox-invitation.png", fullPage: true });

  // The invitee, in a browser of their own.
  const context = await browser.newContext();
  const invited = await context.newPage();
  await invited.goto(`${link.pathname}`);
  await expect(invited.getByText(`Welcome, ${invitee.name}`)).toBeVisible();
  await invited.getByLabel("New password", { exact: true }).fill("too-short");
  await invited.getByLabel("New password again").fill("too-short");
  await invited.getByRole("button", { name: "Set password" }).click();
  await expect(invited.getByText("Use at least 10 characters", { exact: true })).toBeVisible();
  // After an error the message is part of the field's label (TextField), so the field is found by name.
  await invited.locator('input[name="password"]').fill(invitee.password);
  await invited.locator('input[name="confirm"]').fill(invitee.password);
  await invited.getByRole("button", { name: "Set password" }).click();
  await expect(invited.getByTestId("password-set")).toContainText("Your password is set");

  await invited.getByRole("link", { name: "Go to sign-in" }).click();
  await invited.getByLabel("E-mail").fill(invitee.email);
  await invited.getByLabel("Password").fill(invitee.password);
  await invited.getByRole("button", { name: "Sign in" }).click();
  await expect(invited.getByTestId("current-user")).toContainText("Council member");

  // Council pages only: no admin sections, only published scenarios, admin pages refused.
  const nav = invited.getByRole("navigation", { name: "Workspace" });
  await expect(nav.getByRole("link", { name: "Scenarios" })).toBeVisible();
  // Sections of other roles (brief's role table): layers are planners' inputs, the rest is admin.
  for (const section of ["Layers", "People", "Outbox", "Audit trail"]) await expect(nav.getByRole("link", { name: section })).toHaveCount(0);
  const list = invited.getByTestId("scenario-list");
  await expect(list.getByRole("listitem").first()).toBeVisible();
  for (const badge of await list.getByRole("listitem").all()) await expect(badge).toContainText("Published to council");
  await invited.goto("/admin/people");
  await expect(invited.getByTestId("admin-only")).toBeVisible();
  await invited.screenshot({ path: "tests/artifacts/council-invitee.png", fullPage: true });

  // The link worked once.
  await invited.goto(link.pathname);
  await expect(invited.getByTestId("link-problem")).toContainText("This invitation has already been used");
  await context.close();

  // The audit trail names who invited whom.
  await page.goto("/admin/audit?target=person&action=invite");
  const row = page.getByTestId("audit-row").filter({ hasText: invitee.email });
  await expect(row).toContainText("person · invite");
  await expect(row).toContainText("Irene Calloway");
});

test("a tampered invitation link gets a clear page", async ({ page }) => {
  await page.goto(`/invite/${"x".repeat(43)}`);
  await expect(page.getByTestId("link-problem")).toContainText("This invitation link is not valid");
  await page.goto("/reset-password/not-a-token");
  await expect(page.getByTestId("link-problem")).toContainText("This reset link is not valid");
});

test("repeated failed sign-ins pause the account with a clear message", async ({ page }) => {
  // An address without an account: the limit counts it like a real one (docs/people.md, 5 per 15 minutes).
  const email = "no-such-person@council.example";
  await page.goto("/sign-in");
  for (let attempt = 1; attempt <= 5; attempt += 1) {
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(`wrong-guess-${attempt}`);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("sign-in-error")).toHaveText("E-mail or password is not right.");
  }
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("sign-in-error")).toContainText("Too many failed sign-ins for this account. Try again in 15 minutes");
  // The other browser tests sign in from the same address; leave them its full allowance.
  await db.execute("delete from sign_in_attempts");
});
