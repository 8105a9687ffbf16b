/**
 * The source-based alert (METHODS.md §2): the system estimates the source, predicts intensity
 * everywhere with the magnitude it has at alert time, issues an alert when the largest prediction
 * in the area reaches `issueAt`, and sends it to places predicted at `areaAt` or more.
 * With several updates (a magnitude that grows), each update predicts from the rupture broken so
 * far, and a place is alerted by the first update that predicts `areaAt` there; predictions grow
 * from one update to the next (larger magnitude, nearer source), so the search is a bisection.
 */
import type { GroundMotionModel, ModelEarthquake, PreparedGroundMotion } from "../ground-motion/types";
import type { IntensityScale } from "../intensity/scales";
import { createSourceDistances, type SourceGeometry } from "../source/types";
import type { AlertStrategy, AlertUpdate, PlaceAlert, PlaceAlertEvaluator, PlaceContext } from "./types";

/** What the source strategy needs from the prepared scenario. */
export interface SourceStrategyInputs {
  earthquake: ModelEarthquake;
  model: GroundMotionModel;
  scale: IntensityScale;
  issueAt: number;
  areaAt: number;
  /** Alert messages in time order, with the magnitude each one uses. */
  updates: AlertUpdate[];
  /** The source each update predicts from (null: the scenario's full source). */
  updateSources: (SourceGeometry | null)[];
  /** Per update: the smallest model distance from its source to the area, km. */
  nearestModelDistanceKm: number[];
  /** The softest Vs30 in the area, m/s. */
  softestVs30Ms: number;
}

/** Builds the source-based strategy. */
export function sourceStrategy(inputs: SourceStrategyInputs): AlertStrategy {
  const { scale, updates, areaAt } = inputs;
  const motions: PreparedGroundMotion[] = updates.map((u) => inputs.model.prepare({ ...inputs.earthquake, mw: u.mw }));
  const { updateSources } = inputs;
  const usesPlaceIntensity = updates.map((u, k) => u.mw === inputs.earthquake.mw && updateSources[k] === null);
  const peaks = motions.map((m, k) => scale.fromLog10Pgv(m.log10PgvCms(inputs.nearestModelDistanceKm[k], inputs.softestVs30Ms)));
  const distances = createSourceDistances();
  const distanceKind = inputs.model.distanceKind;
  const issueIndex = peaks.findIndex((peak) => peak >= inputs.issueAt);
  const issued = issueIndex >= 0;
  const decidingIndex = issued ? issueIndex : updates.length - 1;
  const firstIssueS = updates[issued ? issueIndex : 0].issueS;
  const last = updates.length - 1;

  const predicted = (u: number, place: PlaceContext) => {
    if (usesPlaceIntensity[u]) return place.intensity;
    const source = updateSources[u];
    let distanceKm = place.modelDistanceKm;
    if (source) {
      source.measure(place.epicentralKm, place.eastKm, place.northKm, distances);
      distanceKm = distanceKind === "rupture" ? distances.ruptureKm : distances.joynerBooreKm;
    }
    return scale.fromLog10Pgv(motions[u].log10PgvCms(distanceKm, place.vs30Ms));
  };

  const evaluator: PlaceAlertEvaluator = {
    evaluate(_index, place, out: PlaceAlert) {
      out.issueS = firstIssueS;
      out.updateIndex = -1;
      if (!issued) {
        out.alerted = false;
        out.predictedIntensity = predicted(decidingIndex, place);
        out.alertMagnitude = updates[decidingIndex].mw;
        return;
      }
      const atLast = predicted(last, place);
      if (atLast < areaAt) {
        out.alerted = false;
        out.predictedIntensity = atLast;
        out.alertMagnitude = updates[last].mw;
        return;
      }
      let lo = issueIndex;
      let hi = last;
      let valueAtHi = atLast;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        const value = predicted(mid, place);
        if (value >= areaAt) {
          hi = mid;
          valueAtHi = value;
        } else lo = mid + 1;
      }
      out.alerted = true;
      out.updateIndex = hi;
      out.issueS = updates[hi].issueS;
      out.predictedIntensity = valueAtHi;
      out.alertMagnitude = updates[hi].mw;
    },
  };

  const notes: string[] = [];
  if (!issued) {
    notes.push(
      `no alert issued: the largest predicted intensity in the area (${peaks[decidingIndex].toFixed(2)}) is below the issue-at threshold (${inputs.issueAt})`,
    );
  }
  const magnitudes = updates.length === 1 ? `Mw ${updates[0].mw.toFixed(1)}` : `Mw ${updates[0].mw.toFixed(1)} growing to ${updates[last].mw.toFixed(1)}`;
  return {
    id: "source",
    label: `source-based (${magnitudes} at alert time)`,
    issued,
    firstIssueS,
    peakPredictedIntensity: peaks[decidingIndex],
    updates,
    firstUpdateIndex: issueIndex,
    notes,
    forPoints: () => evaluator,
    forGrid: () => evaluator,
  };
}
