import type { Coastline } from "./coastline";
import { KM_PER_DEG_LAT, KM_PER_DEG_LON, REGION_ORIGIN, toKm, type KmPoint } from "./frame";

/** Centres of the regular lon/lat grid cells whose centre lies on land. */
export interface LandGrid {
  /** Nominal cell size at the region's origin latitude, km. */
  cellKm: number;
  /** Cell size in degrees. */
  dLonDeg: number;
  dLatDeg: number;
  lon: Float64Array;
  lat: Float64Array;
  /** The same centres in the local plane. */
  pointsKm: KmPoint[];
}

/**
 * Lays a regular lon/lat grid of `cellKm` cells (square at the origin latitude, within ±3 % across the
 * island) over the island's bounding box and keeps the cells whose centre is on land.
 */
export function buildLandGrid(coast: Coastline, cellKm: number): LandGrid {
  const dLonDeg = cellKm / KM_PER_DEG_LON;
  const dLatDeg = cellKm / KM_PER_DEG_LAT;
  let maxAbsX = 0;
  let maxAbsY = 0;
  for (const [x, y] of coast.verticesKm) {
    maxAbsX = Math.max(maxAbsX, Math.abs(x));
    maxAbsY = Math.max(maxAbsY, Math.abs(y));
  }
  const columns = Math.ceil(maxAbsX / cellKm) + 1;
  const rows = Math.ceil(maxAbsY / cellKm) + 1;

  const lon: number[] = [];
  const lat: number[] = [];
  const pointsKm: KmPoint[] = [];
  // Rows from south to north, columns west to east; centres sit half a cell off the origin.
  for (let row = -rows; row < rows; row++) {
    for (let column = -columns; column < columns; column++) {
      const cellLon = REGION_ORIGIN.lon + (column + 0.5) * dLonDeg;
      const cellLat = REGION_ORIGIN.lat + (row + 0.5) * dLatDeg;
      const p = toKm(cellLon, cellLat);
      if (!coast.contains(p)) continue;
      lon.push(cellLon);
      lat.push(cellLat);
      pointsKm.push(p);
    }
  }
  return { cellKm, dLonDeg, dLatDeg, lon: Float64Array.from(lon), lat: Float64Array.from(lat), pointsKm };
}
