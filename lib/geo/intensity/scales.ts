import type { PublishedRelation } from "../ground-motion/types";
import {
  JMA_CLASSES,
  JMA_CLASS_LOWER_BOUNDS,
  jmaClassIndex,
  jmaFromPgvConversion,
  jmaIntensityFromLog10Pgv,
  log10PgvForJmaIntensity,
} from "./jma";
import {
  MMI_CLASSES,
  MMI_CLASS_LOWER_BOUNDS,
  log10PgvForMmi,
  mmiClassIndex,
  mmiFromLog10Pgv,
  mmiFromPgvConversion,
} from "./mmi-worden-2012";

/** The intensity scales a region can choose. */
export const INTENSITY_SCALE_IDS = ["jma", "mmi"] as const;
export type IntensityScaleId = (typeof INTENSITY_SCALE_IDS)[number];

/** One intensity scale with the conversion from PGV that Leeway uses for it. */
export interface IntensityScale {
  id: IntensityScaleId;
  label: string;
  /** Class labels, lowest first. */
  classes: readonly string[];
  /** classes[i + 1] starts at classLowerBounds[i] (≥ at the boundary). */
  classLowerBounds: readonly number[];
  conversion: PublishedRelation;
  /** Intensity values below this lie outside the conversion's published range (−Infinity: none). */
  publishedMinIntensity: number;
  fromLog10Pgv(log10PgvCms: number): number;
  log10PgvFor(intensity: number): number;
  classIndex(intensity: number): number;
}

/** JMA instrumental intensity from PGV (Midorikawa, Fujimoto & Muramatsu 1999; status open). */
export const jmaScale: IntensityScale = {
  id: "jma",
  label: "JMA seismic intensity",
  classes: JMA_CLASSES,
  classLowerBounds: JMA_CLASS_LOWER_BOUNDS,
  conversion: jmaFromPgvConversion,
  publishedMinIntensity: 4,
  fromLog10Pgv: jmaIntensityFromLog10Pgv,
  log10PgvFor: log10PgvForJmaIntensity,
  classIndex: jmaClassIndex,
};

/** Modified Mercalli Intensity from PGV (Worden et al. 2012, without the magnitude–distance term). */
export const mmiScale: IntensityScale = {
  id: "mmi",
  label: "Modified Mercalli Intensity",
  classes: MMI_CLASSES,
  classLowerBounds: MMI_CLASS_LOWER_BOUNDS,
  conversion: mmiFromPgvConversion,
  publishedMinIntensity: -Infinity,
  fromLog10Pgv: mmiFromLog10Pgv,
  log10PgvFor: log10PgvForMmi,
  classIndex: mmiClassIndex,
};

/** The scale object for an id. */
export function getIntensityScale(id: IntensityScaleId): IntensityScale {
  return id === "jma" ? jmaScale : mmiScale;
}
