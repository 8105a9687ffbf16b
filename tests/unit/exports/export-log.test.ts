// The export log (issue 9): every export is recorded with who, what and which version, and
// listed on the scenario; a refused export (role, bad input, nothing to export) writes nothing.
import { app, type Fixture } from "../support/app";
import { beforeEach, describe, expect, it } from "vitest";
import { exportLog, scenarioVersions } from "@/db/schema";
import { getExport } from "./export-routes";
import { fixtureScenarioFile } from "../support/scenario-file";

const SCENARIO_FILE = fixtureScenarioFile("Log test");

async function addVersion(fixture: Fixture, params: unknown, state: "shared" | "published" = "shared") {
  const [row] = await app.db
    .insert(scenarioVersions)
    .values({ scenarioId: fixture.scenarioId, number: 4, params, layerVersions: { population: fixture.populationLayerVersionId }, state, authorId: fixture.people.planner.id })
    .returning();
  return row;
}

async function exportLogOf(scenarioId: number) {
  const { GET } = await import("@/app/api/exports/[scenarioId]/route");
  const response = await GET(new Request(`http://leeway.test/api/exports/${scenarioId}`), { params: Promise.resolve({ scenarioId: String(scenarioId) }) });
  expect(response.status).toBe(200);
  return (await response.json()) as { entries: { kind: string; versionNumber: number; person: string | null; at: string }[] };
}

describe("the export log", () => {
  let fixture: Fixture;
  beforeEach(async () => {
    fixture = await app.reset();
  });

  it("records each export with the person, the kind and the version, and lists it on the scenario", async () => {
    const version = await addVersion(fixture, SCENARIO_FILE);
    app.signInAs("trainer");
    expect((await getExport("contours", fixture.scenarioId, 4)).status).toBe(200);
    expect((await getExport("cap", fixture.scenarioId, 4, "?exercise=Spring%20drill")).status).toBe(200);

    const rows = await app.db.select().from(exportLog);
    expect(rows.map((r) => [r.kind, r.userId, r.scenarioVersionId])).toEqual([
      ["contours-geojson", fixture.people.trainer.id, version.id],
      ["cap-exercise", fixture.people.trainer.id, version.id],
    ]);
    const { entries } = await exportLogOf(fixture.scenarioId);
    expect(entries.map((e) => [e.kind, e.versionNumber, e.person])).toEqual([
      ["cap-exercise", 4, "Fixture trainer"],
      ["contours-geojson", 4, "Fixture trainer"],
    ]);
  });

  it("hides entries of versions the caller may not see", async () => {
    await addVersion(fixture, SCENARIO_FILE, "shared");
    app.signInAs("planner");
    expect((await getExport("scenario-file", fixture.scenarioId, 4)).status).toBe(200);
    app.signInAs("council");
    expect((await exportLogOf(fixture.scenarioId)).entries).toEqual([]);
  });

  it("writes nothing when the role may not export", async () => {
    await addVersion(fixture, SCENARIO_FILE, "published");
    app.signInAs("council");
    for (const kind of ["cap", "contours", "sites", "scenario-file"]) {
      const response = await getExport(kind, fixture.scenarioId, 4);
      expect(response.status, kind).toBe(403);
      expect((await response.json()).error.message).toMatch(/Your role \(council\) may not do this/);
    }
    expect(await app.count("export_log")).toBe(0);
  });

  it("refuses a bad typed point by name and writes nothing", async () => {
    await addVersion(fixture, SCENARIO_FILE);
    app.signInAs("planner");
    const response = await getExport("sites", fixture.scenarioId, 4, "?point=150.2,-30.0&point=east,north");
    expect(response.status).toBe(400);
    expect((await response.json()).error.message).toMatch(/point\[1\]: write a point as lon,lat/);
    expect(await app.count("export_log")).toBe(0);
  });

  it("refuses an exercise message when the scenario issues no alert (409) and writes nothing", async () => {
    // Mw 4.0 stays far below the default "issue at" of JMA 4.5 (lib/scenario/defaults.ts).
    await addVersion(fixture, { ...SCENARIO_FILE, source: { ...SCENARIO_FILE.source, mw: 4.0, depthKm: 60 } });
    app.signInAs("planner");
    const response = await getExport("cap", fixture.scenarioId, 4);
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/no alert is issued/);
    expect(await app.count("export_log")).toBe(0);
  });

  it("refuses a stored version that is not a valid scenario file (409), naming the field", async () => {
    // A partial file: no site conditions and no area.
    const partial: Partial<typeof SCENARIO_FILE> = { ...SCENARIO_FILE };
    delete partial.vs30;
    delete partial.area;
    await addVersion(fixture, partial);
    app.signInAs("planner");
    const response = await getExport("contours", fixture.scenarioId, 4);
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/vs30/);
    expect(await app.count("export_log")).toBe(0);
  });
});
