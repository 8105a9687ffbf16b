import { prepareEngine, resolveGridGeometry, summarizeGridWith } from "@/lib/geo";
import { benchScenario } from "../scenarios";
import { fastestMs, type BenchFigure, type BenchSection } from "../section";

export const ruptureAndWavefieldSection: BenchSection = {
  id: "rupture-wavefield",
  title: "2,000 × 2,000 grid summary: point source vs 200 km finite rupture vs wavefield strategy (target ≤ 3× point)",
  run(): BenchFigure[] {
    const side = 2000;
    const cellKm = 0.25;
    const point = benchScenario({ side, cellKm, extra: { name: "Benchmark coast, point source" } });
    const base = benchScenario({ side, cellKm });
    const rupture = benchScenario({
      side,
      cellKm,
      extra: {
        name: "Benchmark coast, 200 km rupture",
        source: { ...base.source, mw: 7.6, rupture: { strikeDeg: 35, dipDeg: 70, lengthKm: 200, widthKm: 22, mode: "bilateral" } },
      },
    });
    const wavefield = benchScenario({ side, cellKm, extra: { name: "Benchmark coast, wavefield", alert: { strategy: "wavefield" } } });
    const time = (scenario: typeof point) => {
      const engine = prepareEngine(scenario);
      const geometry = resolveGridGeometry(scenario);
      return fastestMs(() => summarizeGridWith(engine, geometry), 3, 1);
    };
    const pointMs = time(point);
    return [
      { label: "point source (4 M cells)", ms: pointMs },
      { label: "finite rupture, 200 km, bilateral", ms: time(rupture), baselineMs: pointMs, targetMs: 3 * pointMs },
      { label: "wavefield strategy (30 stations, 30 km radius)", ms: time(wavefield), baselineMs: pointMs, targetMs: 3 * pointMs },
      { label: "prepare engine, finite rupture (2-D S table over the rupture's depths)", ms: fastestMs(() => prepareEngine(rupture)) },
    ];
  },
};
