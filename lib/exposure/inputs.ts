import type { IntensityScaleId, PopulationCells, ProvenanceContext, Vs30Cells } from "@/lib/geo";
import type { Scenario } from "@/lib/scenario/schema";
import type { StoredFacility } from "./facility-rows";

/** A protective action of the workspace list (table protective_actions). */
export interface WorkspaceAction {
  id: string;
  name: string;
  /** Seconds the action takes once started. */
  secondsNeeded: number;
  /** The facility kinds it is for; null: every kind. */
  facilityKinds: readonly string[] | null;
}

/** Whether an action is for a facility of `kind`; every action is for a place that is not a facility (`kind` null). */
export function actionIsFor(action: Pick<WorkspaceAction, "facilityKinds">, kind: string | null): boolean {
  return kind === null || action.facilityKinds === null || action.facilityKinds.includes(kind);
}

/** Workspace settings that change exposure figures (table settings). */
export interface WorkspaceExposureSettings {
  /** Seconds before anyone starts an action. */
  reactionTimeS: number;
  /** The region's scale, used when a scenario file names none. */
  intensityScale: IntensityScaleId;
  actions: WorkspaceAction[];
}

/** What the "how it was made" line says beyond the scenario file. */
export interface ComputationContext extends ProvenanceContext {
  /** ISO 8601 time of computation. */
  computedAt: string;
  scenarioVersion: number;
  /** Layer kind → layer version number. */
  layerVersions: Record<string, number>;
}

/** Everything one exposure computation reads, loaded from a scenario version and its layer versions. */
export interface ExposureInputs {
  /** The version's scenario file, with the workspace's intensity scale filled in when it names none. */
  scenario: Scenario;
  population: PopulationCells;
  /** The site-condition layer, when the version records one. */
  vs30Cells?: Vs30Cells;
  facilities: StoredFacility[];
  settings: WorkspaceExposureSettings;
  /** For the "how it was made" line. */
  context: ComputationContext;
}

/** The scenario file with the workspace's intensity scale when the file names none. */
export function withWorkspaceScale(scenario: Scenario, intensityScale: IntensityScaleId): Scenario {
  return scenario.intensityScale ? scenario : { ...scenario, intensityScale };
}
