// Rows for exposure tests, written into the app harness's database: a population layer version
// from cells, a facilities layer, workspace settings and actions, and scenario versions.
import { packGridChunks } from "@/db/grid-codec";
import { facilities, gridChunks, layers, layerVersions, protectiveActions, scenarios, scenarioVersions, settings, type FacilityKind, type ScenarioState } from "@/db/schema";
import type { Scenario } from "@/lib/scenario/schema";
import { app } from "../support/app";
import { EPICENTRE, destination, homogeneousScenario } from "../../verification/scenario-fixtures";

/** Cells at exact epicentral distances (GeographicLib Direct), due east of the verification epicentre. */
export function cellsEast(distancesKm: number[]) {
  const points = distancesKm.map((d) => (d === 0 ? EPICENTRE : destination(...EPICENTRE, 90, d)));
  return { lon: Float64Array.from(points, (p) => p[0]), lat: Float64Array.from(points, (p) => p[1]) };
}

/** A population layer version (a new layer, or a new version of `layerId`) holding these cells. */
export async function insertPopulationVersion(options: {
  lon: Float64Array;
  lat: Float64Array;
  people: number[];
  district?: number[];
  districtNames?: string[];
  layerId?: number;
  number?: number;
}) {
  const layerId =
    options.layerId ?? (await app.db.insert(layers).values({ kind: "population", name: "Test population" }).returning({ id: layers.id }))[0].id;
  const [version] = await app.db
    .insert(layerVersions)
    .values({
      layerId,
      number: options.number ?? 1,
      rowCount: options.people.length,
      summary: { totalPopulation: options.people.reduce((a, b) => a + b, 0), districtSource: "file", districtNames: options.districtNames ?? [] },
    })
    .returning({ id: layerVersions.id });
  const columns = {
    lon: options.lon,
    lat: options.lat,
    value: Float64Array.from(options.people),
    district: Int32Array.from(options.district ?? options.people.map(() => -1)),
  };
  for (const chunk of packGridChunks(columns)) await app.db.insert(gridChunks).values({ layerVersionId: version.id, ...chunk });
  return { layerId, layerVersionId: version.id };
}

/** A facilities layer version with the given features. */
export async function insertFacilitiesVersion(features: { name: string; kind: "school" | "hospital" | "rail"; geometry: unknown }[]) {
  const [layer] = await app.db.insert(layers).values({ kind: "facilities", name: "Test facilities" }).returning({ id: layers.id });
  const [version] = await app.db.insert(layerVersions).values({ layerId: layer.id, number: 1, rowCount: features.length }).returning({ id: layerVersions.id });
  await app.db.insert(facilities).values(features.map((f) => ({ layerVersionId: version.id, ...f })));
  return version.id;
}

/** Workspace reaction time and protective actions (list order as given). */
export async function setWorkspace(reactionTimeS: number, actions: { name: string; secondsNeeded: number; facilityKinds?: FacilityKind[] }[]) {
  await app.db.insert(settings).values({ key: "reactionTimeS", value: reactionTimeS }).onConflictDoUpdate({ target: settings.key, set: { value: reactionTimeS } });
  await app.db.delete(protectiveActions);
  if (actions.length) await app.db.insert(protectiveActions).values(actions.map((a, position) => ({ ...a, position })));
}

/** A new scenario with one version per entry of `versions`, numbered from 1. */
export async function insertScenario(name: string, versions: { params: Scenario | Record<string, unknown>; layerVersions: Record<string, number>; state?: ScenarioState }[]) {
  const [scenario] = await app.db.insert(scenarios).values({ name }).returning({ id: scenarios.id });
  const rows = await app.db
    .insert(scenarioVersions)
    .values(versions.map((v, index) => ({ scenarioId: scenario.id, number: index + 1, params: v.params, layerVersions: v.layerVersions, state: v.state ?? "draft" })))
    .returning({ id: scenarioVersions.id, number: scenarioVersions.number });
  return { scenarioId: scenario.id, versionIds: rows.map((r) => r.id) };
}

/**
 * A version Leeway can compute (the verification scenario over two populated cells) in `state`,
 * for route tests and the role matrix.
 */
export async function computableVersion(state: ScenarioState): Promise<{ scenarioId: number; number: number }> {
  const population = await insertPopulationVersion({ ...cellsEast([20, 60]), people: [1200, 800] });
  const { scenarioId } = await insertScenario(`Computable ${state}`, [{ params: homogeneousScenario(), layerVersions: { population: population.layerVersionId }, state }]);
  return { scenarioId, number: 1 };
}

/** One scenario with two computable versions in `state` on the same population layer version; the compare routes' `a` and `b`. */
export async function comparableVersions(state: ScenarioState): Promise<{ a: string; b: string }> {
  const population = await insertPopulationVersion({ ...cellsEast([20, 60]), people: [1200, 800] });
  const layerVersions = { population: population.layerVersionId };
  const { scenarioId } = await insertScenario(`Comparable ${state}`, [
    { params: homogeneousScenario(), layerVersions, state },
    { params: homogeneousScenario({ stationKm: [5, 10, 30] }), layerVersions, state },
  ]);
  return { a: `${scenarioId}:1`, b: `${scenarioId}:2` };
}
