/**
 * Per-cell values of population cells (primary-channel warning seconds, intensity, alerted), for
 * callers that need more than the sums of `computeExposureWith` — e.g. a transition matrix of
 * people between the warning bands of two scenarios. Both walk the cells with `walkCells`, so a
 * cell falls in the same band there and here.
 */
import { walkCells } from "./cell-walk";
import type { Engine } from "./engine";
import type { PopulationCells } from "./exposure";

/** Values per population cell, parallel to the cells' arrays. */
export interface PopulationValues {
  /** Primary-channel warning seconds (NaN where no alert can reach the cell), s. */
  warningS: Float64Array;
  /** Intensity on the scenario's scale. */
  intensity: Float64Array;
  /** 1 where the cell is alerted. */
  alerted: Uint8Array;
}

/** Evaluates every population cell with an engine prepared for a scenario (cells with no people included). */
export function evaluatePopulationCells(engine: Engine, cells: Pick<PopulationCells, "lon" | "lat">): PopulationValues {
  const count = cells.lon.length;
  const out: PopulationValues = { warningS: new Float64Array(count), intensity: new Float64Array(count), alerted: new Uint8Array(count) };
  walkCells(engine, cells.lon, cells.lat, (i, v) => {
    out.warningS[i] = v.warningS;
    out.intensity[i] = v.intensity;
    out.alerted[i] = v.alert.alerted ? 1 : 0;
  });
  return out;
}
