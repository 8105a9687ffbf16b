/**
 * How the alert system decides who is alerted and when (BRIEF item 10):
 * `source` — from a source estimate (magnitude and location) at alert time;
 * `wavefield` — from shaking observed at stations near each place (after the PLUM idea).
 */
export const ALERT_STRATEGY_IDS = ["source", "wavefield"] as const;
export type AlertStrategyId = (typeof ALERT_STRATEGY_IDS)[number];
