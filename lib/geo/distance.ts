/**
 * Distances on the WGS84 ellipsoid (METHODS.md §1b). GeographicLib for single points (sites,
 * stations); Lambert's formula for long lines for many points at a time (grids, population cells).
 * Spherical (haversine) distance is not used for seismic distances: it is up to 0.56 % off.
 */
import { Geodesic } from "geographiclib-geodesic";
import { WGS84, reducedLatitudeRad } from "./wgs84";

const DEG = Math.PI / 180;
const HALF_F = WGS84.flattening / 2;
const A_KM = WGS84.equatorialRadiusKm;

/** Geodesic distance (km) and forward azimuth (degrees clockwise from north) from point 1 to point 2, by GeographicLib. */
export function geodesicInverse(lon1: number, lat1: number, lon2: number, lat2: number): { distanceKm: number; azimuthDeg: number } {
  const r = Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2, Geodesic.DISTANCE | Geodesic.AZIMUTH);
  return { distanceKm: (r.s12 ?? 0) / 1000, azimuthDeg: r.azi1 ?? 0 };
}

/** Geodesic distance in km between two lon/lat points (degrees), by GeographicLib. */
export function geodesicDistanceKm(lon1: number, lat1: number, lon2: number, lat2: number): number {
  return geodesicInverse(lon1, lat1, lon2, lat2).distanceKm;
}

/**
 * The parts of Lambert's formula that depend only on the two latitudes. Lambert (1942): the
 * central angle σ between the reduced latitudes, corrected to first order in the flattening:
 *   d = a·(σ − f/2·(X + Y)),  X = (σ − sin σ)·sin²P·cos²Q / cos²(σ/2),  Y = (σ + sin σ)·cos²P·sin²Q / sin²(σ/2)
 * with P = (β1 + β2)/2, Q = (β2 − β1)/2.
 */
export interface LambertLatitudeTerms {
  /** sin²((β2 − β1)/2) */
  havDeltaBeta: number;
  /** cos β1 · cos β2 */
  cosProduct: number;
  /** sin²P · cos²Q */
  xFactor: number;
  /** cos²P · sin²Q */
  yFactor: number;
}

/** Lambert terms for an origin at reduced latitude `originBetaRad` and a point at geodetic `latDeg`. */
export function lambertLatitudeTerms(originBetaRad: number, latDeg: number): LambertLatitudeTerms {
  const beta = reducedLatitudeRad(latDeg);
  const p = (originBetaRad + beta) / 2;
  const q = (beta - originBetaRad) / 2;
  const sinP = Math.sin(p);
  const cosP = Math.cos(p);
  const sinQ = Math.sin(q);
  const cosQ = Math.cos(q);
  return {
    havDeltaBeta: sinQ * sinQ,
    cosProduct: Math.cos(originBetaRad) * Math.cos(beta),
    xFactor: sinP * sinP * cosQ * cosQ,
    yFactor: cosP * cosP * sinQ * sinQ,
  };
}

/** sin²(Δλ/2) for a longitude difference in degrees: the only longitude term Lambert's formula needs. */
export function havLongitude(deltaLonDeg: number): number {
  const s = Math.sin((deltaLonDeg * DEG) / 2);
  return s * s;
}

/** Lambert's distance (km) from the latitude terms and sin²(Δλ/2); allocation-free, for grid loops. */
export function lambertDistanceFromTermsKm(t: LambertLatitudeTerms, havLon: number): number {
  const h = t.havDeltaBeta + t.cosProduct * havLon;
  if (h <= 0) return 0;
  const sigma = 2 * Math.asin(Math.sqrt(Math.min(1, h)));
  const sinSigma = Math.sin(sigma);
  const x = ((sigma - sinSigma) * t.xFactor) / (1 - h);
  const y = ((sigma + sinSigma) * t.yFactor) / h;
  return A_KM * (sigma - HALF_F * (x + y));
}

/** Lambert's ellipsoidal distance in km between two lon/lat points (degrees); within 0.0002 % of GeographicLib from 1 to 1,000 km. */
export function lambertDistanceKm(lon1: number, lat1: number, lon2: number, lat2: number): number {
  return lambertDistanceFromTermsKm(lambertLatitudeTerms(reducedLatitudeRad(lat1), lat2), havLongitude(lon2 - lon1));
}

/**
 * Lambert distances (km) from one origin to many points, written into `outKm`.
 * Arrays are parallel: point i is (lonDeg[i], latDeg[i]).
 */
export function lambertDistancesKm(
  originLon: number,
  originLat: number,
  lonDeg: ArrayLike<number>,
  latDeg: ArrayLike<number>,
  outKm: Float64Array,
): Float64Array {
  const originBeta = reducedLatitudeRad(originLat);
  for (let i = 0; i < outKm.length; i++) {
    outKm[i] = lambertDistanceFromTermsKm(lambertLatitudeTerms(originBeta, latDeg[i]), havLongitude(lonDeg[i] - originLon));
  }
  return outKm;
}
