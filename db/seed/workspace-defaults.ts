/**
 * Default protective actions and their seconds, in Leeway's own words. Every figure is common
 * practice, no source: a starting point that each workspace replaces with its own drill timings.
 */
export const DEFAULT_PROTECTIVE_ACTIONS = [
  { name: "Drop, cover, hold", secondsNeeded: 5 },
  { name: "Move away from windows and shelving", secondsNeeded: 10 },
  { name: "Leave a ground-floor building", secondsNeeded: 15 },
  { name: "Stop surgery and secure patients", secondsNeeded: 20 },
  { name: "Slow and stop trains", secondsNeeded: 30 },
] as const;

/** Workspace settings by key: seconds before anyone starts an action (common practice, no source) and the intensity scale. */
export const DEFAULT_SETTINGS = {
  reactionTimeS: 2,
  intensityScale: "jma",
} as const;
