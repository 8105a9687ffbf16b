import { kinks, multiPolygon, polygon } from "@turf/turf";
import type { MultiPolygon, Polygon, Position } from "geojson";

/** A problem inside one geometry: where (`ring 1, position 5`) and what. */
export interface GeometryProblem {
  at: string;
  message: string;
}

function describe(value: unknown): string {
  return JSON.stringify(value)?.slice(0, 40) ?? String(value);
}

/**
 * Checks one GeoJSON position: two or three finite numbers, longitude first (RFC 7946 §3.1.1).
 * A second number beyond ±90 after a first within ±90 reads as [lat, lon], and the message says so.
 */
export function checkPosition(value: unknown): string | null {
  if (!Array.isArray(value) || value.length < 2 || value.length > 3 || !value.every((n) => typeof n === "number" && Number.isFinite(n))) {
    return `${describe(value)} is not a position [lon, lat]`;
  }
  const [lon, lat] = value as number[];
  if (Math.abs(lat) > 90) {
    return Math.abs(lon) <= 90 && Math.abs(lat) <= 180
      ? `latitude ${lat} is beyond ±90: the position looks like [lat, lon], but GeoJSON puts longitude first`
      : `latitude ${lat} is beyond ±90`;
  }
  if (Math.abs(lon) > 180) return `longitude ${lon} is beyond ±180`;
  return null;
}

/** Checks a list of positions; `prefix` names the ring or line in messages. */
function checkPositions(list: unknown, minimum: number, prefix: string, problems: GeometryProblem[]): list is Position[] {
  if (!Array.isArray(list)) {
    problems.push({ at: prefix, message: "is not a list of positions" });
    return false;
  }
  let valid = true;
  list.forEach((position, i) => {
    const message = checkPosition(position);
    if (message) {
      valid = false;
      problems.push({ at: `${prefix}, position ${i + 1}`, message });
    }
  });
  if (list.length < minimum) {
    problems.push({ at: prefix, message: `has ${list.length} positions; at least ${minimum} are needed` });
    return false;
  }
  return valid;
}

/** Drops a position equal to the one before it: a zero-length edge is harmless but reads as a crossing to `kinks`. */
function withoutRepeats(ring: Position[]): Position[] {
  return ring.filter((p, i) => i === 0 || p[0] !== ring[i - 1][0] || p[1] !== ring[i - 1][1]);
}

/** A linear ring (RFC 7946 §3.1.6): at least four positions, the last equal to the first. */
function checkRing(ring: unknown, prefix: string, problems: GeometryProblem[]): boolean {
  if (!checkPositions(ring, 4, prefix, problems)) return false;
  const first = ring[0];
  const last = ring[ring.length - 1];
  if (first[0] !== last[0] || first[1] !== last[1]) {
    problems.push({ at: prefix, message: `is not closed: it ends at [${last[0]}, ${last[1]}], not at its first position [${first[0]}, ${first[1]}]` });
    return false;
  }
  if (withoutRepeats(ring).length < 4) {
    problems.push({ at: prefix, message: "has fewer than three distinct corners" });
    return false;
  }
  return true;
}

function checkRings(rings: unknown, prefix: string, problems: GeometryProblem[]): boolean {
  if (!Array.isArray(rings) || rings.length === 0) {
    problems.push({ at: prefix || "coordinates", message: "must be a list of rings" });
    return false;
  }
  return rings.map((ring, i) => checkRing(ring, `${prefix}ring ${i + 1}`, problems)).every(Boolean);
}

function checkPolygons(polygons: unknown, problems: GeometryProblem[]): boolean {
  if (!Array.isArray(polygons) || polygons.length === 0) {
    problems.push({ at: "coordinates", message: "must be a list of polygons" });
    return false;
  }
  return polygons.map((rings, i) => checkRings(rings, `polygon ${i + 1}, `, problems)).every(Boolean);
}

/** Where a polygon's edges cross themselves (a bow-tie, or a hole crossing its outline), as positions. */
function crossings(geometry: Polygon | MultiPolygon): Position[] {
  const found =
    geometry.type === "Polygon"
      ? kinks(polygon(geometry.coordinates.map(withoutRepeats)))
      : kinks(multiPolygon(geometry.coordinates.map((rings) => rings.map(withoutRepeats))));
  return found.features.map((point) => point.geometry.coordinates);
}

function round(value: number): number {
  return Math.round(value * 1e5) / 1e5;
}

/**
 * Checks a district outline: a Polygon or MultiPolygon of closed rings with valid positions
 * whose edges do not cross. Returns the problems found (none for a valid outline).
 */
export function checkAreaGeometry(geometry: unknown): GeometryProblem[] {
  const problems: GeometryProblem[] = [];
  const g = geometry as { type?: unknown; coordinates?: unknown } | null;
  if (!g || typeof g !== "object" || (g.type !== "Polygon" && g.type !== "MultiPolygon")) {
    problems.push({ at: "geometry", message: `must be a Polygon or MultiPolygon, not ${g && typeof g === "object" ? describe(g.type) : describe(g)}` });
    return problems;
  }
  const valid = g.type === "Polygon" ? checkRings(g.coordinates, "", problems) : checkPolygons(g.coordinates, problems);
  if (!valid) return problems;

  const crossed = crossings(g as Polygon | MultiPolygon);
  if (crossed.length) {
    const near = crossed.slice(0, 3).map(([lon, lat]) => `[${round(lon)}, ${round(lat)}]`).join(", ");
    problems.push({ at: "geometry", message: `crosses itself at ${crossed.length} point${crossed.length === 1 ? "" : "s"}, near ${near}` });
  }
  return problems;
}

/** Checks a rail segment: a LineString of at least two valid positions. */
export function checkLineGeometry(coordinates: unknown): GeometryProblem[] {
  const problems: GeometryProblem[] = [];
  checkPositions(coordinates, 2, "line", problems);
  return problems;
}

/** Checks a Point's coordinates. */
export function checkPointGeometry(coordinates: unknown): GeometryProblem[] {
  const message = checkPosition(coordinates);
  return message ? [{ at: "position", message }] : [];
}
