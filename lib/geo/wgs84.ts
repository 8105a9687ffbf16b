/** WGS84 ellipsoid (NIMA TR8350.2): equatorial radius in km and flattening. */
export const WGS84 = { equatorialRadiusKm: 6378.137, flattening: 1 / 298.257223563 } as const;

const DEG = Math.PI / 180;

/** Reduced (parametric) latitude β in radians, tan β = (1 − f)·tan φ, for a geodetic latitude in degrees. */
export function reducedLatitudeRad(latDeg: number): number {
  return Math.atan((1 - WGS84.flattening) * Math.tan(latDeg * DEG));
}

/** Meridian and prime-vertical radii of curvature (km) at a geodetic latitude in degrees. */
export function radiiOfCurvatureKm(latDeg: number): { meridianKm: number; primeVerticalKm: number } {
  const f = WGS84.flattening;
  const e2 = f * (2 - f);
  const s = Math.sin(latDeg * DEG);
  const w = Math.sqrt(1 - e2 * s * s);
  return {
    meridianKm: (WGS84.equatorialRadiusKm * (1 - e2)) / (w * w * w),
    primeVerticalKm: WGS84.equatorialRadiusKm / w,
  };
}
