// The scenario file round trip (issue 9): a version with a disabled station, a finite rupture, a
// Vs30 layer, non-default alert settings and a second channel is exported as a scenario file,
// imported as a new scenario through POST /api/scenarios, and its exposure tables come out
// byte-identical to the original's. The `#` lines differ by design (they name the scenario version
// and the layer versions each result was made from), so the tables are compared below them.
import { app, type Fixture } from "../support/app";
import { readFileSync } from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import { beforeEach, describe, expect, it } from "vitest";
import { packGridChunks } from "@/db/grid-codec";
import { gridChunks, layers, layerVersions, scenarioVersions } from "@/db/schema";
import { classBandTable } from "@/lib/exposure/class-band-table";
import { computeExposure } from "@/lib/geo";
import { parseScenario } from "@/lib/scenario/schema";
import { getExport, tableBody } from "./export-routes";

const FILE = JSON.parse(readFileSync(path.resolve(__dirname, "../../fixtures/exports/round-trip-scenario.json"), "utf8"));
const TABLES = ["class-band", "districts", "channels", "actions", "facilities"] as const;
const DISTRICTS = ["Orrin North", "Orrin South"];

/** A regular lattice over the scenario area, row by row. */
function lattice(stepDeg: number) {
  const [w, s, e, n] = FILE.area.bbox as number[];
  const lon: number[] = [];
  const lat: number[] = [];
  for (let y = s + stepDeg / 2; y < n; y += stepDeg) for (let x = w + stepDeg / 2; x < e; x += stepDeg) {
    lon.push(Math.round(x * 1e4) / 1e4);
    lat.push(Math.round(y * 1e4) / 1e4);
  }
  return { lon: Float64Array.from(lon), lat: Float64Array.from(lat) };
}

async function insertGridLayer(fixture: Fixture, kind: "population" | "site-condition", columns: { lon: Float64Array; lat: Float64Array; value: Float64Array; district?: Int32Array }, summary: Record<string, unknown>) {
  const [layer] = await app.db.insert(layers).values({ kind, name: `Round trip ${kind}`, createdBy: fixture.people.planner.id }).returning();
  const [version] = await app.db
    .insert(layerVersions)
    .values({ layerId: layer.id, number: 1, rowCount: columns.lon.length, summary, createdBy: fixture.people.planner.id })
    .returning();
  for (const chunk of packGridChunks(columns)) await app.db.insert(gridChunks).values({ layerVersionId: version.id, ...chunk });
  return version.id;
}

/** Site conditions from soft (180 m/s) to rock (900 m/s) across the area, and people in two districts. */
async function insertLayers(fixture: Fixture) {
  const soil = lattice(0.05);
  const vs30 = Float64Array.from(soil.lon, (lon, i) => Math.round(180 + 720 * ((lon - 149.5) / 1.4) * (0.5 + 0.5 * Math.cos(soil.lat[i] * 7))));
  const siteCondition = await insertGridLayer(fixture, "site-condition", { ...soil, value: vs30 }, {});
  const cells = lattice(0.02);
  const people = Float64Array.from(cells.lon, (lon, i) => (i % 7 === 0 ? 0 : 5 + ((i * 37) % 113) + 0.4 * (lon - 149)));
  const district = Int32Array.from(cells.lat, (lat, i) => (i % 11 === 0 ? -1 : lat > -30.1 ? 0 : 1));
  const population = await insertGridLayer(fixture, "population", { ...cells, value: people, district }, { districtNames: DISTRICTS, districtSource: "file" });
  return { siteCondition, population, cells, people, district };
}

/** The layers, and version 4 of the fixture scenario: the round-trip file, shared, recording both layers. */
async function insertSharedVersion(fixture: Fixture) {
  const layerIds = await insertLayers(fixture);
  await app.db.insert(scenarioVersions).values({
    scenarioId: fixture.scenarioId,
    number: 4,
    params: FILE,
    layerVersions: { population: layerIds.population, siteCondition: layerIds.siteCondition },
    state: "shared",
    authorId: fixture.people.planner.id,
  });
  return layerIds;
}

