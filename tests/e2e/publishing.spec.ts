import { expect, test, type Browser } from "@playwright/test";
import { firstLink, lastOutboxId, openE2eDatabase, outboxSince, waitForMessage } from "./support/outbox";
import { DEMO_USERS, signIn, type DemoRole } from "./support/session";

/**
 * Issue 8: sharing a version for exercises (trainers see it, council is not e-mailed) and
 * publishing it to council (the council member's notice arrives through SMTP). The tests use a
 * scenario of their own, made from the demo draft's file and removed afterwards, so the demo
 * scenarios other tests count stay as seeded.
 */
const SCENARIO_NAME = "Harbour drill (browser test)";
const db = openE2eDatabase();
let scenarioId: number;

test.beforeAll(async () => {
  const draft = await db.execute(
    "select v.params, v.layer_versions, v.author_id from scenario_versions v where v.state = 'draft' order by v.id limit 1",
  );
  expect(draft.rows.length, "the demo seed has a draft version").toBe(1);
  const [row] = draft.rows;
  const created = await db.execute({
    sql: "insert into scenarios (name, description, created_by) values (?, 'Made by tests/e2e/publishing.spec.ts', ?) returning id",
    args: [SCENARIO_NAME, row.author_id],
  });
  scenarioId = Number(created.rows[0].id);
  await db.execute({
    sql: "insert into scenario_versions (scenario_id, number, params, layer_versions, state, author_id) values (?, 1, ?, ?, 'draft', ?)",
    args: [scenarioId, row.params, row.layer_versions, row.author_id],
  });
});

test.afterAll(async () => {
  await db.execute({ sql: "delete from scenarios where id = ?", args: [scenarioId] });
  db.close();
});

async function pageAs(browser: Browser, role: DemoRole) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, role);
  return { page, close: () => context.close() };
}

test("a planner shares a version for exercises: the trainer sees it and no e-mail is sent", async ({ page, browser }) => {
  const before = await lastOutboxId(db);
  await signIn(page, "planner");
  await page.goto(`/scenarios/${scenarioId}`);
  await page.getByRole("button", { name: "Share for exercises" }).click();
  await expect(page.getByTestId("visibility-result")).toContainText("Shared with trainers for exercises");
  await expect(page.getByText("Shared for exercises", { exact: true })).toBeVisible();

  const trainer = await pageAs(browser, "trainer");
  await expect(trainer.page.getByTestId("scenario-list")).toContainText(SCENARIO_NAME);
  await trainer.page.getByRole("link", { name: new RegExp(SCENARIO_NAME.replace(/[()]/g, "\\$&")) }).click();
  await expect(trainer.page.getByRole("heading", { name: SCENARIO_NAME })).toBeVisible();
  // Trainers get no publishing controls, and the server refuses them anyway.
  await expect(trainer.page.getByTestId("version-visibility")).toHaveCount(0);
  const refused = await trainer.page.request.post(`/api/scenarios/${scenarioId}/versions/1/publish`, { data: { note: "not mine to publish" } });
  expect(refused.status()).toBe(403);
  await trainer.close();

  const council = await pageAs(browser, "council");
  await expect(council.page.getByTestId("scenario-list")).not.toContainText(SCENARIO_NAME);
  await council.close();

  // Give a mistaken notice time to arrive before concluding there was none.
  await page.waitForTimeout(1_000);
  expect(await outboxSince(db, before)).toEqual([]);
});

test("a planner publishes to council with a note, and the council member's notice arrives", async ({ page, browser }) => {
  const before = await lastOutboxId(db);
  await signIn(page, "planner");
  await page.goto(`/scenarios/${scenarioId}`);
  await page.getByRole("button", { name: "Publish to council…" }).click();
  await page.getByLabel("Note for council").fill("For the spring drill briefing");
  await page.getByRole("button", { name: "Publish and notify council" }).click();
  await expect(page.getByTestId("visibility-result")).toContainText("Published to council. E-mail sent to");
  await expect(page.getByText("Published to council", { exact: true })).toBeVisible();
  await page.screenshot({ path: "tests/artifacts/published-version.png", fullPage: true });

  const notice = await waitForMessage(db, { to: DEMO_USERS.council.email, afterId: before });
  expect(notice.subject).toBe(`Leeway: "${SCENARIO_NAME}" version 1 published to council`);
  expect(firstLink(notice).pathname + firstLink(notice).search).toBe(`/scenarios/${scenarioId}/council?v=1`);
  expect(notice.text).toContain("Note: For the spring drill briefing");
  expect(notice.text).toContain("Magnitude (Mw): 7.1");
  // The exposure engine's figures for the demo layers, not only the source's.
  expect(notice.text).toMatch(/People in the blind zone \(shaking before any alert\): [\d,]+ people/);
  expect(notice.text).toMatch(/People alerted 10 s or more before the shaking: [\d,]+ people/);
  expect(notice.text).toContain("Caution: Scenario results are planning estimates");
  expect(notice.text).toMatch(/How it was made: Leeway \d+\.\d+\.\d+; ground motion: .+; scenario: .+ v1; layers: .*population v\d+/);

  const council = await pageAs(browser, "council");
  await expect(council.page.getByTestId("scenario-list")).toContainText(SCENARIO_NAME);
  await council.close();

  // The published version is frozen from the planner's side: only "Unpublish…" is offered.
  await expect(page.getByRole("button", { name: "Unpublish…" })).toBeVisible();
  await expect(page.getByRole("button", { name: "Share for exercises" })).toHaveCount(0);
});
