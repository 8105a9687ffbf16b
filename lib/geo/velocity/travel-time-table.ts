/**
 * First-arrival times tabulated over hypocentral distance × source depth and interpolated
 * bilinearly, so grid loops do not solve rays per cell. The table's distance axis is the
 * straight-line (flat) hypocentral distance r = √(x² + h²), in which the direct wave is nearly
 * linear; nodes with r < h (no receiver there) hold t(0, h)·r/h so the interpolation stays linear
 * next to the source. Queries beyond the table fall back to the exact ray calculation.
 */
import type { VelocityModel } from "./models";
import { firstArrivalS, type Phase } from "./ray-travel-time";

/** Options for `buildTravelTimeTable`. */
export interface TravelTimeTableOptions {
  /** Shallowest and deepest source depth the table covers, km. */
  depthMinKm: number;
  depthMaxKm: number;
  /** Largest hypocentral distance tabulated, km. */
  maxDistanceKm: number;
  /** Node spacing along distance, km (default 1). */
  distanceStepKm?: number;
  /** Node spacing along depth, km (default 0.5: arrival branches cross at kinks in depth too). */
  depthStepKm?: number;
}

/** An interpolated first-arrival table for one phase. */
export interface TravelTimeTable {
  phase: Phase;
  model: VelocityModel;
  maxDistanceKm: number;
  /** Travel time (s) to a surface point `epicentralKm` from a source at `depthKm`. */
  timeS(epicentralKm: number, depthKm: number): number;
  /** The same from the straight-line distance `hypocentralKm` = √(x² + h²), which callers often have already. */
  timeFromHypocentralS(hypocentralKm: number, depthKm: number): number;
}

/** Builds the table by the exact ray calculation at every node. */
export function buildTravelTimeTable(model: VelocityModel, phase: Phase, options: TravelTimeTableOptions): TravelTimeTable {
  const stepR = options.distanceStepKm ?? 1;
  const stepD = options.depthStepKm ?? 0.5;
  const depthMin = options.depthMinKm;
  const depthCount = options.depthMaxKm > depthMin ? Math.ceil((options.depthMaxKm - depthMin) / stepD) + 1 : 1;
  const distanceCount = Math.max(2, Math.ceil(options.maxDistanceKm / stepR) + 1);
  const maxDistanceKm = (distanceCount - 1) * stepR;
  const values = new Float64Array(depthCount * distanceCount);
  for (let j = 0; j < depthCount; j++) {
    const depthKm = depthMin + j * stepD;
    const vertical = firstArrivalS(model, phase, 0, depthKm);
    for (let i = 0; i < distanceCount; i++) {
      const r = i * stepR;
      values[j * distanceCount + i] =
        r < depthKm ? (vertical * r) / depthKm : firstArrivalS(model, phase, Math.sqrt(r * r - depthKm * depthKm), depthKm);
    }
  }
  const lastDistance = distanceCount - 2;
  const lastDepth = Math.max(0, depthCount - 2);
  /** Bilinear interpolation at hypocentral distance `r` (within the table) and `depthKm`. */
  const interpolate = (r: number, depthKm: number): number => {
    const fr = r / stepR;
    const i = Math.min(lastDistance, Math.floor(fr));
    const wr = fr - i;
    if (depthCount === 1) return values[i] + wr * (values[i + 1] - values[i]);
    const fd = Math.min(depthCount - 1, Math.max(0, (depthKm - depthMin) / stepD));
    const j = Math.min(lastDepth, Math.floor(fd));
    const wd = fd - j;
    const a = j * distanceCount + i;
    const b = a + distanceCount;
    const near = values[a] + wr * (values[a + 1] - values[a]);
    const far = values[b] + wr * (values[b + 1] - values[b]);
    return near + wd * (far - near);
  };
  return {
    phase,
    model,
    maxDistanceKm,
    timeS(epicentralKm, depthKm) {
      const r = Math.sqrt(epicentralKm * epicentralKm + depthKm * depthKm);
      return r > maxDistanceKm ? firstArrivalS(model, phase, epicentralKm, depthKm) : interpolate(r, depthKm);
    },
    timeFromHypocentralS(r, depthKm) {
      return r > maxDistanceKm ? firstArrivalS(model, phase, Math.sqrt(Math.max(0, r * r - depthKm * depthKm)), depthKm) : interpolate(r, depthKm);
    },
  };
}
