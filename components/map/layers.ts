import type {
  BackgroundLayerSpecification,
  CircleLayerSpecification,
  ExpressionSpecification,
  FillLayerSpecification,
  LayerSpecification,
  LineLayerSpecification,
  SymbolLayerSpecification,
} from "@maplibre/maplibre-gl-style-spec";
import type { MapFontName } from "@/lib/map/fonts";
import { MAP_COLOURS as C } from "@/lib/map/palette";
import { BASEMAP_SOURCE_ID } from "@/lib/map/style";

/** Ids of the GeoJSON sources the map component fills from its props. */
export const OVERLAY_SOURCE_IDS = { stations: "stations", sources: "sources", layer: "layer-overlay" } as const;

/** Stable layer ids: tests, legends and later overlays refer to these. */
export const MAP_LAYER_IDS = {
  sea: "sea",
  shelfOuter: "shelf-outer",
  shelfInner: "shelf-inner",
  land: "land",
  districtLines: "district-lines",
  coastline: "coastline",
  railCasing: "rail-casing",
  railTies: "rail-ties",
  townDots: "town-dots",
  layerFill: "layer-fill",
  layerLines: "layer-lines",
  layerPoints: "layer-points",
  stations: "stations",
  sourceRings: "source-rings",
  sourceDots: "source-dots",
  districtLabels: "district-labels",
  townLabels: "town-labels",
  stationLabels: "station-labels",
  sourceLabels: "source-labels",
} as const;

const font = (name: MapFontName): [MapFontName] => [name];
const byZoom = (...stops: (number | ExpressionSpecification)[]): ExpressionSpecification => ["interpolate", ["linear"], ["zoom"], ...stops];
const townRank: ExpressionSpecification = ["get", "rank"];
/** Label size of a town by rank at one zoom: the three largest towns in larger type. */
const townSize = (major: number, minor: number): ExpressionSpecification => ["case", ["<=", townRank, 3], major, minor];

const sea: BackgroundLayerSpecification = { id: MAP_LAYER_IDS.sea, type: "background", paint: { "background-color": C.sea } };

const shelf = (id: string, band: number, colour: string): FillLayerSpecification => ({
  id,
  type: "fill",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "shelf",
  filter: ["==", ["get", "band"], band],
  paint: { "fill-color": colour },
});

const land: FillLayerSpecification = { id: MAP_LAYER_IDS.land, type: "fill", source: BASEMAP_SOURCE_ID, "source-layer": "land", paint: { "fill-color": C.land } };

const districtLines: LineLayerSpecification = {
  id: MAP_LAYER_IDS.districtLines,
  type: "line",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "district-boundaries",
  layout: { "line-join": "round" },
  paint: { "line-color": C.districtLine, "line-width": byZoom(5, 0.6, 11, 1.6), "line-dasharray": [4, 2.5] },
};

const coastline: LineLayerSpecification = {
  id: MAP_LAYER_IDS.coastline,
  type: "line",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "land",
  layout: { "line-join": "round" },
  paint: { "line-color": C.coast, "line-width": byZoom(5, 0.7, 11, 1.5) },
};

const railCasing: LineLayerSpecification = {
  id: MAP_LAYER_IDS.railCasing,
  type: "line",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "rail",
  layout: { "line-join": "round", "line-cap": "round" },
  paint: { "line-color": C.rail, "line-width": byZoom(5, 1.6, 11, 4) },
};

/** Light dashes inside the rail line: read as track at every zoom without a sprite. */
const railTies: LineLayerSpecification = {
  id: MAP_LAYER_IDS.railTies,
  type: "line",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "rail",
  minzoom: 7,
  paint: { "line-color": C.railTie, "line-width": byZoom(7, 0.8, 11, 2), "line-dasharray": [2, 3] },
};

const townDots: CircleLayerSpecification = {
  id: MAP_LAYER_IDS.townDots,
  type: "circle",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "towns",
  paint: {
    "circle-color": C.townDot,
    "circle-radius": byZoom(5, townSize(3.5, 2.5), 11, townSize(6, 4.5)),
    "circle-stroke-color": C.labelHalo,
    "circle-stroke-width": 1.5,
  },
};

const isArea: ExpressionSpecification = ["match", ["geometry-type"], ["Polygon", "MultiPolygon"], true, false];
const isPoint: ExpressionSpecification = ["match", ["geometry-type"], ["Point", "MultiPoint"], true, false];

/** An uploaded layer (components/layers): districts as light fills with outlines, rail as lines, cells and facilities as dots. */
const layerFill: FillLayerSpecification = {
  id: MAP_LAYER_IDS.layerFill,
  type: "fill",
  source: OVERLAY_SOURCE_IDS.layer,
  filter: isArea,
  paint: { "fill-color": C.layerOverlay, "fill-opacity": 0.12 },
};

const layerLines: LineLayerSpecification = {
  id: MAP_LAYER_IDS.layerLines,
  type: "line",
  source: OVERLAY_SOURCE_IDS.layer,
  filter: ["!", isPoint],
  layout: { "line-join": "round" },
  paint: { "line-color": C.layerOverlay, "line-width": byZoom(5, 1.2, 11, 2.5) },
};

