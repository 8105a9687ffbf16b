import type { KmPoint } from "./frame";
import { uniform, type Random } from "./prng";

/** Vertices on the coastline: one every 0.25° of bearing from the island's centre, ≈ 0.4–0.7 km apart. */
export const COAST_VERTEX_COUNT = 1440;

/** Half-lengths of the island's base ellipse, km, and the math angle of its long axis (70° from east = 20° east of north). */
const SEMI_MAJOR_KM = 158;
const SEMI_MINOR_KM = 96;
const LONG_AXIS_RAD = (70 * Math.PI) / 180;

/** Harbour bays: bearing (math angle, degrees), depth as a fraction of the radius, half-width in degrees. */
const BAYS = [
  { thetaDeg: 330, depth: 0.12, halfWidthDeg: 3.5 },
  { thetaDeg: 170, depth: 0.08, halfWidthDeg: 4.5 },
  { thetaDeg: 280, depth: 0.06, halfWidthDeg: 3 },
] as const;

const TWO_PI = 2 * Math.PI;
const STEP_RAD = TWO_PI / COAST_VERTEX_COUNT;

function angularGap(a: number, b: number): number {
  const d = Math.abs(a - b) % TWO_PI;
  return Math.min(d, TWO_PI - d);
}

/**
 * The island's outline: a polygon that is star-shaped about the plane's origin, with its vertices at
 * evenly spaced bearings. That shape makes every question about it O(1): the ray from the origin at a
 * bearing crosses exactly one edge.
 */
export class Coastline {
  /** The outer ring, counter-clockwise (RFC 7946 order), not closed. */
  readonly verticesKm: readonly KmPoint[];

  constructor(random: Random) {
    // Low harmonics give headlands and gulfs, high ones a kilometre-scale ragged shore; amplitudes fall
    // with the harmonic number as coastlines do (a rough power law, common practice, no source).
    const harmonics: { k: number; amplitude: number; phase: number }[] = [];
    for (let k = 2; k <= 12; k++) harmonics.push({ k, amplitude: 0.13 * Math.pow(k, -1.1) * uniform(random, 0.4, 1), phase: uniform(random, 0, TWO_PI) });
    for (let k = 13; k <= 160; k++) harmonics.push({ k, amplitude: 0.022 * Math.pow(k / 13, -1.5) * uniform(random, 0.2, 1), phase: uniform(random, 0, TWO_PI) });

    const vertices: KmPoint[] = [];
    for (let i = 0; i < COAST_VERTEX_COUNT; i++) {
      const theta = i * STEP_RAD;
      const along = theta - LONG_AXIS_RAD;
      const ellipseKm = (SEMI_MAJOR_KM * SEMI_MINOR_KM) / Math.hypot(SEMI_MINOR_KM * Math.cos(along), SEMI_MAJOR_KM * Math.sin(along));
      let factor = 1;
      for (const h of harmonics) factor += h.amplitude * Math.cos(h.k * theta + h.phase);
      for (const bay of BAYS) {
        const gap = angularGap(theta, (bay.thetaDeg * Math.PI) / 180) / ((bay.halfWidthDeg * Math.PI) / 180);
        factor -= bay.depth * Math.exp(-gap * gap);
      }
      const radiusKm = ellipseKm * factor;
      vertices.push([radiusKm * Math.cos(theta), radiusKm * Math.sin(theta)]);
    }
    this.verticesKm = vertices;
  }

  private edgeAt(thetaRad: number): [KmPoint, KmPoint] {
    const normalized = ((thetaRad % TWO_PI) + TWO_PI) % TWO_PI;
    const i = Math.min(COAST_VERTEX_COUNT - 1, Math.floor(normalized / STEP_RAD));
    return [this.verticesKm[i], this.verticesKm[(i + 1) % COAST_VERTEX_COUNT]];
  }

  /** Distance from the origin to the shore along the bearing `thetaRad` (math angle, radians from east), km. */
  radiusKm(thetaRad: number): number {
    const [a, b] = this.edgeAt(thetaRad);
    const dx = Math.cos(thetaRad);
    const dy = Math.sin(thetaRad);
    // Ray origin + t·(dx, dy) meets the edge a + s·(b − a): solve the 2 × 2 system for t.
    const ex = b[0] - a[0];
    const ey = b[1] - a[1];
    return (a[0] * ey - a[1] * ex) / (dx * ey - dy * ex);
  }

  /** Whether a point of the plane lies inside the coastline. */
  contains(point: KmPoint): boolean {
    const [a, b] = this.edgeAt(Math.atan2(point[1], point[0]));
    return (b[0] - a[0]) * (point[1] - a[1]) - (b[1] - a[1]) * (point[0] - a[0]) > 0;
  }

  /** The point at `fraction` of the way from the origin to the shore along the bearing `thetaDeg` (math angle, degrees). */
  pointAt(thetaDeg: number, fraction: number): [number, number] {
    const theta = (thetaDeg * Math.PI) / 180;
    const r = this.radiusKm(theta) * fraction;
    return [r * Math.cos(theta), r * Math.sin(theta)];
  }

  /** Shortest distance from a point to the shore, km (positive inland and offshore alike). */
  distanceToShoreKm(point: KmPoint): number {
    let best = Infinity;
    const n = this.verticesKm.length;
    for (let i = 0; i < n; i++) {
      const a = this.verticesKm[i];
      const b = this.verticesKm[(i + 1) % n];
      const ex = b[0] - a[0];
      const ey = b[1] - a[1];
      const t = Math.max(0, Math.min(1, ((point[0] - a[0]) * ex + (point[1] - a[1]) * ey) / (ex * ex + ey * ey)));
      const d2 = (point[0] - a[0] - t * ex) ** 2 + (point[1] - a[1] - t * ey) ** 2;
      if (d2 < best) best = d2;
    }
    return Math.sqrt(best);
  }
}
