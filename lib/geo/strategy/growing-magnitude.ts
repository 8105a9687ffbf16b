/**
 * A magnitude that grows with the rupture (BRIEF item 10): the system's estimate at time t is
 * limited by the rupture length broken by then, through the slope of Wells & Coppersmith's (1994)
 * subsurface length relation anchored at the scenario's Mw and full length:
 *
 *     M(t) = Mw + log10(L(t) / L) / 0.59
 *
 * The first alert uses M at the moment it is issued; an update follows each time the estimate has
 * grown by `stepMw`, until the rupture is complete. Each message predicts from the part of the
 * rupture broken by then (its full down-dip width). The estimate follows the rupture with no
 * further latency (an ideal system).
 */
import { WELLS_COPPERSMITH_1994 } from "../source/wells-coppersmith-1994";
import type { FiniteRupture } from "../source/finite-rupture";
import type { AlertUpdate } from "./types";

/** Magnitude step between updates. */
export const GROWING_MAGNITUDE_STEP_MW = 0.1;
const LOWEST_MW = 3;

/** The magnitude estimate `timeS` after origin. */
export function growingMagnitudeAt(rupture: FiniteRupture, mw: number, timeS: number): number {
  const broken = rupture.brokenLengthKm(timeS);
  if (broken <= 0) return LOWEST_MW;
  const slope = WELLS_COPPERSMITH_1994.subsurfaceRuptureLengthKm.b;
  return Math.min(mw, Math.max(LOWEST_MW, mw + Math.log10(broken / rupture.spec.lengthKm) / slope));
}

/** The alert messages: the first at `firstIssueS`, then one per magnitude step until Mw. */
export function growingMagnitudeUpdates(rupture: FiniteRupture, mw: number, firstIssueS: number, stepMw = GROWING_MAGNITUDE_STEP_MW): AlertUpdate[] {
  const first = growingMagnitudeAt(rupture, mw, firstIssueS);
  const updates: AlertUpdate[] = [{ issueS: firstIssueS, mw: first, brokenLengthKm: rupture.brokenLengthKm(firstIssueS) }];
  const slope = WELLS_COPPERSMITH_1994.subsurfaceRuptureLengthKm.b;
  const perSecondKm = rupture.brokenLengthKm(1);
  for (let m = first + stepMw; m < mw - 1e-9; m += stepMw) {
    const lengthKm = rupture.spec.lengthKm * 10 ** (slope * (m - mw));
    updates.push({ issueS: lengthKm / perSecondKm, mw: m, brokenLengthKm: lengthKm });
  }
  if (first < mw) updates.push({ issueS: rupture.spec.lengthKm / perSecondKm, mw, brokenLengthKm: rupture.spec.lengthKm });
  return updates;
}
