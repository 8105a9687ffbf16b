/**
 * Wells, D. L. & Coppersmith, K. J. (1994), New empirical relationships among magnitude, rupture
 * length, rupture width, rupture area, and surface displacement, BSSA 84(4), 974–1002, table 2A,
 * all slip types: log10 Y = a + b·M.
 *
 * Deviations: none. The data span about M 4.8–8.1 of mostly crustal events; outside that range
 * (great interface ruptures are far wider than these give) Leeway asks for length and width.
 */

/** Coefficients (a, b, σ of log10 Y) for all slip types. */
export const WELLS_COPPERSMITH_1994 = {
  surfaceRuptureLengthKm: { a: -3.22, b: 0.69, sigma: 0.22 },
  subsurfaceRuptureLengthKm: { a: -2.44, b: 0.59, sigma: 0.16 },
  downDipWidthKm: { a: -1.01, b: 0.32, sigma: 0.15 },
  areaKm2: { a: -3.49, b: 0.91, sigma: 0.24 },
  magnitudeRange: { min: 4.8, max: 8.1 },
} as const;

/** True when the relations cover magnitude `mw`. */
export function wellsCoppersmithCovers(mw: number): boolean {
  return mw >= WELLS_COPPERSMITH_1994.magnitudeRange.min && mw <= WELLS_COPPERSMITH_1994.magnitudeRange.max;
}

/** Median subsurface rupture length (km) — the one to use for a buried rupture. */
export function subsurfaceRuptureLengthKm(mw: number): number {
  const { a, b } = WELLS_COPPERSMITH_1994.subsurfaceRuptureLengthKm;
  return 10 ** (a + b * mw);
}

/** Median down-dip rupture width (km). */
export function downDipWidthKm(mw: number): number {
  const { a, b } = WELLS_COPPERSMITH_1994.downDipWidthKm;
  return 10 ** (a + b * mw);
}

/** Median rupture area (km²). */
export function ruptureAreaKm2(mw: number): number {
  const { a, b } = WELLS_COPPERSMITH_1994.areaKm2;
  return 10 ** (a + b * mw);
}
