import type { LandGrid } from "./land-grid";
import type { Terrain } from "./terrain";

/** Vs30 of the softest ground (coastal and valley sediments) and the firmest (the interior), m/s. */
const SOFT_VS30_MS = 180;
const FIRM_VS30_MS = 760;
/** Distance inland over which the ground firms up, km. */
const FIRMING_DISTANCE_KM = 35;

/**
 * Vs30 per land cell, m/s, rounded to 5 m/s: soft near the shore and on valley floors, firm inland
 * (an invented rule with realistic end values: NEHRP site classes run from about 180 m/s, class D/E,
 * to 760 m/s, class B/C — from memory).
 */
export function assignVs30(grid: LandGrid, terrain: Terrain): Float64Array {
  const vs30Ms = new Float64Array(grid.pointsKm.length);
  grid.pointsKm.forEach((p, i) => {
    const inland = Math.min(1, terrain.shoreDistanceKm(p) / FIRMING_DISTANCE_KM);
    const firm = SOFT_VS30_MS + (FIRM_VS30_MS - SOFT_VS30_MS) * Math.pow(inland, 0.7);
    const valley = 1 - 0.45 * terrain.valleyWeight(p);
    const textured = firm * valley * (1 + 0.08 * terrain.texture(p));
    vs30Ms[i] = Math.round(Math.max(150, Math.min(900, textured)) / 5) * 5;
  });
  return vs30Ms;
}
