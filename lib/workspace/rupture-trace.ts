/**
 * The finite rupture's extent along strike, drawn on the map as a line through the epicentre
 * with a handle at each end. Unilateral: the hypocentre (under the epicentre) is the starting
 * end and the rupture runs `lengthKm` in the strike direction; bilateral: it sits in the middle.
 * Dragging one end keeps the other where it was and sets strike, length and epicentre from the
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

/**
 * Strike (0–360°), length (km) and epicentre once one end of the trace is at `to` and the other
 * at `fixed` (where it was when the drag began: re-deriving it from rounded form values at every
 * step would let it drift).
 */
export function dragRuptureEnd(mode: TraceRupture["mode"], which: "start" | "end", fixed: LonLat, to: LonLat): { epicentre: LonLat; strikeDeg: number; lengthKm: number } | null {
  const start = which === "start" ? to : fixed;
  const end = which === "end" ? to : fixed;
  const offset = localOffsetKm(start.lon, start.lat, end.lon, end.lat);
  if (offset.distanceKm < 1e-6) return null;
  const strikeDeg = (Math.atan2(offset.eastKm, offset.northKm) / DEG + 360) % 360;
  if (mode === "unilateral") return { epicentre: start, strikeDeg, lengthKm: offset.distanceKm };
  const [lon, lat] = pointAtOffset(start.lon, start.lat, offset.eastKm / 2, offset.northKm / 2);
  return { epicentre: { lon, lat }, strikeDeg, lengthKm: offset.distanceKm };
}
