/**
 * The scenario workspace's map layers as data: result contours (warning bands, intensity classes,
 * alert area, blind zone), population density, facilities, edit handles, the replay's fronts and
 * triggered stations, and the site marker. Fill colours come from the d3 scales in lib/colour, the
 * same ones the legends read. Only the sources' data and the layers' visibility change at run time.
 */
import type { CircleLayerSpecification, ExpressionSpecification, FillLayerSpecification, LayerSpecification, LineLayerSpecification, SourceSpecification, SymbolLayerSpecification } from "@maplibre/maplibre-gl-style-spec";
import { RESULT_LINE_COLOURS as L } from "@/lib/colour/ramps";
import { intensityColourScale, populationColourScale, POPULATION_DENSITY_BREAKS_PER_KM2, warningColourScale } from "@/lib/colour/scales";
import { MAP_LAYER_IDS } from "./layers";
import type { MapExtension } from "./region-map";

/** GeoJSON sources the workspace fills. */
export const RESULT_SOURCE_IDS = {
  warning: "result-warning",
  intensity: "result-intensity",
  alertArea: "result-alert-area",
  blindZone: "result-blind-zone",
  population: "result-population",
  facilities: "result-facilities",
  handles: "edit-handles",
  ruptureLine: "edit-rupture-line",
  fronts: "replay-fronts",
  replayStations: "replay-stations",
  site: "site-marker",
} as const;

/** Stable layer ids (tests and the layer switches use them). */
export const RESULT_LAYER_IDS = {
  warning: "result-warning-fill",
  intensity: "result-intensity-fill",
  population: "result-population-fill",
  blindZoneFill: "result-blind-zone-fill",
  blindZoneLine: "result-blind-zone-line",
  alertArea: "result-alert-area-line",
  facilityLines: "result-facility-lines",
  facilityPoints: "result-facility-points",
  ruptureLine: "edit-rupture-line",
  handles: "edit-handles",
  fronts: "replay-front-lines",
  frontLabels: "replay-front-labels",
  replayStations: "replay-station-rings",
  site: "site-marker",
} as const;

const RESULT_FILL_OPACITY = 0.62;
const byZoom = (...stops: number[]): ExpressionSpecification => ["interpolate", ["linear"], ["zoom"], ...stops];

/** A MapLibre `match` on a feature property, from the domain and range of an ordinal scale. */
function matchColour(property: string, pairs: [string | number, string][], fallback: string): ExpressionSpecification {
  const cases = pairs.flatMap(([key, colour]) => [key, colour]);
  return ["match", ["get", property], ...cases, fallback] as unknown as ExpressionSpecification;
}

/** Fill colour of the warning bands for the scenario's band ids (see `warningBands`). */
export function warningFillColour(bandIds: readonly string[]): ExpressionSpecification {
  const scale = warningColourScale(bandIds);
  return matchColour("band", bandIds.map((id) => [id, scale(id)]), "rgba(0,0,0,0)");
}

function intensityFillColour(): ExpressionSpecification {
  const scale = intensityColourScale();
  const pairs = scale.domain().flatMap((index): [number, string][] => {
    const colour = scale(index);
    return colour === null ? [] : [[index, colour]];
  });
  return matchColour("classIndex", pairs, "rgba(0,0,0,0)");
}

function populationFillColour(): ExpressionSpecification {
  const scale = populationColourScale();
  const steps = POPULATION_DENSITY_BREAKS_PER_KM2.flatMap((edge) => [edge, scale(edge)]);
  return ["step", ["get", "perKm2"], scale(0), ...steps] as unknown as ExpressionSpecification;
}

const hidden = { visibility: "none" } as const;

const fill = (id: string, source: string, colour: ExpressionSpecification | string, opacity = RESULT_FILL_OPACITY, visible = true): FillLayerSpecification => ({
  id,
  type: "fill",
  source,
  layout: visible ? {} : hidden,
  paint: { "fill-color": colour, "fill-opacity": opacity, "fill-antialias": false },
});

const blindZoneLine: LineLayerSpecification = {
  id: RESULT_LAYER_IDS.blindZoneLine,
  type: "line",
  source: RESULT_SOURCE_IDS.blindZone,
  paint: { "line-color": L.blindZoneEdge, "line-width": byZoom(5, 1.6, 11, 3) },
};

const alertArea: LineLayerSpecification = {
  id: RESULT_LAYER_IDS.alertArea,
  type: "line",
  source: RESULT_SOURCE_IDS.alertArea,
  layout: { "line-join": "round" },
  paint: { "line-color": L.alertArea, "line-width": byZoom(5, 1.6, 11, 3), "line-dasharray": [3, 2] },
};

const facilityLines: LineLayerSpecification = {
  id: RESULT_LAYER_IDS.facilityLines,
  type: "line",
  source: RESULT_SOURCE_IDS.facilities,
  filter: ["==", ["geometry-type"], "LineString"],
  layout: hidden,
  paint: { "line-color": L.facility, "line-width": byZoom(5, 1.2, 11, 3), "line-opacity": 0.8 },
};

const facilityPoints: CircleLayerSpecification = {
  id: RESULT_LAYER_IDS.facilityPoints,
  type: "circle",
  source: RESULT_SOURCE_IDS.facilities,
  filter: ["==", ["geometry-type"], "Point"],
  layout: hidden,
  paint: {
    "circle-radius": byZoom(5, 2.5, 11, 5),
    "circle-color": ["match", ["get", "kind"], "hospital", "#ffffff", L.facility],
    "circle-stroke-color": L.facility,
    "circle-stroke-width": byZoom(5, 1, 11, 2),
  },
};

