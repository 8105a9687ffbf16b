import { app } from "../support/app";
import { and, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { DELETE as unpublish, POST as publish } from "@/app/api/scenarios/[scenarioId]/versions/[number]/publish/route";
import { DELETE as unshare, POST as share } from "@/app/api/scenarios/[scenarioId]/versions/[number]/share/route";
import { compareHeadlineWithToday } from "@/db/queries/publishing";
import { auditLog, layerVersions, scenarioVersions, users } from "@/db/schema";
import { CAUTION } from "@/lib/caution";
import { headlineSchema } from "@/lib/publishing/headline";
import { isVersionFrozen } from "@/lib/publishing/state";
import packageJson from "@/package.json";

beforeAll(() => app.startMailServer());
beforeEach(() => app.reset());

type Handler = (request: Request, context: { params: Promise<{ scenarioId: string; number: string }> }) => Promise<Response>;

function call(handler: Handler, method: string, number: number, body?: unknown) {
  const { scenarioId } = app.fixture;
  const request = new Request(`http://leeway.test/api/scenarios/${scenarioId}/versions/${number}/x`, {
    method,
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return handler(request, { params: Promise.resolve({ scenarioId: String(scenarioId), number: String(number) }) });
}

async function version(number: number) {
  const [row] = await app.db
    .select()
    .from(scenarioVersions)
    .where(and(eq(scenarioVersions.scenarioId, app.fixture.scenarioId), eq(scenarioVersions.number, number)));
  return row;
}

describe("publishing to council", () => {
  it("freezes the version with its note, publisher and headline, and e-mails each active council member", async () => {
    await app.db.insert(users).values([
      { email: "second-council@fixture.example", name: "Second council", role: "council" },
      { email: "gone-council@fixture.example", name: "Former council", role: "council", active: false },
    ]);
    app.signInAs("planner");
    const response = await call(publish, "POST", 1, { note: "For the March briefing" });
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.mail).toEqual({ sent: ["council@fixture.example", "second-council@fixture.example"], failed: [] });

    const published = await version(1);
    expect(published).toMatchObject({ state: "published", note: "For the March briefing", publishedBy: app.fixture.people.planner.id });
    expect(isVersionFrozen(published)).toBe(true);
    // The layer versions the version used are left as they were.
    expect(published.layerVersions).toEqual({ population: app.fixture.populationLayerVersionId });
    const headline = headlineSchema.parse(published.headline);
    expect(headline.figures.find((figure) => figure.key === "layerPopulation")?.value).toBe(12_345);

    const mails = await app.waitForMail(2);
    const text = mails[0].text;
    expect(mails[0].subject).toBe('Leeway: "Harbour test" version 1 published to council');
    expect(text).toContain(`http://leeway.test/scenarios/${app.fixture.scenarioId}/council?v=1`);
    expect(text).toContain("Note: For the March briefing");
    expect(text).toContain("Magnitude (Mw): 7.1");
    expect(text).toContain("Operating stations: 2");
    expect(text).toContain("People in the population layer: 12,345 people");
    // The caution word for word, and the "how it was made" line (BRIEF "Cautions and provenance").
    expect(text.replace(/\s+/g, " ")).toContain(CAUTION);
    expect(text).toMatch(new RegExp(`How it was made: Leeway ${packageJson.version.replace(/\./g, "\\.")} · ground motion: Si & Midorikawa \\(1999\\)`));
    expect(text).toContain('scenario "Harbour test" version 1');
    expect(text).toContain('layers: population "Fixture population" v1');

    const [audit] = await app.db.select().from(auditLog);
    expect(audit).toMatchObject({ action: "publish", targetType: "scenario-version", targetId: `${app.fixture.scenarioId}/1` });
  });

  it("refuses a missing note by name and changes nothing", async () => {
    app.signInAs("planner");
    const response = await call(publish, "POST", 1, { note: "  " });
    expect(response.status).toBe(400);
    expect((await response.json()).error.message).toContain("note");
    expect((await version(1)).state).toBe("draft");
    expect(await app.count("audit_log")).toBe(0);
  });

  it("refuses to publish a published version again (409)", async () => {
    app.signInAs("planner");
    const response = await call(publish, "POST", app.fixture.versions.published, { note: "again" });
    expect(response.status).toBe(409);
  });

  it("unpublishes with a reason, logged and e-mailed; the version stays frozen", async () => {
    app.signInAs("admin");
    const number = app.fixture.versions.published;
    const response = await call(unpublish, "DELETE", number, { reason: "Station list was out of date" });
    expect(response.status).toBe(200);
    const after = await version(number);
    expect(after.state).toBe("draft");
    expect(isVersionFrozen(after)).toBe(true);
    const [mail] = await app.waitForMail(1);
    expect(mail.subject).toContain("withdrawn from council");
    expect(mail.text).toContain("Reason: Station list was out of date");
    const [audit] = await app.db.select().from(auditLog);
    expect(audit).toMatchObject({ action: "unpublish", detail: { before: { state: "published" }, after: { state: "draft", note: "Station list was out of date" } } });
  });
});

describe("sharing for exercises", () => {
  it("shares a draft with trainers without any e-mail, and can stop sharing", async () => {
    app.signInAs("planner");
    expect((await call(share, "POST", 1)).status).toBe(200);
    expect((await version(1)).state).toBe("shared");
    expect(await app.count("outbox")).toBe(0);
    expect((await call(unshare, "DELETE", 1)).status).toBe(200);
    expect((await version(1)).state).toBe("draft");
    const actions = (await app.db.select({ action: auditLog.action }).from(auditLog).orderBy(auditLog.id)).map((row) => row.action);
    expect(actions).toEqual(["share", "unshare"]);
  });

  it("refuses to share a published version (409)", async () => {
    app.signInAs("planner");
    expect((await call(share, "POST", app.fixture.versions.published)).status).toBe(409);
  });

  it("answers 404 for a version that does not exist", async () => {
    app.signInAs("planner");
    expect((await call(share, "POST", 99)).status).toBe(404);
  });
});

describe("the council summary's check against today's figures", () => {
  it("finds no change right after publication, and names a figure that changed since", async () => {
    app.signInAs("planner");
    await call(publish, "POST", 1, { note: "Baseline" });
    const fresh = await compareHeadlineWithToday({ scenarioId: app.fixture.scenarioId, number: 1 });
    expect(fresh.stored).not.toBeNull();
    expect(fresh.changes).toEqual([]);

    // The layer version's figures are corrected after publication.
    await app.db.update(layerVersions).set({ summary: { totalPopulation: 12_400 } }).where(eq(layerVersions.id, app.fixture.populationLayerVersionId));
    const later = await compareHeadlineWithToday({ scenarioId: app.fixture.scenarioId, number: 1 });
    expect(later.changes).toEqual([{ key: "layerPopulation", label: "People in the population layer", stored: 12_345, now: 12_400 }]);
  });
});