describe("scenario file round trip", () => {
  let fixture: Fixture;
  beforeEach(async () => {
    fixture = await app.reset();
  });

  it("exports a file that, imported, gives byte-identical exposure tables", async () => {
    await insertSharedVersion(fixture);

    // The trainer exports the scenario file of the shared version.
    app.signInAs("trainer");
    const fileResponse = await getExport("scenario-file", fixture.scenarioId, 4);
    expect(fileResponse.status).toBe(200);
    expect(fileResponse.headers.get("content-disposition")).toMatch(/attachment; filename="leeway-harbour-test-v4-scenario\.json"/);
    const text = await fileResponse.text();
    const exported = JSON.parse(text);
    expect(parseScenario(exported).ok).toBe(true);
    // The Vs30 layer is written into the file, cell for cell, in the layer's order.
    expect(exported.vs30Grid).toHaveLength(Math.round((1.4 / 0.05) * (1.2 / 0.05)));
    expect(exported.stations.find((s: { id: string }) => s.id === "ORR3").operating).toBe(false);
    expect(exported.source.rupture).toEqual(FILE.source.rupture);
    expect(exported.alert).toEqual(FILE.alert);
    expect(exported.channels).toEqual(FILE.channels);
    // The workspace names no intensity scale in this fixture, so the engine default (jma) is written in.
    expect(exported.intensityScale).toBe("jma");

    // The planner imports it as a new scenario (version 1 records today's layers).
    app.signInAs("planner");
    const { POST } = await import("@/app/api/scenarios/route");
    const imported = await POST(new Request("http://leeway.test/api/scenarios", { method: "POST", body: JSON.stringify({ name: "Imported round trip", scenario: exported }) }), { params: Promise.resolve({}) } as never);
    expect(imported.status).toBe(201);
    const importedId: number = (await imported.json()).scenario.id;

    for (const table of TABLES) {
      const original = await (await getExport("exposure", fixture.scenarioId, 4, `?table=${table}`)).text();
      const again = await (await getExport("exposure", importedId, 1, `?table=${table}`)).text();
      expect(tableBody(again), `${table} table`).toBe(tableBody(original));
      expect(original.split("\r\n")[0]).toMatch(/^# Scenario results are planning estimates/);
    }
  });

  it("computes the same tables from the file alone, without any layer for site conditions", async () => {
    const layerIds = await insertSharedVersion(fixture);
    app.signInAs("planner");
    const exported = JSON.parse(await (await getExport("scenario-file", fixture.scenarioId, 4)).text());
    const parsed = parseScenario(exported);
    if (!parsed.ok) throw new Error("the exported file does not parse");
    const population = { lon: layerIds.cells.lon, lat: layerIds.cells.lat, population: layerIds.people, district: layerIds.district, districtNames: DISTRICTS };
    const fromFile = computeExposure(parsed.scenario, population, { actions: [], reactionS: 2 });

    const stored = await (await getExport("exposure", fixture.scenarioId, 4, "?table=class-band")).text();
    const rows = Papa.parse<string[]>(tableBody(stored), { skipEmptyLines: true }).data.slice(1, -1);
    const fromRoute = rows.map(([intensityClass, ...counts]) => ({ intensityClass, counts: counts.map(Number) }));
    const expected = classBandTable(fromFile).rows.map((r) => ({ intensityClass: r.intensityClass, counts: [...r.alertedByBand, r.notAlerted, r.total] }));
    expect(fromRoute).toEqual(expected);

    // The test can fail: without the Vs30 grid the same scenario gives other figures.
    const withoutGrid = { ...parsed.scenario };
    delete withoutGrid.vs30Grid;
    const withoutSoil = computeExposure(withoutGrid, population, { actions: [], reactionS: 2 });
    expect(withoutSoil.table).not.toEqual(fromFile.table);
  });
});
