// Contours and blind zone as RFC 7946 GeoJSON (issue 9): positions are [longitude, latitude]
// (RFC 7946 §3.1.1), rings are closed (§3.1.6: first and last positions equivalent), outer rings
// run counter-clockwise and holes clockwise (§3.1.6), and every feature names its units and breaks.
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { CAUTION } from "@/lib/caution";
import { buildContoursExport, type ContoursExport } from "@/lib/exports/contours-geojson";
import { computeGrid, describeProvenance, traceContours } from "@/lib/geo";
import { parseScenario } from "@/lib/scenario/schema";

const file = JSON.parse(readFileSync(path.resolve(__dirname, "../../fixtures/engine/batch/b-homogeneous.json"), "utf8"));
const parsed = parseScenario(file);
if (!parsed.ok) throw new Error("fixture scenario is invalid");
const scenario = parsed.scenario;
const [west, south, east, north] = scenario.area.bbox;

function exportOf(): ContoursExport {
  const { grid, provenance, notes } = computeGrid(scenario, { computedAt: "2026-01-01T00:00:00Z" });
  return buildContoursExport(traceContours(grid), {
    warningBreaksS: grid.warningBreaksS,
    intensityScale: grid.intensityScale,
    intensityClassLowerBounds: grid.intensityClassLowerBounds,
    channel: grid.channels[0].id,
    caution: CAUTION,
    provenance,
    howItWasMade: describeProvenance(provenance),
    notes,
  });
}

/** Twice the signed area in the lon/lat plane (shoelace): positive for counter-clockwise. */
function signedArea(ring: [number, number][]): number {
  let sum = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) sum += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return sum;
}

function inside(ring: [number, number][], [x, y]: [number, number]): boolean {
  let hit = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) hit = !hit;
  }
  return hit;
}

describe("the contours GeoJSON export", () => {
  const collection = exportOf();

  it("is a FeatureCollection of MultiPolygons carrying the caution and how it was made", () => {
    expect(collection.type).toBe("FeatureCollection");
    expect(collection.caution).toBe(CAUTION);
    expect(collection.howItWasMade).toMatch(/^Leeway /);
    expect(collection.features.length).toBeGreaterThan(3);
    for (const f of collection.features) expect(f.geometry.type).toBe("MultiPolygon");
    // Round-trips through JSON as RFC 7946 requires plain numbers, no typed arrays.
    expect(JSON.parse(JSON.stringify(collection))).toEqual(collection);
  });

  it("writes [longitude, latitude]: every position lies in the scenario area, whose longitude and latitude ranges do not overlap", () => {
    // The area spans lon −131.5..−128.7 and lat −41..−39: a swapped pair would fall outside both.
    for (const f of collection.features) {
      for (const polygon of f.geometry.coordinates) {
        for (const ring of polygon) {
          for (const [lon, lat] of ring) {
            expect(lon).toBeGreaterThanOrEqual(west);
            expect(lon).toBeLessThanOrEqual(east);
            expect(lat).toBeGreaterThanOrEqual(south);
            expect(lat).toBeLessThanOrEqual(north);
          }
        }
      }
    }
  });

  it("closes every ring, runs outer rings counter-clockwise and holes clockwise (RFC 7946 §3.1.6)", () => {
    let outers = 0;
    let holes = 0;
    for (const f of collection.features) {
      for (const [outer, ...inner] of f.geometry.coordinates) {
        for (const ring of [outer, ...inner]) {
          expect(ring.length).toBeGreaterThanOrEqual(4);
          expect(ring[ring.length - 1]).toEqual(ring[0]);
        }
        expect(signedArea(outer)).toBeGreaterThan(0);
        outers++;
        for (const ring of inner) {
          expect(signedArea(ring)).toBeLessThan(0);
          holes++;
        }
      }
    }
    expect(outers).toBeGreaterThan(0);
    // Warning bands around a blind zone are rings with holes, so both orientations are exercised.
    expect(holes).toBeGreaterThan(0);
  });

  it("names units and breaks on each feature", () => {
    const warning = collection.features.filter((f) => f.properties.layer === "warning");
    expect(warning.length).toBeGreaterThan(0);
    for (const f of warning) {
      expect(f.properties.units).toBe("s");
      expect(f.properties.breaksS).toEqual([0, 5, 10, 20, 30, 60]);
      expect(f.properties.channel).toBe("cell-broadcast");
    }
    for (const f of collection.features.filter((g) => g.properties.layer === "intensity")) {
      expect(f.properties.units).toMatch(/^jma intensity/);
      expect(f.properties.breaks).toEqual([0.5, 1.5, 2.5, 3.5, 4.5, 5.0, 5.5, 6.0, 6.5]);
    }
    const blind = collection.features.filter((f) => f.properties.layer === "blind-zone");
    expect(blind).toHaveLength(1);
    expect(blind[0].properties.upperS).toBe(0);
  });

  it("puts the epicentre inside the blind zone (shaking there always arrives before any alert)", () => {
    const blind = collection.features.find((f) => f.properties.layer === "blind-zone");
    const epicentre: [number, number] = [scenario.source.lon, scenario.source.lat];
    expect(blind?.geometry.coordinates.some(([outer]) => inside(outer, epicentre))).toBe(true);
  });
});
