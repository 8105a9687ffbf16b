/**
 * The scenario file for re-import (lib/scenario, version 1). A workspace scenario version takes
 * its site conditions from a site-condition layer version and its intensity scale from the
 * workspace setting when the file leaves it out; the export writes both into the file (the Vs30
 * grid as `vs30Grid`, cells in the layer's order), so importing it computes the same numbers
 * without the layer. The file holds no results, so it has no caution field: the format refuses
 * unknown fields.
 */
import type { Scenario } from "@/lib/scenario/schema";
import type { IntensityScaleId } from "@/lib/geo/intensity/scales";

/** What the stored version does not say by itself. */
export interface ScenarioFileContext {
  /** The scenario's name in the workspace (used when the file has none). */
  name: string;
  /** Site-condition layer cells, when the version recorded one. */
  vs30Cells?: { lon: ArrayLike<number>; lat: ArrayLike<number>; vs30Ms: ArrayLike<number> };
  /** The workspace's intensity scale, used when the file leaves it out. */
  intensityScale?: IntensityScaleId;
}

/** The self-contained scenario file for a stored version. */
export function exportScenarioFile(scenario: Scenario, context: ScenarioFileContext): Scenario {
  const out: Scenario = { ...scenario, name: scenario.name ?? context.name };
  if (context.vs30Cells && context.vs30Cells.lon.length > 0) {
    const { lon, lat, vs30Ms } = context.vs30Cells;
    out.vs30Grid = Array.from({ length: lon.length }, (_, i) => ({ lon: lon[i], lat: lat[i], vs30: vs30Ms[i] }));
  }
  if (out.intensityScale === undefined && context.intensityScale !== undefined) out.intensityScale = context.intensityScale;
  return out;
}

/** The file's text: two-space JSON with a final line break (numbers as JavaScript writes them, which read back exactly). */
export function scenarioFileText(file: Scenario): string {
  return `${JSON.stringify(file, null, 2)}\n`;
}
