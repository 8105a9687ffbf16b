/**
 * Leeway's own colour ramps for scenario results. Each was laid out in CIE LCh with lightness
 * stepping evenly (≥ 10 L* between neighbours) and hue turning slowly, then written down as hex:
 * the hex values are the definition. Ordered from the first legend row to the last.
 */

/** Warning seconds, blind zone first (darkest) to the longest warnings (lightest): plum, slate blue, teal, pale sage. */
export const WARNING_RAMP = ["#542a50", "#534b84", "#3474a8", "#349ab4", "#63bcba", "#a6dabf", "#ecf0d5"] as const;

/**
 * Intensity classes above the lowest (JMA 1 … 7, or MMI II … X), lightest to darkest: straw, apricot,
 * terracotta, brick, oxblood, umber. The lowest class (JMA 0, MMI I) is not filled.
 */
export const INTENSITY_RAMP = ["#fcf3d9", "#eed2a1", "#e4af73", "#d98954", "#c96445", "#ad453d", "#8b2b38", "#631c2a", "#381512"] as const;

/** Population density classes, sparse (lightest) to dense (darkest): sea-glass greens. */
export const POPULATION_RAMP = ["#d8e6db", "#a2c0af", "#6d9a8d", "#3b7470", "#064f56"] as const;

/** Lines drawn over the ramps: the alert area's edge, the blind zone's edge, P and S fronts in replay. */
export const RESULT_LINE_COLOURS = {
  alertArea: "#1b3d8f",
  blindZoneEdge: "#2b1029",
  pFront: "#1d5c66",
  sFront: "#8a3b12",
  triggeredStation: "#1b3d8f",
  dragHandle: "#a13f27",
  facility: "#3a3550",
  siteMarker: "#111820",
} as const;

/** Text colours legends may put on a swatch (the one with more contrast is used). */
export const SWATCH_TEXT_COLOURS = ["#ffffff", "#111820"] as const;
