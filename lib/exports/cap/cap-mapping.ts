/**
 * Leeway's mapping from a scenario's figures to the CAP 1.2 `urgency`, `severity` and `certainty`
 * codes (§3.3.2). The mapping is Leeway's own (common practice, no source) and is stated in
 * docs/exports.md and in every message's `<parameter>` list, so a drill team can see why a
 * message carries the codes it does.
 */
import type { IntensityScaleId } from "@/lib/geo/intensity/scales";

/** CAP 1.2 urgency values. */
export const CAP_URGENCIES = ["Immediate", "Expected", "Future", "Past", "Unknown"] as const;
/** CAP 1.2 severity values. */
export const CAP_SEVERITIES = ["Extreme", "Severe", "Moderate", "Minor", "Unknown"] as const;
/** CAP 1.2 certainty values. */
export const CAP_CERTAINTIES = ["Observed", "Likely", "Possible", "Unlikely", "Unknown"] as const;

export type CapUrgency = (typeof CAP_URGENCIES)[number];
export type CapSeverity = (typeof CAP_SEVERITIES)[number];
export type CapCertainty = (typeof CAP_CERTAINTIES)[number];

/** What the mapping reads from a computed scenario. */
export interface CapMappingInput {
  intensityScale: IntensityScaleId;
  /** Strongest expected intensity inside the alert area, on the scenario's scale. */
  maxAlertAreaIntensity: number;
  /** Largest probability, inside the alert area, that shaking reaches the alert target (ground-motion scatter only), 0–1. */
  maxAlertAreaPExceedTarget: number;
}

/** The three codes and the reasons, in words, for each. */
export interface CapCodes {
  urgency: CapUrgency;
  severity: CapSeverity;
  certainty: CapCertainty;
  reasons: { urgency: string; severity: string; certainty: string };
}

/** Intensity (continuous, on each scale) at which each severity starts. */
export const SEVERITY_FROM_INTENSITY: Record<IntensityScaleId, { extreme: number; severe: number; moderate: number; labels: [string, string, string] }> = {
  // JMA 6-lower, 5-lower, 4 (class lower bounds, lib/geo/intensity/jma.ts).
  jma: { extreme: 5.5, severe: 4.5, moderate: 3.5, labels: ["JMA 6-lower", "JMA 5-lower", "JMA 4"] },
  // MMI VIII, VI, V under nearest-integer rounding (lib/geo/intensity/mmi-worden-2012.ts).
  mmi: { extreme: 7.5, severe: 5.5, moderate: 4.5, labels: ["MMI VIII", "MMI VI", "MMI V"] },
};

/** Below this largest probability of reaching the target the message says "Possible" instead of "Likely". */
export const LIKELY_FROM_P_EXCEED = 0.5;

/** Maps a computed scenario with an issued alert to CAP urgency, severity and certainty. */
export function mapCapCodes(input: CapMappingInput): CapCodes {
  const s = SEVERITY_FROM_INTENSITY[input.intensityScale];
  const i = input.maxAlertAreaIntensity;
  const [extremeLabel, severeLabel, moderateLabel] = s.labels;
  const severity: CapSeverity = i >= s.extreme ? "Extreme" : i >= s.severe ? "Severe" : i >= s.moderate ? "Moderate" : "Minor";
  const severityReason =
    severity === "Extreme"
      ? `strongest expected shaking in the alert area reaches ${extremeLabel}`
      : severity === "Severe"
        ? `strongest expected shaking in the alert area reaches ${severeLabel}, below ${extremeLabel}`
        : severity === "Moderate"
          ? `strongest expected shaking in the alert area reaches ${moderateLabel}, below ${severeLabel}`
          : `strongest expected shaking in the alert area stays below ${moderateLabel}`;
  const likely = input.maxAlertAreaPExceedTarget >= LIKELY_FROM_P_EXCEED;
  return {
    // Shaking follows an early-warning alert within seconds to a minute or two: act now.
    urgency: "Immediate",
    severity,
    certainty: likely ? "Likely" : "Possible",
    reasons: {
      urgency: "early-warning alerts come seconds before shaking: responsive action now",
      severity: severityReason,
      certainty: likely
        ? `somewhere in the alert area the chance of reaching the alert target is at least ${LIKELY_FROM_P_EXCEED * 100} %`
        : `nowhere in the alert area does the chance of reaching the alert target reach ${LIKELY_FROM_P_EXCEED * 100} %`,
    },
  };
}
