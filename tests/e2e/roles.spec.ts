import { expect, test } from "@playwright/test";
import { signIn } from "./support/session";

/**
 * What each role sees of the demo scenarios (brief, role table): drafts for admin and planner only,
 * versions shared for exercises also for trainers, published versions for everyone.
 * The demo seed has one scenario in each state.
 */
const VISIBLE = {
  admin: ["Draft", "Shared for exercises", "Published to council"],
  planner: ["Draft", "Shared for exercises", "Published to council"],
  trainer: ["Shared for exercises", "Published to council"],
  council: ["Published to council"],
} as const;

for (const [role, states] of Object.entries(VISIBLE)) {
  test(`${role} signs in and sees only the scenarios the role allows`, async ({ page }) => {
    await signIn(page, role as keyof typeof VISIBLE);
    const list = page.getByTestId("scenario-list");
    await expect(list).toBeVisible();
    await expect(list.getByRole("listitem")).toHaveCount(states.length);
    for (const state of states) await expect(list.getByText(state, { exact: true })).toBeVisible();
    await expect(page.getByTestId("caution")).toContainText("planning estimates");
    await page.screenshot({ path: `tests/artifacts/scenarios-${role}.png`, fullPage: true });
  });
}

test("council member opening a draft's address gets 'not found' and the API answers 403", async ({ page }) => {
  await signIn(page, "planner");
  const { scenarios } = await (await page.request.get("/api/scenarios")).json();
  const draft = scenarios.find((s: { latest: { state: string } }) => s.latest.state === "draft");
  expect(draft, "the demo seed has a draft scenario").toBeTruthy();
  await page.getByTestId("sign-out").click();
  await page.waitForURL(/sign-in/);

  await signIn(page, "council");
  await page.goto(`/scenarios/${draft.id}`);
  await expect(page.getByRole("heading", { name: "Scenario not found" })).toBeVisible();
  const api = await page.request.get(`/api/scenarios/${draft.id}/versions/1`);
  expect(api.status()).toBe(403);
  expect((await api.json()).error.message).toContain("council");
});

test("a wrong password is refused with a clear message and no session", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("planner@leeway.example");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("sign-in-error")).toContainText("not right");
  const api = await page.request.get("/api/scenarios");
  expect(api.status()).toBe(401);
});
