import type { ExposureHeadlineFigure, ExposureResult } from "./contracts";

/** Keys of the exposure figures in a published headline (lib/publishing/headline.ts). */
export const HEADLINE_KEYS = {
  blindZone: "blindZonePeople",
  tenSeconds: "alertedTenSecondsPeople",
  facilities: "facilitiesActionMisfit",
} as const;

/** Whether an action meant for the facility does not fit there (actions for other kinds are null and do not count). */
export function hasMisfit(facility: Pick<ExposureResult["facilities"][number], "actionFits">): boolean {
  return facility.actionFits.some((fits) => fits === false);
}

/** Facilities where at least one action meant for them does not fit. */
export function facilitiesWithMisfit(facilities: ExposureResult["facilities"]): number {
  return facilities.filter(hasMisfit).length;
}

/**
 * The three figures council reads first: people in the blind zone, people alerted with at least
 * 10 s before the shaking reaches them, and facilities where an action does not fit.
 */
export function headlineFigures(result: Pick<ExposureResult, "totals" | "facilities">): ExposureHeadlineFigure[] {
  return [
    { key: HEADLINE_KEYS.blindZone, label: "People in the blind zone (shaking before any alert)", value: result.totals.blindZonePopulation, unit: "people" },
    { key: HEADLINE_KEYS.tenSeconds, label: "People alerted 10 s or more before the shaking", value: result.totals.alertedWithTenSecondsPopulation, unit: "people" },
    { key: HEADLINE_KEYS.facilities, label: "Facilities where a protective action does not fit", value: facilitiesWithMisfit(result.facilities), unit: "facilities" },
  ];
}
