/**
 * The per-cell loop shared by exposure and per-cell population values: Lambert's ellipsoidal
 * distance from the epicentre with the latitude terms reused while the latitude repeats (cells
 * usually come row by row), the local east/north frame where the source needs it, then shaking
 * and the alert at the cell. One loop, so a cell falls in the same band wherever it is counted.
 */
import { havLongitude, lambertDistanceFromTermsKm, lambertLatitudeTerms, type LambertLatitudeTerms } from "./distance";
import type { Engine } from "./engine";
import { createPlaceValues, evaluateAlert, evaluateShaking, type PlaceValues } from "./place";
import { reducedLatitudeRad } from "./wgs84";

const DEG = Math.PI / 180;

/**
 * Evaluates each cell `i` of the lon/lat arrays (degrees) for which `include(i)` holds, and hands
 * its values to `visit`. The `PlaceValues` object is reused: copy what you keep.
 */
export function walkCells(
  engine: Engine,
  lon: Float64Array,
  lat: Float64Array,
  visit: (index: number, values: PlaceValues) => void,
  include?: (index: number) => boolean,
): void {
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
  for (let i = 0; i < lon.length; i++) {
    if (include && !include(i)) continue;
    const lonDeg = lon[i];
    const latDeg = lat[i];
    if (latDeg !== lastLat) {
      terms = lambertLatitudeTerms(originBeta, latDeg);
      const beta = reducedLatitudeRad(latDeg);
      sinB2 = Math.sin(beta);
      cosB2 = Math.cos(beta);
      lastLat = latDeg;
    }
    const epicentralKm = lambertDistanceFromTermsKm(terms, havLongitude(lonDeg - lon0));
    let eastKm = 0;
    let northKm = 0;
    if (needsFrame && epicentralKm > 0) {
      const dLon = (lonDeg - lon0) * DEG;
      const e = Math.sin(dLon) * cosB2;
      const n = cosB1 * sinB2 - sinB1 * cosB2 * Math.cos(dLon);
      const norm = Math.hypot(e, n);
      eastKm = (epicentralKm * e) / norm;
      northKm = (epicentralKm * n) / norm;
    }
    evaluateShaking(engine, epicentralKm, eastKm, northKm, engine.vs30.vs30At(lonDeg, latDeg), v);
    evaluateAlert(engine, evaluator, i, lonDeg, latDeg, v);
    visit(i, v);
  }
}
