import { NO_ALERT_BAND, warningBandIndex, warningBands, type WarningBand } from "@/lib/geo";
import { roundLargestRemainder } from "@/lib/geo/rounding";

/** People moved between warning bands from one version (A, rows) to another (B, columns). */
export interface TransitionMatrix {
  /** Rows and columns: A's warning bands, then "no alert reaches" when some cell has no alert in A or B. */
  bands: WarningBand[];
  matrix: number[][];
  rowTotals: number[];
  columnTotals: number[];
  totalPopulation: number;
  /** People in a band with more warning in B than in A, and with less (the "no alert" row and column left out). */
  movedToMoreWarning: number;
  movedToLessWarning: number;
}

/**
 * Cross-tabulates people by their warning band in A and in B (primary channel, alerted or not).
 * The matrix is rounded as one table by largest remainder, so its cells add up to
 * round(Σ people), each row to A's people in that band and each column to B's.
 */
export function transitionMatrix(warningA: ArrayLike<number>, warningB: ArrayLike<number>, people: ArrayLike<number>, breaksS: readonly number[]): TransitionMatrix {
  if (warningA.length !== people.length || warningB.length !== people.length) throw new Error("warning and people arrays must be parallel");
  const bands = warningBands(breaksS);
  const slots = bands.length + 1;
  const sums = new Float64Array(slots * slots);
  let total = 0;
  for (let i = 0; i < people.length; i++) {
    const p = people[i];
    if (!(p > 0)) continue;
    const a = warningBandIndex(warningA[i], breaksS);
    const b = warningBandIndex(warningB[i], breaksS);
    sums[(a < 0 ? bands.length : a) * slots + (b < 0 ? bands.length : b)] += p;
    total += p;
  }
  const totalPopulation = Math.round(total);
  const rounded = roundLargestRemainder(sums, totalPopulation);
  const full = Array.from({ length: slots }, (_, r) => Array.from(rounded.subarray(r * slots, (r + 1) * slots)));
  // The "no alert" row and column appear only when someone is in them.
  const keep = full.length - 1;
  const hasNoAlert = full[keep].some((v) => v > 0) || full.some((row) => row[keep] > 0);
  const size = hasNoAlert ? slots : bands.length;
  const matrix = full.slice(0, size).map((row) => row.slice(0, size));
  let movedToMoreWarning = 0;
  let movedToLessWarning = 0;
  for (let r = 0; r < bands.length; r++) {
    for (let c = 0; c < bands.length; c++) {
      if (c > r) movedToMoreWarning += matrix[r][c];
      else if (c < r) movedToLessWarning += matrix[r][c];
    }
  }
  return {
    bands: hasNoAlert ? [...bands, NO_ALERT_BAND] : bands,
    matrix,
    rowTotals: matrix.map((row) => row.reduce((a, b) => a + b, 0)),
    columnTotals: matrix[0].map((_, c) => matrix.reduce((sum, row) => sum + row[c], 0)),
    totalPopulation,
    movedToMoreWarning,
    movedToLessWarning,
  };
}
