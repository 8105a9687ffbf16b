/**
 * Contours of a grid as RFC 7946 GeoJSON: warning-second bands, intensity-class bands, the blind
 * zone and the alert area. Marching squares by d3-contour on the row-major grid; d3 puts value
 * (i, j) at (i + 0.5, j + 0.5), which with cell centres at west + (i + 0.5)·Δlon maps a contour
 * point (x, y) to (west + x·Δlon, north − y·Δlat). Each level is traced on the grid padded with
 * one cell below the level, so every ring is a closed curve inside the padding; bands (a, b] are
 * then the region ≥ a less the region ≥ b: the rings of both levels nested by containment
 * (contours at different levels do not cross). Points in the padding are clamped onto the grid's
 * edge afterwards, so a band's hole may run along the edge where its outer ring does.
 * Outer rings are counter-clockwise and holes clockwise after the mapping, as
 * RFC 7946 §3.1.6 asks. Areas that run past 180° keep longitudes above 180 (not cut at the
 * antimeridian).
 */
import { contours as d3Contours } from "d3-contour";
import type { EngineGrid } from "./grid";
import { BLIND_BAND, warningBands } from "./warning";

type Position = [number, number];
type Ring = Position[];

/** A GeoJSON MultiPolygon feature with Leeway's contour properties. */
export interface ContourFeature<P> {
  type: "Feature";
  properties: P;
  geometry: { type: "MultiPolygon"; coordinates: Ring[][] };
}

/** A GeoJSON FeatureCollection. */
export interface ContourCollection<P> {
  type: "FeatureCollection";
  features: ContourFeature<P>[];
}

/** Properties of a warning band: lowerS < warning ≤ upperS (null: open). */
export interface WarningBandProperties {
  layer: "warning";
  band: string;
  label: string;
  lowerS: number | null;
  upperS: number | null;
}

/** Properties of an intensity-class band: lower ≤ intensity < upper (null: open). */
export interface IntensityBandProperties {
  layer: "intensity";
  scale: string;
  intensityClass: string;
  classIndex: number;
  lowerIntensity: number | null;
  upperIntensity: number | null;
}

/** Properties of the blind zone (warning ≤ 0 on a channel). */
export interface BlindZoneProperties {
  layer: "blind-zone";
  channel: string;
}

/** Properties of the alert area. */
export interface AlertAreaProperties {
  layer: "alert-area";
}

/** The four contour layers of one grid. */
export interface ContourSet {
  warning: ContourCollection<WarningBandProperties>;
  intensity: ContourCollection<IntensityBandProperties>;
  blindZone: ContourCollection<BlindZoneProperties>;
  alertArea: ContourCollection<AlertAreaProperties>;
}

/** Options for `traceContours`. */
export interface ContourOptions {
  /** Warning breaks, s (default the grid's). */
  warningBreaksS?: readonly number[];
  /** Channel for the warning bands and blind zone (default the primary channel). */
  channel?: string;
  /** Decimal places kept in coordinates (default 5, about 1 m). */
  precision?: number;
}

/** Rings of one or more levels in padded grid units, before mapping to lon/lat. */
interface RawRings {
  rings: Ring[];
}

/** A grid field with a one-cell border, reused for every level of that field. */
interface PaddedField {
  values: Float32Array;
  width: number;
  height: number;
  /** Smallest value of the field (NaN cells excepted). */
  min: number;
  max: number;
  hasNaN: boolean;
}

/** Copies a field into a padded array, optionally negated (so "≤ t" becomes "≥ −t"). */
function padField(values: ArrayLike<number>, width: number, height: number, negate = false): PaddedField {
  const paddedWidth = width + 2;
  const padded = new Float32Array(paddedWidth * (height + 2));
  const sign = negate ? -1 : 1;
  let min = Infinity;
  let max = -Infinity;
  let hasNaN = false;
  for (let row = 0; row < height; row++) {
    const from = row * width;
    const to = (row + 1) * paddedWidth + 1;
    for (let c = 0; c < width; c++) {
      const v = sign * values[from + c];
      padded[to + c] = v;
      if (v < min) min = v;
      if (v > max) max = v;
      if (v !== v) hasNaN = true;
    }
  }
  return { values: padded, width: paddedWidth, height: height + 2, min, max, hasNaN };
}

const PADDING_BELOW = 1e-3;

