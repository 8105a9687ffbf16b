import { describe, expect, it } from "vitest";
import { readDistrictsGeojson, readFacilitiesGeojson } from "@/lib/layers/geojson-layers";
import { fixtureText, refusal } from "./fixtures";


function collection(features: unknown[]): string {
  return JSON.stringify({ type: "FeatureCollection", features });
}

const square = [[[-126.25, -46.95], [-126.15, -46.95], [-126.15, -46.85], [-126.25, -46.85], [-126.25, -46.95]]];

describe("district boundaries", () => {
  it("reads Polygons and MultiPolygons with names", async () => {
    const layer = await readDistrictsGeojson(fixtureText("districts-ok.geojson"));
    expect(layer.districts.map((d) => [d.name, d.geometry.type])).toEqual([
      ["Orvanne", "Polygon"],
      ["Quillmoor", "MultiPolygon"],
    ]);
    expect(layer.bbox).toEqual([-126.25, -46.95, -126, -46.85]);
  });

  it("refuses a self-intersecting polygon (a bow-tie crossing at its centre, -126.1, -46.9)", async () => {
    const error = await refusal(readDistrictsGeojson(fixtureText("districts-self-intersecting.geojson")));
    expect(error.issues).toEqual([{ path: 'feature 2 ("Bowtie Flats"), geometry', message: "crosses itself at 1 point, near [-126.1, -46.9]" }]);
  });

  it("refuses a hole that crosses its outline", async () => {
    const hole = [[-126.2, -46.9], [-126.1, -46.9], [-126.1, -46.88], [-126.2, -46.88], [-126.2, -46.9]];
    const error = await refusal(readDistrictsGeojson(collection([{ type: "Feature", properties: { name: "Holed" }, geometry: { type: "Polygon", coordinates: [...square, hole] } }])));
    expect(error.issues[0].message).toMatch(/^crosses itself at 2 points/);
  });

  it("does not count a repeated corner as a crossing", async () => {
    const repeated = [[square[0][0], square[0][1], square[0][1], ...square[0].slice(2)]];
    const layer = await readDistrictsGeojson(collection([{ type: "Feature", properties: { name: "Doubled corner" }, geometry: { type: "Polygon", coordinates: repeated } }]));
    expect(layer.districts).toHaveLength(1);
  });

  it("refuses a ring that is not closed", async () => {
    const error = await refusal(readDistrictsGeojson(fixtureText("districts-open-ring.geojson")));
    expect(error.issues[0].path).toBe('feature 1 ("Orvanne"), ring 1');
    expect(error.issues[0].message).toMatch(/^is not closed/);
  });

  it("recognises [lat, lon] order and says GeoJSON puts longitude first (RFC 7946 §3.1.1)", async () => {
    const error = await refusal(readDistrictsGeojson(fixtureText("districts-lat-lon-swapped.geojson")));
    expect(error.issues[0]).toEqual({
      path: 'feature 1 ("Orvanne"), ring 1, position 1',
      message: "latitude -126.25 is beyond ±90: the position looks like [lat, lon], but GeoJSON puts longitude first",
    });
    expect(error.issueCount).toBe(5);
  });

  it("refuses a longitude beyond ±180, a missing name, a repeated name and a Point", async () => {
    const far = [[[190, -46.9], [191, -46.9], [191, -46.8], [190, -46.9]]];
    const error = await refusal(
      readDistrictsGeojson(
        collection([
          { type: "Feature", properties: { name: "Far" }, geometry: { type: "Polygon", coordinates: far } },
          { type: "Feature", properties: {}, geometry: { type: "Polygon", coordinates: square } },
          { type: "Feature", properties: { name: "Orvanne" }, geometry: { type: "Polygon", coordinates: square } },
          { type: "Feature", properties: { name: "Orvanne" }, geometry: { type: "Polygon", coordinates: square } },
          { type: "Feature", properties: { name: "Dot" }, geometry: { type: "Point", coordinates: [-126.2, -46.9] } },
        ]),
      ),
    );
    expect(error.issues).toEqual([
      { path: 'feature 1 ("Far"), ring 1, position 1', message: "longitude 190 is beyond ±180" },
      { path: 'feature 1 ("Far"), ring 1, position 2', message: "longitude 191 is beyond ±180" },
      { path: 'feature 1 ("Far"), ring 1, position 3', message: "longitude 191 is beyond ±180" },
      { path: 'feature 1 ("Far"), ring 1, position 4', message: "longitude 190 is beyond ±180" },
      { path: "feature 2, properties.name", message: "is missing; every feature needs a name" },
      { path: 'feature 4 ("Orvanne"), properties.name', message: '"Orvanne" is already the name of feature 3; district names must be unique' },
      { path: 'feature 5 ("Dot"), geometry', message: 'must be a Polygon or MultiPolygon, not "Point"' },
    ]);
  });

  it("refuses an empty file, text that is not JSON, and JSON that is not a FeatureCollection", async () => {
    expect((await refusal(readDistrictsGeojson(""))).message).toMatch(/^The file is empty\./);
    expect((await refusal(readDistrictsGeojson("{ not json"))).message).toMatch(/^The file is not valid JSON/);
    expect((await refusal(readDistrictsGeojson('{"type":"Feature"}'))).message).toContain("not a GeoJSON FeatureCollection");
    expect((await refusal(readDistrictsGeojson(collection([])))).message).toContain("no features");
  });
});

