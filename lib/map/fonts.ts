import type { FontFacesSpecification } from "@maplibre/maplibre-gl-style-spec";

/** Where the app serves the map's font files (copied from fonts/ by scripts/copy-map-worker.mjs). */
export const MAP_FONT_PATH = "/map-fonts";

/** The map's label fonts by the name symbol layers use in `text-font`, each one Source Sans 3 file (latin). */
export const MAP_FONT_FILES = {
  "Leeway Sans Regular": "source-sans-3-latin-400-normal.woff2",
  "Leeway Sans Semibold": "source-sans-3-latin-600-normal.woff2",
} as const;

export type MapFontName = keyof typeof MAP_FONT_FILES;

/**
 * The style's `font-faces`: with no `glyphs` URL, MapLibre draws label text itself from these files
 * through the browser's font loading, so no glyph server is needed and nothing leaves the app.
 */
export function mapFontFaces(origin: string): FontFacesSpecification {
  return Object.fromEntries(Object.entries(MAP_FONT_FILES).map(([name, file]) => [name, `${origin}${MAP_FONT_PATH}/${file}`]));
}
