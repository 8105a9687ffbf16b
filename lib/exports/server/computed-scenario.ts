import "server-only";
import { computeGridWith, describeProvenance, prepareEngine, resolveGridGeometry, traceContours, type ContourSet, type Engine, type EngineGrid, type Vs30Cells } from "@/lib/geo";
import type { ExportSource } from "./export-source";

/** Contours are traced on at most this many cells (the engine's contour limit, the README's engine section). */
export const CONTOUR_MAX_CELLS = 1_000_000;

/** A version computed on its scenario grid, with its contours. */
export interface ComputedScenario {
  engine: Engine;
  grid: EngineGrid;
  contours: ContourSet;
  howItWasMade: string;
}

/** Prepares the engine (with the version's site conditions), computes the grid and traces its contours. */
export function computeScenario(source: ExportSource, vs30Cells: Vs30Cells | undefined, extraPoints: readonly [number, number][] = []): ComputedScenario {
  const engine = prepareEngine(source.scenario, { vs30Cells, ...source.context }, extraPoints);
  const geometry = resolveGridGeometry(source.scenario, { maxCells: CONTOUR_MAX_CELLS });
  const { grid } = computeGridWith(engine, geometry);
  return { engine, grid, contours: traceContours(grid), howItWasMade: describeProvenance(engine.provenance) };
}
