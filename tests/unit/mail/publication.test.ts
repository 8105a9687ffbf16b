import { app } from "../support/app";
import { EPICENTRE_CELL_PEOPLE, makeFixtureComputable } from "../support/computable-scenario";
import { and, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { DELETE as unpublish, POST as publish } from "@/app/api/scenarios/[scenarioId]/versions/[number]/publish/route";
import { DELETE as unshare, POST as share } from "@/app/api/scenarios/[scenarioId]/versions/[number]/share/route";
import { auditLog, scenarioVersions, users } from "@/db/schema";
import { CAUTION } from "@/lib/caution";
import { headlineSchema } from "@/lib/publishing/headline";
import { compareHeadlineWithToday } from "@/lib/publishing/headline-today";
import { isVersionFrozen } from "@/lib/publishing/state";
import packageJson from "@/package.json";

beforeAll(() => app.startMailServer());

beforeEach(async () => makeFixtureComputable(await app.reset()));

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
    // The fixture's only population cell (1,000 people) lies on the epicentre. There the S wave
    // arrives after 20 km / 3.36 km/s ≈ 6.0 s (IASP91 upper crust; from memory), while the alert
    // waits for the second station's P wave (both operating stations ≈ 19 km away: ≈ 28 km
    // hypocentral, ≈ 4.8 s at 5.8 km/s) plus the default P window, telemetry and processing
    // (1 + 0.5 + 1.5 s) and cell-broadcast delivery (5 s): ≈ 12.8 s. Warning ≈ −7 s, so the cell is
    // in the blind zone and nobody gets 10 s (hand estimate; the margin is several seconds).
    const figure = (key: string) => headline.figures.find((f) => f.key === key)?.value;
    expect(figure("blindZonePeople")).toBe(EPICENTRE_CELL_PEOPLE);
    expect(figure("alertedTenSecondsPeople")).toBe(0);
    expect(headline.exposureNote).toBeNull();

    const mails = await app.waitForMail(2);
    const text = mails[0].text;
    expect(mails[0].subject).toBe('Leeway: "Harbour test" version 1 published to council');
    expect(text).toContain(`http://leeway.test/scenarios/${app.fixture.scenarioId}/council?v=1`);
    expect(text).toContain("Note: For the March briefing");
    expect(text).toContain("Magnitude (Mw): 7.1");
    // Stations S1 and S2 operate, S3 does not (the fixture's scenario file).
    expect(text).toContain("Operating stations: 2");
    expect(text).toContain("People in the blind zone (shaking before any alert): 1,000 people");
    // The caution word for word, and the "how it was made" line (BRIEF "Cautions and provenance").
    expect(text.replace(/\s+/g, " ")).toContain(CAUTION);
    const provenance = text.split("\n").find((line) => line.startsWith("How it was made: "));
    expect(provenance).toContain(`Leeway ${packageJson.version}`);
    expect(provenance).toContain("ground motion: Si & Midorikawa (1999)");
    expect(provenance).toContain("scenario: Harbour test v1");
    expect(provenance).toContain("layers: population v1");
    expect(provenance).toMatch(/computed \d{4}-\d{2}-\d{2}T/);

    const [audit] = await app.db.select().from(auditLog);
    expect(audit).toMatchObject({ action: "publish", targetType: "scenario-version", targetId: `${app.fixture.scenarioId}/1` });
  });

  it("publishes a version without a population layer with its source figures, saying why exposure is missing", async () => {
    await app.db.update(scenarioVersions).set({ layerVersions: {} }).where(eq(scenarioVersions.scenarioId, app.fixture.scenarioId));
    app.signInAs("planner");
    expect((await call(publish, "POST", 1, { note: "Source only" })).status).toBe(200);
    const headline = headlineSchema.parse((await version(1)).headline);
    expect(headline.figures.map((f) => f.key)).toEqual(["mw", "depthKm", "faultType", "operatingStations", "triggerStations"]);
    expect(headline.exposureNote).toContain("no population layer");
    expect(headline.provenance).toContain("scenario: Harbour test v1");
    const [mail] = await app.waitForMail(1);
    expect(mail.text).toContain("Exposure figures are not included:");
    expect(mail.text).toContain("How it was made: Leeway");
  });

  it("refuses a version whose scenario file the engine cannot read (409) and changes nothing", async () => {
    await app.db.update(scenarioVersions).set({ params: { version: 1 } }).where(eq(scenarioVersions.scenarioId, app.fixture.scenarioId));
    app.signInAs("planner");
    const response = await call(publish, "POST", 1, { note: "Broken" });
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toContain("scenario file Leeway cannot compute");
    expect((await version(1)).state).toBe("draft");
    expect(await app.count("outbox")).toBe(0);
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

    // A changed stored figure stands for one computed differently at publication (an older engine).
    const stored = headlineSchema.parse((await version(1)).headline);
    const older = { ...stored, figures: stored.figures.map((f) => (f.key === "blindZonePeople" ? { ...f, value: 900 } : f)) };
    await app.db.update(scenarioVersions).set({ headline: older }).where(and(eq(scenarioVersions.scenarioId, app.fixture.scenarioId), eq(scenarioVersions.number, 1)));
    const later = await compareHeadlineWithToday({ scenarioId: app.fixture.scenarioId, number: 1 });
    expect(later.changes).toEqual([{ key: "blindZonePeople", label: "People in the blind zone (shaking before any alert)", stored: 900, now: 1_000 }]);
  });
});
