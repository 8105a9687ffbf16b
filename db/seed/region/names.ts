/**
 * Names of the invented demo region. Every name was made up for Leeway; none is meant to be, or to
 * sound like, a real place.
 */

/** The island's name. */
export const ISLAND_NAME = "Tessarine";

/** District names, in the order of the district seeds (inner ring first, then the outer ring). */
export const DISTRICT_NAMES = [
  "Velloran",
  "Ostrevin",
  "Quillomar",
  "Tavrenne",
  "Skelmorth",
  "Hollivar",
  "Pendrask",
  "Corrivane",
  "Ithelmere",
  "Brevane",
  "Caldrith",
  "Nurrowick",
] as const;

/**
 * Towns, largest first. Placement is polar about the island's centre: `thetaDeg` is the bearing as a
 * math angle (0 = east, counter-clockwise) and `shoreFraction` how far out towards the shore the centre
 * sits. `population` is the town's share of the million; `decayKm` the e-folding length of its
 * exponential density profile (compact cores reach well over 5,000 people/km²).
 */
export const TOWN_PLANS = [
  { name: "Marisvell", population: 290_000, thetaDeg: 330, shoreFraction: 0.91, decayKm: 2.6 },
  { name: "Eskerhaven", population: 160_000, thetaDeg: 170, shoreFraction: 0.9, decayKm: 1.9 },
  { name: "Vantorel", population: 95_000, thetaDeg: 100, shoreFraction: 0.42, decayKm: 1.4 },
  { name: "Sorvaine", population: 40_000, thetaDeg: 281, shoreFraction: 0.9, decayKm: 1.3 },
  { name: "Quelline", population: 30_000, thetaDeg: 66, shoreFraction: 0.86, decayKm: 1.2 },
  { name: "Lismerrow", population: 25_000, thetaDeg: 18, shoreFraction: 0.9, decayKm: 1.1 },
  { name: "Caddoran", population: 20_000, thetaDeg: 214, shoreFraction: 0.86, decayKm: 1.1 },
  { name: "Fennavik", population: 16_000, thetaDeg: 134, shoreFraction: 0.9, decayKm: 1.0 },
  { name: "Drevenna", population: 12_000, thetaDeg: 249, shoreFraction: 0.82, decayKm: 1.0 },
  { name: "Ulvanter", population: 10_000, thetaDeg: 300, shoreFraction: 0.45, decayKm: 1.0 },
] as const;

/** Prefix of the demo station codes (TS01, TS02, …). */
export const STATION_CODE_PREFIX = "TS";
