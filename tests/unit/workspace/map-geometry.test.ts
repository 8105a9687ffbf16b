import { Geodesic } from "geographiclib-geodesic";
import { describe, expect, it } from "vitest";
import { applyDraftAction, type ScenarioDraft } from "@/lib/workspace/draft";
import { dragRuptureEnd, ruptureTraceEnds } from "@/lib/workspace/rupture-trace";
import { populationDensitySquares } from "@/lib/workspace/population-density";
import { PREVIEW_MIN_CELLS_PER_SIDE, previewGrid } from "@/lib/workspace/preview-area";

/** Distance (km) and azimuth (°) by GeographicLib, the reference for every check here. */
function inverse(a: { lon: number; lat: number }, b: { lon: number; lat: number }) {
  const r = Geodesic.WGS84.Inverse(a.lat, a.lon, b.lat, b.lon);
  return { km: (r.s12 ?? NaN) / 1000, azimuthDeg: ((r.azi1 ?? NaN) + 360) % 360 };
}

const EPICENTRE = { lon: -126.2, lat: -46.9 };

const BASE_DRAFT: ScenarioDraft = {
  version: 1,
  source: { ...EPICENTRE, depthKm: 10, mw: 6.9, faultType: "crustal" },
  stations: [{ id: "A", lon: -126.1, lat: -46.9 }],
  vs30: 400,
  area: { bbox: [-127, -47.5, -125.5, -46.3], cellKm: 2 },
};

describe("rupture trace on the ellipsoid (checked with GeographicLib)", () => {
  it("puts a unilateral rupture's start at the epicentre and its end lengthKm along strike", () => {
    const { start, end } = ruptureTraceEnds(EPICENTRE, { strikeDeg: 40, lengthKm: 120, mode: "unilateral" });
    expect(inverse(EPICENTRE, start).km).toBeLessThan(1e-6);
    const toEnd = inverse(start, end);
    expect(toEnd.km).toBeCloseTo(120, 6);
    expect(toEnd.azimuthDeg).toBeCloseTo(40, 6);
  });

  it("centres a bilateral rupture on the epicentre", () => {
    const { start, end } = ruptureTraceEnds(EPICENTRE, { strikeDeg: 300, lengthKm: 80, mode: "bilateral" });
    expect(inverse(EPICENTRE, start).km).toBeCloseTo(40, 6);
    expect(inverse(EPICENTRE, end).km).toBeCloseTo(40, 6);
    expect(inverse(start, end).km).toBeCloseTo(80, 4);
  });

  it("dragging the end keeps the start: length and strike are the start-to-end geodesic", () => {
    const to = { lon: -125.1, lat: -46.2 };
    const moved = dragRuptureEnd("unilateral", "end", EPICENTRE, to)!;
    const reference = inverse(EPICENTRE, to);
    expect(moved.epicentre).toEqual(EPICENTRE);
    expect(moved.lengthKm).toBeCloseTo(reference.km, 3);
    expect(moved.strikeDeg).toBeCloseTo(reference.azimuthDeg, 1);
  });

  it("dragging a bilateral start keeps the end and moves the epicentre to the middle", () => {
    const { end } = ruptureTraceEnds(EPICENTRE, { strikeDeg: 90, lengthKm: 60, mode: "bilateral" });
    const to = { lon: -127.0, lat: -47.2 };
    const moved = dragRuptureEnd("bilateral", "start", end, to)!;
    expect(moved.lengthKm).toBeCloseTo(inverse(to, end).km, 3);
    expect(inverse(moved.epicentre, to).km).toBeCloseTo(moved.lengthKm / 2, 1);
    expect(inverse(moved.epicentre, end).km).toBeCloseTo(moved.lengthKm / 2, 1);
  });

  it("keeps the fixed end through many small steps with rounded form values (no drift)", () => {
    let draft = applyDraftAction(BASE_DRAFT, { type: "set-rupture", rupture: { strikeDeg: 30, dipDeg: 80, lengthKm: 40, mode: "bilateral" } });
    const { start } = ruptureTraceEnds(draft.source, { strikeDeg: 30, lengthKm: 40, mode: "bilateral" });
    for (let i = 1; i <= 30; i++) draft = applyDraftAction(draft, { type: "drag-rupture-end", which: "end", fixed: start, to: { lon: -126.0 + i * 0.003, lat: -46.75 - i * 0.002 } });
    const rupture = draft.source.rupture!;
    const startNow = ruptureTraceEnds(draft.source, { strikeDeg: rupture.strikeDeg, lengthKm: rupture.lengthKm!, mode: "bilateral" }).start;
    // One rounding's worth (length to 0.1 km: 0.05 km; strike to 0.1°: 0.05° over ~25 km ≈ 0.02 km; 4 decimals ≈ 0.01 km), not thirty.
    expect(inverse(startNow, start).km).toBeLessThan(0.1);
  });
});

describe("preview grid", () => {
  const area: [number, number, number, number] = [-128.6, -49, -123.7, -44.9];

  it("has at least 200 cells across the shorter side of the visible part of the area", () => {
    for (const visible of [area, [-127, -47.5, -125.5, -46.5], [-126.3, -47, -126.1, -46.9]] as [number, number, number, number][]) {
      const preview = previewGrid(visible, area);
      expect(Math.min(preview.width, preview.height)).toBeGreaterThanOrEqual(PREVIEW_MIN_CELLS_PER_SIDE);
      expect(preview.maxCells).toBe(preview.width * preview.height);
    }
  });

  it("covers only the part of the view inside the area, and the whole area when none of it is in view", () => {
    expect(previewGrid([-130, -50, -126, -46], area).bbox).toEqual([-128.6, -49, -126, -46]);
    expect(previewGrid([0, 0, 1, 1], area).bbox).toEqual(area);
  });
});

describe("population density squares", () => {
  const bbox: [number, number, number, number] = [-127, -47.5, -125.5, -46.5];
  const points = [
    { lon: -126.5, lat: -47.0, people: 1200 },
    { lon: -126.501, lat: -47.001, people: 800 },
    { lon: -125.6, lat: -46.6, people: 50 },
  ];

  it("keeps every person and gives people per km² of each square", () => {
    const squares = populationDensitySquares(points, bbox, 8);
    const total = squares.features.reduce((sum, f) => sum + f.properties.people, 0);
    expect(total).toBe(2050);
    const dense = squares.features.find((f) => f.properties.people === 2000)!;
    // Area of the square by GeographicLib's polygon area on WGS84 (an outside check of cellAreaKm2).
    const polygon = Geodesic.WGS84.Polygon(false);
    for (const [lon, lat] of dense.geometry.coordinates[0].slice(0, 4)) polygon.AddPoint(lat, lon);
    const areaKm2 = Math.abs(polygon.Compute(false, true).area ?? NaN) / 1e6;
    expect(dense.properties.perKm2).toBeCloseTo(2000 / areaKm2, 0);
  });
});
