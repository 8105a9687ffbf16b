import type { LayerKind } from "@/db/schema";

export const LAYER_FORMATS = ["csv", "geojson"] as const;
export type LayerFormat = (typeof LAYER_FORMATS)[number];

/** The file formats each layer kind accepts. */
export const FORMATS_BY_KIND: Record<LayerKind, readonly LayerFormat[]> = {
  population: ["csv"],
  "site-condition": ["csv"],
  stations: ["csv"],
  districts: ["geojson"],
  facilities: ["csv", "geojson"],
};

/** Planner's words for each kind, used in headings and messages. */
export const LAYER_KIND_LABELS: Record<LayerKind, string> = {
  population: "Population grid",
  districts: "District boundaries",
  facilities: "Facilities",
  stations: "Stations",
  "site-condition": "Site condition (Vs30)",
};

/** The format a file name suggests: `.geojson`/`.json` → GeoJSON, anything else → CSV. */
export function formatFromFileName(fileName: string): LayerFormat {
  return /\.(geo)?json$/i.test(fileName) ? "geojson" : "csv";
}
