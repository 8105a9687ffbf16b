import {
  computeGridWith,
  mergeContours,
  prepareEngine,
  resolveGridGeometry,
  summarizeGridWith,
  traceContours,
  CAUTION,
  type Engine,
  type GridSummary,
  type Provenance,
} from "@/lib/geo";
import type { Scenario } from "@/lib/scenario/schema";
import { numberOption, type ParsedOptions } from "../args";
import { SCENARIO_OPTIONS, engineOptions, scenarioOption } from "./context";

/** Contours are traced on at most this many cells; the summary always uses the full grid. */
export const CONTOUR_MAX_CELLS = 1_000_000;

/** Output of `grid`. */
export interface GridCommandOutput {
  summary: GridSummary;
  contours: ReturnType<typeof mergeContours>;
  /** The grid the contours were traced on (coarser than the summary's above 1 M cells). */
  contourGrid: { cellKm: number; width: number; height: number; cells: number };
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/** The grid summary at full resolution plus contours on a grid of at most 1 M cells. */
export function gridOutput(engine: Engine, scenario: Scenario, cellKm: number | undefined): GridCommandOutput {
  const geometry = resolveGridGeometry(scenario, { cellKm });
  const contourGeometry = resolveGridGeometry(scenario, { cellKm, maxCells: CONTOUR_MAX_CELLS });
  const traced = computeGridWith(engine, contourGeometry);
  const summary = geometry.width * geometry.height <= CONTOUR_MAX_CELLS ? traced.summary : summarizeGridWith(engine, geometry);
  return {
    summary,
    contours: mergeContours(traceContours(traced.grid)),
    contourGrid: { cellKm: contourGeometry.cellKm, width: contourGeometry.width, height: contourGeometry.height, cells: contourGeometry.width * contourGeometry.height },
    notes: engine.notes,
    caution: CAUTION,
    provenance: engine.provenance,
  };
}

/** `grid --scenario S.json [--cell-km K]`. */
export const gridCommand = {
  name: "grid",
  summary: "grid summary and contours (GeoJSON) over the scenario's area",
  options: { ...SCENARIO_OPTIONS, "cell-km": "value" } as const,
  run(options: ParsedOptions): { output: GridCommandOutput; result: GridCommandOutput } {
    const scenario = scenarioOption(options, "grid");
    const engine = prepareEngine(scenario, engineOptions(options));
    const output = gridOutput(engine, scenario, numberOption(options, "cell-km", "grid"));
    return { output, result: output };
  },
};
