import type { ExposureResult as EngineExposure } from "@/lib/geo";
import type { ClassBandTable } from "./contracts";

/**
 * The planner's main table: one row per intensity class, one column per warning band holding the
 * ALERTED people of that band, and a "not alerted" column for everyone else (outside the alert
 * area, or where no alert reaches). Built from the engine's rounded table, so every row, column
 * and the grand total add up exactly to the layer's rounded population.
 */
export function classBandTable(exposure: Pick<EngineExposure, "intensityClasses" | "warningBands" | "table">): ClassBandTable {
  const bandIndex = new Map(exposure.warningBands.map((band, index) => [band.id, index]));
  const rows = exposure.intensityClasses.map((intensityClass) => ({
    intensityClass,
    alertedByBand: exposure.warningBands.map(() => 0),
    notAlerted: 0,
    total: 0,
  }));
  const rowOf = new Map(exposure.intensityClasses.map((c, index) => [c, rows[index]]));
  for (const cell of exposure.table) {
    const row = rowOf.get(cell.intensityClass);
    if (!row) throw new Error(`exposure table names an unknown intensity class "${cell.intensityClass}"`);
    const band = bandIndex.get(cell.warningBand);
    // The "no alert" band has no column: nobody there is alerted.
    if (band !== undefined) row.alertedByBand[band] += cell.alertedPopulation;
    row.notAlerted += cell.population - cell.alertedPopulation;
    row.total += cell.population;
  }
  const bandTotals = exposure.warningBands.map((_, b) => rows.reduce((sum, row) => sum + row.alertedByBand[b], 0));
  const notAlertedTotal = rows.reduce((sum, row) => sum + row.notAlerted, 0);
  return { rows, bandTotals, notAlertedTotal, total: rows.reduce((sum, row) => sum + row.total, 0) };
}
