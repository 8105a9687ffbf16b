/**
 * Modified Mercalli Intensity from ground motion.
 *
 * Worden, C. B., Gerstenberger, M. C., Rhoades, D. A. & Wald, D. J. (2012), Probabilistic
 * relationships between ground-motion parameters and Modified Mercalli Intensity in California,
 * BSSA 102(1), 204–221, eq. 3 and table 1:
 *
 *     MMI = c1 + c2·log Y   for log Y ≤ t1;   MMI = c3 + c4·log Y   otherwise
 *
 * with the optional magnitude–distance term MMI += c5 + c6·log R + c7·M (eq. 5, table 2).
 * Deviations: none. MMI classes are MMI rounded to the nearest integer and clipped to I–X
 * (common practice, no source).
 */
import type { PublishedRelation } from "../ground-motion/types";

/** MMI class labels, I first. */
export const MMI_CLASSES = ["I", "II", "III", "IV", "V", "VI", "VII", "VIII", "IX", "X"] as const;
export type MmiClass = (typeof MMI_CLASSES)[number];

/** Lower bound of each class above I under nearest-integer rounding (class II starts at 1.5). */
export const MMI_CLASS_LOWER_BOUNDS = [1.5, 2.5, 3.5, 4.5, 5.5, 6.5, 7.5, 8.5, 9.5] as const;

interface WordenCoefficients {
  c1: number;
  c2: number;
  c3: number;
  c4: number;
  t1: number;
  sigmaMmi: number;
  c5: number;
  c6: number;
  c7: number;
}

/** Table 1 and 2 of the paper: Y is PGA in cm/s² or PGV in cm/s. */
export const WORDEN_2012: { pga: WordenCoefficients; pgv: WordenCoefficients } = {
  pga: { c1: 1.78, c2: 1.55, c3: -1.6, c4: 3.7, t1: 1.57, sigmaMmi: 0.73, c5: -0.91, c6: 1.02, c7: -0.17 },
  pgv: { c1: 3.78, c2: 1.47, c3: 2.89, c4: 3.16, t1: 0.53, sigmaMmi: 0.65, c5: 0.9, c6: 0, c7: -0.18 },
};

/** The PGV → MMI conversion as shown to users. */
export const mmiFromPgvConversion: PublishedRelation = {
  id: "worden-2012",
  title: "Worden, Gerstenberger, Rhoades & Wald (2012) MMI from PGV",
  citation: "Worden, C. B., Gerstenberger, M. C., Rhoades, D. A. & Wald, D. J. (2012), BSSA 102(1), 204–221",
  status: "checked",
};

function mmiFromLog10(k: WordenCoefficients, log10Y: number): number {
  return log10Y <= k.t1 ? k.c1 + k.c2 * log10Y : k.c3 + k.c4 * log10Y;
}

/** MMI (unrounded) from log10 PGV in cm/s, without the magnitude–distance term. */
export function mmiFromLog10Pgv(log10PgvCms: number): number {
  return mmiFromLog10(WORDEN_2012.pgv, log10PgvCms);
}

/** MMI (unrounded) from log10 PGA in cm/s², without the magnitude–distance term. */
export function mmiFromLog10Pga(log10PgaCms2: number): number {
  return mmiFromLog10(WORDEN_2012.pga, log10PgaCms2);
}

/** The optional magnitude–distance term of eq. 5 for PGV, added to `mmiFromLog10Pgv`; R in km. */
export function mmiPgvMagnitudeDistanceTerm(mw: number, distanceKm: number): number {
  const k = WORDEN_2012.pgv;
  return k.c5 + k.c6 * Math.log10(distanceKm) + k.c7 * mw;
}

/**
 * log10 of the PGV (cm/s) that maps to `mmi`. The two branches leave a gap of 0.006 MMI at t1;
 * values in it map to t1.
 */
export function log10PgvForMmi(mmi: number): number {
  const k = WORDEN_2012.pgv;
  const lower = (mmi - k.c1) / k.c2;
  if (lower <= k.t1) return lower;
  return Math.max(k.t1, (mmi - k.c3) / k.c4);
}

/** Index into MMI_CLASSES: the nearest integer, clipped to I–X. */
export function mmiClassIndex(mmi: number): number {
  return Math.min(9, Math.max(0, Math.round(mmi) - 1));
}

/** The class label of an unrounded MMI. */
export function mmiClassOf(mmi: number): MmiClass {
  return MMI_CLASSES[mmiClassIndex(mmi)];
}
