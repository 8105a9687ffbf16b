import type { Coastline } from "./coastline";
import { offsetKm, planeDistanceKm, roundDeg, toLonLat, type KmPoint } from "./frame";
import { STATION_CODE_PREFIX } from "./names";
import { uniform, type Random } from "./prng";

/** A seismic station of the demo network. */
export interface RegionStation {
  code: string;
  lon: number;
  lat: number;
  /** False for the two stations the demo network has out of service. */
  operating: boolean;
}

/** How many of the largest towns get a close ring of stations around them. */
const RINGED_TOWNS = 3;
const RING_STATIONS = 4;
const RING_RADIUS_KM = [7, 11] as const;
/** Spacing of the island-wide backbone, km, and the least distance between stations, km. */
const BACKBONE_SPACING_KM = 42;
const MIN_SEPARATION_KM = 18;
/** Stations stay this far from the shore, km. */
const SHORE_MARGIN_KM = 2;
/** Backbone positions (in placement order) of the stations out of service in the demo. */
const OUT_OF_SERVICE_BACKBONE = [2, 8] as const;

/**
 * Places the demo network: a station in every town, a ring around each of the three largest (so
 * stations are densest where people are), then a jittered backbone over the rest of the island.
 */
export function placeStations(coast: Coastline, townCentresKm: readonly KmPoint[], random: Random): RegionStation[] {
  const placed: { km: KmPoint; operating: boolean }[] = [];
  const usable = (p: KmPoint) => coast.contains(p) && coast.distanceToShoreKm(p) >= SHORE_MARGIN_KM;

  townCentresKm.forEach((centre, rank) => {
    placed.push({ km: offsetKm(centre, uniform(random, 0, 360), uniform(random, 0.5, 2)), operating: true });
    if (rank >= RINGED_TOWNS) return;
    for (let k = 0; k < RING_STATIONS; k++) {
      const azimuthDeg = (360 * k) / RING_STATIONS + uniform(random, -20, 20);
      const radiusKm = uniform(random, RING_RADIUS_KM[0], RING_RADIUS_KM[1]);
      // A coastal town's seaward ring station swings round the town until it finds land.
      for (let turn = 0; turn < 18; turn++) {
        const p = offsetKm(centre, azimuthDeg + turn * 20, radiusKm);
        if (usable(p)) {
          placed.push({ km: p, operating: true });
          break;
        }
      }
    }
  });

  let backboneIndex = 0;
  const extentKm = Math.max(...coast.verticesKm.map(([x, y]) => Math.max(Math.abs(x), Math.abs(y))));
  for (let y = -extentKm; y <= extentKm; y += BACKBONE_SPACING_KM) {
    for (let x = -extentKm; x <= extentKm; x += BACKBONE_SPACING_KM) {
      const p: KmPoint = [x + uniform(random, -8, 8), y + uniform(random, -8, 8)];
      if (!usable(p) || placed.some((s) => planeDistanceKm(s.km, p) < MIN_SEPARATION_KM)) continue;
      placed.push({ km: p, operating: !(OUT_OF_SERVICE_BACKBONE as readonly number[]).includes(backboneIndex) });
      backboneIndex++;
    }
  }

  return placed.map((s, i) => {
    const [lon, lat] = toLonLat(s.km);
    return { code: `${STATION_CODE_PREFIX}${String(i + 1).padStart(2, "0")}`, lon: roundDeg(lon), lat: roundDeg(lat), operating: s.operating };
  });
}
