/**
 * Values at named sites (a site card, the CLI's `sites` command, facilities): distances on the
 * ellipsoid by GeographicLib, then the shared per-place calculation.
 */
import type { Scenario } from "@/lib/scenario/schema";
import { prepareEngine, type Engine, type EngineOptions } from "./engine";
import { jmaClassOf, jmaIntensityFromLog10Pgv, type JmaClass } from "./intensity/jma";
import { mmiClassOf, mmiFromLog10Pgv, type MmiClass } from "./intensity/mmi-worden-2012";
import { localOffsetKm } from "./local-frame";
import { createPlaceValues, evaluateAlert, evaluateShaking, pExceedTarget } from "./place";
import { CAUTION, type Provenance } from "./provenance";
import { MODEL_VS30_RANGE_MS } from "./vs30";

/** A site to evaluate: lon/lat in degrees, optional Vs30 in m/s (else the scenario's site conditions). */
export interface SiteInput {
  id: string;
  lon: number;
  lat: number;
  vs30?: number;
}

/** One delivery channel's figures at a site. */
export interface SiteChannelResult {
  channel: string;
  deliveryS: number;
  /** When the alert reaches the site through this channel, s after origin (null: no alert can reach it). */
  alertS: number | null;
  warningS: number | null;
}

/** Everything Leeway computes for a site (times s after origin; warning at full precision). */
export interface SiteResult {
  id: string;
  lon: number;
  lat: number;
  vs30Ms: number;
  epicentralKm: number;
  hypocentralKm: number;
  ruptureKm: number;
  joynerBooreKm: number;
  pArrivalS: number;
  sArrivalS: number;
  peakShakingS: number;
  /** The first S is a head wave (Sn): warning errs on the short (safe) side. */
  sIsHeadWave: boolean;
  /** When the alert for this site is (or would be) issued; null when no alert can reach it. */
  alertIssuedS: number | null;
  /** Primary channel: when the alert reaches the site. */
  alertS: number | null;
  /** Primary channel: sArrivalS − alertS (computed whether or not the site is alerted). */
  warningS: number | null;
  alerted: boolean;
  /** Intensity on the scenario's scale (`intensityScale`) and its class. */
  intensity: number;
  intensityClass: string;
  /** Intensity the system predicts at alert time, on the scenario's scale. */
  predictedIntensity: number;
  /** The magnitude behind that prediction (null for the wavefield strategy). */
  alertMw: number | null;
  pgvCms: number;
  pgaCms2: number;
  jmaIntensity: number;
  jmaClass: JmaClass;
  /** Worden et al. (2012) from PGV, without the magnitude–distance term. */
  mmi: number;
  mmiClass: MmiClass;
  /** P(intensity ≥ alert.target), ground-motion scatter only. */
  pExceedTarget: number;
  extrapolated: boolean;
  byChannel: SiteChannelResult[];
}

/** Result of `computeSites`. */
export interface SitesResult {
  sites: SiteResult[];
  alertIssued: boolean;
  notes: string[];
  caution: string;
  provenance: Provenance;
}

const orNull = (value: number) => (Number.isNaN(value) ? null : value);

/** Evaluates sites with an engine already prepared for the scenario. */
export function evaluateSites(engine: Engine, sites: readonly SiteInput[]): SiteResult[] {
  const values = createPlaceValues();
  const evaluator = engine.strategy.forPoints();
  return sites.map((site) => {
    const offset = localOffsetKm(engine.scenario.source.lon, engine.scenario.source.lat, site.lon, site.lat);
    const vs30Ms =
      site.vs30 === undefined ? engine.vs30.vs30At(site.lon, site.lat) : Math.min(MODEL_VS30_RANGE_MS.max, Math.max(MODEL_VS30_RANGE_MS.min, site.vs30));
    evaluateShaking(engine, offset.distanceKm, offset.eastKm, offset.northKm, vs30Ms, values);
    evaluateAlert(engine, evaluator, 0, site.lon, site.lat, values);
    const issueS = values.alert.issueS;
    const jmaIntensity = jmaIntensityFromLog10Pgv(values.log10PgvCms);
    const mmi = mmiFromLog10Pgv(values.log10PgvCms);
    return {
      id: site.id,
      lon: site.lon,
      lat: site.lat,
      vs30Ms,
      epicentralKm: values.epicentralKm,
      hypocentralKm: values.hypocentralKm,
      ruptureKm: values.ruptureKm,
      joynerBooreKm: values.joynerBooreKm,
      pArrivalS: values.pArrivalS,
      sArrivalS: values.sArrivalS,
      peakShakingS: values.peakShakingS,
      sIsHeadWave: values.sIsHeadWave,
      alertIssuedS: orNull(issueS),
      alertS: orNull(values.alertS),
      warningS: orNull(values.warningS),
      alerted: values.alert.alerted,
      intensity: values.intensity,
      intensityClass: engine.scale.classes[engine.scale.classIndex(values.intensity)],
      predictedIntensity: values.alert.predictedIntensity,
      alertMw: orNull(values.alert.alertMagnitude),
      pgvCms: 10 ** values.log10PgvCms,
      pgaCms2: 10 ** engine.motion.log10PgaCms2(values.modelDistanceKm, vs30Ms),
      jmaIntensity,
      jmaClass: jmaClassOf(jmaIntensity),
      mmi,
      mmiClass: mmiClassOf(mmi),
      pExceedTarget: pExceedTarget(engine, values),
      extrapolated: values.extrapolated,
      byChannel: engine.timeline.channels.map((c) => ({
        channel: c.id,
        deliveryS: c.deliveryS,
        alertS: orNull(issueS + c.deliveryS),
        warningS: orNull(values.sArrivalS - (issueS + c.deliveryS)),
      })),
    };
  });
}

/** Computes every site of `sites` for a parsed scenario. */
export function computeSites(scenario: Scenario, sites: readonly SiteInput[], options: EngineOptions = {}): SitesResult {
  const engine = prepareEngine(scenario, options, sites.map((s) => [s.lon, s.lat]));
  return {
    sites: evaluateSites(engine, sites),
    alertIssued: engine.strategy.issued,
    notes: engine.notes,
    caution: CAUTION,
    provenance: engine.provenance,
  };
}
