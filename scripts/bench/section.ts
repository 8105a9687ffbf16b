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

/** Median wall time (ms) of `runs` calls after `warmups` unmeasured ones. */
export function measureMs(fn: () => unknown, runs = 3, warmups = 1): number {
  for (let i = 0; i < warmups; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

/** Bytes held by typed arrays and other off-heap buffers, plus the JS heap, in MB. */
export function memoryMb(): number {
  const m = process.memoryUsage();
  return (m.heapUsed + m.arrayBuffers) / 1e6;
}
