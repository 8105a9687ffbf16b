import "server-only";
import { describeLayerVersions, readFacilities, readWorkspaceExposureSettings } from "@/db/queries/exposure";
import { readGridLayer } from "@/db/queries/layers";
import { findScenario, findScenarioVersion } from "@/db/queries/scenarios";
import { canViewScenarioState } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";
import type { PopulationCells, ProvenanceContext, Vs30Cells } from "@/lib/geo";
import type { IntensityScaleId } from "@/lib/geo/intensity/scales";
import type { StoredFacility } from "@/lib/exposure/facility-rows";
import type { WorkspaceAction } from "@/lib/exposure/inputs";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";

/** One scenario version, checked for the caller, with what every export reads. */
export interface ExportSource {
  scenarioId: number;
  scenarioName: string;
  versionId: number;
  versionNumber: number;
  state: string;
  /** The stored scenario file as written (for the scenario-file export). */
  storedScenario: Scenario;
  /** The file with the workspace's intensity scale filled in when it names none (what is computed). */
  scenario: Scenario;
  /** The workspace's intensity scale (settings), used when the file names none. */
  workspaceScale: IntensityScaleId;
  reactionTimeS: number;
  actions: WorkspaceAction[];
  /** Stored layer version ids by role (population, siteCondition, facilities, …). */
  layerVersionIds: Record<string, number>;
  /** For the "how it was made" line. */
  context: Required<ProvenanceContext>;
}

/** "2 (Tessarine population (demo))" by role, for the provenance record: each layer version's own number and its layer's name. */
async function layerVersionLabels(ids: Record<string, number>): Promise<Record<string, string>> {
  const byId = new Map((await describeLayerVersions({ ids: Object.values(ids) })).map((r) => [r.id, r]));
  return Object.fromEntries(
    Object.entries(ids).flatMap(([role, id]) => {
      const row = byId.get(id);
      return row ? [[role, `${row.number} (${row.name})`]] : [];
    }),
  );
}

function layerIdsOf(value: unknown): Record<string, number> {
  if (!value || typeof value !== "object") return {};
  return Object.fromEntries(Object.entries(value).filter((entry): entry is [string, number] => typeof entry[1] === "number"));
}

/**
 * Loads a scenario version for an export: 404 when it does not exist, 403 when the caller's role
 * may not see its state, 409 when the stored file no longer passes the scenario schema.
 */
export async function loadExportSource({ scenarioId, number, user, now }: { scenarioId: number; number: number; user: CurrentUser; now: Date }): Promise<ExportSource> {
  const scenarioRow = await findScenario({ id: scenarioId });
  const row = scenarioRow && (await findScenarioVersion({ scenarioId, number }));
  if (!scenarioRow || !row) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
  if (!canViewScenarioState(user.role, row.version.state)) {
    throw new LeewayError("forbidden", `Your role (${user.role}) may not see ${row.version.state} scenario versions.`);
  }
  const parsed = parseScenario(row.version.params);
  if (!parsed.ok) {
    const [first] = parsed.issues;
    throw new LeewayError("conflict", `Version ${number} of "${scenarioRow.name}" is not a valid scenario file (${first.path}: ${first.message}); nothing was exported.`, {
      issues: parsed.issues,
    });
  }
  const workspace = await readWorkspaceExposureSettings();
  const layerVersionIds = layerIdsOf(row.version.layerVersions);
  const stored = parsed.scenario;
  return {
    scenarioId,
    scenarioName: scenarioRow.name,
    versionId: row.version.id,
    versionNumber: number,
    state: row.version.state,
    storedScenario: stored,
    scenario: stored.intensityScale ? stored : { ...stored, intensityScale: workspace.intensityScale },
    workspaceScale: workspace.intensityScale,
    reactionTimeS: workspace.reactionTimeS,
    actions: workspace.actions,
    layerVersionIds,
    context: { computedAt: now.toISOString(), scenarioVersion: number, layerVersions: await layerVersionLabels(layerVersionIds) },
  };
}

/** The version's site-condition cells, when it recorded a site-condition layer. */
export async function loadVs30Cells(source: ExportSource): Promise<Vs30Cells | undefined> {
  const id = source.layerVersionIds.siteCondition;
  if (id === undefined) return undefined;
  const grid = await readGridLayer({ layerVersionId: id });
  return { lon: grid.lon, lat: grid.lat, vs30Ms: grid.value };
}

/** The version's population cells; 409 when it recorded no population layer. */
export async function loadPopulation(source: ExportSource): Promise<PopulationCells> {
  const id = source.layerVersionIds.population;
  if (id === undefined) throw new LeewayError("conflict", `Version ${source.versionNumber} of "${source.scenarioName}" records no population layer, so there is no exposure to export.`);
  const grid = await readGridLayer({ layerVersionId: id });
  return { lon: grid.lon, lat: grid.lat, population: grid.value, district: grid.district, districtNames: grid.districtNames };
}

/** The version's facilities with their stored ids (empty when it recorded no facilities layer). */
export async function loadFacilities(source: ExportSource): Promise<StoredFacility[]> {
  const id = source.layerVersionIds.facilities;
  return id === undefined ? [] : readFacilities({ layerVersionId: id });
}
