/**
 * Population density for the map: the people of a population layer's drawn points (cells, or the
 * bins the layer API merges them into) summed into squares of about `squareKm` on a regular
 * lon/lat lattice, each coloured by people per km². Totals are kept; the squares are coarser than
 * the stored cells, so the density is an average over each square.
 */
import type { Feature, FeatureCollection, Polygon } from "geojson";
import { cellAreaKm2, columnLonDeg, gridGeometry, rowLatDeg, type Bbox } from "@/lib/geo";

/** A population point: position (degrees) and people. */
export interface PopulationPoint {
  lon: number;
  lat: number;
  people: number;
}

/** Side of the density squares, km: a few times the binned points' spacing, so no square falls between bins. */
export const DENSITY_SQUARE_KM = 8;

/** Squares with their people and people per km², as GeoJSON polygons (`people`, `perKm2`). */
export function populationDensitySquares(points: readonly PopulationPoint[], bbox: Bbox, squareKm = DENSITY_SQUARE_KM): FeatureCollection<Polygon, { people: number; perKm2: number }> {
  const g = gridGeometry(bbox, squareKm);
  const people = new Float64Array(g.width * g.height);
  for (const p of points) {
    const column = Math.min(g.width - 1, Math.max(0, Math.floor((p.lon - g.bbox[0]) / g.cellLonDeg)));
    const row = Math.min(g.height - 1, Math.max(0, Math.floor((g.bbox[3] - p.lat) / g.cellLatDeg)));
    people[row * g.width + column] += p.people;
  }
  const features: Feature<Polygon, { people: number; perKm2: number }>[] = [];
  for (let row = 0; row < g.height; row++) {
    const areaKm2 = cellAreaKm2(g, row);
    const lat = rowLatDeg(g, row);
    for (let column = 0; column < g.width; column++) {
      const count = people[row * g.width + column];
      if (count <= 0) continue;
      const lon = columnLonDeg(g, column);
      const w = lon - g.cellLonDeg / 2;
      const e = lon + g.cellLonDeg / 2;
      const s = lat - g.cellLatDeg / 2;
      const n = lat + g.cellLatDeg / 2;
      features.push({
        type: "Feature",
        properties: { people: count, perKm2: count / areaKm2 },
        geometry: { type: "Polygon", coordinates: [[[w, s], [e, s], [e, n], [w, n], [w, s]]] },
      });
    }
  }
  return { type: "FeatureCollection", features };
}
