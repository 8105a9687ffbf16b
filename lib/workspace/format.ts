/**
 * How the workspace prints numbers (the site-card browser test compares with the CLI at these
 * precisions). Warning seconds are shown rounded down to whole seconds (BRIEF item 5).
 */
import { displayedWarningS } from "@/lib/geo";

/** Times after origin and delays, s, to a tenth. */
export const formatTimeS = (s: number) => s.toFixed(1);
/** Distances, km, to a tenth. */
export const formatKm = (km: number) => km.toFixed(1);
/** Areas, km², whole. */
export const formatAreaKm2 = (km2: number) => Math.round(km2).toLocaleString("en");
/** Warning seconds as planners see them: whole seconds, rounded down. */
export const formatWarningS = (s: number) => String(displayedWarningS(s));
/** PGV (cm/s) and PGA (cm/s²): three significant figures. */
export const formatMotion = (value: number) => value.toPrecision(3);
/** Intensity values: two decimals (classes are taken from the unrounded value). */
export const formatIntensity = (value: number) => value.toFixed(2);
