import type { MultiPolygon, Polygon, Position } from "geojson";

/** One district's edges, bucketed by latitude band so a point only tests the few edges at its latitude. */
interface DistrictEdges {
  west: number;
  south: number;
  east: number;
  north: number;
  bandHeightDeg: number;
  /** Edge endpoints: x1, y1, x2, y2 per edge. */
  edges: Float64Array;
  /** Band b's edges are bandEdges[bandStart[b] .. bandStart[b + 1]). */
  bandStart: Int32Array;
  bandEdges: Int32Array;
}

/** Edges per band on average; a few keeps each point's test short without many empty bands. */
const EDGES_PER_BAND = 4;

function ringsOf(geometry: Polygon | MultiPolygon): Position[][] {
  return geometry.type === "Polygon" ? geometry.coordinates : geometry.coordinates.flat();
}

function indexDistrict(geometry: Polygon | MultiPolygon): DistrictEdges {
  const rings = ringsOf(geometry);
  const edgeCount = rings.reduce((sum, ring) => sum + Math.max(0, ring.length - 1), 0);
  const edges = new Float64Array(edgeCount * 4);
  let west = Infinity;
  let south = Infinity;
  let east = -Infinity;
  let north = -Infinity;
  let e = 0;
  for (const ring of rings) {
    for (let i = 0; i + 1 < ring.length; i++, e++) {
      const [x1, y1] = ring[i];
      const [x2, y2] = ring[i + 1];
      edges.set([x1, y1, x2, y2], e * 4);
      west = Math.min(west, x1, x2);
      east = Math.max(east, x1, x2);
      south = Math.min(south, y1, y2);
      north = Math.max(north, y1, y2);
    }
  }
  const bandCount = Math.max(1, Math.ceil(edgeCount / EDGES_PER_BAND));
  const bandHeightDeg = (north - south) / bandCount || 1;
  const bandOf = (y: number) => Math.min(bandCount - 1, Math.max(0, Math.floor((y - south) / bandHeightDeg)));

  // Two passes (count, then fill) build a compact band → edges table.
  const counts = new Int32Array(bandCount + 1);
  const eachBand = (edge: number, visit: (band: number) => void) => {
    const y1 = edges[edge * 4 + 1];
    const y2 = edges[edge * 4 + 3];
    for (let b = bandOf(Math.min(y1, y2)); b <= bandOf(Math.max(y1, y2)); b++) visit(b);
  };
  for (let edge = 0; edge < edgeCount; edge++) eachBand(edge, (b) => counts[b + 1]++);
  const bandStart = new Int32Array(bandCount + 1);
  for (let b = 0; b < bandCount; b++) bandStart[b + 1] = bandStart[b] + counts[b + 1];
  const fill = bandStart.slice(0, bandCount);
  const bandEdges = new Int32Array(bandStart[bandCount]);
  for (let edge = 0; edge < edgeCount; edge++) eachBand(edge, (b) => (bandEdges[fill[b]++] = edge));

  return { west, south, east, north, bandHeightDeg, edges, bandStart, bandEdges };
}

/** Even–odd ray casting towards +lon over the edges of the point's band (holes count as outside). */
function contains(d: DistrictEdges, x: number, y: number): boolean {
  if (x < d.west || x > d.east || y < d.south || y > d.north) return false;
  const bandCount = d.bandStart.length - 1;
  const band = Math.min(bandCount - 1, Math.floor((y - d.south) / d.bandHeightDeg));
  let inside = false;
  for (let k = d.bandStart[band]; k < d.bandStart[band + 1]; k++) {
    const o = d.bandEdges[k] * 4;
    const y1 = d.edges[o + 1];
    const y2 = d.edges[o + 3];
    // Half-open in y, strict in x: a point on an edge shared by two districts falls in exactly one.
    if (y1 > y !== y2 > y) {
      const x1 = d.edges[o];
      const xCross = x1 + ((y - y1) * (d.edges[o + 2] - x1)) / (y2 - y1);
      if (x < xCross) inside = !inside;
    }
  }
  return inside;
}

/**
 * The district of each point: the index (in `districts`) of the first outline that contains it,
 * or −1 outside all. Lon/lat in degrees, treated as a plane, as GeoJSON's own containment rules do
 * (RFC 7946 §3.1.1 draws edges as straight lines in lon/lat).
 */
export function assignDistricts(lonDeg: Float64Array, latDeg: Float64Array, districts: readonly { geometry: Polygon | MultiPolygon }[]): Int32Array {
  const indexed = districts.map((d) => indexDistrict(d.geometry));
  const result = new Int32Array(lonDeg.length).fill(-1);
  for (let i = 0; i < lonDeg.length; i++) {
    for (let d = 0; d < indexed.length; d++) {
      if (contains(indexed[d], lonDeg[i], latDeg[i])) {
        result[i] = d;
        break;
      }
    }
  }
  return result;
}
