import type { ScenarioRow, ScenarioVersionRow } from "@/db/schema";
import type { SavedVersion } from "./save-contracts";

/** The API's answer for a scenario version just written. */
export function toSavedVersion({ scenario, version }: { scenario: ScenarioRow; version: ScenarioVersionRow }): SavedVersion {
  return {
    scenario: { id: scenario.id, name: scenario.name },
    version: {
      number: version.number,
      state: version.state,
      createdAt: version.createdAt.toISOString(),
      layerVersions: version.layerVersions as Record<string, number>,
    },
  };
}
