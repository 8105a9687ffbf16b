import type { Region, RegionSource, RegionStation } from "./region";

/** Sea around the island that the demo scenarios compute over, degrees beyond the land's bounding box. */
const AREA_MARGIN_LON_DEG = 1;
const AREA_MARGIN_LAT_DEG = 0.7;
/** Vs30 where the site-condition layer has no cell (the sea), m/s: a stiff-soil placeholder, no source. */
const OFF_GRID_VS30_MS = 400;

const floorTenth = (deg: number) => Math.floor(deg * 10) / 10;
const ceilTenth = (deg: number) => Math.ceil(deg * 10) / 10;

/**
 * The scenario file (lib/scenario, version 1) of one demo source. Delays are the documented
 * defaults and placeholders (METHODS §2); channel delivery times are placeholders, no source.
 */
export function demoScenarioFile(region: Region, source: RegionSource, stations: readonly RegionStation[]) {
  const [west, south, east, north] = region.bbox;
  return {
    version: 1,
    name: source.name,
    source: {
      lon: source.lon,
      lat: source.lat,
      depthKm: source.depthKm,
      mw: source.mw,
      faultType: source.faultType,
      mechanism: source.mechanism,
      // The demo hypocentres sit at the middle of their ruptures, which then grow both ways.
      rupture: { ...source.rupture, mode: "bilateral" },
    },
    stations: stations.map((s) => ({ id: s.code, lon: s.lon, lat: s.lat, operating: s.operating })),
    velocityModel: { kind: "layered", name: "iasp91" },
    timing: { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 },
    channels: [
      { id: "cell-broadcast", deliveryS: 5 },
      { id: "phone-app", deliveryS: 3 },
      { id: "sirens", deliveryS: 10 },
    ],
    vs30: OFF_GRID_VS30_MS,
    area: {
      bbox: [floorTenth(west - AREA_MARGIN_LON_DEG), floorTenth(south - AREA_MARGIN_LAT_DEG), ceilTenth(east + AREA_MARGIN_LON_DEG), ceilTenth(north + AREA_MARGIN_LAT_DEG)],
      cellKm: 2,
    },
  };
}
