/**
 * The alert strategy a scenario asks for, built from the engine's shaking machinery: source-based
 * (a fixed or growing magnitude) or wavefield.
 */
import type { ShakingEngine } from "./engine";
import { nearestModelDistanceKm, sourceSurfacePoints } from "./engine-source";
import { localOffsetKm } from "./local-frame";
import { createPlaceValues, evaluateShaking } from "./place";
import { finiteRupture } from "./source/finite-rupture";
import { growingMagnitudeUpdates } from "./strategy/growing-magnitude";
import { sourceStrategy } from "./strategy/source-strategy";
import type { AlertStrategy, AlertUpdate } from "./strategy/types";
import { wavefieldStrategy, type StationRecord } from "./strategy/wavefield-strategy";
import type { AlertTimeline } from "./timeline";

/** Each operating station's predicted record for the wavefield strategy. */
function stationRecords(engine: ShakingEngine): StationRecord[] {
  const { lon: lon0, lat: lat0 } = engine.scenario.source;
  const { telemetryS, processingS } = engine.scenario.timing;
  const values = createPlaceValues();
  return engine.scenario.stations
    .filter((s) => s.operating)
    .map((station) => {
      const offset = localOffsetKm(lon0, lat0, station.lon, station.lat);
      evaluateShaking(engine, offset.distanceKm, offset.eastKm, offset.northKm, engine.vs30.vs30At(station.lon, station.lat), values);
      return { id: station.id, lon: station.lon, lat: station.lat, intensity: values.intensity, triggerS: values.peakShakingS + telemetryS + processingS };
    });
}

/** The strategy of `scenario.alert`, with its messages and their magnitudes. */
export function buildAlertStrategy(shaking: ShakingEngine, timeline: AlertTimeline): AlertStrategy {
  const { scenario, rupture, source, model, scale, earthquake, vs30 } = shaking;
  const { alert } = scenario;
  if (alert.strategy === "wavefield") {
    return wavefieldStrategy({ stations: stationRecords(shaking), issueAt: alert.issueAt, areaAt: alert.areaAt, radiusKm: alert.wavefieldRadiusKm });
  }
  const mw = scenario.source.mw;
  const growing = alert.magnitude === "growing" && rupture !== null;
  const updates: AlertUpdate[] = growing
    ? growingMagnitudeUpdates(rupture, mw, timeline.alertIssuedS)
    : [{ issueS: timeline.alertIssuedS, mw: alert.magnitude === "growing" ? mw : alert.magnitude }];
  // A growing rupture's messages predict from the part broken so far; the last one is the whole rupture.
  const updateSources = updates.map((u) =>
    growing && u.brokenLengthKm !== undefined && u.brokenLengthKm < rupture.spec.lengthKm ? finiteRupture({ ...rupture.spec, lengthKm: Math.max(0.1, u.brokenLengthKm) }) : null,
  );
  return sourceStrategy({
    earthquake,
    model,
    scale,
    issueAt: alert.issueAt,
    areaAt: alert.areaAt,
    updates,
    updateSources,
    nearestModelDistanceKm: updateSources.map((partial) => nearestModelDistanceKm(scenario, partial ?? source, model, sourceSurfacePoints(scenario, partial ?? rupture))),
    softestVs30Ms: vs30.minVs30Ms,
  });
}
