import { app } from "../support/app";
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { DELETE as deleteLayerRoute, GET as getLayerRoute, PATCH as renameLayerRoute } from "@/app/api/layers/[layerId]/route";
import { POST as addVersionRoute } from "@/app/api/layers/[layerId]/versions/route";
import { GET as featuresRoute } from "@/app/api/layers/[layerId]/versions/[number]/features/route";
import { POST as previewRoute } from "@/app/api/layers/preview/route";
import { GET as listRoute, POST as createRoute } from "@/app/api/layers/route";
import { readGridLayer } from "@/db/queries/layers";
import { layers, layerVersions, scenarioVersions } from "@/db/schema";
import { layerDetailSchema, layerFeaturesSchema, layerListSchema, layerPreviewSchema, previewStreamLineSchema } from "@/lib/layers/api-schemas";
import { fixtureBytes } from "./fixtures";

beforeEach(() => app.reset());

const CONTENT_TABLES = ["layers", "layer_versions", "grid_chunks", "districts", "facilities", "stations", "audit_log"] as const;

/** Row counts of every table an upload writes, for "nothing was written" checks. */
async function contentCounts() {
  const counts: Record<string, number> = {};
  for (const table of CONTENT_TABLES) counts[table] = await app.count(table);
  return counts;
}

function upload(path: string, query: Record<string, string>, body: Uint8Array, headers: Record<string, string> = {}): Request {
  const url = new URL(`http://leeway.test${path}`);
  for (const [key, value] of Object.entries(query)) url.searchParams.set(key, value);
  return new Request(url, { method: "POST", body: body as BodyInit, headers: { "content-length": String(body.byteLength), ...headers } });
}

const none = { params: Promise.resolve({}) };
const layerContext = (layerId: number) => ({ params: Promise.resolve({ layerId: String(layerId) }) });

async function createLayer(kind: string, fixture: string, name = `Uploaded ${kind}`) {
  const format = fixture.endsWith(".geojson") ? "geojson" : "csv";
  return createRoute(upload("/api/layers", { kind, format, name, fileName: fixture }, fixtureBytes(fixture)), none);
}

async function errorOf(response: Response) {
  const body = (await response.json()) as { error: { message: string; issues?: { path: string; message: string }[] } };
  return body.error;
}

