/**
 * The finite rupture's extent along strike, drawn on the map as a line through the epicentre
 * with a handle at each end. Unilateral: the hypocentre (under the epicentre) is the starting
 * end and the rupture runs `lengthKm` in the strike direction; bilateral: it sits in the middle.
 * Dragging one end keeps the other where it is and sets strike, length and epicentre from the
 * two ends. Offsets on the WGS84 ellipsoid (GeographicLib, via lib/geo).
 */
import { localOffsetKm, pointAtOffset } from "@/lib/geo";

const DEG = Math.PI / 180;

/** A point, degrees. */
export interface LonLat {
  lon: number;
  lat: number;
}

/** What the trace needs of the rupture. */
export interface TraceRupture {
  strikeDeg: number;
  lengthKm: number;
  mode: "unilateral" | "bilateral";
}

/** The two ends of the rupture along strike: where it starts and where it ends (strike direction). */
export function ruptureTraceEnds(epicentre: LonLat, rupture: TraceRupture): { start: LonLat; end: LonLat } {
  const alongStartKm = rupture.mode === "bilateral" ? -rupture.lengthKm / 2 : 0;
  const alongEndKm = alongStartKm + rupture.lengthKm;
  const east = Math.sin(rupture.strikeDeg * DEG);
  const north = Math.cos(rupture.strikeDeg * DEG);
  const at = (alongKm: number): LonLat => {
    const [lon, lat] = pointAtOffset(epicentre.lon, epicentre.lat, alongKm * east, alongKm * north);
    return { lon, lat };
  };
  return { start: at(alongStartKm), end: at(alongEndKm) };
}

/** Strike (0–360°), length (km) and epicentre after one end of the trace is dragged to `to`. */
export function dragRuptureEnd(epicentre: LonLat, rupture: TraceRupture, which: "start" | "end", to: LonLat): { epicentre: LonLat; strikeDeg: number; lengthKm: number } {
  const ends = ruptureTraceEnds(epicentre, rupture);
  const start = which === "start" ? to : ends.start;
  const end = which === "end" ? to : ends.end;
  const offset = localOffsetKm(start.lon, start.lat, end.lon, end.lat);
  if (offset.distanceKm < 1e-6) return { epicentre, strikeDeg: rupture.strikeDeg, lengthKm: rupture.lengthKm };
  const strikeDeg = (Math.atan2(offset.eastKm, offset.northKm) / DEG + 360) % 360;
  if (rupture.mode === "unilateral") return { epicentre: start, strikeDeg, lengthKm: offset.distanceKm };
  const [lon, lat] = pointAtOffset(start.lon, start.lat, offset.eastKm / 2, offset.northKm / 2);
  return { epicentre: { lon, lat }, strikeDeg, lengthKm: offset.distanceKm };
}
