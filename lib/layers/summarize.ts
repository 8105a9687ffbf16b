import { length, lineString } from "@turf/turf";
import { FACILITY_KINDS, type FacilityKind } from "@/db/schema";
import type { ParsedLayer } from "./parsed-layer";

/**
 * Figures kept with each layer version (`layer_versions.summary`) and shown in lists and previews.
 * Names match what the demo seed and the publishing headline read (`totalPopulation`, `minVs30Ms`, …).
 */
export interface PopulationSummary {
  cells: number;
  totalPopulation: number;
  /** Distinct names in the file's `district` column; null when the file has none. */
  fileDistricts: number | null;
}
export interface SiteConditionSummary {
  cells: number;
  minVs30Ms: number;
  medianVs30Ms: number;
  maxVs30Ms: number;
}
export interface DistrictsSummary {
  districts: number;
  names: string[];
}
export interface FacilitiesSummary {
  byKind: Record<FacilityKind, number>;
  /** Length of all rail segments along great circles (turf `length`), km. */
  railKm: number;
}
export interface StationsSummary {
  stations: number;
  operating: number;
}
export type LayerSummary = PopulationSummary | SiteConditionSummary | DistrictsSummary | FacilitiesSummary | StationsSummary;

function median(values: Float64Array): number {
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function sum(values: Float64Array): number {
  let total = 0;
  for (const v of values) total += v;
  return total;
}

/** The figures of a parsed layer: people and cells, Vs30 range, facility counts by kind, rail length (km, great-circle), stations. */
export function summarizeLayer(layer: ParsedLayer): LayerSummary {
  switch (layer.kind) {
    case "population":
      return { cells: layer.lon.length, totalPopulation: sum(layer.people), fileDistricts: layer.fileDistricts?.names.length ?? null };
    case "site-condition": {
      let min = Infinity;
      let max = -Infinity;
      for (const v of layer.vs30Ms) {
        min = Math.min(min, v);
        max = Math.max(max, v);
      }
      return { cells: layer.lon.length, minVs30Ms: min, medianVs30Ms: median(layer.vs30Ms), maxVs30Ms: max };
    }
    case "districts":
      return { districts: layer.districts.length, names: layer.districts.map((d) => d.name) };
    case "facilities": {
      const byKind = Object.fromEntries(FACILITY_KINDS.map((kind) => [kind, 0])) as Record<FacilityKind, number>;
      let railKm = 0;
      for (const facility of layer.facilities) {
        byKind[facility.kind] += 1;
        if (facility.geometry.type === "LineString") railKm += length(lineString(facility.geometry.coordinates), { units: "kilometers" });
      }
      return { byKind, railKm };
    }
    case "stations":
      return { stations: layer.stations.length, operating: layer.stations.filter((s) => s.operating).length };
  }
}

/** The first rows of a parsed layer as a small table, for the preview before saving. */
export function sampleRows(layer: ParsedLayer, count = 10): { columns: string[]; rows: (string | number)[][] } {
  switch (layer.kind) {
    case "population": {
      const n = Math.min(count, layer.lon.length);
      const districts = layer.fileDistricts;
      const rows = Array.from({ length: n }, (_, i) => {
        const row: (string | number)[] = [layer.lon[i], layer.lat[i], layer.people[i]];
        if (districts) row.push(districts.index[i] < 0 ? "" : districts.names[districts.index[i]]);
        return row;
      });
      return { columns: districts ? ["lon", "lat", "population", "district"] : ["lon", "lat", "population"], rows };
    }
    case "site-condition":
      return {
        columns: ["lon", "lat", "vs30 (m/s)"],
        rows: Array.from({ length: Math.min(count, layer.lon.length) }, (_, i) => [layer.lon[i], layer.lat[i], layer.vs30Ms[i]]),
      };
    case "districts":
      return {
        columns: ["name", "geometry", "corners"],
        rows: layer.districts.slice(0, count).map((d) => {
          const rings = d.geometry.type === "Polygon" ? d.geometry.coordinates : d.geometry.coordinates.flat();
          return [d.name, d.geometry.type, rings.reduce((total, ring) => total + ring.length - 1, 0)];
        }),
      };
    case "facilities":
      return {
        columns: ["name", "kind", "where"],
        rows: layer.facilities.slice(0, count).map((f) => {
          const where =
            f.geometry.type === "Point"
              ? `${f.geometry.coordinates[1].toFixed(4)}°, ${f.geometry.coordinates[0].toFixed(4)}°`
              : `line of ${f.geometry.coordinates.length} points, ${length(lineString(f.geometry.coordinates), { units: "kilometers" }).toFixed(1)} km`;
          return [f.name, f.kind, where];
        }),
      };
    case "stations":
      return {
        columns: ["id", "lon", "lat", "operating"],
        rows: layer.stations.slice(0, count).map((s) => [s.code, s.lon, s.lat, s.operating ? "yes" : "no"]),
      };
  }
}