describe("facilities GeoJSON", () => {
  it("reads points by kind and rail segments as LineStrings", async () => {
    const layer = await readFacilitiesGeojson(fixtureText("facilities-ok.geojson"));
    expect(layer.facilities.map((f) => [f.kind, f.geometry.type])).toEqual([
      ["school", "Point"],
      ["hospital", "Point"],
      ["care-home", "Point"],
      ["rail", "LineString"],
    ]);
  });

  it("refuses a point without a kind, a rail point, a MultiLineString and a one-point line", async () => {
    const error = await refusal(
      readFacilitiesGeojson(
        collection([
          { type: "Feature", properties: { name: "No kind" }, geometry: { type: "Point", coordinates: [-126.2, -46.9] } },
          { type: "Feature", properties: { name: "Halt", kind: "rail" }, geometry: { type: "Point", coordinates: [-126.2, -46.9] } },
          { type: "Feature", properties: { name: "Branch" }, geometry: { type: "MultiLineString", coordinates: [[[-126.2, -46.9], [-126.1, -46.9]]] } },
          { type: "Feature", properties: { name: "Stub" }, geometry: { type: "LineString", coordinates: [[-126.2, -46.9]] } },
        ]),
      ),
    );
    expect(error.issues.map((i) => i.path)).toEqual([
      'feature 1 ("No kind"), properties.kind',
      'feature 2 ("Halt"), properties.kind',
      'feature 3 ("Branch"), geometry',
      'feature 4 ("Stub"), line',
    ]);
    expect(error.issues[3].message).toBe("has 1 positions; at least 2 are needed");
  });
});

describe("display features", () => {
  it("merges a large grid into bins that keep every person and the grid's outline", async () => {
    const { toDisplayFeatures } = await import("@/lib/layers/display-features");
    const n = 120_000;
    const lon = Float64Array.from({ length: n }, (_, i) => -126.4 + (i % 250) * 0.002);
    const lat = Float64Array.from({ length: n }, (_, i) => -47.1 + Math.floor(i / 250) * 0.002);
    const people = Float64Array.from({ length: n }, (_, i) => (i % 40) + 1);
    const drawn = toDisplayFeatures({ kind: "population", lon, lat, people, fileDistricts: null }, { maxPoints: 4000 });
    expect(drawn.features.length).toBeLessThanOrEqual(4000);
    // Conservation: sum over i of (i mod 40) + 1 for 120,000 = 3,000 full cycles of 1..40 = 3,000 × 820.
    expect(drawn.features.reduce((total, f) => total + (f.properties.value ?? 0), 0)).toBeCloseTo(3000 * 820, 6);
    const xs = drawn.features.map((f) => (f.geometry as { coordinates: number[] }).coordinates[0]);
    // Bin centres reach within one bin (≈ 0.5° / 40 columns) of both edges.
    expect(Math.min(...xs)).toBeLessThan(-126.4 + 0.02);
    expect(Math.max(...xs)).toBeGreaterThan(-126.4 + 249 * 0.002 - 0.02);
  });
});