/** The whole grid: a ring through the padding's centres, outside every traced ring. */
function wholeGrid(field: PaddedField): RawRings {
  const [x0, y0, x1, y1] = [0.5, 0.5, field.width - 0.5, field.height - 0.5];
  return { rings: [[[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]] };
}

/** Rings of the region ≥ `threshold`, in padded grid units. */
function levelRings(field: PaddedField, threshold: number): RawRings {
  const { values, width, height } = field;
  if (threshold <= field.min && !field.hasNaN) return wholeGrid(field);
  // Just below the level: edge crossings then fall near the padding's centres, clamped to the edge.
  const below = threshold - PADDING_BELOW;
  for (let c = 0; c < width; c++) {
    values[c] = below;
    values[(height - 1) * width + c] = below;
  }
  for (let row = 0; row < height; row++) {
    values[row * width] = below;
    values[row * width + width - 1] = below;
  }
  const multi = d3Contours().size([width, height]).contour(values as unknown as number[], threshold);
  return { rings: multi.coordinates.flat() as Ring[] };
}

const LEFT = 1;
const RIGHT = 2;
const TOP = 4;
const BOTTOM = 8;

/**
 * Maps padded grid units to lon/lat, clamping points in the padding onto the grid's edge. Where a
 * ring cuts across a padding corner (from one edge to the next), the grid's corner is put back.
 */
function toLonLat(ring: Ring, grid: EngineGrid, scale: number): Ring {
  const { width, height, cellLonDeg, cellLatDeg } = grid;
  const [west, , , north] = grid.bbox;
  const out: Ring = [];
  const push = (x: number, y: number) => {
    const p: Position = [Math.round((west + x * cellLonDeg) * scale) / scale, Math.round((north - y * cellLatDeg) * scale) / scale];
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  };
  let lastEdges = 0;
  for (const [px, py] of ring) {
    const gx = px - 1;
    const gy = py - 1;
    const edges = (gx < 0 ? LEFT : 0) | (gx > width ? RIGHT : 0) | (gy < 0 ? TOP : 0) | (gy > height ? BOTTOM : 0);
    if (edges && lastEdges && !(edges & lastEdges)) {
      const corner = edges | lastEdges;
      push(corner & LEFT ? 0 : width, corner & TOP ? 0 : height);
    }
    push(Math.min(width, Math.max(0, gx)), Math.min(height, Math.max(0, gy)));
    lastEdges = edges;
  }
  return out;
}

function signedArea(ring: Ring): number {
  let sum = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) sum += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return sum / 2;
}

function ringBounds(ring: Ring): [number, number, number, number] {
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const [x, y] of ring) {
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  return [x0, y0, x1, y1];
}

function ringContains(ring: Ring, [x, y]: Position): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * Builds polygons from rings whose interiors alternate (even-odd): a ring inside an even number of
 * others is an outer ring; one inside an odd number is a hole of the innermost ring around it.
 * Rings are in padded grid units and mapped to lon/lat at the end.
 */
function nestRings(all: RawRings, grid: EngineGrid, scale: number): Ring[][] {
  const { rings } = all;
  const bounds = rings.map(ringBounds);
  const containers: number[][] = rings.map(() => []);
  rings.forEach((ring, i) => {
    const point = ring[0];
    for (let j = 0; j < rings.length; j++) {
      if (i === j) continue;
      const [x0, y0, x1, y1] = bounds[j];
      if (point[0] < x0 || point[0] > x1 || point[1] < y0 || point[1] > y1) continue;
      if (ringContains(rings[j], point)) containers[i].push(j);
    }
  });
  const depth = containers.map((c) => c.length);
  const polygonOf = new Map<number, Ring[]>();
  const polygons: Ring[][] = [];
  rings.forEach((ring, i) => {
    if (depth[i] % 2 === 0) {
      const polygon = [orient(toLonLat(ring, grid, scale), true)];
      polygonOf.set(i, polygon);
      polygons.push(polygon);
    }
  });
  rings.forEach((ring, i) => {
    if (depth[i] % 2 === 1) {
      const parent = containers[i].find((j) => depth[j] === depth[i] - 1);
      if (parent !== undefined) polygonOf.get(parent)?.push(orient(toLonLat(ring, grid, scale), false));
    }
  });
  // An outer ring and a hole both clamped onto the grid's edge enclose nothing: drop such slivers.
  const minAreaDeg2 = 0.01 * grid.cellLonDeg * grid.cellLatDeg;
  return polygons.filter(([outer, ...holes]) => signedArea(outer) + holes.reduce((sum, h) => sum + signedArea(h), 0) > minAreaDeg2);
}

function orient(ring: Ring, counterClockwise: boolean): Ring {
  return signedArea(ring) > 0 === counterClockwise ? ring : [...ring].reverse();
}

function feature<P>(properties: P, coordinates: Ring[][]): ContourFeature<P> {
  return { type: "Feature", properties, geometry: { type: "MultiPolygon", coordinates } };
}

/** Polygons of each band and of the region below the first threshold. */
interface Banded {
  /** Band i: ≥ thresholds[i] and < thresholds[i + 1] (the last band open above). */
  bands: Ring[][][];
  /** Below thresholds[0]; without NaN cells that is the complement of the first level, so no extra pass. */
  below: Ring[][];
}

