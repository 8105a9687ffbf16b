/**
 * The wavefield alert, after the published PLUM idea (Kodera et al. 2018, from memory): no source
 * estimate; a place is alerted when a station within `radiusKm` records shaking at or above
 * `areaAt`, at the moment that station's strong shaking arrives plus telemetry and processing.
 * The alert goes out at all once some station records `issueAt`. The predicted intensity of a
 * place is the intensity of the station that alerts it. Station shaking is the scenario's median
 * prediction at the station.
 */
import { havLongitude, lambertDistanceFromTermsKm, lambertDistanceKm, lambertLatitudeTerms } from "../distance";
import { columnLonDeg, rowLatDeg, type GridGeometry } from "../grid-geometry";
import { radiiOfCurvatureKm, reducedLatitudeRad } from "../wgs84";
import type { AlertStrategy, PlaceAlert, PlaceAlertEvaluator } from "./types";

const DEG = Math.PI / 180;

/** A station's predicted record. */
export interface StationRecord {
  id: string;
  lon: number;
  lat: number;
  /** Intensity at the station on the scenario's scale. */
  intensity: number;
  /** Strong-shaking arrival + telemetry + processing, s after origin. */
  triggerS: number;
}

/** What the wavefield strategy needs. */
export interface WavefieldStrategyInputs {
  stations: StationRecord[];
  issueAt: number;
  areaAt: number;
  radiusKm: number;
}

/** Builds the wavefield strategy. */
export function wavefieldStrategy(inputs: WavefieldStrategyInputs): AlertStrategy {
  const { radiusKm } = inputs;
  const triggering = inputs.stations.filter((s) => s.intensity >= inputs.areaAt).sort((a, b) => a.triggerS - b.triggerS || a.id.localeCompare(b.id));
  const issuing = inputs.stations.filter((s) => s.intensity >= inputs.issueAt);
  const issued = issuing.length > 0;
  const firstIssueS = issued ? Math.min(...issuing.map((s) => s.triggerS)) : Number.NaN;
  const peak = inputs.stations.reduce((m, s) => Math.max(m, s.intensity), -Infinity);
  const latMarginDeg = radiusKm / 110 + 0.01;

  const decide = (triggerS: number, intensity: number, out: PlaceAlert) => {
    out.alertMagnitude = Number.NaN;
    out.predictedIntensity = intensity;
    out.alerted = issued && !Number.isNaN(triggerS);
    out.updateIndex = out.alerted ? 0 : -1;
    out.issueS = issued && out.alerted ? Math.max(triggerS, firstIssueS) : triggerS;
  };

  const forPoints = (): PlaceAlertEvaluator => ({
    evaluate(_index, place, out) {
      const lon = place.lonDeg;
      const lat = place.latDeg;
      const lonMarginDeg = latMarginDeg / Math.max(0.05, Math.cos(lat * DEG));
      for (const station of triggering) {
        if (Math.abs(station.lat - lat) > latMarginDeg) continue;
        const dLon = Math.abs(((station.lon - lon + 540) % 360) - 180);
        if (dLon > lonMarginDeg) continue;
        if (lambertDistanceKm(station.lon, station.lat, lon, lat) <= radiusKm) return decide(station.triggerS, station.intensity, out);
      }
      decide(Number.NaN, Number.NaN, out);
    },
  });

  const forGrid = (g: GridGeometry): PlaceAlertEvaluator => {
    const cells = g.width * g.height;
    const triggerS = new Float32Array(cells).fill(Number.NaN);
    const intensity = new Float32Array(cells).fill(Number.NaN);
    const [west, south, east, north] = g.bbox;
    const centre = (west + east) / 2;
    for (const station of triggering) {
      const stationLon = station.lon + 360 * Math.round((centre - station.lon) / 360);
      const { meridianKm, primeVerticalKm } = radiiOfCurvatureKm(station.lat);
      const dLat = radiusKm / (meridianKm * DEG) + g.cellLatDeg;
      const rowFrom = Math.max(0, Math.floor((north - (station.lat + dLat)) / g.cellLatDeg));
      const rowTo = Math.min(g.height - 1, Math.ceil((north - (station.lat - dLat)) / g.cellLatDeg));
      const farLat = Math.min(89, Math.max(Math.abs(station.lat + dLat), Math.abs(station.lat - dLat)));
      const dLon = radiusKm / (primeVerticalKm * Math.cos(farLat * DEG) * DEG) + g.cellLonDeg;
      const colFrom = Math.max(0, Math.floor((stationLon - dLon - west) / g.cellLonDeg));
      const colTo = Math.min(g.width - 1, Math.ceil((stationLon + dLon - west) / g.cellLonDeg));
      if (rowFrom > rowTo || colFrom > colTo || station.lat - dLat > north || station.lat + dLat < south) continue;
      const beta = reducedLatitudeRad(station.lat);
      for (let row = rowFrom; row <= rowTo; row++) {
        const terms = lambertLatitudeTerms(beta, rowLatDeg(g, row));
        for (let c = colFrom; c <= colTo; c++) {
          const i = row * g.width + c;
          // Stations come in trigger order: the first to reach a cell is its earliest.
          if (!Number.isNaN(triggerS[i])) continue;
          if (lambertDistanceFromTermsKm(terms, havLongitude(columnLonDeg(g, c) - stationLon)) <= radiusKm) {
            triggerS[i] = station.triggerS;
            intensity[i] = station.intensity;
          }
        }
      }
    }
    return {
      evaluate(index, _place, out) {
        decide(triggerS[index], intensity[index], out);
      },
    };
  };

  const notes = [
    `wavefield strategy: places within ${radiusKm} km of a station recording intensity ${inputs.areaAt} or more are alerted when that station's strong shaking arrives, plus telemetry and processing`,
  ];
  if (!issued) notes.push(`no alert issued: no station records the issue-at intensity (${inputs.issueAt}); the largest is ${peak.toFixed(2)}`);
  return {
    id: "wavefield",
    label: `wavefield (stations within ${radiusKm} km)`,
    issued,
    firstIssueS,
    peakPredictedIntensity: peak,
    updates: issued ? [{ issueS: firstIssueS, mw: Number.NaN }] : [],
    firstUpdateIndex: issued ? 0 : -1,
    notes,
    forPoints,
    forGrid,
  };
}
