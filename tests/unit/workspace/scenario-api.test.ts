import { app } from "../support/app";
import { asc, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { POST as createRoute } from "@/app/api/scenarios/route";
import { POST as saveRoute } from "@/app/api/scenarios/[scenarioId]/versions/route";
import { auditLog, scenarios, scenarioVersions } from "@/db/schema";
import { savedVersionSchema } from "@/lib/workspace/save-contracts";

beforeEach(() => app.reset());

const SCENARIO_FILE = {
  version: 1,
  name: "Harbour test, edited",
  source: { lon: 150.2, lat: -30.1, depthKm: 20, mw: 7.1, faultType: "crustal" },
  stations: [
    { id: "S1", lon: 150.0, lat: -30.0 },
    { id: "S2", lon: 150.4, lat: -30.2 },
    { id: "S4", lon: 150.25, lat: -30.05 },
  ],
  vs30: 400,
  area: { bbox: [149.5, -30.6, 150.9, -29.6], cellKm: 5 },
};

const none = { params: Promise.resolve({}) };
const scenarioContext = (scenarioId: number | string) => ({ params: Promise.resolve({ scenarioId: String(scenarioId) }) });
const post = (path: string, body: unknown) => new Request(`http://leeway.test${path}`, { method: "POST", body: typeof body === "string" ? body : JSON.stringify(body) });

/** Row counts of every table a save writes, for "nothing was written" checks. */
async function counts() {
  return { scenarios: await app.count("scenarios"), versions: await app.count("scenario_versions"), audit: await app.count("audit_log") };
}

async function errorOf(response: Response) {
  return ((await response.json()) as { error: { kind: string; message: string; issues?: { path: string; message: string }[] } }).error;
}

describe("POST /api/scenarios/:id/versions", () => {
  it("saves the next version as a draft, keeps every earlier version as it was, and records the layers and the audit row", async () => {
    const fixture = app.fixture;
    const before = await app.db.select().from(scenarioVersions).orderBy(asc(scenarioVersions.number));
    app.signInAs("planner");
    const response = await saveRoute(post(`/api/scenarios/${fixture.scenarioId}/versions`, { scenario: SCENARIO_FILE, basedOn: fixture.versions.published, note: "Added S4" }), scenarioContext(fixture.scenarioId));
    expect(response.status).toBe(201);
    const saved = savedVersionSchema.parse(await response.json());
    expect(saved.version).toMatchObject({ number: 4, state: "draft", layerVersions: { population: fixture.populationLayerVersionId } });

    const after = await app.db.select().from(scenarioVersions).orderBy(asc(scenarioVersions.number));
    expect(after.slice(0, 3)).toEqual(before);
    expect(after[3].params).toEqual(SCENARIO_FILE);
    const [audit] = await app.db.select().from(auditLog).where(eq(auditLog.action, "save"));
    expect(audit).toMatchObject({ targetType: "scenario-version", targetId: `${fixture.scenarioId}/4`, actorId: fixture.people.planner.id });
  });

  it("numbers a second save after the first, never reusing a number", async () => {
    app.signInAs("admin");
    const path = `/api/scenarios/${app.fixture.scenarioId}/versions`;
    await saveRoute(post(path, { scenario: SCENARIO_FILE }), scenarioContext(app.fixture.scenarioId));
    const second = savedVersionSchema.parse(await (await saveRoute(post(path, { scenario: SCENARIO_FILE }), scenarioContext(app.fixture.scenarioId))).json());
    expect(second.version.number).toBe(5);
  });

  const badFiles: [string, unknown, string, string][] = [
    ["a negative depth", { ...SCENARIO_FILE, source: { ...SCENARIO_FILE.source, depthKm: -5 } }, "source.depthKm", "depth must be between 0 and 200 km"],
    ["an unknown field", { ...SCENARIO_FILE, source: { ...SCENARIO_FILE.source, dipDeg: 30 } }, "source.dipDeg", "unknown field"],
    ["a duplicate station id", { ...SCENARIO_FILE, stations: [...SCENARIO_FILE.stations, { id: "S1", lon: 150.1, lat: -30 }] }, "stations[3].id", 'duplicate station id "S1" (also stations[0])'],
    ["text where a number belongs", { ...SCENARIO_FILE, vs30: "stiff" }, "vs30", "Vs30 must be a number"],
  ];

  it.each(badFiles)("refuses %s with 400, names the JSON path, and writes nothing", async (_what, file, path, message) => {
    const before = await counts();
    app.signInAs("planner");
    const response = await saveRoute(post(`/api/scenarios/${app.fixture.scenarioId}/versions`, { scenario: file }), scenarioContext(app.fixture.scenarioId));
    expect(response.status).toBe(400);
    const error = await errorOf(response);
    expect(error.issues).toContainEqual({ path, message });
    expect(error.message).toContain(path);
    expect(await counts()).toEqual(before);
  });

  it("refuses a body that is not JSON, a version to start from that does not exist, and a missing scenario, writing nothing", async () => {
    const before = await counts();
    app.signInAs("planner");
    const id = app.fixture.scenarioId;
    expect((await saveRoute(post(`/api/scenarios/${id}/versions`, "{not json"), scenarioContext(id))).status).toBe(400);
    const noSuchBase = await saveRoute(post(`/api/scenarios/${id}/versions`, { scenario: SCENARIO_FILE, basedOn: 99 }), scenarioContext(id));
    expect(noSuchBase.status).toBe(400);
    expect((await errorOf(noSuchBase)).issues).toContainEqual({ path: "basedOn", message: "no version 99" });
    expect((await saveRoute(post(`/api/scenarios/999/versions`, { scenario: SCENARIO_FILE }), scenarioContext(999))).status).toBe(404);
    expect(await counts()).toEqual(before);
  });

  it("refuses trainers and council members (403) and writes nothing", async () => {
    const before = await counts();
    for (const role of ["trainer", "council"] as const) {
      app.signInAs(role);
      const response = await saveRoute(post(`/api/scenarios/${app.fixture.scenarioId}/versions`, { scenario: SCENARIO_FILE }), scenarioContext(app.fixture.scenarioId));
      expect(response.status).toBe(403);
    }
    expect(await counts()).toEqual(before);
  });
});

describe("POST /api/scenarios", () => {
  it("creates a scenario with version 1, a draft using today's layers, and an audit row", async () => {
    app.signInAs("planner");
    const response = await createRoute(post("/api/scenarios", { name: "  Outer bank test  ", description: "From scratch", scenario: SCENARIO_FILE }), none);
    expect(response.status).toBe(201);
    const saved = savedVersionSchema.parse(await response.json());
    expect(saved.scenario.name).toBe("Outer bank test");
    expect(saved.version).toMatchObject({ number: 1, state: "draft", layerVersions: { population: app.fixture.populationLayerVersionId } });
    const [row] = await app.db.select().from(scenarios).where(eq(scenarios.id, saved.scenario.id));
    expect(row.description).toBe("From scratch");
    expect(await app.db.select().from(auditLog).where(eq(auditLog.action, "create"))).toHaveLength(1);
  });

  it("refuses a missing name and a bad file with the field named, writing nothing", async () => {
    const before = await counts();
    app.signInAs("planner");
    const noName = await createRoute(post("/api/scenarios", { name: " ", scenario: SCENARIO_FILE }), none);
    expect(noName.status).toBe(400);
    expect((await errorOf(noName)).issues).toContainEqual({ path: "name", message: "Give the scenario a name" });
    const badFile = await createRoute(post("/api/scenarios", { name: "Bad", scenario: { ...SCENARIO_FILE, stations: [] } }), none);
    expect(badFile.status).toBe(400);
    expect((await errorOf(badFile)).issues).toContainEqual({ path: "stations", message: "at least one station is needed" });
    expect(await counts()).toEqual(before);
  });
});
