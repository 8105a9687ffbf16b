import { booleanPointInPolygon, point } from "@turf/turf";
import type { MultiPolygon, Polygon } from "geojson";
import { describe, expect, it } from "vitest";
import { assignDistricts } from "@/lib/layers/assign-districts";
import { readDistrictsGeojson } from "@/lib/layers/geojson-layers";
import { fixtureText } from "./fixtures";

/** A small deterministic generator (mulberry32) so the sample points are the same on every run. */
function random(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A star-shaped district with a hole: many edges and concave corners, centred on lon0, lat0. */
function starWithHole(lon0: number, lat0: number): Polygon {
  const outer = Array.from({ length: 41 }, (_, i) => {
    const angle = ((i % 40) / 40) * 2 * Math.PI;
    const r = i % 2 ? 0.05 : 0.12;
    return [lon0 + r * Math.cos(angle), lat0 + r * Math.sin(angle)];
  });
  const hole = Array.from({ length: 13 }, (_, i) => {
    const angle = -((i % 12) / 12) * 2 * Math.PI;
    return [lon0 + 0.02 * Math.cos(angle), lat0 + 0.02 * Math.sin(angle)];
  });
  return { type: "Polygon", coordinates: [outer, hole] };
}

describe("assignDistricts", () => {
  it("places the fixture cells as read off the fixture's corners by hand", async () => {
    const { districts } = await readDistrictsGeojson(fixtureText("districts-ok.geojson"));
    // Orvanne spans lon −126.25…−126.15, Quillmoor −126.15…−126.05 plus −126.04…−126.00 (lat −46.95…−46.91).
    const lon = Float64Array.from([-126.22, -126.16, -126.12, -126.02, -126.02, -126.3]);
    const lat = Float64Array.from([-46.9, -46.9, -46.88, -46.93, -46.89, -46.9]);
    expect([...assignDistricts(lon, lat, districts)]).toEqual([0, 0, 1, 1, -1, -1]);
  });

  it("puts a point on an edge shared by two districts in exactly one of them", async () => {
    const { districts } = await readDistrictsGeojson(fixtureText("districts-ok.geojson"));
    const onEdge = assignDistricts(Float64Array.from([-126.15]), Float64Array.from([-46.9]), districts);
    expect([0, 1]).toContain(onEdge[0]);
  });

  it("agrees with turf's booleanPointInPolygon on 20,000 random points (concave outlines, holes, a MultiPolygon)", () => {
    const star = starWithHole(-126.2, -46.9);
    const pair: MultiPolygon = { type: "MultiPolygon", coordinates: [starWithHole(-125.9, -46.9).coordinates, starWithHole(-125.9, -46.6).coordinates] };
    const districts = [{ geometry: star }, { geometry: pair }];
    const next = random(7);
    const n = 20_000;
    const lon = Float64Array.from({ length: n }, () => -126.4 + next() * 0.7);
    const lat = Float64Array.from({ length: n }, () => -47.1 + next() * 0.7);

    const ours = assignDistricts(lon, lat, districts);
    let disagreements = 0;
    let inside = 0;
    for (let i = 0; i < n; i++) {
      const p = point([lon[i], lat[i]]);
      const expected = booleanPointInPolygon(p, star) ? 0 : booleanPointInPolygon(p, pair) ? 1 : -1;
      if (expected !== ours[i]) disagreements += 1;
      if (expected >= 0) inside += 1;
    }
    expect(inside).toBeGreaterThan(1000);
    expect(disagreements).toBe(0);
  });
});
