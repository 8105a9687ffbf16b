/**
 * An azimuthal equidistant frame around a point (the epicentre): east and north offsets in km
 * that keep the true ellipsoidal distance from the origin. Used for finite-rupture geometry,
 * where distances to points a few tens of km from the origin matter.
 */
import { Geodesic } from "geographiclib-geodesic";

const DEG = Math.PI / 180;

/** East/north offsets (km) of (lon, lat) from the origin, by GeographicLib (exact distance and azimuth). */
export function localOffsetKm(originLon: number, originLat: number, lon: number, lat: number): { distanceKm: number; eastKm: number; northKm: number } {
  const r = Geodesic.WGS84.Inverse(originLat, originLon, lat, lon, Geodesic.DISTANCE | Geodesic.AZIMUTH);
  const distanceKm = (r.s12 ?? 0) / 1000;
  const azimuth = (r.azi1 ?? 0) * DEG;
  return { distanceKm, eastKm: distanceKm * Math.sin(azimuth), northKm: distanceKm * Math.cos(azimuth) };
}

/** The lon/lat (degrees) at east/north offsets (km) from the origin: the inverse of `localOffsetKm`. */
export function pointAtOffset(originLon: number, originLat: number, eastKm: number, northKm: number): [number, number] {
  const distanceKm = Math.hypot(eastKm, northKm);
  if (distanceKm === 0) return [originLon, originLat];
  const azimuthDeg = Math.atan2(eastKm, northKm) / DEG;
  const r = Geodesic.WGS84.Direct(originLat, originLon, azimuthDeg, distanceKm * 1000, Geodesic.LATITUDE | Geodesic.LONGITUDE | Geodesic.LONG_UNROLL);
  return [r.lon2 ?? Number.NaN, r.lat2 ?? Number.NaN];
}