const layerPoints: CircleLayerSpecification = {
  id: MAP_LAYER_IDS.layerPoints,
  type: "circle",
  source: OVERLAY_SOURCE_IDS.layer,
  filter: isPoint,
  paint: {
    "circle-radius": byZoom(5, 1.8, 11, 4.5),
    "circle-color": C.layerOverlay,
    "circle-stroke-color": C.layerOverlayOutline,
    "circle-stroke-width": byZoom(5, 0.3, 11, 1),
  },
};

const stations: CircleLayerSpecification = {
  id: MAP_LAYER_IDS.stations,
  type: "circle",
  source: OVERLAY_SOURCE_IDS.stations,
  paint: {
    "circle-radius": byZoom(5, 3, 11, 6),
    "circle-color": ["case", ["==", ["get", "operating"], 1], C.station, C.stationOff],
    "circle-stroke-color": ["case", ["==", ["get", "operating"], 1], C.stationOutline, C.stationOffOutline],
    "circle-stroke-width": byZoom(5, 1.2, 11, 2),
  },
};

const sourceRings: CircleLayerSpecification = {
  id: MAP_LAYER_IDS.sourceRings,
  type: "circle",
  source: OVERLAY_SOURCE_IDS.sources,
  paint: { "circle-radius": byZoom(5, 8, 11, 15), "circle-opacity": 0, "circle-stroke-color": C.source, "circle-stroke-width": 2 },
};

const sourceDots: CircleLayerSpecification = {
  id: MAP_LAYER_IDS.sourceDots,
  type: "circle",
  source: OVERLAY_SOURCE_IDS.sources,
  paint: { "circle-radius": byZoom(5, 2.5, 11, 4), "circle-color": C.source },
};

const districtLabels: SymbolLayerSpecification = {
  id: MAP_LAYER_IDS.districtLabels,
  type: "symbol",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "district-labels",
  minzoom: 7,
  layout: {
    "text-field": ["upcase", ["get", "name"]],
    "text-font": font("Leeway Sans Semibold"),
    "text-size": byZoom(7, 10.5, 11, 13),
    "text-letter-spacing": 0.16,
    "text-max-width": 12,
  },
  paint: { "text-color": C.districtLabel, "text-halo-color": C.labelHalo, "text-halo-width": 1.2 },
};

const townLabels: SymbolLayerSpecification = {
  id: MAP_LAYER_IDS.townLabels,
  type: "symbol",
  source: BASEMAP_SOURCE_ID,
  "source-layer": "towns",
  layout: {
    "text-field": ["get", "name"],
    "text-font": ["case", ["<=", townRank, 3], ["literal", font("Leeway Sans Semibold")], ["literal", font("Leeway Sans Regular")]],
    "text-size": byZoom(5, townSize(13, 11.5), 11, townSize(19, 15)),
    "text-variable-anchor": ["left", "right", "top", "bottom"],
    "text-radial-offset": 0.55,
    "text-justify": "auto",
    // Larger towns claim their label space first.
    "symbol-sort-key": townRank,
  },
  paint: { "text-color": C.townLabel, "text-halo-color": C.labelHalo, "text-halo-width": 1.6 },
};

const stationLabels: SymbolLayerSpecification = {
  id: MAP_LAYER_IDS.stationLabels,
  type: "symbol",
  source: OVERLAY_SOURCE_IDS.stations,
  minzoom: 9,
  layout: {
    "text-field": ["get", "id"],
    "text-font": font("Leeway Sans Regular"),
    "text-size": 11,
    "text-anchor": "top",
    "text-offset": [0, 0.7],
  },
  paint: { "text-color": C.station, "text-halo-color": C.labelHalo, "text-halo-width": 1.2 },
};

const sourceLabels: SymbolLayerSpecification = {
  id: MAP_LAYER_IDS.sourceLabels,
  type: "symbol",
  source: OVERLAY_SOURCE_IDS.sources,
  layout: {
    "text-field": ["get", "label"],
    "text-font": font("Leeway Sans Semibold"),
    "text-size": 12.5,
    "text-anchor": "top",
    "text-offset": [0, 1.2],
  },
  paint: { "text-color": C.source, "text-halo-color": C.sourceHalo, "text-halo-width": 1.6 },
};

/** The map's layers, bottom to top: basemap, an uploaded layer, stations and sources, then labels (top ones are placed first). */
export const REGION_MAP_LAYERS: LayerSpecification[] = [
  sea,
  shelf(MAP_LAYER_IDS.shelfOuter, 0, C.shelfOuter),
  shelf(MAP_LAYER_IDS.shelfInner, 1, C.shelfInner),
  land,
  districtLines,
  coastline,
  railCasing,
  railTies,
  townDots,
  layerFill,
  layerLines,
  layerPoints,
  stations,
  sourceRings,
  sourceDots,
  districtLabels,
  townLabels,
  stationLabels,
  sourceLabels,
];
