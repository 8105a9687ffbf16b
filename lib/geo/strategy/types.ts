import type { GridGeometry } from "../grid-geometry";
import type { AlertStrategyId } from "./ids";

/** What an alert strategy decides for one place. */
export interface PlaceAlert {
  /**
   * When the alert for this place is issued (s after origin, before delivery). For places that
   * are not alerted, the moment it would have been issued; NaN when no alert can reach the place.
   */
  issueS: number;
  alerted: boolean;
  /** The intensity the system predicts for the place when it decides (alert-time magnitude). */
  predictedIntensity: number;
  /** The magnitude behind that prediction (NaN for strategies without one). */
  alertMagnitude: number;
  /** Which of the strategy's `updates` alerts the place (−1: not alerted). */
  updateIndex: number;
}

/** A zeroed `PlaceAlert` to reuse in loops. */
export function createPlaceAlert(): PlaceAlert {
  return { issueS: Number.NaN, alerted: false, predictedIntensity: Number.NaN, alertMagnitude: Number.NaN, updateIndex: -1 };
}

/** What a strategy may look at for a place (filled by the per-place calculation). */
export interface PlaceContext {
  lonDeg: number;
  latDeg: number;
  epicentralKm: number;
  /** Offsets from the epicentre in its azimuthal equidistant frame, km. */
  eastKm: number;
  northKm: number;
  /** The ground-motion model's distance to the full source, km. */
  modelDistanceKm: number;
  vs30Ms: number;
  /** Intensity from the source's true Mw. */
  intensity: number;
}

/** Decides places one at a time (allocation-free). */
export interface PlaceAlertEvaluator {
  /** `index` is the cell index for grid evaluators (ignored for points). */
  evaluate(index: number, place: PlaceContext, out: PlaceAlert): void;
}

/** One alert message the system sends: when it is issued and with what magnitude (NaN: none). */
export interface AlertUpdate {
  issueS: number;
  mw: number;
  /** For a growing rupture: the length broken when the message is issued, km. */
  brokenLengthKm?: number;
}

/** How an alert system decides who is alerted and when (BRIEF item 10). */
export interface AlertStrategy {
  id: AlertStrategyId;
  /** Plain words for legends and provenance. */
  label: string;
  issued: boolean;
  /** The first moment an alert is issued, s after origin (the would-be moment when none is issued; NaN when there is none). */
  firstIssueS: number;
  /** The largest intensity the system expects anywhere in the area when it decides to issue. */
  peakPredictedIntensity: number;
  /** Alert messages in time order. */
  updates: AlertUpdate[];
  /** Index in `updates` of the first message actually issued (−1: none). */
  firstUpdateIndex: number;
  notes: string[];
  forPoints(): PlaceAlertEvaluator;
  forGrid(geometry: GridGeometry): PlaceAlertEvaluator;
}
