import { FACILITY_KINDS, type FacilityKind } from "@/db/schema";

/** Every facility kind that is a building (all but rail). */
const BUILDINGS: FacilityKind[] = FACILITY_KINDS.filter((kind) => kind !== "rail");

/**
 * Default protective actions and their seconds, in Leeway's own words. Every figure is common
 * practice, no source: a starting point that each workspace replaces with its own drill timings.
 * Each action names the facility kinds it is for, so a school is not counted as one where
 * "slow and stop trains" does not fit.
 */
export const DEFAULT_PROTECTIVE_ACTIONS: readonly { name: string; secondsNeeded: number; facilityKinds: FacilityKind[] | null }[] = [
  { name: "Drop, cover, hold", secondsNeeded: 5, facilityKinds: BUILDINGS },
  { name: "Move away from windows and shelving", secondsNeeded: 10, facilityKinds: BUILDINGS },
  { name: "Leave a ground-floor building", secondsNeeded: 15, facilityKinds: BUILDINGS },
  { name: "Stop surgery and secure patients", secondsNeeded: 20, facilityKinds: ["hospital"] },
  { name: "Slow and stop trains", secondsNeeded: 30, facilityKinds: ["rail"] },
];

/** Workspace settings by key: seconds before anyone starts an action (common practice, no source) and the intensity scale. */
export const DEFAULT_SETTINGS = {
  reactionTimeS: 2,
  intensityScale: "jma",
} as const;
