/**
 * Per-cell values of population cells (primary-channel warning seconds, intensity, alerted), for
 * callers that need more than the sums of `computeExposureWith` — e.g. a transition matrix of
 * people between the warning bands of two scenarios. The distance loop is the one of
 * `computeExposureWith` (Lambert's ellipsoidal distance with the latitude terms reused along a
 * row), so the cells fall in the same bands there and here.
 */
import { havLongitude, lambertDistanceFromTermsKm, lambertLatitudeTerms, type LambertLatitudeTerms } from "./distance";
import type { Engine } from "./engine";
import type { PopulationCells } from "./exposure";
import { createPlaceValues, evaluateAlert, evaluateShaking } from "./place";
import { reducedLatitudeRad } from "./wgs84";

const DEG = Math.PI / 180;

/** Values per population cell, parallel to the cells' arrays. */
export interface PopulationValues {
  /** Primary-channel warning seconds (NaN where no alert can reach the cell), s. */
  warningS: Float64Array;
  /** Intensity on the scenario's scale. */
  intensity: Float64Array;
  /** 1 where the cell is alerted. */
  alerted: Uint8Array;
}

/** Evaluates every population cell with an engine prepared for a scenario (cells with no people included). */
export function evaluatePopulationCells(engine: Engine, cells: Pick<PopulationCells, "lon" | "lat">): PopulationValues {
  const count = cells.lon.length;
  const out: PopulationValues = { warningS: new Float64Array(count), intensity: new Float64Array(count), alerted: new Uint8Array(count) };
  const { lon: lon0, lat: lat0 } = engine.scenario.source;
  const originBeta = reducedLatitudeRad(lat0);
  const sinB1 = Math.sin(originBeta);
  const cosB1 = Math.cos(originBeta);
  const needsFrame = engine.source.needsLocalFrame;
  const evaluator = engine.strategy.forPoints();
  const v = createPlaceValues();
  let lastLat = Number.NaN;
  let terms: LambertLatitudeTerms = lambertLatitudeTerms(originBeta, 0);
  let sinB2 = 0;
  let cosB2 = 1;
  for (let i = 0; i < count; i++) {
    const lon = cells.lon[i];
    const lat = cells.lat[i];
    if (lat !== lastLat) {
      terms = lambertLatitudeTerms(originBeta, lat);
      const beta = reducedLatitudeRad(lat);
      sinB2 = Math.sin(beta);
      cosB2 = Math.cos(beta);
      lastLat = lat;
    }
    const epicentralKm = lambertDistanceFromTermsKm(terms, havLongitude(lon - lon0));
    let eastKm = 0;
    let northKm = 0;
    if (needsFrame && epicentralKm > 0) {
      const dLon = (lon - lon0) * DEG;
      const e = Math.sin(dLon) * cosB2;
      const n = cosB1 * sinB2 - sinB1 * cosB2 * Math.cos(dLon);
      const norm = Math.hypot(e, n);
      eastKm = (epicentralKm * e) / norm;
      northKm = (epicentralKm * n) / norm;
    }
    evaluateShaking(engine, epicentralKm, eastKm, northKm, engine.vs30.vs30At(lon, lat), v);
    evaluateAlert(engine, evaluator, i, lon, lat, v);
    out.warningS[i] = v.warningS;
    out.intensity[i] = v.intensity;
    out.alerted[i] = v.alert.alerted ? 1 : 0;
  }
  return out;
}
