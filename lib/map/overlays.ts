import type { FeatureCollection, Point } from "geojson";

/** A station as the map shows it. */
export interface MapStation {
  id: string;
  lon: number;
  lat: number;
  operating: boolean;
}

/** A hypothetical earthquake as the map shows it (epicentre). */
export interface MapSource {
  name: string;
  lon: number;
  lat: number;
  mw: number;
  depthKm: number;
  faultType: string;
}

/** Stations as GeoJSON points with `id` and `operating` (1 or 0, for filters). */
export function stationsToGeoJson(stations: readonly MapStation[]): FeatureCollection<Point> {
  return {
    type: "FeatureCollection",
    features: stations.map((s) => ({
      type: "Feature",
      geometry: { type: "Point", coordinates: [s.lon, s.lat] },
      properties: { id: s.id, operating: s.operating ? 1 : 0 },
    })),
  };
}

/** Sources as GeoJSON points with their name, a short label ("Mw 8.4, 20 km") and fault type. */
export function sourcesToGeoJson(sources: readonly MapSource[]): FeatureCollection<Point> {
  return {
    type: "FeatureCollection",
    features: sources.map((s) => ({
      type: "Feature",
      geometry: { type: "Point", coordinates: [s.lon, s.lat] },
      properties: { name: s.name, label: `Mw ${s.mw.toFixed(1)}, ${Math.round(s.depthKm)} km deep`, faultType: s.faultType },
    })),
  };
}