describe("uploading a layer file", () => {
  const malformed = [
    ["wrong columns", "population", "population-wrong-columns.csv", 400, "The header row has the wrong columns"],
    ["text in a number column", "population", "population-text-in-number.csv", 400, 'row 3, column population: "many" is not a number'],
    ["latitude out of range", "population", "population-lat-out-of-range.csv", 400, "row 4, column lat: must be between -90 and 90 degrees"],
    ["semicolons", "population", "population-semicolons.csv", 400, "separates its columns with semicolons"],
    ["decimal commas", "population", "population-decimal-comma.csv", 400, "decimal comma"],
    ["an empty file", "population", "empty.csv", 400, "The file is empty"],
    ["a self-intersecting polygon", "districts", "districts-self-intersecting.geojson", 400, 'feature 2 ("Bowtie Flats"), geometry: crosses itself'],
    ["a ring that is not closed", "districts", "districts-open-ring.geojson", 400, "is not closed"],
    ["rail in a facility CSV", "facilities", "facilities-rail-in-csv.csv", 400, "rail segments are lines"],
  ] as const;

  for (const [what, kind, fixture, status, message] of malformed) {
    it(`refuses ${what} with ${status} and writes nothing`, async () => {
      app.signInAs("planner");
      const before = await contentCounts();
      const response = await createLayer(kind, fixture);
      expect(response.status).toBe(status);
      expect((await errorOf(response)).message).toContain(message);
      expect(await contentCounts()).toEqual(before);
    });
  }

  it("refuses a file over the size limit with 413 and writes nothing", async () => {
    app.signInAs("planner");
    const before = await contentCounts();
    const row = "TS01,-126.21,-46.89,true\n";
    const oversized = Buffer.from(`id,lon,lat,operating\n${row.repeat(Math.ceil((2 * 1024 * 1024) / row.length) + 1)}`);
    const response = await createRoute(upload("/api/layers", { kind: "stations", format: "csv", name: "Too big", fileName: "big.csv" }, oversized), none);
    expect(response.status).toBe(413);
    expect((await errorOf(response)).message).toMatch(/^The file is 2(\.0)? MB|^The file is [\d,]+ bytes; Leeway accepts at most 2 MB for a stations layer/);
    expect(await contentCounts()).toEqual(before);
  });

  it("refuses a body shorter than its Content-Length (a cut-off upload)", async () => {
    app.signInAs("planner");
    const before = await contentCounts();
    const bytes = fixtureBytes("population-ok.csv");
    const response = await createRoute(upload("/api/layers", { kind: "population", format: "csv", name: "Cut", fileName: "cut.csv" }, bytes, { "content-length": String(bytes.byteLength + 10) }), none);
    expect(response.status).toBe(400);
    expect((await errorOf(response)).message).toContain("arrived incomplete");
    expect(await contentCounts()).toEqual(before);
  });

  it("accepts a BOM + CRLF population file and reads it back as typed arrays", async () => {
    app.signInAs("planner");
    const response = await createLayer("population", "population-bom-crlf.csv", "Harbour cells");
    expect(response.status).toBe(201);
    const body = (await response.json()) as { layer: { id: number }; version: { number: number } };
    expect(body.version.number).toBe(1);
    const [version] = await app.db.select().from(layerVersions).where(eq(layerVersions.layerId, body.layer.id));
    expect(version.sourceFile).toBe("population-bom-crlf.csv");
    expect(version.summary).toMatchObject({ totalPopulation: 400, cells: 3, districtSource: "none" });
    const grid = await readGridLayer({ layerVersionId: version.id });
    expect(grid.lon).toBeInstanceOf(Float64Array);
    expect([...grid.value]).toEqual([100, 250.5, 49.5]);
    expect([...grid.district]).toEqual([-1, -1, -1]);
  });

  it("refuses the upload of a trainer (403) and of a council member (403), and of nobody (401)", async () => {
    for (const [caller, status] of [["trainer", 403], ["council", 403], ["none", 401]] as const) {
      app.signInAs(caller);
      const before = await contentCounts();
      expect((await createLayer("population", "population-ok.csv")).status).toBe(status);
      expect((await previewRoute(upload("/api/layers/preview", { kind: "population", format: "csv" }, fixtureBytes("population-ok.csv")), none)).status).toBe(status);
      expect(await contentCounts()).toEqual(before);
    }
  });

  it("refuses a format the kind does not take and an unknown kind", async () => {
    app.signInAs("planner");
    const wrongFormat = await createRoute(upload("/api/layers", { kind: "districts", format: "csv", name: "D", fileName: "d.csv" }, fixtureBytes("population-ok.csv")), none);
    expect(wrongFormat.status).toBe(400);
    expect((await errorOf(wrongFormat)).message).toBe("A district boundaries layer is uploaded as GeoJSON, not CSV.");
    const unknownKind = await createRoute(upload("/api/layers", { kind: "roads", format: "csv", name: "R", fileName: "r.csv" }, fixtureBytes("population-ok.csv")), none);
    expect(unknownKind.status).toBe(400);
    expect((await errorOf(unknownKind)).issues?.[0].path).toBe("kind");
  });
});

describe("previewing a layer file", () => {
  it("answers with figures, first rows and an extent without writing anything", async () => {
    app.signInAs("planner");
    const before = await contentCounts();
    const response = await previewRoute(upload("/api/layers/preview", { kind: "population", format: "csv" }, fixtureBytes("population-ok.csv")), none);
    expect(response.status).toBe(200);
    const preview = layerPreviewSchema.parse(await response.json());
    if (!preview.accepted) throw new Error(preview.message);
    expect(preview.rowCount).toBe(5);
    expect(preview.summary).toMatchObject({ totalPopulation: 4760, cells: 5, fileDistricts: 2 });
    expect(preview.sample.columns).toEqual(["lon", "lat", "population", "district"]);
    expect(preview.sample.rows[0]).toEqual([-126.22, -46.9, 1200, "Orvanne"]);
    expect(preview.extent.features).toHaveLength(5);
    expect(await contentCounts()).toEqual(before);
  });

  it("lists the problems of a file that would be refused", async () => {
    app.signInAs("planner");
    const response = await previewRoute(upload("/api/layers/preview", { kind: "population", format: "csv" }, fixtureBytes("population-lat-out-of-range.csv")), none);
    const preview = layerPreviewSchema.parse(await response.json());
    expect(preview).toEqual({
      accepted: false,
      message: "The file was refused: row 4, column lat: must be between -90 and 90 degrees. Nothing was saved.",
      issues: [{ path: "row 4, column lat", message: "must be between -90 and 90 degrees" }],
      issueCount: 1,
    });
  });

  it("streams progress lines and then the result when asked for NDJSON", async () => {
    app.signInAs("planner");
    const rows = Array.from({ length: 60_000 }, (_, i) => `${(-127 + (i % 300) * 0.01).toFixed(2)},${(-47 + Math.floor(i / 300) * 0.01).toFixed(2)},3`);
    const file = Buffer.from(["lon,lat,population", ...rows].join("\n"));
    const response = await previewRoute(upload("/api/layers/preview", { kind: "population", format: "csv" }, file, { accept: "application/x-ndjson" }), none);
    expect(response.headers.get("content-type")).toBe("application/x-ndjson");
    const lines = (await response.text()).trim().split("\n").map((line) => previewStreamLineSchema.parse(JSON.parse(line)));
    const progress = lines.filter((line) => line.type === "progress");
    expect(progress.length).toBeGreaterThan(0);
    expect(progress.at(-1)).toEqual({ type: "progress", fraction: 1 });
    const last = lines.at(-1);
    expect(last?.type === "result" && last.preview.accepted && last.preview.rowCount).toBe(60_000);
  });
});

