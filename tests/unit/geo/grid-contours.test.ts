import * as turf from "@turf/turf";
import { describe, expect, it } from "vitest";
import { traceContours, mergeContours, type ContourSet } from "@/lib/geo/contours";
import { computeGrid, resolveGridGeometry, summarizeGrid } from "@/lib/geo/grid";
import { computeSites } from "@/lib/geo/sites";
import { homogeneousScenario, scenarioFrom } from "../../verification/scenario-fixtures";

const scenario = homogeneousScenario({ depthKm: 12, mw: 6.9, stationKm: [10, 18, 30] });
const result = computeGrid(scenario, { cellKm: 2 });
const contours = traceContours(result.grid);

function signedArea(ring: number[][]): number {
  let sum = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) sum += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return sum / 2;
}

function allPolygons(set: ContourSet) {
  return mergeContours(set).features.flatMap((f) => f.geometry.coordinates);
}

describe("contours as RFC 7946 GeoJSON", () => {
  it("outer rings are counter-clockwise, holes clockwise, rings closed (RFC 7946 §3.1.6)", () => {
    const polygons = allPolygons(contours);
    expect(polygons.length).toBeGreaterThan(5);
    for (const [outer, ...holes] of polygons) {
      expect(signedArea(outer)).toBeGreaterThan(0);
      for (const hole of holes) expect(signedArea(hole)).toBeLessThan(0);
      for (const ring of [outer, ...holes]) expect(ring[0]).toEqual(ring[ring.length - 1]);
    }
  });

  it("warning bands and the blind zone tile the area (their areas add up to the box's)", () => {
    const bandsKm2 = [...contours.warning.features, ...contours.blindZone.features].reduce((sum, f) => sum + turf.area(f) / 1e6, 0);
    const boxKm2 = turf.area(turf.bboxPolygon(result.grid.bbox)) / 1e6;
    expect(Math.abs(bandsKm2 - boxKm2) / boxKm2).toBeLessThan(1e-3);
    const classesKm2 = contours.intensity.features.reduce((sum, f) => sum + turf.area(f) / 1e6, 0);
    expect(Math.abs(classesKm2 - boxKm2) / boxKm2).toBeLessThan(1e-3);
  });

  it("a cell lies in the band (a, b] that holds its warning seconds, and in its intensity class", () => {
    const { grid } = result;
    let checked = 0;
    for (let i = 0; i < grid.width * grid.height; i += 97) {
      const w = grid.warningS[i];
      // Skip cells within 0.5 s of a break: the contour passes between cell centres there.
      if (grid.warningBreaksS.some((b) => Math.abs(w - b) < 0.5)) continue;
      const point = turf.point([grid.lonDeg[i % grid.width], grid.latDeg[Math.floor(i / grid.width)]]);
      const containing = [...contours.warning.features, ...contours.blindZone.features].filter((f) => turf.booleanPointInPolygon(point, f.geometry));
      expect(containing).toHaveLength(1);
      const p = containing[0].properties;
      if (p.layer === "blind-zone") expect(w).toBeLessThanOrEqual(0);
      else {
        expect(w).toBeGreaterThan(p.lowerS ?? -Infinity);
        expect(w).toBeLessThanOrEqual(p.upperS ?? Infinity);
      }
      checked++;
    }
    expect(checked).toBeGreaterThan(50);
  });

  it("the alert area covers the alerted cells", () => {
    const { grid } = result;
    const [area] = contours.alertArea.features;
    let alertedKm2 = 0;
    for (let i = 0; i < grid.alerted.length; i++) if (grid.alerted[i]) alertedKm2 += grid.cellAreaKm2[Math.floor(i / grid.width)];
    expect(Math.abs(turf.area(area) / 1e6 - alertedKm2) / alertedKm2).toBeLessThan(0.03);
  });
});

describe("grids", () => {
  it("a cell centre gets the site values (GeographicLib vs Lambert distances: 1e-4 relative)", () => {
    const { grid } = result;
    const column = 37;
    const row = 21;
    const i = row * grid.width + column;
    const [site] = computeSites(scenario, [{ id: "cell", lon: grid.lonDeg[column], lat: grid.latDeg[row] }]).sites;
    expect(grid.sArrivalS[i]).toBeCloseTo(site.sArrivalS, 3);
    expect(grid.warningS[i]).toBeCloseTo(site.warningS ?? Number.NaN, 3);
    expect(Math.abs(grid.pgvCms[i] - site.pgvCms) / site.pgvCms).toBeLessThan(1e-4);
    expect(grid.alerted[i]).toBe(site.alerted ? 1 : 0);
  });

  it("the streaming summary equals the summary of the kept grid", () => {
    expect(summarizeGrid(scenario, { cellKm: 2 }).summary).toEqual(result.summary);
  });

  it("the same scenario twice gives identical arrays", () => {
    const again = computeGrid(scenario, { cellKm: 2 }).grid;
    expect(Buffer.from(again.warningS.buffer).equals(Buffer.from(result.grid.warningS.buffer))).toBe(true);
    expect(Buffer.from(again.intensity.buffer).equals(Buffer.from(result.grid.intensity.buffer))).toBe(true);
  });

  it("enlarges cells to stay within maxCells", () => {
    const geometry = resolveGridGeometry(scenario, { cellKm: 0.5, maxCells: 40_000 });
    expect(geometry.width * geometry.height).toBeLessThanOrEqual(40_000);
    expect(geometry.width * geometry.height).toBeGreaterThan(30_000);
  });

  it("crosses the antimeridian: an area from 179° to 181° is symmetric about a source on 180°", () => {
    const crossing = scenarioFrom({
      version: 1,
      source: { lon: 180, lat: -30, depthKm: 10, mw: 6.5, faultType: "crustal" },
      stations: [
        { id: "W", lon: 179.9, lat: -30 },
        { id: "E", lon: -179.9, lat: -30 },
      ],
      vs30: 500,
      area: { bbox: [179, -30.5, 181, -29.5], cellKm: 5 },
    });
    const { grid } = computeGrid(crossing);
    const middle = Math.floor(grid.height / 2) * grid.width;
    expect(grid.warningS[middle]).toBeCloseTo(grid.warningS[middle + grid.width - 1], 3);
    const lons = traceContours(grid).warning.features.flatMap((f) => f.geometry.coordinates.flat(2).map(([lon]) => lon));
    expect(Math.max(...lons)).toBeGreaterThan(180);
  });
});
