import { offsetKm, roundDeg, toLonLat, type KmPoint } from "./frame";

/** Fault types of the scenario file (lib/scenario). */
export type FaultType = "crustal" | "interplate" | "intraslab";
export type Mechanism = "unspecified" | "strike-slip" | "normal" | "reverse";

/**
 * A finite rupture: a rectangle with the hypocentre at its centre. Strike is the compass azimuth of
 * the top edge with the fault dipping to its right (Aki & Richards convention).
 */
export interface Rupture {
  strikeDeg: number;
  dipDeg: number;
  lengthKm: number;
  widthKm: number;
}

/** A hypothetical earthquake of the demo region. */
export interface RegionSource {
  /** Stable key for the seed (a scenario is found again by it on a re-run). */
  key: "interface" | "crustal" | "intraslab";
  name: string;
  description: string;
  /** Epicentre, degrees. */
  lon: number;
  lat: number;
  depthKm: number;
  mw: number;
  faultType: FaultType;
  mechanism: Mechanism;
  rupture: Rupture;
}

/** Azimuth of the subduction trench and of the island's long axis; the plate dips beneath the island to the east-south-east. */
const TRENCH_STRIKE_DEG = 20;

/** Horizontal distance from a rupture's top edge to its centre, km. */
function halfWidthHorizontalKm(r: Rupture): number {
  return (r.widthKm / 2) * Math.cos((r.dipDeg * Math.PI) / 180);
}

function sourceAt(epicentreKm: KmPoint, fields: Omit<RegionSource, "lon" | "lat">): RegionSource {
  const [lon, lat] = toLonLat(epicentreKm);
  return { ...fields, lon: roundDeg(lon, 4), lat: roundDeg(lat, 4) };
}

/**
 * The three hypothetical sources. Sizes follow published scaling: the interface rupture's area fits
 * Strasser et al. (2010, SRL 81(6)) for Mw 8.4 (≈ 33,000 km², from memory); the crustal and intraslab
 * ruptures use Wells & Coppersmith (1994) subsurface length and down-dip width (METHODS §8).
 */
export function placeSources(vantorelKm: KmPoint): RegionSource[] {
  const trenchInterface: Rupture = { strikeDeg: TRENCH_STRIKE_DEG, dipDeg: 14, lengthKm: 320, widthKm: 120 };
  const topEdgeOffshoreKm = 185;
  // The rupture's top edge lies 185 km west-north-west of the island's centre; its centre is down-dip from there.
  const interfaceEpicentre = offsetKm([0, 0], TRENCH_STRIKE_DEG + 90, -topEdgeOffshoreKm + halfWidthHorizontalKm(trenchInterface));

  const crustalRupture: Rupture = { strikeDeg: 40, dipDeg: 80, lengthKm: 43, widthKm: 16 };
  const crustalEpicentre = offsetKm(vantorelKm, 225, 12);

  const slabRupture: Rupture = { strikeDeg: TRENCH_STRIKE_DEG, dipDeg: 55, lengthKm: 56, widthKm: 18 };
  const slabEpicentre = offsetKm(offsetKm([0, 0], TRENCH_STRIKE_DEG, 25), TRENCH_STRIKE_DEG + 90, -15);

  return [
    sourceAt(interfaceEpicentre, {
      key: "interface",
      name: "Western trench, Mw 8.4",
      description: "A great subduction-interface rupture off Tessarine's west coast, 320 km along the trench.",
      // The rupture's centre sits 20 km deep: its top edge is then 5.5 km below the sea floor's datum.
      depthKm: 20,
      mw: 8.4,
      faultType: "interplate",
      mechanism: "reverse",
      rupture: trenchInterface,
    }),
    sourceAt(crustalEpicentre, {
      key: "crustal",
      name: "Vantorel valley fault, Mw 6.9",
      description: "A shallow strike-slip rupture on the inland fault that runs past Vantorel.",
      depthKm: 9,
      mw: 6.9,
      faultType: "crustal",
      mechanism: "strike-slip",
      rupture: crustalRupture,
    }),
    sourceAt(slabEpicentre, {
      key: "intraslab",
      name: "Deep slab beneath the island, Mw 7.1",
      description: "A normal-faulting rupture inside the subducting plate, 72 km beneath central Tessarine.",
      depthKm: 72,
      mw: 7.1,
      faultType: "intraslab",
      mechanism: "normal",
      rupture: slabRupture,
    }),
  ];
}
