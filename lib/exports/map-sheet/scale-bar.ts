/**
 * The map sheet's scale bar, for a Web Mercator map (MapLibre): across the frame, longitude is
 * linear in x, so one point of paper spans (east − west) / frameWidth degrees of longitude, and at
 * the sheet's centre latitude φ a degree of longitude is (π/180)·N(φ)·cos φ km on the WGS84
 * ellipsoid, N(φ) = a / √(1 − e² sin² φ) the prime-vertical radius (the length of an arc of the
 * parallel). The bar is the roundest length (1, 2 or 5 × 10ⁿ km) that fits the given width.
 */

/** WGS84 semi-major axis, km, and first eccentricity squared (NIMA TR8350.2). */
const WGS84_A_KM = 6378.137;
const WGS84_E2 = 0.00669437999014;

/** Kilometres along the parallel per degree of longitude at latitude `latDeg`, WGS84. */
export function kmPerDegreeLongitude(latDeg: number): number {
  const phi = (latDeg * Math.PI) / 180;
  const primeVerticalKm = WGS84_A_KM / Math.sqrt(1 - WGS84_E2 * Math.sin(phi) ** 2);
  return (Math.PI / 180) * primeVerticalKm * Math.cos(phi);
}

/** A scale bar: its length on the ground and on paper. */
export interface ScaleBar {
  km: number;
  lengthPt: number;
  /** "10 km", "500 m". */
  label: string;
}

/** Kilometres of ground per point of paper at the centre of a frame spanning `westDeg`..`eastDeg`. */
export function kmPerPoint(westDeg: number, eastDeg: number, frameWidthPt: number, centreLatDeg: number): number {
  return ((eastDeg - westDeg) / frameWidthPt) * kmPerDegreeLongitude(centreLatDeg);
}

/** The longest round length that is at most `maxLengthPt` long on paper. */
export function scaleBarFor(kmPerPt: number, maxLengthPt: number): ScaleBar {
  const maxKm = kmPerPt * maxLengthPt;
  // 10^floor(log10 max) ≤ max, so one of 5, 2, 1 times it always fits.
  const magnitude = 10 ** Math.floor(Math.log10(maxKm));
  const km = ([5, 2, 1].find((m) => m * magnitude <= maxKm) ?? 1) * magnitude;
  const label = km >= 1 ? `${Number(km.toPrecision(6))} km` : `${Math.round(km * 1000)} m`;
  return { km, lengthPt: km / kmPerPt, label };
}