describe("layer versions and districts", () => {
  async function idOf(response: Response): Promise<number> {
    expect(response.status).toBe(201);
    return ((await response.json()) as { layer: { id: number } }).layer.id;
  }

  it("adds a version on upload over a layer, and refuses a file of another kind", async () => {
    app.signInAs("planner");
    const layerId = await idOf(await createLayer("stations", "stations-ok.csv", "Network"));
    const second = await addVersionRoute(upload(`/api/layers/${layerId}/versions`, { format: "csv", fileName: "stations-v2.csv" }, fixtureBytes("stations-ok.csv")), layerContext(layerId));
    expect(second.status).toBe(201);
    expect(((await second.json()) as { version: { number: number } }).version.number).toBe(2);

    const before = await contentCounts();
    const wrongKind = await addVersionRoute(upload(`/api/layers/${layerId}/versions`, { format: "csv", fileName: "p.csv" }, fixtureBytes("population-ok.csv")), layerContext(layerId));
    expect(wrongKind.status).toBe(400);
    expect(await contentCounts()).toEqual(before);

    const detail = layerDetailSchema.parse(await (await getLayerRoute(new Request("http://leeway.test"), layerContext(layerId))).json());
    expect(detail.versions.map((v) => v.number)).toEqual([2, 1]);
    expect(detail.versions[0].description).toBe("4 stations, 3 operating");
  });

  it("places population cells in the current district boundaries, and a district column wins over them", async () => {
    app.signInAs("planner");
    await idOf(await createLayer("districts", "districts-ok.geojson", "Districts"));
    const byBoundaries = await idOf(await createLayer("population", "population-no-district.csv", "Cells by boundaries"));
    const byColumn = await idOf(await createLayer("population", "population-ok.csv", "Cells by column"));

    const [boundaryVersion] = await app.db.select().from(layerVersions).where(eq(layerVersions.layerId, byBoundaries));
    const grid = await readGridLayer({ layerVersionId: boundaryVersion.id });
    // By hand from the fixtures' corners: Orvanne, Orvanne, Quillmoor, Quillmoor, outside both.
    expect([...grid.district]).toEqual([0, 0, 1, 1, -1]);
    expect(grid.districtNames).toEqual(["Orvanne", "Quillmoor"]);
    expect(boundaryVersion.summary).toMatchObject({ districtSource: "boundaries", peopleWithoutDistrict: 75 });

    const [columnVersion] = await app.db.select().from(layerVersions).where(eq(layerVersions.layerId, byColumn));
    const columnGrid = await readGridLayer({ layerVersionId: columnVersion.id });
    expect([...columnGrid.district]).toEqual([0, 0, 0, 1, -1]);
    expect(columnGrid.districtNames).toEqual(["Orvanne", "Quillmoor"]);
  });

  it("re-places population cells in a new version when districts are replaced, in the same transaction", async () => {
    app.signInAs("planner");
    const districtsId = await idOf(await createLayer("districts", "districts-ok.geojson", "Districts"));
    const populationId = await idOf(await createLayer("population", "population-no-district.csv", "Cells"));
    const byColumn = await idOf(await createLayer("population", "population-ok.csv", "Cells by column"));

    // New boundaries: one district covering everything the fixture's cells occupy.
    const wide = {
      type: "FeatureCollection",
      features: [{ type: "Feature", properties: { name: "Greater Orvanne" }, geometry: { type: "Polygon", coordinates: [[[-126.4, -47], [-126, -47], [-126, -46.8], [-126.4, -46.8], [-126.4, -47]]] } }],
    };
    const response = await addVersionRoute(upload(`/api/layers/${districtsId}/versions`, { format: "geojson", fileName: "wide.geojson" }, Buffer.from(JSON.stringify(wide))), layerContext(districtsId));
    expect(response.status).toBe(201);
    const body = (await response.json()) as { reassigned: { layerId: number; number: number }[] };
    // The fixture's own population layer (boundaries, no cells) and ours are re-placed; the column layer is not.
    expect(body.reassigned).toContainEqual({ layerId: populationId, number: 2 });
    expect(body.reassigned.map((r) => r.layerId)).not.toContain(byColumn);

    const versions = await app.db.select().from(layerVersions).where(eq(layerVersions.layerId, populationId)).orderBy(layerVersions.number);
    expect(versions.map((v) => v.number)).toEqual([1, 2]);
    const before = await readGridLayer({ layerVersionId: versions[0].id });
    const after = await readGridLayer({ layerVersionId: versions[1].id });
    expect([...before.district]).toEqual([0, 0, 1, 1, -1]);
    expect([...after.district]).toEqual([0, 0, 0, 0, 0]);
    expect(after.districtNames).toEqual(["Greater Orvanne"]);
    expect([...after.value]).toEqual([...before.value]);
    expect(versions[1].summary).toMatchObject({ copiedFromVersion: 1, districtSource: "boundaries", peopleWithoutDistrict: 0 });
  });

  it("draws a version on the map as thinned GeoJSON with its provenance and the caution", async () => {
    app.signInAs("planner");
    const layerId = await idOf(await createLayer("facilities", "facilities-ok.geojson", "Facilities"));
    app.signInAs("trainer");
    const response = await featuresRoute(new Request("http://leeway.test"), { params: Promise.resolve({ layerId: String(layerId), number: "1" }) });
    const features = layerFeaturesSchema.parse(await response.json());
    expect(features.features.map((f) => f.geometry.type)).toEqual(["Point", "Point", "Point", "LineString"]);
    expect(features.provenance).toContain('Layer "Facilities" version 1 from facilities-ok.geojson, uploaded by Fixture planner');
    expect(features.caution).toContain("planning estimates");
  });
});

