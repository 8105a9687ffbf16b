import type { LineString, Polygon } from "geojson";
import { Coastline } from "./coastline";
import { buildDistricts, districtBoundaries, districtIndexAt, type District } from "./districts";
import { placeFacilities, type RegionFacility } from "./facilities";
import { planeDistanceKm, toLonLat, type KmPoint } from "./frame";
import { buildLandGrid } from "./land-grid";
import { ISLAND_NAME, TOWN_PLANS } from "./names";
import { distributePopulation } from "./population";
import { createRandom } from "./prng";
import { assignVs30 } from "./site-condition";
import { placeSources, type RegionSource } from "./sources";
import { placeStations, type RegionStation } from "./stations";
import { Terrain } from "./terrain";

export type { District } from "./districts";
export type { RegionFacility } from "./facilities";
export type { RegionSource, Rupture } from "./sources";
export type { RegionStation } from "./stations";
export { TOTAL_POPULATION } from "./population";

/** The one seed every random choice of the region flows from; each part draws from its own stream. */
export const REGION_SEED = 7301;

/** Population cells are 1 km, site-condition cells 2 km (nominal, at the region's origin latitude). */
export const POPULATION_CELL_KM = 1;
export const SITE_CONDITION_CELL_KM = 2;

/** A town of the region; rank 1 is the largest. */
export interface Town {
  name: string;
  rank: number;
  /** People the town's density profile holds (its cells also carry some of the countryside). */
  population: number;
  lon: number;
  lat: number;
  /** Index of the district the town centre lies in. */
  districtIdx: number;
}

/** A grid layer on land cells, as parallel arrays (degrees; value in people or Vs30 m/s). */
export interface RegionGrid {
  cellKm: number;
  dLonDeg: number;
  dLatDeg: number;
  lon: Float64Array;
  lat: Float64Array;
  value: Float64Array;
}

/** Everything the demo seed and the basemap need to know about the invented island. */
export interface Region {
  name: string;
  /** The coastline, lon/lat degrees, counter-clockwise. */
  land: Polygon;
  /** [west, south, east, north] of the land, degrees. */
  bbox: [number, number, number, number];
  districts: District[];
  /** The lines between neighbouring districts, each once (no coastline), lon/lat degrees. */
  districtBoundaries: LineString[];
  towns: Town[];
  /** People per 1 km land cell, with each cell's district index. */
  population: RegionGrid & { district: Int32Array };
  /** Vs30 per 2 km land cell, m/s. */
  siteCondition: RegionGrid;
  stations: RegionStation[];
  sources: RegionSource[];
  facilities: RegionFacility[];
}

/** Rural schools go to the busiest cell of each district lying this far from every town centre, km. */
const RURAL_SCHOOL_TOWN_CLEARANCE_KM = 12;

/** Builds the invented island of Tessarine. Pure and deterministic: the same output on every call. */
export function buildRegion(): Region {
  const coast = new Coastline(createRandom(REGION_SEED));
  const districts = buildDistricts(coast, createRandom(REGION_SEED + 1));
  const townCentresKm: KmPoint[] = TOWN_PLANS.map((t) => coast.pointAt(t.thetaDeg, t.shoreFraction));
  const terrain = new Terrain(coast, townCentresKm, createRandom(REGION_SEED + 2));

  const grid = buildLandGrid(coast, POPULATION_CELL_KM);
  const townDensities = TOWN_PLANS.map((t, i) => ({ centreKm: townCentresKm[i], population: t.population, decayKm: t.decayKm }));
  const people = distributePopulation(grid, townDensities, terrain);
  const cellDistricts = Int32Array.from(grid.pointsKm, (p) => districtIndexAt(districts, p));

  const soilGrid = buildLandGrid(coast, SITE_CONDITION_CELL_KM);
  const vs30Ms = assignVs30(soilGrid, terrain);

  const towns: Town[] = TOWN_PLANS.map((t, i) => {
    const [lon, lat] = toLonLat(townCentresKm[i]);
    return { name: t.name, rank: i + 1, population: t.population, lon, lat, districtIdx: districtIndexAt(districts, townCentresKm[i]) };
  });

  const ruralSchoolSites = districts.flatMap((d) => {
    let best = -1;
    grid.pointsKm.forEach((p, i) => {
      if (cellDistricts[i] !== d.idx || townCentresKm.some((t) => planeDistanceKm(t, p) < RURAL_SCHOOL_TOWN_CLEARANCE_KM)) return;
      if (best < 0 || people[i] > people[best]) best = i;
    });
    return best < 0 ? [] : [{ siteKm: grid.pointsKm[best], districtName: d.name }];
  });
  const facilities = placeFacilities(
    coast,
    TOWN_PLANS.map((t, i) => ({ name: t.name, centreKm: townCentresKm[i], population: t.population, decayKm: t.decayKm })),
    ruralSchoolSites,
    createRandom(REGION_SEED + 4),
  );

  const ring = [...coast.verticesKm, coast.verticesKm[0]].map(toLonLat);
  const lons = ring.map((p) => p[0]);
  const lats = ring.map((p) => p[1]);

  return {
    name: ISLAND_NAME,
    land: { type: "Polygon", coordinates: [ring] },
    bbox: [Math.min(...lons), Math.min(...lats), Math.max(...lons), Math.max(...lats)],
    districts,
    districtBoundaries: districtBoundaries(districts, coast),
    towns,
    population: { cellKm: grid.cellKm, dLonDeg: grid.dLonDeg, dLatDeg: grid.dLatDeg, lon: grid.lon, lat: grid.lat, value: people, district: cellDistricts },
    siteCondition: { cellKm: soilGrid.cellKm, dLonDeg: soilGrid.dLonDeg, dLatDeg: soilGrid.dLatDeg, lon: soilGrid.lon, lat: soilGrid.lat, value: vs30Ms },
    stations: placeStations(coast, townCentresKm, createRandom(REGION_SEED + 3)),
    sources: placeSources(townCentresKm[TOWN_PLANS.findIndex((t) => t.name === "Vantorel")]),
    facilities,
  };
}