const ruptureLine: LineLayerSpecification = {
  id: RESULT_LAYER_IDS.ruptureLine,
  type: "line",
  source: RESULT_SOURCE_IDS.ruptureLine,
  layout: { "line-cap": "round" },
  paint: { "line-color": L.dragHandle, "line-width": byZoom(5, 2.5, 11, 5), "line-opacity": 0.85 },
};

/** Grab handles: the epicentre (large ring) and the rupture's ends (squares drawn as small rings). */
const handles: CircleLayerSpecification = {
  id: RESULT_LAYER_IDS.handles,
  type: "circle",
  source: RESULT_SOURCE_IDS.handles,
  paint: {
    "circle-radius": ["match", ["get", "role"], "source", 10, 7],
    "circle-color": "rgba(255,255,255,0.35)",
    "circle-stroke-color": L.dragHandle,
    "circle-stroke-width": 2.5,
  },
};

const fronts: LineLayerSpecification = {
  id: RESULT_LAYER_IDS.fronts,
  type: "line",
  source: RESULT_SOURCE_IDS.fronts,
  paint: { "line-color": ["match", ["get", "phase"], "P", L.pFront, L.sFront], "line-width": 1.4 },
};

const frontLabels: SymbolLayerSpecification = {
  id: RESULT_LAYER_IDS.frontLabels,
  type: "symbol",
  source: RESULT_SOURCE_IDS.fronts,
  layout: {
    "symbol-placement": "line",
    "symbol-spacing": 260,
    "text-field": ["get", "label"],
    "text-font": ["Leeway Sans Semibold"],
    "text-size": 12,
    "text-keep-upright": true,
  },
  paint: { "text-color": ["match", ["get", "phase"], "P", L.pFront, L.sFront], "text-halo-color": "#ffffff", "text-halo-width": 1.6 },
};

const replayStations: CircleLayerSpecification = {
  id: RESULT_LAYER_IDS.replayStations,
  type: "circle",
  source: RESULT_SOURCE_IDS.replayStations,
  paint: { "circle-radius": byZoom(5, 6.5, 11, 11), "circle-opacity": 0, "circle-stroke-color": L.triggeredStation, "circle-stroke-width": 2.2 },
};

const site: CircleLayerSpecification = {
  id: RESULT_LAYER_IDS.site,
  type: "circle",
  source: RESULT_SOURCE_IDS.site,
  paint: { "circle-radius": 6, "circle-color": "#ffffff", "circle-stroke-color": L.siteMarker, "circle-stroke-width": 3 },
};

const EMPTY: SourceSpecification = { type: "geojson", data: { type: "FeatureCollection", features: [] } };

/** The workspace's extension of the region map, for a scenario whose warning bands have these ids. */
export function workspaceMapExtension(warningBandIds: readonly string[]): MapExtension {
  const sources = Object.fromEntries(Object.values(RESULT_SOURCE_IDS).map((id) => [id, EMPTY]));
  // Population density, when switched on, lies over the result fills: it is the layer being looked at then.
  const below: LayerSpecification[] = [
    fill(RESULT_LAYER_IDS.intensity, RESULT_SOURCE_IDS.intensity, intensityFillColour(), RESULT_FILL_OPACITY, false),
    fill(RESULT_LAYER_IDS.warning, RESULT_SOURCE_IDS.warning, warningFillColour(warningBandIds)),
    fill(RESULT_LAYER_IDS.blindZoneFill, RESULT_SOURCE_IDS.blindZone, L.blindZoneEdge, 0.18),
    fill(RESULT_LAYER_IDS.population, RESULT_SOURCE_IDS.population, populationFillColour(), 0.85, false),
  ];
  const above: LayerSpecification[] = [blindZoneLine, alertArea, facilityLines, facilityPoints, fronts, frontLabels, replayStations, ruptureLine, handles, site];
  return { sources, below, above };
}

/** The layer switches of the workspace, each with the map layers it shows or hides. */
export const LAYER_SWITCHES = [
  { id: "warning", label: "Warning seconds", layers: [RESULT_LAYER_IDS.warning], initiallyOn: true },
  { id: "intensity", label: "Intensity", layers: [RESULT_LAYER_IDS.intensity], initiallyOn: false },
  { id: "alertArea", label: "Alert area", layers: [RESULT_LAYER_IDS.alertArea], initiallyOn: true },
  { id: "blindZone", label: "Blind zone", layers: [RESULT_LAYER_IDS.blindZoneFill, RESULT_LAYER_IDS.blindZoneLine], initiallyOn: true },
  { id: "stations", label: "Stations", layers: [MAP_LAYER_IDS.stations, MAP_LAYER_IDS.stationLabels], initiallyOn: true },
  { id: "population", label: "Population density", layers: [RESULT_LAYER_IDS.population], initiallyOn: false },
  { id: "districts", label: "Districts", layers: [MAP_LAYER_IDS.districtLines, MAP_LAYER_IDS.districtLabels], initiallyOn: true },
  { id: "facilities", label: "Facilities", layers: [RESULT_LAYER_IDS.facilityLines, RESULT_LAYER_IDS.facilityPoints], initiallyOn: false },
] as const;

export type LayerSwitchId = (typeof LAYER_SWITCHES)[number]["id"];
