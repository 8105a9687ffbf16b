import { computeExposureWith, prepareEngine, type PopulationCells } from "@/lib/geo";
import { columnLonDeg, gridGeometry, rowLatDeg } from "@/lib/geo/grid-geometry";
import { benchScenario } from "../scenarios";
import { fastestMs, type BenchFigure, type BenchSection } from "../section";
import { hypocentralDistanceLoopMs } from "./engine-grid";

/** A million population cells on a 1 km lattice with ten districts. */
function populationCells(side: number, bbox: [number, number, number, number]): PopulationCells {
  const geometry = gridGeometry(bbox, ((bbox[3] - bbox[1]) * 111.2) / side);
  const n = geometry.width * geometry.height;
  const cells: PopulationCells = {
    lon: new Float64Array(n),
    lat: new Float64Array(n),
    population: new Float64Array(n),
    district: new Int32Array(n),
    districtNames: Array.from({ length: 10 }, (_, k) => `District ${k + 1}`),
  };
  for (let r = 0; r < geometry.height; r++) {
    for (let c = 0; c < geometry.width; c++) {
      const i = r * geometry.width + c;
      cells.lon[i] = columnLonDeg(geometry, c);
      cells.lat[i] = rowLatDeg(geometry, r);
      cells.population[i] = ((i * 7919) % 97) / 3;
      cells.district![i] = (c % 11) - 1;
    }
  }
  return cells;
}

export const exposureSection: BenchSection = {
  id: "exposure",
  title: "Exposure over 1 M population cells (tables by class × band, district, channel)",
  run(): BenchFigure[] {
    const scenario = benchScenario({ side: 1000, cellKm: 0.3 });
    const engine = prepareEngine(scenario);
    const cells = populationCells(1000, scenario.area.bbox);
    const { source } = scenario;
    const geometry = gridGeometry(scenario.area.bbox, scenario.area.cellKm);
    const baselineMs = hypocentralDistanceLoopMs(geometry, source.lon, source.lat, source.depthKm);
    return [{ label: `${cells.population.length} cells`, ms: fastestMs(() => computeExposureWith(engine, cells)), baselineMs, targetMs: 1000 }];
  },
};
