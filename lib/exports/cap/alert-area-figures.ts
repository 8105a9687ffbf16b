import type { EngineGrid } from "@/lib/geo/grid";

/** Figures of the alerted cells that the CAP mapping reads. */
export interface AlertAreaFigures {
  alertedCells: number;
  /** Strongest expected intensity among alerted cells (−Infinity when none). */
  maxIntensity: number;
  /** Largest P(intensity ≥ target) among alerted cells, 0–1 (0 when none). */
  maxPExceedTarget: number;
}

/** Scans a computed grid's alerted cells. */
export function alertAreaFigures(grid: Pick<EngineGrid, "alerted" | "intensity" | "pExceedTarget">): AlertAreaFigures {
  let alertedCells = 0;
  let maxIntensity = -Infinity;
  let maxPExceedTarget = 0;
  for (let i = 0; i < grid.alerted.length; i++) {
    if (grid.alerted[i] !== 1) continue;
    alertedCells++;
    if (grid.intensity[i] > maxIntensity) maxIntensity = grid.intensity[i];
    if (grid.pExceedTarget[i] > maxPExceedTarget) maxPExceedTarget = grid.pExceedTarget[i];
  }
  return { alertedCells, maxIntensity, maxPExceedTarget };
}
