import { computeGridWith, prepareEngine, resolveGridGeometry, traceContours } from "@/lib/geo";
import { benchScenario } from "../scenarios";
import { fastestMs, type BenchFigure, type BenchSection } from "../section";

export const contoursSection: BenchSection = {
  id: "contours",
  title: "Contours of a 1,000 × 1,000 grid (warning bands, intensity classes, blind zone, alert area)",
  run(): BenchFigure[] {
    const scenario = benchScenario({ side: 1000, cellKm: 0.3 });
    const { grid } = computeGridWith(prepareEngine(scenario), resolveGridGeometry(scenario));
    const start = performance.now();
    const first = traceContours(grid);
    const coldMs = performance.now() - start;
    const features = Object.values(first).reduce((n, c) => n + c.features.length, 0);
    return [
      { label: "first call (cold)", ms: coldMs, targetMs: 500, note: `${features} features` },
      { label: "warm (fastest of 5)", ms: fastestMs(() => traceContours(grid)), targetMs: 500 },
    ];
  },
};
