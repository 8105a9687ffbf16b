/**
 * Site condition for any point: the nearest cell of a regular Vs30 grid (the lon,lat,vs30 layout
 * of site-condition uploads), or the scenario's single `vs30` outside it. Values are clipped to
 * the range the models were fitted on.
 */

/** Vs30 range of the amplification and ground-motion models, m/s (Midorikawa et al. 1994). */
export const MODEL_VS30_RANGE_MS = { min: 100, max: 1500 } as const;

/** Grid cells as parallel arrays (cell centres in degrees, Vs30 in m/s). */
export interface Vs30Cells {
  lon: ArrayLike<number>;
  lat: ArrayLike<number>;
  vs30Ms: ArrayLike<number>;
}

/** Looks up Vs30 (m/s) at a point. */
export interface Vs30Lookup {
  /** True when every point gets the same value (no grid). */
  uniform: boolean;
  fallbackVs30Ms: number;
  /** Smallest value anywhere (the softest site), after clipping. */
  minVs30Ms: number;
  /** True when some value was clipped to the models' range. */
  clipped: boolean;
  vs30At(lonDeg: number, latDeg: number): number;
}

function clip(vs30Ms: number): number {
  return Math.min(MODEL_VS30_RANGE_MS.max, Math.max(MODEL_VS30_RANGE_MS.min, vs30Ms));
}

/** Smallest positive gap between sorted distinct values (the lattice step). */
function latticeStep(values: ArrayLike<number>): { origin: number; step: number; count: number } {
  const distinct = [...new Set(Array.from(values))].sort((a, b) => a - b);
  let step = Infinity;
  for (let i = 1; i < distinct.length; i++) step = Math.min(step, distinct[i] - distinct[i - 1]);
  if (!Number.isFinite(step)) return { origin: distinct[0], step: 1, count: 1 };
  return { origin: distinct[0], step, count: Math.round((distinct[distinct.length - 1] - distinct[0]) / step) + 1 };
}

/**
 * Builds the lookup. `cells` must lie on one regular lattice (as site-condition uploads do);
 * lattice positions without a cell, and points more than half a cell beyond the lattice, take
 * `fallbackVs30Ms`.
 */
export function buildVs30Lookup(fallbackVs30Ms: number, cells?: Vs30Cells): Vs30Lookup {
  const fallback = clip(fallbackVs30Ms);
  if (!cells || cells.lon.length === 0) {
    return { uniform: true, fallbackVs30Ms: fallback, minVs30Ms: fallback, clipped: fallback !== fallbackVs30Ms, vs30At: () => fallback };
  }
  const lon = latticeStep(cells.lon);
  const lat = latticeStep(cells.lat);
  const values = new Float64Array(lon.count * lat.count).fill(Number.NaN);
  let minVs30Ms = fallback;
  let clipped = fallback !== fallbackVs30Ms;
  for (let i = 0; i < cells.lon.length; i++) {
    const column = Math.round((cells.lon[i] - lon.origin) / lon.step);
    const row = Math.round((cells.lat[i] - lat.origin) / lat.step);
    const value = clip(cells.vs30Ms[i]);
    clipped ||= value !== cells.vs30Ms[i];
    minVs30Ms = Math.min(minVs30Ms, value);
    values[row * lon.count + column] = value;
  }
  const west = lon.origin - lon.step / 2;
  const span = lon.step * lon.count;
  return {
    uniform: false,
    fallbackVs30Ms: fallback,
    minVs30Ms,
    clipped,
    vs30At(lonDeg, latDeg) {
      // Bring the longitude into the lattice's 360° window (areas may run past 180°).
      let x = lonDeg;
      if (x < west) x += 360 * Math.ceil((west - x) / 360);
      else if (x >= west + 360) x -= 360 * Math.floor((x - west) / 360);
      if (x >= west + span) return fallback;
      const column = Math.round((x - lon.origin) / lon.step);
      const row = Math.round((latDeg - lat.origin) / lat.step);
      if (row < 0 || row >= lat.count || column < 0 || column >= lon.count) return fallback;
      const value = values[row * lon.count + column];
      return Number.isNaN(value) ? fallback : value;
    },
  };
}
