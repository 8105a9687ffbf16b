/**
 * A small seeded pseudo-random generator (mulberry32), so the invented region comes out the same
 * on every machine and every run: nothing in the seed draws on Math.random or the clock.
 */
export type Random = () => number;

/** Returns a generator of uniform numbers in [0, 1) fully determined by `seed` (a 32-bit integer). */
export function createRandom(seed: number): Random {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A uniform number in [min, max). */
export function uniform(random: Random, min: number, max: number): number {
  return min + (max - min) * random();
}
