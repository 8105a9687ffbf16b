/**
 * The region's local plane: x km east and y km north of a fixed origin in the far South Pacific.
 * The island is drawn in this plane and mapped to lon/lat by the local scale of the WGS84
 * ellipsoid at the origin (meridional and prime-vertical radii), an affine map: straight lines
 * and point-in-polygon answers are the same in both frames, so the cell, district and coastline
 * tests agree whichever frame they run in.
 */

/** A point in the local plane, [xKm east, yKm north] of the origin. */
export type KmPoint = readonly [number, number];

/** The plane's origin, degrees; about 2,500 km from the nearest real land (tested). */
export const REGION_ORIGIN = { lon: -126.2, lat: -46.9 } as const;

const WGS84_A_KM = 6378.137;
const WGS84_F = 1 / 298.257223563;
const E2 = WGS84_F * (2 - WGS84_F);
const RAD = Math.PI / 180;

const sinLat = Math.sin(REGION_ORIGIN.lat * RAD);
const meridionalRadiusKm = (WGS84_A_KM * (1 - E2)) / Math.pow(1 - E2 * sinLat * sinLat, 1.5);
const primeVerticalRadiusKm = WGS84_A_KM / Math.sqrt(1 - E2 * sinLat * sinLat);

/** Kilometres per degree of latitude at the origin. */
export const KM_PER_DEG_LAT = meridionalRadiusKm * RAD;
/** Kilometres per degree of longitude at the origin. */
export const KM_PER_DEG_LON = primeVerticalRadiusKm * Math.cos(REGION_ORIGIN.lat * RAD) * RAD;

/** Local plane → [lon, lat] in degrees. */
export function toLonLat([xKm, yKm]: KmPoint): [number, number] {
  return [REGION_ORIGIN.lon + xKm / KM_PER_DEG_LON, REGION_ORIGIN.lat + yKm / KM_PER_DEG_LAT];
}

/** [lon, lat] in degrees → local plane. */
export function toKm(lon: number, lat: number): [number, number] {
  return [(lon - REGION_ORIGIN.lon) * KM_PER_DEG_LON, (lat - REGION_ORIGIN.lat) * KM_PER_DEG_LAT];
}

/** The point `distanceKm` from `from` towards the compass azimuth `azimuthDeg` (0 = north, 90 = east). */
export function offsetKm(from: KmPoint, azimuthDeg: number, distanceKm: number): [number, number] {
  return [from[0] + distanceKm * Math.sin(azimuthDeg * RAD), from[1] + distanceKm * Math.cos(azimuthDeg * RAD)];
}

/** Rounds degrees to `decimals` places (5 places ≈ 1 m), so stored coordinates read cleanly. */
export function roundDeg(deg: number, decimals = 5): number {
  const scale = 10 ** decimals;
  return Math.round(deg * scale) / scale;
}

/** Straight-line distance in the local plane, km. */
export function planeDistanceKm(a: KmPoint, b: KmPoint): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}
