import type { Bbox } from "./grid-geometry";

/**
 * The point of a lon/lat box nearest to (lon, lat) in coordinates: latitude clamped, longitude
 * shifted by whole turns to the box's side of the antimeridian and clamped. Exact for points
 * inside; close (to the curvature of meridians) for points outside, which is all the alert
 * decision needs.
 */
export function nearestPointInBbox(lonDeg: number, latDeg: number, bbox: Bbox): [number, number] {
  const [w, s, e, n] = bbox;
  const centre = (w + e) / 2;
  const lon = lonDeg + 360 * Math.round((centre - lonDeg) / 360);
  return [Math.min(e, Math.max(w, lon)), Math.min(n, Math.max(s, latDeg))];
}
