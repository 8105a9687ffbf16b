import type { LineString, Point } from "geojson";
import type { Coastline } from "./coastline";
import { offsetKm, planeDistanceKm, toLonLat, type KmPoint } from "./frame";
import { uniform, type Random } from "./prng";

/** A school, a hospital or a rail segment between two towns. */
export interface RegionFacility {
  name: string;
  kind: "school" | "hospital" | "rail";
  geometry: Point | LineString;
}

/** What the facility planner needs to know of a town. */
export interface TownSite {
  name: string;
  centreKm: KmPoint;
  population: number;
  decayKm: number;
}

/** One school per this many townspeople (at least one a town), an invented ratio. */
const PEOPLE_PER_SCHOOL = 15_000;
/** Hospitals by town rank, largest town first. */
const HOSPITALS_BY_RANK = [4, 3, 2, 1, 1, 1] as const;
const HOSPITAL_QUARTERS = ["General", "Harbour", "Hillside", "North"] as const;
/** The main line, as town names in running order. */
const RAIL_ROUTE = ["Fennavik", "Eskerhaven", "Vantorel", "Lismerrow", "Marisvell", "Sorvaine"] as const;
/** Rail vertices every few km, kept this far from the shore, km. */
const RAIL_STEP_KM = 3;
const RAIL_SHORE_MARGIN_KM = 1.5;
const FACILITY_SHORE_MARGIN_KM = 0.3;

function pointGeometry(p: KmPoint): Point {
  return { type: "Point", coordinates: toLonLat(p) };
}

/** A spot inside the built-up area of a town: nearer the centre more often, as the people are. */
function siteInTown(coast: Coastline, town: TownSite, random: Random): KmPoint {
  for (;;) {
    const distanceKm = Math.min(3 * town.decayKm, -Math.log(1 - random()) * town.decayKm * 1.2);
    const p = offsetKm(town.centreKm, uniform(random, 0, 360), distanceKm);
    if (coast.contains(p) && coast.distanceToShoreKm(p) >= FACILITY_SHORE_MARGIN_KM) return p;
  }
}

/**
 * A rail segment from town to town: a gentle curve (a sine bow of up to 3 km), pulled towards the
 * island's centre wherever it would run within 1.5 km of the shore.
 */
function railSegment(coast: Coastline, from: KmPoint, to: KmPoint, random: Random): KmPoint[] {
  const steps = Math.max(2, Math.ceil(planeDistanceKm(from, to) / RAIL_STEP_KM));
  const bowKm = uniform(random, -3, 3);
  const lengthKm = planeDistanceKm(from, to);
  const normal: KmPoint = [-(to[1] - from[1]) / lengthKm, (to[0] - from[0]) / lengthKm];
  const vertices: KmPoint[] = [];
  for (let s = 0; s <= steps; s++) {
    const t = s / steps;
    const bend = bowKm * Math.sin(Math.PI * t);
    let p: KmPoint = [from[0] + t * (to[0] - from[0]) + bend * normal[0], from[1] + t * (to[1] - from[1]) + bend * normal[1]];
    while (s > 0 && s < steps && (!coast.contains(p) || coast.distanceToShoreKm(p) < RAIL_SHORE_MARGIN_KM)) p = [p[0] * 0.98, p[1] * 0.98];
    vertices.push(p);
  }
  return vertices;
}

/** Schools and hospitals in the towns, rural schools in the villages, and the main rail line. */
export function placeFacilities(
  coast: Coastline,
  towns: readonly TownSite[],
  ruralSchoolSitesKm: readonly { siteKm: KmPoint; districtName: string }[],
  random: Random,
): RegionFacility[] {
  const facilities: RegionFacility[] = [];
  towns.forEach((town, rank) => {
    const hospitals = HOSPITALS_BY_RANK[rank] ?? 0;
    for (let h = 0; h < hospitals; h++) {
      facilities.push({ name: `${town.name} ${HOSPITAL_QUARTERS[h]} Hospital`, kind: "hospital", geometry: pointGeometry(siteInTown(coast, town, random)) });
    }
    const schools = Math.max(1, Math.round(town.population / PEOPLE_PER_SCHOOL));
    for (let s = 1; s <= schools; s++) {
      facilities.push({ name: `${town.name} School ${s}`, kind: "school", geometry: pointGeometry(siteInTown(coast, town, random)) });
    }
  });
  for (const rural of ruralSchoolSitesKm) {
    facilities.push({ name: `${rural.districtName} Rural School`, kind: "school", geometry: pointGeometry(rural.siteKm) });
  }

  const byName = new Map(towns.map((t) => [t.name, t]));
  for (let i = 1; i < RAIL_ROUTE.length; i++) {
    const from = byName.get(RAIL_ROUTE[i - 1]);
    const to = byName.get(RAIL_ROUTE[i]);
    if (!from || !to) throw new Error(`the rail route names a town that does not exist: ${RAIL_ROUTE[i - 1]}–${RAIL_ROUTE[i]}`);
    facilities.push({
      name: `${from.name}–${to.name} line`,
      kind: "rail",
      geometry: { type: "LineString", coordinates: railSegment(coast, from.centreKm, to.centreKm, random).map(toLonLat) },
    });
  }
  return facilities;
}
