import type { Coastline } from "./coastline";
import type { KmPoint } from "./frame";
import { uniform, type Random } from "./prng";

/** A valley floor: a segment from a town up towards the island's spine. */
interface Valley {
  from: KmPoint;
  to: KmPoint;
}

/** Half-width of a valley floor, km (where its weight falls to 1/e). */
const VALLEY_HALF_WIDTH_KM = 5;
/** How far up-country a valley runs, as a fraction of the town's distance from the island's centre. */
const VALLEY_REACH = 0.55;
const NOISE_WAVES = 8;

function distanceToSegmentKm(p: KmPoint, a: KmPoint, b: KmPoint): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / (ex * ex + ey * ey)));
  return Math.hypot(p[0] - a[0] - t * ex, p[1] - a[1] - t * ey);
}

/**
 * The invented landscape the people and the soils follow: distance from the shore, river valleys
 * running inland from each town, and a smooth random texture so the fields do not look drawn by compass.
 */
export class Terrain {
  private readonly valleys: Valley[];
  private readonly waves: { kx: number; ky: number; phase: number }[];

  constructor(
    private readonly coast: Coastline,
    townCentresKm: readonly KmPoint[],
    random: Random,
  ) {
    this.valleys = townCentresKm.map((town) => ({ from: town, to: [town[0] * (1 - VALLEY_REACH), town[1] * (1 - VALLEY_REACH)] }));
    this.waves = Array.from({ length: NOISE_WAVES }, () => {
      const wavelengthKm = uniform(random, 20, 80);
      const direction = uniform(random, 0, 2 * Math.PI);
      const k = (2 * Math.PI) / wavelengthKm;
      return { kx: k * Math.cos(direction), ky: k * Math.sin(direction), phase: uniform(random, 0, 2 * Math.PI) };
    });
  }

  /** Distance to the shore, km. */
  shoreDistanceKm(p: KmPoint): number {
    return this.coast.distanceToShoreKm(p);
  }

  /** 1 on a valley floor, falling off across it as a Gaussian, 0 far from every valley. */
  valleyWeight(p: KmPoint): number {
    let nearestKm = Infinity;
    for (const v of this.valleys) nearestKm = Math.min(nearestKm, distanceToSegmentKm(p, v.from, v.to));
    return Math.exp(-((nearestKm / VALLEY_HALF_WIDTH_KM) ** 2));
  }

  /** A smooth texture in about [-1, 1] with features 20–80 km across. */
  texture(p: KmPoint): number {
    let sum = 0;
    for (const w of this.waves) sum += Math.cos(w.kx * p[0] + w.ky * p[1] + w.phase);
    return sum / Math.sqrt(NOISE_WAVES / 2) / 2;
  }
}