/** Bands between successive thresholds; levels above the data are skipped. */
function bands(values: ArrayLike<number>, grid: EngineGrid, thresholds: readonly number[], scale: number): Banded {
  const field = padField(values, grid.width, grid.height);
  const levels = thresholds.map((t): RawRings => (t > field.max ? { rings: [] } : levelRings(field, t)));
  const banded = thresholds.map((_, i) => {
    // Empty when nothing reaches this level, or when the next level covers the whole grid.
    if (levels[i].rings.length === 0 || (i + 1 < thresholds.length && thresholds[i + 1] <= field.min && !field.hasNaN)) return [];
    const upper = i + 1 < levels.length ? levels[i + 1].rings : [];
    return nestRings({ rings: [...levels[i].rings, ...upper] }, grid, scale);
  });
  let below: Ring[][];
  if (field.hasNaN) below = region(values, grid, -thresholds[0], scale, true);
  else if (thresholds[0] <= field.min) below = [];
  else below = nestRings({ rings: [...wholeGrid(field).rings, ...levels[0].rings] }, grid, scale);
  return { bands: banded, below };
}

/** The region ≥ `threshold` (≤ −threshold when `negate`) as polygons. */
function region(values: ArrayLike<number>, grid: EngineGrid, threshold: number, scale: number, negate = false): Ring[][] {
  const field = padField(values, grid.width, grid.height, negate);
  if (threshold > field.max) return [];
  return nestRings(levelRings(field, threshold), grid, scale);
}

/** Traces the warning, intensity, blind-zone and alert-area contours of a grid. */
export function traceContours(grid: EngineGrid, options: ContourOptions = {}): ContourSet {
  const scale = 10 ** (options.precision ?? 5);
  const breaks = options.warningBreaksS ?? grid.warningBreaksS;
  const channel = grid.channels.find((c) => c.id === (options.channel ?? grid.channels[0].id));
  if (!channel) throw new Error(`unknown channel "${options.channel}"`);
  const warning = channel.offsetS === 0 ? grid.warningS : grid.warningS.map((w) => w + channel.offsetS);
  const warningBanded = bands(warning, grid, breaks, scale);
  const warningFeatures = warningBanded.bands
    .map((coordinates, i) => ({ coordinates, band: warningBands(breaks)[i + 1] }))
    .filter((b) => b.coordinates.length > 0)
    .map(({ coordinates, band }) => feature<WarningBandProperties>({ layer: "warning", band: band.id, label: band.label, lowerS: band.lowerS, upperS: band.upperS }, coordinates));

  // Bands start at 0 s, so the region below the first break is the blind zone (warning ≤ 0).
  const blind = breaks[0] === BLIND_BAND.upperS ? warningBanded.below : region(warning, grid, -(BLIND_BAND.upperS ?? 0), scale, true);

  const bounds = grid.intensityClassLowerBounds;
  const intensityFeatures: ContourFeature<IntensityBandProperties>[] = [];
  const intensityBanded = bands(grid.intensity, grid, bounds, scale);
  const lowest = intensityBanded.below;
  const classBand = (classIndex: number, coordinates: Ring[][]) =>
    feature<IntensityBandProperties>(
      {
        layer: "intensity",
        scale: grid.intensityScale,
        intensityClass: grid.intensityClasses[classIndex],
        classIndex,
        lowerIntensity: classIndex === 0 ? null : bounds[classIndex - 1],
        upperIntensity: classIndex < bounds.length ? bounds[classIndex] : null,
      },
      coordinates,
    );
  if (lowest.length) intensityFeatures.push(classBand(0, lowest));
  intensityBanded.bands.forEach((coordinates, i) => {
    if (coordinates.length) intensityFeatures.push(classBand(i + 1, coordinates));
  });

  const alert = region(grid.alerted, grid, 0.5, scale);

  return {
    warning: { type: "FeatureCollection", features: warningFeatures },
    intensity: { type: "FeatureCollection", features: intensityFeatures },
    blindZone: { type: "FeatureCollection", features: blind.length ? [feature<BlindZoneProperties>({ layer: "blind-zone", channel: channel.id }, blind)] : [] },
    alertArea: { type: "FeatureCollection", features: alert.length ? [feature<AlertAreaProperties>({ layer: "alert-area" }, alert)] : [] },
  };
}

/** All four layers in one FeatureCollection (each feature's `layer` property tells them apart). */
export function mergeContours(set: ContourSet): ContourCollection<WarningBandProperties | IntensityBandProperties | BlindZoneProperties | AlertAreaProperties> {
  return {
    type: "FeatureCollection",
    features: [...set.warning.features, ...set.intensity.features, ...set.blindZone.features, ...set.alertArea.features],
  };
}
