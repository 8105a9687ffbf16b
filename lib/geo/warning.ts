/**
 * Warning seconds and bands (METHODS.md §2): warning = S arrival − (alert issued + delivery).
 * Bands are half-open (a, b]; "blind" is warning ≤ 0. Places no alert can reach (the wavefield
 * strategy far from stations) fall in no band ("no alert").
 */

/** One warning band: `lowerS < warning ≤ upperS`; `null` bounds are open. */
export interface WarningBand {
  id: string;
  label: string;
  lowerS: number | null;
  upperS: number | null;
}

/** The band for warning ≤ 0 s. */
export const BLIND_BAND: WarningBand = { id: "blind", label: "blind zone (≤ 0 s)", lowerS: null, upperS: 0 };

/** The row for places no alert reaches (not a band of warning seconds). */
export const NO_ALERT_BAND: WarningBand = { id: "no-alert", label: "no alert reaches", lowerS: null, upperS: null };

/** The bands for `breaksS` (increasing, starting at 0): blind, (0, b1], …, (bn, ∞). */
export function warningBands(breaksS: readonly number[]): WarningBand[] {
  const bands = [BLIND_BAND];
  for (let i = 0; i < breaksS.length; i++) {
    const lowerS = breaksS[i];
    const upperS = i + 1 < breaksS.length ? breaksS[i + 1] : null;
    bands.push(
      upperS === null
        ? { id: `${lowerS}+`, label: `more than ${lowerS} s`, lowerS, upperS: null }
        : { id: `${lowerS}-${upperS}`, label: `(${lowerS}, ${upperS}] s`, lowerS, upperS },
    );
  }
  return bands;
}

/** Index into `warningBands(breaksS)` of a warning time; −1 for NaN (no alert reaches). */
export function warningBandIndex(warningS: number, breaksS: readonly number[]): number {
  if (Number.isNaN(warningS)) return -1;
  let index = 0;
  while (index < breaksS.length && warningS > breaksS[index]) index++;
  return index;
}

/**
 * Closed-form blind-zone radius (epicentral km) for a homogeneous model:
 * Δ = √((Vs·T)² − h²) with T = alert issued + delivery (0 when Vs·T < h).
 */
export function homogeneousBlindZoneRadiusKm(vsKms: number, depthKm: number, alertReachS: number): number {
  const reach = vsKms * alertReachS;
  return reach > depthKm ? Math.sqrt(reach * reach - depthKm * depthKm) : 0;
}

/** Warning seconds as shown to planners: rounded down to whole seconds (the engine keeps full precision). */
export function displayedWarningS(warningS: number): number {
  return Math.floor(warningS);
}
