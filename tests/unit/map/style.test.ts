import { existsSync, readdirSync } from "node:fs";
import path from "node:path";
import { validateStyleMin, type LayerSpecification } from "@maplibre/maplibre-gl-style-spec";
import { describe, expect, it } from "vitest";
import { MAP_LAYER_IDS, OVERLAY_SOURCE_IDS, REGION_MAP_LAYERS } from "@/components/map/layers";
import { BASEMAP_LAYER_NAMES } from "@/db/seed/region/basemap";
import { contrastRatio } from "@/lib/design/contrast";
import { MAP_FONT_FILES } from "@/lib/map/fonts";
import { MAP_COLOURS } from "@/lib/map/palette";
import { buildMapStyle } from "@/lib/map/style";
import tileMetadata from "@/public/tiles/metadata.json";

const ORIGIN = "http://localhost:3210";
const style = buildMapStyle({
  origin: ORIGIN,
  layers: REGION_MAP_LAYERS,
  sources: {
    [OVERLAY_SOURCE_IDS.stations]: { type: "geojson", data: { type: "FeatureCollection", features: [] } },
    [OVERLAY_SOURCE_IDS.sources]: { type: "geojson", data: { type: "FeatureCollection", features: [] } },
    [OVERLAY_SOURCE_IDS.layer]: { type: "geojson", data: { type: "FeatureCollection", features: [] } },
  },
});

const sourceLayerOf = (layer: LayerSpecification) => ("source-layer" in layer ? layer["source-layer"] : undefined);

describe("the map style", () => {
  it("passes the MapLibre style specification's own validator", () => {
    expect(validateStyleMin(style).map((e) => e.message)).toEqual([]);
  });

  it("asks nothing of another host: no glyphs URL, no sprite, every URL on the app's origin", () => {
    expect(style.glyphs).toBeUndefined();
    expect(style.sprite).toBeUndefined();
    const urls = [...JSON.stringify(style).matchAll(/"(https?:\/\/[^"]+)"/g)].map((m) => m[1]);
    expect(urls.length).toBeGreaterThan(0);
    expect(urls.filter((u) => !u.startsWith(`${ORIGIN}/`))).toEqual([]);
  });

  it("declares every font a symbol layer names in font-faces, each backed by a file in fonts/", () => {
    const declared = Object.keys(style["font-faces"] ?? {});
    const textFonts = REGION_MAP_LAYERS.map((l) => (l.type === "symbol" ? l.layout?.["text-font"] : undefined));
    const used = new Set(JSON.stringify(textFonts).match(/Leeway Sans [A-Za-z]+/g));
    expect(used.size).toBeGreaterThan(0);
    expect([...used].filter((name) => !declared.includes(name))).toEqual([]);
    for (const file of Object.values(MAP_FONT_FILES)) expect(existsSync(path.join("fonts", file)), file).toBe(true);
  });

  it("gives every layer a unique stable id and draws only source layers the tiles contain", () => {
    const ids = REGION_MAP_LAYERS.map((l) => l.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect([...ids].sort()).toEqual(Object.values(MAP_LAYER_IDS).sort());
    const sourceLayers = REGION_MAP_LAYERS.map(sourceLayerOf).filter((s): s is string => s !== undefined);
    expect(sourceLayers.filter((s) => !(BASEMAP_LAYER_NAMES as readonly string[]).includes(s))).toEqual([]);
    expect([...tileMetadata.layers].sort()).toEqual([...BASEMAP_LAYER_NAMES].sort());
  });

  it("keeps label text legible on land: WCAG 2.2 contrast of at least 4.5:1 for town and station labels", () => {
    expect(contrastRatio(MAP_COLOURS.townLabel, MAP_COLOURS.land)).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(MAP_COLOURS.station, MAP_COLOURS.land)).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(MAP_COLOURS.source, MAP_COLOURS.sourceHalo)).toBeGreaterThanOrEqual(4.5);
    // District names are secondary, large-ish capitals: WCAG's 3:1 for large text.
    expect(contrastRatio(MAP_COLOURS.districtLabel, MAP_COLOURS.land)).toBeGreaterThanOrEqual(3);
  });
});

describe("the committed tiles", () => {
  it("cover the zooms metadata.json states, and no deeper (the source over-zooms past maxzoom)", () => {
    const zooms = readdirSync(path.join("public", "tiles"))
      .filter((name) => /^\d+$/.test(name))
      .map(Number)
      .sort((a, b) => a - b);
    expect(zooms[0]).toBe(tileMetadata.minzoom);
    expect(zooms[zooms.length - 1]).toBe(tileMetadata.maxzoom);
    expect(style.sources.basemap).toMatchObject({ minzoom: tileMetadata.minzoom, maxzoom: tileMetadata.maxzoom });
  });
});
