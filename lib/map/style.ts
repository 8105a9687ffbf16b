import type { LayerSpecification, SourceSpecification, StyleSpecification } from "@maplibre/maplibre-gl-style-spec";
import tileMetadata from "@/public/tiles/metadata.json";
import { mapFontFaces } from "./fonts";

/** Id of the vector source holding Leeway's basemap tiles. */
export const BASEMAP_SOURCE_ID = "basemap";

/** [west, south, east, north] the basemap tiles cover, degrees (from public/tiles/metadata.json). */
export const BASEMAP_BOUNDS = tileMetadata.bounds as [number, number, number, number];

/** [west, south, east, north] of the island's land, degrees. */
export const LAND_BOUNDS = tileMetadata.landBounds as [number, number, number, number];

/** What a map style is made of besides the basemap source. */
export interface MapStyleParts {
  /** The app's own origin (e.g. `http://localhost:3000`); every URL in the style starts with it. */
  origin: string;
  /** Layers, bottom to top. */
  layers: LayerSpecification[];
  /** Further sources by id, e.g. GeoJSON overlays for stations and sources. */
  sources?: Record<string, SourceSpecification>;
}

/**
 * Builds the MapLibre style for Leeway's map: the self-hosted basemap tiles, the label fonts served by
 * the app (`font-faces`, no `glyphs` URL, no sprite), and the given layers and overlay sources.
 */
export function buildMapStyle({ origin, layers, sources = {} }: MapStyleParts): StyleSpecification {
  return {
    version: 8,
    name: "Leeway",
    sources: {
      [BASEMAP_SOURCE_ID]: {
        type: "vector",
        tiles: [`${origin}/tiles/{z}/{x}/{y}.pbf`],
        minzoom: tileMetadata.minzoom,
        // Past the deepest level written, MapLibre over-zooms the level-11 tiles.
        maxzoom: tileMetadata.maxzoom,
        bounds: BASEMAP_BOUNDS,
        attribution: "Basemap: Leeway, invented demo region",
      },
      ...sources,
    },
    "font-faces": mapFontFaces(origin),
    layers,
  };
}
