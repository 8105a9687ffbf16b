/**
 * The regular lon/lat lattice a scenario is computed on. Cells are about `cellKm` on a side at
 * the area's middle latitude, adjusted so a whole number of cells fills the bounding box.
 * Row 0 is the northernmost row; column 0 the westernmost. Longitudes may run past 180 when the
 * area crosses the antimeridian.
 */
import { radiiOfCurvatureKm } from "./wgs84";

const DEG = Math.PI / 180;

/** Bounding box [west, south, east, north] in degrees. */
export type Bbox = [number, number, number, number];

/** Size and placement of a grid. */
export interface GridGeometry {
  bbox: Bbox;
  width: number;
  height: number;
  /** Requested cell size, km (cells are this size at the middle latitude, to the rounding of width and height). */
  cellKm: number;
  cellLonDeg: number;
  cellLatDeg: number;
}

/** The lattice for a bounding box at a cell size in km. */
export function gridGeometry(bbox: Bbox, cellKm: number): GridGeometry {
  const [w, s, e, n] = bbox;
  const { meridianKm, primeVerticalKm } = radiiOfCurvatureKm((s + n) / 2);
  const kmPerDegLat = meridianKm * DEG;
  const kmPerDegLon = Math.max(1e-6, primeVerticalKm * Math.cos(((s + n) / 2) * DEG) * DEG);
  const width = Math.max(1, Math.round(((e - w) * kmPerDegLon) / cellKm));
  const height = Math.max(1, Math.round(((n - s) * kmPerDegLat) / cellKm));
  return { bbox: [w, s, e, n], width, height, cellKm, cellLonDeg: (e - w) / width, cellLatDeg: (n - s) / height };
}

/** Longitude of the centre of column `column`. */
export function columnLonDeg(g: GridGeometry, column: number): number {
  return g.bbox[0] + (column + 0.5) * g.cellLonDeg;
}

/** Latitude of the centre of row `row` (row 0 is the north edge). */
export function rowLatDeg(g: GridGeometry, row: number): number {
  return g.bbox[3] - (row + 0.5) * g.cellLatDeg;
}

/** Ellipsoidal area (km²) of a cell in row `row`, to second order in the cell size. */
export function cellAreaKm2(g: GridGeometry, row: number): number {
  const lat = rowLatDeg(g, row);
  const { meridianKm, primeVerticalKm } = radiiOfCurvatureKm(lat);
  return g.cellLatDeg * DEG * meridianKm * (g.cellLonDeg * DEG * primeVerticalKm * Math.cos(lat * DEG));
}

/**
 * A cell size (km) that brings `g`'s cell count to at most about `maxCells`; `g`'s own cell
 * size when it already fits.
 */
export function cellKmWithin(g: GridGeometry, maxCells: number): number {
  const cells = g.width * g.height;
  if (cells <= maxCells) return g.cellKm;
  return g.cellKm * Math.sqrt(cells / maxCells) * 1.0001;
}
