/**
 * The blind zone on a 1 km grid against the closed form for a homogeneous model (METHODS.md §2):
 * a circle of epicentral radius Δ_bz = √((Vs·T)² − h²). Polygon area by GeographicLib's
 * ellipsoidal PolygonArea; vertex distances by GeographicLib's Inverse.
 */
import { Geodesic, PolygonArea } from "geographiclib-geodesic";
import { describe, expect, it } from "vitest";
import { traceContours } from "@/lib/geo/contours";
import { computeGrid } from "@/lib/geo/grid";
import { homogeneousBlindZoneRadiusKm } from "@/lib/geo/warning";
import { EPICENTRE, VP_KMS, VS_KMS, homogeneousScenario } from "./scenario-fixtures";

function ellipsoidalAreaKm2(ring: [number, number][]): number {
  const polygon = new PolygonArea.PolygonArea(Geodesic.WGS84, false);
  for (const [lon, lat] of ring.slice(0, -1)) polygon.AddPoint(lat, lon);
  return Math.abs(polygon.Compute(false, true).area ?? Number.NaN) / 1e6;
}

describe("blind zone (homogeneous closed form)", () => {
  const depthKm = 10;
  const scenario = homogeneousScenario({ depthKm, stationKm: [20, 25, 40] });
  const alertS = Math.hypot(25, depthKm) / VP_KMS + 3 + 4;
  const radiusKm = homogeneousBlindZoneRadiusKm(VS_KMS, depthKm, alertS);
  const closedFormKm2 = Math.PI * radiusKm ** 2;
  const { grid, summary } = computeGrid(scenario, { cellKm: 1 });
  const contours = traceContours(grid);

  it("is one polygon whose area is within 2 % of π·Δ_bz² at 1 km cells", () => {
    const [blind] = contours.blindZone.features;
    expect(blind.geometry.coordinates).toHaveLength(1);
    const [outer, ...holes] = blind.geometry.coordinates[0];
    expect(holes).toHaveLength(0);
    const area = ellipsoidalAreaKm2(outer);
    console.log(`blind zone: radius ${radiusKm.toFixed(2)} km, polygon ${area.toFixed(1)} km² vs ${closedFormKm2.toFixed(1)} km²`);
    expect(Math.abs(area - closedFormKm2) / closedFormKm2).toBeLessThan(0.02);
  });

  it("has every vertex within one cell (1 km) of the circle", () => {
    const outer = contours.blindZone.features[0].geometry.coordinates[0][0];
    let worst = 0;
    for (const [lon, lat] of outer) {
      const d = (Geodesic.WGS84.Inverse(EPICENTRE[1], EPICENTRE[0], lat, lon).s12 ?? Number.NaN) / 1000;
      worst = Math.max(worst, Math.abs(d - radiusKm));
    }
    console.log(`blind zone: largest vertex offset from the circle ${worst.toFixed(3)} km`);
    expect(worst).toBeLessThan(1);
  });

  it("the grid summary's blind-zone area (sum of cells) is within 2 % as well", () => {
    expect(Math.abs(summary.blindZoneAreaKm2 - closedFormKm2) / closedFormKm2).toBeLessThan(0.02);
  });

  it("a later channel has the larger closed-form blind zone", () => {
    const sirens = homogeneousBlindZoneRadiusKm(VS_KMS, depthKm, alertS + 5);
    const area = summary.byChannel[1].blindZoneAreaKm2;
    expect(Math.abs(area - Math.PI * sirens ** 2) / (Math.PI * sirens ** 2)).toBeLessThan(0.02);
  });
});
