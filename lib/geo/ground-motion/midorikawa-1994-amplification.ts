/**
 * Amplification of PGV by the ground above engineering bedrock, from Vs30.
 *
 * Midorikawa, S., Matsuoka, M. & Sakugawa, K. (1994), site effects on strong-motion records of a
 * 1987 earthquake, Proc. 9th Japan Earthquake Engineering Symposium 3, 85–90:
 *
 *     log ARV = 1.83 − 0.66·log Vs30        (100 ≤ Vs30 ≤ 1500 m/s)
 *
 * Deviations: none; ARV is used exactly as printed (ARV(600 m/s) = 0.992, not rescaled to 1).
 * Status: the slope reproduces the 1.31 factor between 600 and 400 m/s used by national hazard
 * maps; the intercept is from memory.
 */
import type { PublishedRelation } from "./types";

/** Coefficients of the equation above. */
export const MIDORIKAWA_1994 = { intercept: 1.83, slope: -0.66, minVs30Ms: 100, maxVs30Ms: 1500 } as const;

/** Description shown beside results that use this amplification. */
export const midorikawa1994Amplification: PublishedRelation = {
  id: "midorikawa-1994",
  title: "Midorikawa, Matsuoka & Sakugawa (1994) PGV amplification from Vs30",
  citation:
    "Midorikawa, S., Matsuoka, M. & Sakugawa, K. (1994), Proc. 9th Japan Earthquake Engineering Symposium 3, 85–90",
  status: "from memory",
};

/** log10 of the PGV amplification ratio ARV for a site of `vs30Ms` (m/s), relative to engineering bedrock. */
export function log10AmplificationRatio(vs30Ms: number): number {
  return MIDORIKAWA_1994.intercept + MIDORIKAWA_1994.slope * Math.log10(vs30Ms);
}
