/**
 * `npm run tiles`: cuts Leeway's basemap of the invented demo region into Mapbox Vector Tiles,
 * public/tiles/{z}/{x}/{y}.pbf, plus public/tiles/metadata.json. Deterministic: the same region
 * gives byte-identical tiles, so the committed tiles change only when the region does.
 * No world data is needed: the island lies thousands of kilometres from any other land.
 */
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { GeoJSONVT } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import { buildRegion } from "@/db/seed/region";
import { BASEMAP_LAYER_NAMES, basemapLayers } from "@/db/seed/region/basemap";

/** Zooms written: 4 shows the whole island in a corner of one tile; past 11 the map over-zooms the level-11 tiles. */
const MIN_ZOOM = 4;
const MAX_ZOOM = 11;
const EXTENT = 4096;
/** Degrees of sea around the island's bounding box that the tiles cover (the shelf bands reach 25 km ≈ 0.35°). */
const MARGIN_DEG = 0.4;
const OUT_DIR = path.join("public", "tiles");

function lonToTileX(lon: number, z: number): number {
  return Math.floor(((lon + 180) / 360) * 2 ** z);
}

function latToTileY(lat: number, z: number): number {
  const rad = (lat * Math.PI) / 180;
  return Math.floor(((1 - Math.log(Math.tan(rad) + 1 / Math.cos(rad)) / Math.PI) / 2) * 2 ** z);
}

function main() {
  const region = buildRegion();
  const layers = basemapLayers(region);
  const indexes = BASEMAP_LAYER_NAMES.map((name) => ({
    name,
    index: new GeoJSONVT(layers[name], { maxZoom: MAX_ZOOM, indexMaxZoom: MAX_ZOOM, extent: EXTENT, buffer: 64, tolerance: 3 }),
  }));
  const [west, south, east, north] = region.bbox;
  const bounds: [number, number, number, number] = [west - MARGIN_DEG, south - MARGIN_DEG, east + MARGIN_DEG, north + MARGIN_DEG];

  rmSync(OUT_DIR, { recursive: true, force: true });
  let tiles = 0;
  let bytes = 0;
  for (let z = MIN_ZOOM; z <= MAX_ZOOM; z++) {
    for (let x = lonToTileX(bounds[0], z); x <= lonToTileX(bounds[2], z); x++) {
      for (let y = latToTileY(bounds[3], z); y <= latToTileY(bounds[1], z); y++) {
        const tileLayers: Record<string, NonNullable<ReturnType<GeoJSONVT["getTile"]>>> = {};
        for (const { name, index } of indexes) {
          const tile = index.getTile(z, x, y);
          if (tile && tile.features.length > 0) tileLayers[name] = tile;
        }
        if (Object.keys(tileLayers).length === 0) continue;
        const pbf = fromGeojsonVt(tileLayers, { version: 2, extent: EXTENT });
        mkdirSync(path.join(OUT_DIR, String(z), String(x)), { recursive: true });
        writeFileSync(path.join(OUT_DIR, String(z), String(x), `${y}.pbf`), pbf);
        tiles++;
        bytes += pbf.byteLength;
      }
    }
  }

  const metadata = {
    name: `${region.name} basemap (invented demo region)`,
    format: "pbf",
    minzoom: MIN_ZOOM,
    maxzoom: MAX_ZOOM,
    bounds: bounds.map((v) => Math.round(v * 1e4) / 1e4),
    // The island itself, for fitting the first view.
    landBounds: region.bbox.map((v) => Math.round(v * 1e4) / 1e4),
    center: [(west + east) / 2, (south + north) / 2].map((v) => Math.round(v * 1e4) / 1e4),
    layers: BASEMAP_LAYER_NAMES,
    generator: "scripts/build-tiles.ts",
  };
  writeFileSync(path.join(OUT_DIR, "metadata.json"), `${JSON.stringify(metadata, null, 2)}\n`);
  console.log(`wrote ${tiles} tiles (${(bytes / 1024).toFixed(0)} KiB), zooms ${MIN_ZOOM}–${MAX_ZOOM}, to ${OUT_DIR}`);
}

main();
