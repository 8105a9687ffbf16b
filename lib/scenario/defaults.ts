/**
 * Default settings for everything a scenario file may leave out, each with its status
 * (METHODS.md §2), and `defaultsUsedBy` to tell which of them a scenario relies on.
 */
import type { IntensityScaleId } from "@/lib/geo/intensity/scales";
import { DEFAULT_GROUND_MOTION_MODEL_ID } from "@/lib/geo/ground-motion/registry";
import type { Scenario } from "./schema";

/** Where a default comes from, in the words shown to users. */
export interface DocumentedDefault<T> {
  value: T;
  status: string;
}

/** Alert-system timing defaults (METHODS.md §2 table). */
export const DEFAULT_TIMING = {
  triggerStations: { value: 2, status: "practice of national services: an event is declared once two stations have picked the P wave" },
  pWindowS: { value: 1, status: "common practice, no source (1–4 s are used)" },
  telemetryS: { value: 0.5, status: "placeholder, no source" },
  processingS: {
    value: 1.5,
    status:
      "a 2018 review (Progress in Earth and Planetary Science 5:63) assumes 2 s after three stations; Du et al. (2021, China Earthquake 37(1)) estimate 7.6 s for processing plus transmission in one national network",
  },
} as const satisfies Record<string, DocumentedDefault<number>>;

/** Delivery channels used when a scenario lists none; the first is the primary channel. */
export const DEFAULT_CHANNELS: DocumentedDefault<readonly { id: string; deliveryS: number }[]> = {
  value: [
    { id: "cell-broadcast", deliveryS: 5 },
    { id: "phone-app", deliveryS: 3 },
    { id: "siren-pa", deliveryS: 6 },
    { id: "radio-tv", deliveryS: 10 },
    { id: "machine", deliveryS: 0.5 },
  ],
  status: "placeholder, no source: enter measured figures",
};

/** Alert thresholds per intensity scale, as continuous intensity values. */
export const DEFAULT_ALERT_THRESHOLDS: Record<IntensityScaleId, { issueAt: DocumentedDefault<number>; areaAt: DocumentedDefault<number>; target: DocumentedDefault<number> }> = {
  jma: {
    issueAt: { value: 4.5, status: "JMA 5-lower: national services issue public warnings when 5-lower or more is expected" },
    areaAt: { value: 3.5, status: "JMA 4: from memory, one service's rule" },
    target: { value: 4.5, status: "JMA 5-lower, the shaking that matters (METHODS.md §9)" },
  },
  mmi: {
    issueAt: { value: 6.0, status: "MMI 6.0: JMA 5-lower mapped through PGV 11.4 cm/s (METHODS.md §2)" },
    areaAt: { value: 4.5, status: "MMI 4.5: JMA 4 mapped through PGV 3.0 cm/s (METHODS.md §2)" },
    target: { value: 5.5, status: "MMI VI: the lower edge of class VI under nearest-integer rounding" },
  },
};

/** Warning-band breaks in seconds; bands are (a, b], and "blind" is warning ≤ 0. */
export const DEFAULT_WARNING_BREAKS_S: DocumentedDefault<readonly number[]> = {
  value: [0, 5, 10, 20, 30, 60],
  status: "Leeway's default bands",
};

/** Radius within which a station's observed shaking alerts a place (wavefield strategy). */
export const DEFAULT_WAVEFIELD_RADIUS_KM: DocumentedDefault<number> = {
  value: 30,
  status: "Kodera et al. (2018), PLUM: places within 30 km of a station (from memory)",
};

/** Rupture velocity as a fraction of the shear velocity at the hypocentre. */
export const DEFAULT_RUPTURE_VELOCITY_FRACTION_OF_VS: DocumentedDefault<number> = {
  value: 0.8,
  status: "common practice, no source",
};

/** Other defaults: the velocity model, ground-motion model and intensity scale. */
export const DEFAULT_MODELS = {
  velocityModel: { value: { kind: "layered", name: "iasp91" } as const, status: "IASP91 crust and upper mantle" },
  groundMotionModel: { value: DEFAULT_GROUND_MOTION_MODEL_ID, status: "Si & Midorikawa (1999) with Midorikawa et al. (1994) amplification" },
  intensityScale: { value: "jma" as IntensityScaleId, status: "JMA seismic intensity" },
} as const;

/** The note every output carries when a scenario relies on default delays. */
export const DEFAULT_DELAYS_NOTE = "default delays — enter your operator's figures";

/** Which defaults a scenario relies on: JSON paths of the settings it leaves out, grouped. */
export interface DefaultsUsed {
  /** Timing and delivery delays taken from the defaults (`timing.pWindowS`, `channels`, …). */
  delays: string[];
  /** Alert rules taken from the defaults (`alert.issueAt`, …). */
  alert: string[];
  /** Models taken from the defaults (`velocityModel`, …). */
  models: string[];
  /** True when any delay is a default: outputs then carry DEFAULT_DELAYS_NOTE. */
  usesDefaultDelays: boolean;
}

/** Tells which defaults `scenario` relies on. */
export function defaultsUsedBy(scenario: Scenario): DefaultsUsed {
  const delays = (Object.keys(DEFAULT_TIMING) as (keyof typeof DEFAULT_TIMING)[])
    .filter((key) => scenario.timing?.[key] === undefined)
    .map((key) => `timing.${key}`);
  if (!scenario.channels) delays.push("channels");
  const alertKeys = ["issueAt", "areaAt", "target"] as const;
  const alert = alertKeys.filter((key) => scenario.alert?.[key] === undefined).map((key) => `alert.${key}`);
  const models = (Object.keys(DEFAULT_MODELS) as (keyof typeof DEFAULT_MODELS)[]).filter((key) => scenario[key] === undefined);
  return { delays, alert, models, usesDefaultDelays: delays.length > 0 };
}
