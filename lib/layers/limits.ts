import type { LayerKind } from "@/db/schema";

/** What a layer file may hold: the file's size in bytes and its number of data rows (or GeoJSON features). */
export interface LayerLimits {
  maxBytes: number;
  maxRows: number;
}

const MB = 1024 * 1024;

/**
 * Limits per layer kind. A million 1 km population cells written as `lon,lat,population,district`
 * take about 40 MB, so grids get 64 MB and 1.5 million rows; the others are far smaller in practice.
 * The proxy's body buffer (next.config.mjs, `proxyClientMaxBodySize`) must stay above the largest.
 */
export const LAYER_LIMITS: Record<LayerKind, LayerLimits> = {
  population: { maxBytes: 64 * MB, maxRows: 1_500_000 },
  "site-condition": { maxBytes: 64 * MB, maxRows: 1_500_000 },
  districts: { maxBytes: 32 * MB, maxRows: 2_000 },
  facilities: { maxBytes: 16 * MB, maxRows: 100_000 },
  stations: { maxBytes: 2 * MB, maxRows: 5_000 },
};

/** How many problems a refused file lists; the message always gives the total. */
export const MAX_LISTED_ISSUES = 50;

/** Formats a byte count the way the messages show it ("2 MB", "640 KB"). */
export function formatBytes(bytes: number): string {
  if (bytes >= MB) return `${Math.round((bytes / MB) * 10) / 10} MB`;
  return `${Math.ceil(bytes / 1024)} KB`;
}
