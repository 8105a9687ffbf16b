/**
 * JMA seismic intensity: the official classes, and the conversion from PGV that Leeway uses.
 *
 * Classes (JMA definition): 0 (< 0.5), 1, 2, 3, 4 (3.5–4.5), 5-lower (4.5–5.0), 5-upper,
 * 6-lower, 6-upper (6.0–6.5), 7 (≥ 6.5); taken from the unrounded intensity with ≥ at each boundary.
 *
 * Conversion from surface PGV (cm/s): Midorikawa, Fujimoto & Muramatsu (1999), Journal of Social
 * Safety Science 1, 51–56:
 *
 *     I = 2.68 + 1.72·log PGV        (published for 4 ≤ I ≤ 7; extrapolated below)
 *
 * Status open: the coefficients are from memory, and another transcription credited to the same
 * paper gives 2.43 + 1.82·log PGV. Deviations: none.
 */
import type { PublishedRelation } from "../ground-motion/types";

/** JMA intensity class labels, lowest first. */
export const JMA_CLASSES = ["0", "1", "2", "3", "4", "5-", "5+", "6-", "6+", "7"] as const;
export type JmaClass = (typeof JMA_CLASSES)[number];

/** Lower bound of each class above 0 (the class at index i + 1 starts at JMA_CLASS_LOWER_BOUNDS[i]). */
export const JMA_CLASS_LOWER_BOUNDS = [0.5, 1.5, 2.5, 3.5, 4.5, 5.0, 5.5, 6.0, 6.5] as const;

/** Coefficients of the PGV conversion above. */
export const MIDORIKAWA_FUJIMOTO_MURAMATSU_1999 = { intercept: 2.68, slope: 1.72, publishedMinIntensity: 4, publishedMaxIntensity: 7 } as const;

/** The PGV → JMA conversion as shown to users. */
export const jmaFromPgvConversion: PublishedRelation = {
  id: "midorikawa-fujimoto-muramatsu-1999",
  title: "Midorikawa, Fujimoto & Muramatsu (1999) JMA intensity from PGV",
  citation: "Midorikawa, S., Fujimoto, K. & Muramatsu, I. (1999), Journal of Social Safety Science 1, 51–56",
  status: "open",
};

/** JMA instrumental intensity (unrounded) from log10 of surface PGV in cm/s. */
export function jmaIntensityFromLog10Pgv(log10PgvCms: number): number {
  return MIDORIKAWA_FUJIMOTO_MURAMATSU_1999.intercept + MIDORIKAWA_FUJIMOTO_MURAMATSU_1999.slope * log10PgvCms;
}

/** log10 of the surface PGV (cm/s) that the conversion maps to JMA intensity `intensity`. */
export function log10PgvForJmaIntensity(intensity: number): number {
  return (intensity - MIDORIKAWA_FUJIMOTO_MURAMATSU_1999.intercept) / MIDORIKAWA_FUJIMOTO_MURAMATSU_1999.slope;
}

/** Index into JMA_CLASSES of an unrounded intensity (≥ at each boundary). */
export function jmaClassIndex(intensity: number): number {
  let index = 0;
  while (index < JMA_CLASS_LOWER_BOUNDS.length && intensity >= JMA_CLASS_LOWER_BOUNDS[index]) index++;
  return index;
}

/** The class label of an unrounded JMA intensity. */
export function jmaClassOf(intensity: number): JmaClass {
  return JMA_CLASSES[jmaClassIndex(intensity)];
}
