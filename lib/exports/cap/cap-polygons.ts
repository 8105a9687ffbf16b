/**
 * The alert area as CAP 1.2 `<polygon>` values (§3.3.2 "polygon"): a space-separated list of
 * `latitude,longitude` pairs in WGS 84, at least four pairs, the first equal to the last. CAP has
 * no holes, so each part of the area (each polygon of the GeoJSON MultiPolygon) contributes its
 * outer ring only.
 */

type Position = [number, number];

/** One CAP polygon: its pairs (lat, lon) and the text written into `<polygon>`. */
export interface CapPolygon {
  /** [latitude, longitude] pairs, degrees, first equal to last. */
  pairs: [number, number][];
  text: string;
}

/** Result of `capPolygonsOf`. */
export interface CapPolygons {
  polygons: CapPolygon[];
  /** Holes of the area that a CAP polygon cannot carry (places inside an outer ring that are not alerted). */
  droppedHoles: number;
}

/** Degrees to the 5 decimals (about 1 m) the contours are traced at, without trailing zeros. */
function degreesText(value: number): string {
  return String(Math.round(value * 1e5) / 1e5);
}

/** Longitude in −180..180: contours of areas past the antimeridian keep longitudes above 180. */
function wrapLongitude(lon: number): number {
  return lon > 180 ? lon - 360 : lon;
}

/** A ring as CAP pairs, closed, with repeated points removed. */
function ringPairs(ring: readonly Position[]): [number, number][] {
  const pairs: [number, number][] = [];
  for (const [lon, lat] of ring) {
    const pair: [number, number] = [lat, wrapLongitude(lon)];
    const last = pairs[pairs.length - 1];
    if (!last || last[0] !== pair[0] || last[1] !== pair[1]) pairs.push(pair);
  }
  const [first] = pairs;
  const last = pairs[pairs.length - 1];
  if (first && (first[0] !== last[0] || first[1] !== last[1])) pairs.push([first[0], first[1]]);
  return pairs;
}

/**
 * CAP polygons from the coordinates of a GeoJSON MultiPolygon (RFC 7946: [lon, lat] positions,
 * outer ring first). Rings with fewer than four pairs after closing (no area) are left out.
 */
export function capPolygonsOf(multiPolygon: readonly (readonly (readonly Position[])[])[]): CapPolygons {
  const polygons: CapPolygon[] = [];
  let droppedHoles = 0;
  for (const [outer, ...holes] of multiPolygon) {
    droppedHoles += holes.length;
    if (!outer) continue;
    const pairs = ringPairs(outer);
    if (pairs.length < 4) continue;
    polygons.push({ pairs, text: pairs.map(([lat, lon]) => `${degreesText(lat)},${degreesText(lon)}`).join(" ") });
  }
  return { polygons, droppedHoles };
}
