/**
 * A scenario to start from scratch on: a moderate crustal point source in the middle of the
 * region, today's station network, and every timing, alert and model setting left to Leeway's
 * documented defaults (so outputs say so until the planner enters their operator's figures).
 */
import type { Bbox } from "@/lib/geo";
import type { ScenarioDraft } from "./draft";

/** Sea around the region that a new scenario computes over, degrees (as the demo scenarios). */
const MARGIN_LON_DEG = 1;
const MARGIN_LAT_DEG = 0.7;
/** Vs30 off the site-condition grid, m/s: a stiff-soil placeholder, no source. */
const PLACEHOLDER_VS30_MS = 400;
/** Full-grid cell size, km. */
const CELL_KM = 2;

const tenth = (deg: number, round: (x: number) => number) => round(deg * 10) / 10;

/** The blank scenario for a region (`landBounds`, degrees) and a station network. */
export function blankScenario(name: string, landBounds: Bbox, stations: readonly { code: string; lon: number; lat: number; operating: boolean }[]): ScenarioDraft {
  const [w, s, e, n] = landBounds;
  return {
    version: 1,
    name,
    source: { lon: Math.round(((w + e) / 2) * 1e4) / 1e4, lat: Math.round(((s + n) / 2) * 1e4) / 1e4, depthKm: 10, mw: 6.5, faultType: "crustal" },
    stations: stations.map((st) => ({ id: st.code, lon: st.lon, lat: st.lat, ...(st.operating ? {} : { operating: false }) })),
    vs30: PLACEHOLDER_VS30_MS,
    area: {
      bbox: [tenth(w - MARGIN_LON_DEG, Math.floor), tenth(s - MARGIN_LAT_DEG, Math.floor), tenth(e + MARGIN_LON_DEG, Math.ceil), tenth(n + MARGIN_LAT_DEG, Math.ceil)],
      cellKm: CELL_KM,
    },
  };
}
