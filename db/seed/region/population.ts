import { apportion } from "./apportion";
import type { LandGrid } from "./land-grid";
import type { Terrain } from "./terrain";
import type { KmPoint } from "./frame";

/** The demo region's population, people. */
export const TOTAL_POPULATION = 1_000_000;

/** A town as the population model sees it. */
export interface TownDensity {
  centreKm: KmPoint;
  /** People in the town's own density profile. */
  population: number;
  /** e-folding length of the exponential profile, km. */
  decayKm: number;
}

/** Beyond this many e-folding lengths a town adds nothing (the profile's mass outside is 0.05 %). */
const TOWN_REACH_DECAYS = 10;

/**
 * Weights of a town over the land cells: an exponential fall-off from its centre, the usual first
 * description of a city's density (Clark 1951, J. R. Stat. Soc. A 114(4); citation from memory), scaled so its land cells
 * carry the town's population exactly even where the profile runs into the sea.
 */
function townWeights(grid: LandGrid, town: TownDensity): Float64Array {
  const weights = new Float64Array(grid.pointsKm.length);
  const reachKm = TOWN_REACH_DECAYS * town.decayKm;
  let sum = 0;
  grid.pointsKm.forEach(([x, y], i) => {
    const dKm = Math.hypot(x - town.centreKm[0], y - town.centreKm[1]);
    if (dKm > reachKm) return;
    weights[i] = Math.exp(-dKm / town.decayKm);
    sum += weights[i];
  });
  for (let i = 0; i < weights.length; i++) weights[i] *= town.population / sum;
  return weights;
}

/**
 * Weights of the countryside: most people near the shore and along the valleys, few on the high
 * interior, with a smooth texture (an invented rule).
 */
function ruralWeights(grid: LandGrid, terrain: Terrain, ruralPopulation: number): Float64Array {
  const weights = new Float64Array(grid.pointsKm.length);
  let sum = 0;
  grid.pointsKm.forEach((p, i) => {
    const coastal = Math.exp(-terrain.shoreDistanceKm(p) / 10);
    const w = (0.3 + 1.8 * coastal + 1.5 * terrain.valleyWeight(p)) * (1 + 0.45 * terrain.texture(p));
    weights[i] = Math.max(0.05, w);
    sum += weights[i];
  });
  for (let i = 0; i < weights.length; i++) weights[i] *= ruralPopulation / sum;
  return weights;
}

/**
 * People per land cell, whole numbers adding up to `TOTAL_POPULATION` exactly: the towns' profiles
 * plus the countryside, which takes whatever the towns leave.
 */
export function distributePopulation(grid: LandGrid, towns: readonly TownDensity[], terrain: Terrain): Float64Array {
  const urban = towns.reduce((sum, t) => sum + t.population, 0);
  if (urban >= TOTAL_POPULATION) throw new Error("the towns leave no one for the countryside");
  const weights = ruralWeights(grid, terrain, TOTAL_POPULATION - urban);
  for (const town of towns) {
    const w = townWeights(grid, town);
    for (let i = 0; i < weights.length; i++) weights[i] += w[i];
  }
  return apportion(weights, TOTAL_POPULATION);
}
