import { computeGridWith, prepareEngine, resolveGridGeometry, summarizeGridWith } from "@/lib/geo";
import { havLongitude, lambertDistanceFromTermsKm, lambertLatitudeTerms } from "@/lib/geo/distance";
import { columnLonDeg, rowLatDeg, type GridGeometry } from "@/lib/geo/grid-geometry";
import { reducedLatitudeRad } from "@/lib/geo/wgs84";
import { benchScenario } from "../scenarios";
import { fastestMs, memoryMb, type BenchFigure, type BenchSection } from "../section";

/** The minimal loop every grid figure is compared with: hypocentral distance per cell, nothing else. */
export function hypocentralDistanceLoopMs(geometry: GridGeometry, lon0: number, lat0: number, depthKm: number): number {
  const out = new Float32Array(geometry.width * geometry.height);
  return fastestMs(() => {
    const beta0 = reducedLatitudeRad(lat0);
    const hav = Float64Array.from({ length: geometry.width }, (_, c) => havLongitude(columnLonDeg(geometry, c) - lon0));
    for (let r = 0; r < geometry.height; r++) {
      const terms = lambertLatitudeTerms(beta0, rowLatDeg(geometry, r));
      for (let c = 0; c < geometry.width; c++) {
        const d = lambertDistanceFromTermsKm(terms, hav[c]);
        out[r * geometry.width + c] = Math.sqrt(d * d + depthKm * depthKm);
      }
    }
  });
}

export const engineGridSection: BenchSection = {
  id: "engine-grid",
  title: "Engine on a 1,000 × 1,000 grid (warning seconds, intensity, alert flag), point source",
  run(): BenchFigure[] {
    const scenario = benchScenario({ side: 1000, cellKm: 0.3 });
    const engine = prepareEngine(scenario);
    const geometry = resolveGridGeometry(scenario);
    const { source } = scenario;
    const baselineMs = hypocentralDistanceLoopMs(geometry, source.lon, source.lat, source.depthKm);
    const before = memoryMb();
    const fullMs = fastestMs(() => computeGridWith(engine, geometry));
    const summaryMs = fastestMs(() => summarizeGridWith(engine, geometry));
    const big = benchScenario({ side: 4000, cellKm: 0.1 });
    const bigEngine = prepareEngine(big);
    const bigGeometry = resolveGridGeometry(big);
    const beforeBig = memoryMb();
    const bigMs = fastestMs(() => summarizeGridWith(bigEngine, bigGeometry), 2, 0);
    return [
      { label: `hypocentral distance only (${geometry.width * geometry.height} cells)`, ms: baselineMs },
      { label: "all grid fields kept (typed arrays)", ms: fullMs, baselineMs, targetMs: 1000 },
      { label: "summary only (row-streamed)", ms: summaryMs, baselineMs, targetMs: 1000 },
      { label: "prepare engine (tables, timeline)", ms: fastestMs(() => prepareEngine(scenario)) },
      { label: `summary of 4,000 × 4,000 = 16 M cells`, ms: bigMs, note: `heap + buffers ${before.toFixed(0)} → ${beforeBig.toFixed(0)} → ${memoryMb().toFixed(0)} MB` },
    ];
  },
};
