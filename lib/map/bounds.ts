/** [west, south, east, north], degrees. */
export type Bounds = [number, number, number, number];

/** The smallest bounds holding `bounds` and every point (lon, lat in degrees); no wrapping across the antimeridian. */
export function extendBounds(bounds: Bounds, points: readonly { lon: number; lat: number }[]): Bounds {
  let [west, south, east, north] = bounds;
  for (const p of points) {
    west = Math.min(west, p.lon);
    south = Math.min(south, p.lat);
    east = Math.max(east, p.lon);
    north = Math.max(north, p.lat);
  }
  return [west, south, east, north];
}
