/** Distances from a source to a surface site, written by `SourceGeometry.measure`. */
export interface SourceDistances {
  /** Straight-line distance to the hypocentre, km. */
  hypocentralKm: number;
  /** Shortest distance to the rupture (the hypocentre for a point source), km. */
  ruptureKm: number;
  /** Shortest distance to the rupture's surface projection (the epicentre for a point source), km. */
  joynerBooreKm: number;
  /** When the rupture front reaches the rupture point nearest the site, s after origin. */
  ruptureTimeS: number;
  /** Depth of that point, km. */
  nearestDepthKm: number;
  /** Horizontal distance from that point to the site, km. */
  nearestHorizontalKm: number;
}

/** A point source or a finite rupture, seen from surface sites. */
export interface SourceGeometry {
  kind: "point" | "finite";
  /** True when `measure` needs the site's east/north offsets from the epicentre. */
  needsLocalFrame: boolean;
  /** Shallowest and deepest point of the source, km. */
  depthRangeKm: [number, number];
  /**
   * Distances for a surface site `epicentralKm` from the epicentre, at `eastKm`/`northKm` in the
   * epicentre's azimuthal equidistant frame (ignored by a point source).
   */
  measure(epicentralKm: number, eastKm: number, northKm: number, out: SourceDistances): void;
}

/**
 * A blank `SourceDistances` to reuse in loops. Fields start as NaN, not 0, so the engine's hot loops
 * see double fields from the first write on (V8 then updates them in place instead of boxing each value).
 */
export function createSourceDistances(): SourceDistances {
  const nan = Number.NaN;
  return { hypocentralKm: nan, ruptureKm: nan, joynerBooreKm: nan, ruptureTimeS: nan, nearestDepthKm: nan, nearestHorizontalKm: nan };
}
