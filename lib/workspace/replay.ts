/**
 * The replay of a scenario in time: when the P and S waves reach each distance, when each station
 * picks the P wave, and when the alert is issued and reaches each channel's users. Built from the
 * engine (prepareEngine: its alert timeline and travel-time tables), so replay times are the same
 * ones the grid and the site card use.
 */
import { lambertDistanceKm, pointAtOffset, prepareEngine, type StationPick } from "@/lib/geo";
import type { Scenario } from "@/lib/scenario/schema";

/** A station in the replay: the alert timeline's pick (distance from the epicentre and P arrival). */
export type ReplayStation = StationPick;

/** Everything the replay draws. Times in s after origin, distances epicentral km. */
export interface ReplayModel {
  epicentre: { lon: number; lat: number };
  depthKm: number;
  stations: ReplayStation[];
  triggerStations: number;
  detectionS: number;
  alertIssuedS: number;
  alertIssued: boolean;
  channels: { id: string; deliveryS: number; alertS: number }[];
  /** Travel-time curves sampled every `stepKm` from 0 to twice `maxDistanceKm` (the P front runs ahead of the S wave). */
  curve: { stepKm: number; pS: Float64Array; sS: Float64Array };
  maxDistanceKm: number;
  /** End of the replay: the S wave at the far edge of the area, or 10 s after the last alert. */
  endS: number;
}

const CURVE_STEP_KM = 0.5;
/** The P wave is about Vp/Vs ≈ 1.7 times as far as the S wave: sampling to twice the area's reach covers it until the replay ends. */
const CURVE_REACH_FACTOR = 2;

/** Farthest point of the scenario area from the epicentre, km. */
function reachKm(scenario: Scenario): number {
  const [w, s, e, n] = scenario.area.bbox;
  const { lon, lat } = scenario.source;
  let reach = 0;
  for (const x of [w, (w + e) / 2, e]) for (const y of [s, (s + n) / 2, n]) reach = Math.max(reach, lambertDistanceKm(lon, lat, x, y));
  return reach;
}

/** Builds the replay for a parsed scenario; `alertIssued` comes from the grid (the issue threshold). */
export function buildReplayModel(scenario: Scenario, alertIssued: boolean): ReplayModel {
  const engine = prepareEngine(scenario);
  const depthKm = scenario.source.depthKm;
  const maxDistanceKm = Math.ceil(reachKm(scenario));
  const samples = Math.floor((CURVE_REACH_FACTOR * maxDistanceKm) / CURVE_STEP_KM) + 1;
  const pS = new Float64Array(samples);
  const sS = new Float64Array(samples);
  for (let i = 0; i < samples; i++) {
    pS[i] = engine.pTable.timeS(i * CURVE_STEP_KM, depthKm);
    sS[i] = engine.sTable.timeS(i * CURVE_STEP_KM, depthKm);
  }
  const { timeline } = engine;
  const lastAlertS = Math.max(...timeline.channels.map((c) => c.alertS));
  return {
    epicentre: { lon: scenario.source.lon, lat: scenario.source.lat },
    depthKm,
    stations: timeline.stations.map((s) => ({ id: s.id, lon: s.lon, lat: s.lat, epicentralKm: s.epicentralKm, pArrivalS: s.pArrivalS, operating: s.operating })),
    triggerStations: timeline.triggerStations,
    detectionS: timeline.detectionS,
    alertIssuedS: timeline.alertIssuedS,
    alertIssued,
    channels: timeline.channels.map((c) => ({ id: c.id, deliveryS: c.deliveryS, alertS: c.alertS })),
    curve: { stepKm: CURVE_STEP_KM, pS, sS },
    maxDistanceKm,
    endS: Math.ceil(Math.max(engine.sTable.timeS(maxDistanceKm, depthKm), lastAlertS + 10)),
  };
}

/**
 * Epicentral distance (km) the wave front has reached at `timeS`: where t(Δ) = timeS, by linear
 * interpolation between samples (first arrivals grow with distance). Null before the wave reaches
 * the surface above the hypocentre; the last sample once it has passed it.
 */
export function frontDistanceKm(model: ReplayModel, phase: "P" | "S", timeS: number): number | null {
  const times = phase === "P" ? model.curve.pS : model.curve.sS;
  if (timeS < times[0]) return null;
  let lo = 0;
  let hi = times.length - 1;
  if (timeS >= times[hi]) return hi * model.curve.stepKm;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid] <= timeS) lo = mid;
    else hi = mid;
  }
  const fraction = (timeS - times[lo]) / (times[hi] - times[lo]);
  return (lo + fraction) * model.curve.stepKm;
}

/** Operating stations that have picked the P wave by `timeS` (t ≥ their P time). */
export function triggeredStations(model: ReplayModel, timeS: number): ReplayStation[] {
  return model.stations.filter((s) => s.operating && timeS >= s.pArrivalS);
}

/** A closed ring (lon/lat) at `radiusKm` from the epicentre on the ellipsoid, for drawing a front. */
export function frontRing(model: ReplayModel, radiusKm: number, segments = 120): [number, number][] {
  const ring: [number, number][] = [];
  for (let i = 0; i <= segments; i++) {
    const azimuth = (2 * Math.PI * (i % segments)) / segments;
    ring.push(pointAtOffset(model.epicentre.lon, model.epicentre.lat, radiusKm * Math.sin(azimuth), radiusKm * Math.cos(azimuth)));
  }
  return ring;
}
