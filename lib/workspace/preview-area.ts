/**
 * The preview grid computed while something is dragged: the part of the scenario area in view,
 * with at least PREVIEW_MIN_CELLS_PER_SIDE cells across its shorter side (so ≥ 200 × 200 cells).
 */
import { gridGeometry, type Bbox } from "@/lib/geo";

/** Cells across the shorter side of the preview grid. */
export const PREVIEW_MIN_CELLS_PER_SIDE = 200;
/** The worker refuses finer cells (km). */
const MIN_CELL_KM = 0.1;

/** The overlap of two boxes, or null. */
function intersect(a: Bbox, b: Bbox): Bbox | null {
  const box: Bbox = [Math.max(a[0], b[0]), Math.max(a[1], b[1]), Math.min(a[2], b[2]), Math.min(a[3], b[3])];
  return box[2] > box[0] && box[3] > box[1] ? box : null;
}

/** `bbox` grown about its centre so its shorter side is at least `minKm` (a closely zoomed view). */
function atLeastKm(bbox: Bbox, minKm: number): Bbox {
  const probe = gridGeometry(bbox, 1);
  const scale = minKm / Math.min(probe.width, probe.height);
  if (scale <= 1) return bbox;
  const [w, s, e, n] = bbox;
  const halfLon = ((e - w) / 2) * scale;
  const halfLat = ((n - s) / 2) * scale;
  return [(w + e) / 2 - halfLon, (s + n) / 2 - halfLat, (w + e) / 2 + halfLon, (s + n) / 2 + halfLat];
}

/**
 * Bbox, cell size (km) and cell count of the preview for the visible map area. A view closer than
 * 200 of the finest cells (0.1 km) is widened around its centre, so the grid still has 200 × 200.
 */
export function previewGrid(visible: Bbox, area: Bbox): { bbox: Bbox; cellKm: number; maxCells: number; width: number; height: number } {
  const bbox = atLeastKm(intersect(visible, area) ?? area, PREVIEW_MIN_CELLS_PER_SIDE * MIN_CELL_KM * 1.02);
  // The box's extent in km, read from a 1 km lattice.
  const probe = gridGeometry(bbox, 1);
  const cellKm = Math.max(MIN_CELL_KM, Math.min(probe.width, probe.height) / PREVIEW_MIN_CELLS_PER_SIDE);
  let geometry = gridGeometry(bbox, cellKm);
  // Rounding may leave the short side a cell short of the minimum: shrink the cells a little.
  while (Math.min(geometry.width, geometry.height) < PREVIEW_MIN_CELLS_PER_SIDE) geometry = gridGeometry(bbox, geometry.cellKm * 0.995);
  return { bbox, cellKm: geometry.cellKm, maxCells: geometry.width * geometry.height, width: geometry.width, height: geometry.height };
}
