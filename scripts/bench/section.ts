/** The benchmark's building blocks: a section is one file exporting a `BenchSection`. */

/** One measured figure. `baselineMs` prints the ratio; `targetMs` prints whether it is met. */
export interface BenchFigure {
  label: string;
  ms: number;
  baselineMs?: number;
  targetMs?: number;
  note?: string;
}

/** A group of related measurements (add one file under sections/ and one line in sections.ts). */
export interface BenchSection {
  id: string;
  title: string;
  run(): Promise<BenchFigure[]> | BenchFigure[];
}

/**
 * Fastest wall time (ms) of `runs` calls after `warmups` unmeasured ones. The fastest run is the
 * one least disturbed by other work on a shared machine, so it best estimates one core's speed.
 */
export function fastestMs(fn: () => unknown, runs = 5, warmups = 1): number {
  for (let i = 0; i < warmups; i++) fn();
  let fastest = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    fastest = Math.min(fastest, performance.now() - start);
  }
  return fastest;
}

/** Bytes held by typed arrays and other off-heap buffers, plus the JS heap, in MB. */
export function memoryMb(): number {
  const m = process.memoryUsage();
  return (m.heapUsed + m.arrayBuffers) / 1e6;
}
