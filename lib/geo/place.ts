/**
 * Everything Leeway computes for one place, in one allocation-free function shared by sites,
 * grids and population cells — so the CLI, the worker and the server give identical numbers for
 * the same point and distance.
 */
import type { Engine, ShakingEngine } from "./engine";
import type { SourceDistances } from "./source/types";
import { createPlaceAlert, type PlaceAlert, type PlaceAlertEvaluator, type PlaceContext } from "./strategy/types";
import { probabilityOfExceedance } from "./uncertainty";

/**
 * Values for one place (s after origin, km, cm/s, intensity on the scenario's scale): the
 * distances, the context a strategy reads (position, model distance, Vs30, intensity), and these.
 */
export interface PlaceValues extends SourceDistances, PlaceContext {
  pArrivalS: number;
  /** First S arrival, s. */
  sArrivalS: number;
  /** Rupture time to the nearest rupture point plus S travel from there (= sArrivalS for a point source), s. */
  peakShakingS: number;
  /** True when the first S is a head wave (Sn): warning errs on the short side. */
  sIsHeadWave: boolean;
  log10PgvCms: number;
  /** Beyond the model's data (distance or magnitude). */
  extrapolated: boolean;
  alert: PlaceAlert;
  /** Primary-channel alert time (issue + delivery), s; NaN when no alert can reach the place. */
  alertS: number;
  /** Primary-channel warning seconds: sArrivalS − alertS. */
  warningS: number;
}

/** A blank `PlaceValues` to reuse in loops (numbers start as NaN for the reason given at `createSourceDistances`). */
export function createPlaceValues(): PlaceValues {
  const nan = Number.NaN;
  return {
    hypocentralKm: nan,
    ruptureKm: nan,
    joynerBooreKm: nan,
    ruptureTimeS: nan,
    nearestDepthKm: nan,
    nearestHorizontalKm: nan,
    lonDeg: nan,
    latDeg: nan,
    epicentralKm: nan,
    eastKm: nan,
    northKm: nan,
    modelDistanceKm: nan,
    pArrivalS: nan,
    sArrivalS: nan,
    peakShakingS: nan,
    sIsHeadWave: false,
    vs30Ms: nan,
    log10PgvCms: nan,
    intensity: nan,
    extrapolated: false,
    alert: createPlaceAlert(),
    alertS: nan,
    warningS: nan,
  };
}

/**
 * Travel times, distances and median shaking (true Mw) for a surface place `epicentralKm` from
 * the epicentre (east/north offsets for finite ruptures), on a site of `vs30Ms`.
 */
export function evaluateShaking(engine: ShakingEngine, epicentralKm: number, eastKm: number, northKm: number, vs30Ms: number, out: PlaceValues): void {
  const depthKm = engine.scenario.source.depthKm;
  engine.source.measure(epicentralKm, eastKm, northKm, out);
  out.epicentralKm = epicentralKm;
  out.eastKm = eastKm;
  out.northKm = northKm;
  out.pArrivalS = engine.pTable.timeFromHypocentralS(out.hypocentralKm, depthKm);
  out.sArrivalS = engine.sTable.timeFromHypocentralS(out.hypocentralKm, depthKm);
  out.peakShakingS = engine.source.kind === "point" ? out.sArrivalS : peakShakingS(engine, out);
  out.sIsHeadWave = epicentralKm >= engine.sHeadWaveFromKm;
  out.modelDistanceKm = engine.model.distanceKind === "rupture" ? out.ruptureKm : out.joynerBooreKm;
  out.vs30Ms = vs30Ms;
  out.log10PgvCms = engine.motion.log10PgvCms(out.modelDistanceKm, vs30Ms);
  out.intensity = engine.scale.fromLog10Pgv(out.log10PgvCms);
  out.extrapolated = out.modelDistanceKm > engine.motion.dataLimitKm || engine.motion.magnitudeExtrapolated;
}

/** Strong shaking from a finite rupture: rupture time to the nearest point + S travel from it. */
function peakShakingS(engine: ShakingEngine, d: SourceDistances): number {
  const table = engine.peakSTable;
  return d.ruptureTimeS + (table ? table.timeS(d.nearestHorizontalKm, d.nearestDepthKm) : Number.NaN);
}

/** The alert decision and primary-channel warning for a place whose shaking is in `out`. */
export function evaluateAlert(engine: Engine, evaluator: PlaceAlertEvaluator, index: number, lonDeg: number, latDeg: number, out: PlaceValues): void {
  out.lonDeg = lonDeg;
  out.latDeg = latDeg;
  evaluator.evaluate(index, out, out.alert);
  out.alertS = out.alert.issueS + engine.timeline.channels[0].deliveryS;
  out.warningS = out.sArrivalS - out.alertS;
}

/** P(intensity ≥ target) at a place from the model's sigma (ground-motion scatter only). */
export function pExceedTarget(engine: Engine, out: PlaceValues): number {
  return probabilityOfExceedance(out.log10PgvCms, engine.log10PgvTarget, engine.motion.sigmaLog10Pgv(out.modelDistanceKm, out.vs30Ms));
}
