import { featureCollection, intersect, point, polygon, voronoi } from "@turf/turf";
import type { LineString, MultiPolygon, Polygon, Position } from "geojson";
import type { Coastline } from "./coastline";
import { toKm, toLonLat, type KmPoint } from "./frame";
import { DISTRICT_NAMES } from "./names";
import { uniform, type Random } from "./prng";

/** One district: its index in the districts layer (population cells refer to it), name and outline. */
export interface District {
  idx: number;
  name: string;
  /** The district's seed point in the local plane; the district is the land nearer to it than to any other seed. */
  seedKm: KmPoint;
  /** Outline in lon/lat degrees (RFC 7946 ring order). */
  geometry: Polygon | MultiPolygon;
}

/** Seeds on two rings (bearing as math angle in degrees, fraction of the way to the shore), four inner and eight outer. */
const SEED_RINGS = [
  { count: 4, shoreFraction: 0.36, firstThetaDeg: 25 },
  { count: 8, shoreFraction: 0.76, firstThetaDeg: 0 },
] as const;

function ringsToLonLat(rings: Position[][]): Position[][] {
  return rings.map((ring) => ring.map(([x, y]) => toLonLat([x, y])));
}

/**
 * Cuts the island into districts: the Voronoi cells of twelve seeds (drawn in the local plane, where
 * distances are kilometres) clipped to the coastline, so the districts tile the land with no gap or overlap.
 */
export function buildDistricts(coast: Coastline, random: Random): District[] {
  const seeds: KmPoint[] = [];
  for (const ring of SEED_RINGS) {
    for (let i = 0; i < ring.count; i++) {
      const thetaDeg = ring.firstThetaDeg + (360 * i) / ring.count + uniform(random, -8, 8);
      seeds.push(coast.pointAt(thetaDeg, ring.shoreFraction + uniform(random, -0.05, 0.05)));
    }
  }
  if (seeds.length !== DISTRICT_NAMES.length) throw new Error("one district name per seed");

  const landRing: Position[] = [...coast.verticesKm, coast.verticesKm[0]].map(([x, y]) => [x, y]);
  const land = polygon([landRing]);
  const cells = voronoi(featureCollection(seeds.map(([x, y]) => point([x, y]))), { bbox: [-1000, -1000, 1000, 1000] });

  return seeds.map((seedKm, idx) => {
    const cell = cells.features[idx];
    const clipped = cell ? intersect(featureCollection<Polygon | MultiPolygon>([cell, land])) : null;
    if (!clipped) throw new Error(`district ${DISTRICT_NAMES[idx]} has no land`);
    const g = clipped.geometry;
    const geometry: Polygon | MultiPolygon =
      g.type === "Polygon"
        ? { type: "Polygon", coordinates: ringsToLonLat(g.coordinates) }
        : { type: "MultiPolygon", coordinates: g.coordinates.map(ringsToLonLat) };
    return { idx, name: DISTRICT_NAMES[idx], seedKm, geometry };
  });
}

/** Index of the district a land point falls in: the nearest seed, which is what the Voronoi cells are. */
export function districtIndexAt(districts: readonly District[], p: KmPoint): number {
  let best = -1;
  let bestD2 = Infinity;
  for (const d of districts) {
    const d2 = (d.seedKm[0] - p[0]) ** 2 + (d.seedKm[1] - p[1]) ** 2;
    if (d2 < bestD2) {
      bestD2 = d2;
      best = d.idx;
    }
  }
  return best;
}

/** A ring segment whose midpoint lies this close to the shore is coastline, not a boundary between districts, km. */
const ON_SHORE_KM = 0.05;

/**
 * The lines between districts, each drawn once: the districts' ring segments minus those along the
 * coast, with the segment two neighbours share kept a single time. (Outlining each polygon would draw
 * every shared edge twice, and two dash patterns out of step read as a solid line.)
 */
export function districtBoundaries(districts: readonly District[], coast: Coastline): LineString[] {
  const seen = new Set<string>();
  const lines: LineString[] = [];
  const key = (p: Position) => `${p[0].toFixed(7)},${p[1].toFixed(7)}`;
  for (const d of districts) {
    const polygons = d.geometry.type === "Polygon" ? [d.geometry.coordinates] : d.geometry.coordinates;
    for (const ring of polygons.flatMap((rings) => rings)) {
      for (let i = 1; i < ring.length; i++) {
        const [a, b] = [ring[i - 1], ring[i]];
        const edgeKey = [key(a), key(b)].sort().join("|");
        if (seen.has(edgeKey)) continue;
        seen.add(edgeKey);
        const [ax, ay] = toKm(a[0], a[1]);
        const [bx, by] = toKm(b[0], b[1]);
        if (coast.distanceToShoreKm([(ax + bx) / 2, (ay + by) / 2]) < ON_SHORE_KM) continue;
        lines.push({ type: "LineString", coordinates: [a, b] });
      }
    }
  }
  return lines;
}