describe("listing, renaming and deleting layers", () => {
  it("lists layers for roles that may see them and refuses council", async () => {
    app.signInAs("trainer");
    const list = layerListSchema.parse(await (await listRoute(new Request("http://leeway.test"), none)).json());
    expect(list.layers.map((l) => l.name)).toEqual(["Fixture population"]);
    expect(list.layers[0].latest.description).toBe("12,345 people");
    app.signInAs("council");
    expect((await listRoute(new Request("http://leeway.test"), none)).status).toBe(403);
  });

  it("renames a layer, refusing an empty name and a trainer", async () => {
    const layerId = (await app.db.select().from(layers))[0].id;
    const rename = (name: unknown) =>
      renameLayerRoute(new Request("http://leeway.test", { method: "PATCH", body: JSON.stringify({ name }) }), layerContext(layerId));
    app.signInAs("trainer");
    expect((await rename("Trainer's name")).status).toBe(403);
    app.signInAs("planner");
    const empty = await rename("  ");
    expect(empty.status).toBe(400);
    expect((await errorOf(empty)).issues?.[0]).toEqual({ path: "name", message: "is required" });
    expect((await rename("Harbour population")).status).toBe(200);
    expect((await app.db.select().from(layers))[0].name).toBe("Harbour population");
  });

  it("refuses to delete a layer a published or shared scenario version uses (409) and deletes it once none does", async () => {
    app.signInAs("planner");
    const layerId = (await app.db.select().from(layers))[0].id;
    const before = await contentCounts();
    const refused = await deleteLayerRoute(new Request("http://leeway.test", { method: "DELETE" }), layerContext(layerId));
    expect(refused.status).toBe(409);
    expect((await errorOf(refused)).message).toContain('"Harbour test" version 2 (shared for exercises)');
    expect(await contentCounts()).toEqual(before);

    await app.db.update(scenarioVersions).set({ state: "draft" });
    const deleted = await deleteLayerRoute(new Request("http://leeway.test", { method: "DELETE" }), layerContext(layerId));
    expect(deleted.status).toBe(204);
    expect(await app.count("layers")).toBe(0);
    expect(await app.count("layer_versions")).toBe(0);
  });

  it("deletes every version's contents with the layer", async () => {
    app.signInAs("planner");
    const created = await createLayer("population", "population-ok.csv", "Short-lived");
    const { layer } = (await created.json()) as { layer: { id: number } };
    expect(await app.count("grid_chunks")).toBe(1);
    expect((await deleteLayerRoute(new Request("http://leeway.test", { method: "DELETE" }), layerContext(layer.id))).status).toBe(204);
    expect(await app.count("grid_chunks")).toBe(0);
  });
});
