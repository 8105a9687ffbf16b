import { and, asc, eq, inArray, like, ne } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/connect";
import { DEFAULT_SETTINGS } from "@/db/seed/workspace-defaults";
import { districts, facilities, layers, layerVersions, protectiveActions, resultCache, scenarios, scenarioVersions, settings } from "@/db/schema";
import type { StoredFacility } from "@/lib/exposure/facility-rows";
import type { WorkspaceExposureSettings } from "@/lib/exposure/inputs";
import { INTENSITY_SCALE_IDS } from "@/lib/geo";

/*
 * What exposure reads and caches. Like db/queries/layers.ts, every function takes an optional
 * `db`: the app passes none and gets the server's handle; tests and the benchmark pass their own.
 */

async function resolveDb(db: Database | undefined): Promise<Database> {
  return db ?? (await import("@/db/client")).db;
}

/** `scenario_versions.layer_versions`: layer kind → layer version id. */
export const layerVersionIdsSchema = z.record(z.string(), z.number().int().positive());

/** A scenario version with its scenario, as exposure needs it; undefined when either is unknown. */
export async function findExposureVersion({ scenarioId, number, db }: { scenarioId: number; number: number; db?: Database }) {
  const database = await resolveDb(db);
  const [row] = await database
    .select({ scenario: { id: scenarios.id, name: scenarios.name }, version: scenarioVersions })
    .from(scenarioVersions)
    .innerJoin(scenarios, eq(scenarios.id, scenarioVersions.scenarioId))
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, number)));
  return row;
}

const storedSettingsSchema = z.object({
  reactionTimeS: z.number().min(0).optional(),
  intensityScale: z.enum(INTENSITY_SCALE_IDS).optional(),
});

/**
 * The workspace's reaction time, intensity scale and protective actions (in their list order).
 * Settings never written fall back to the documented defaults of db/seed/workspace-defaults.ts.
 */
export async function readWorkspaceExposureSettings({ db }: { db?: Database } = {}): Promise<WorkspaceExposureSettings> {
  const database = await resolveDb(db);
  const rows = await database.select().from(settings).where(inArray(settings.key, ["reactionTimeS", "intensityScale"]));
  const stored = storedSettingsSchema.safeParse(Object.fromEntries(rows.map((row) => [row.key, row.value])));
  const values = stored.success ? stored.data : {};
  const actions = await database.select().from(protectiveActions).orderBy(asc(protectiveActions.position), asc(protectiveActions.id));
  return {
    reactionTimeS: values.reactionTimeS ?? DEFAULT_SETTINGS.reactionTimeS,
    intensityScale: values.intensityScale ?? DEFAULT_SETTINGS.intensityScale,
    actions: actions.map((a) => ({ id: `action-${a.id}`, name: a.name, secondsNeeded: a.secondsNeeded, facilityKinds: a.facilityKinds ?? null })),
  };
}

/** Layer versions by id with their layer's kind and name, and their number. */
export async function describeLayerVersions({ ids, db }: { ids: number[]; db?: Database }) {
  if (ids.length === 0) return [];
  const database = await resolveDb(db);
  return database
    .select({ id: layerVersions.id, layerId: layerVersions.layerId, number: layerVersions.number, kind: layers.kind, name: layers.name })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(inArray(layerVersions.id, ids));
}

/** A facilities layer version's facilities, in upload order. */
export async function readFacilities({ layerVersionId, db }: { layerVersionId: number; db?: Database }): Promise<StoredFacility[]> {
  const database = await resolveDb(db);
  const rows = await database.select().from(facilities).where(eq(facilities.layerVersionId, layerVersionId)).orderBy(asc(facilities.id));
  return rows.map((row) => ({ id: row.id, name: row.name, kind: row.kind, geometry: row.geometry as StoredFacility["geometry"] }));
}

/** A districts layer version's outlines (GeoJSON geometry), by index. */
export async function readDistrictOutlines({ layerVersionId, db }: { layerVersionId: number; db?: Database }) {
  const database = await resolveDb(db);
  const rows = await database
    .select({ idx: districts.idx, name: districts.name, geometry: districts.geometry })
    .from(districts)
    .where(eq(districts.layerVersionId, layerVersionId))
    .orderBy(asc(districts.idx));
  // Stored after the layer reader checked them as GeoJSON polygons (lib/layers/geometry-checks.ts).
  return rows as { idx: number; name: string; geometry: { type: "Polygon"; coordinates: number[][][] } | { type: "MultiPolygon"; coordinates: number[][][][] } }[];
}

/** A cached result by key, or undefined. */
export async function readCachedResult({ key, db }: { key: string; db?: Database }): Promise<unknown> {
  const database = await resolveDb(db);
  const [row] = await database.select({ result: resultCache.result }).from(resultCache).where(eq(resultCache.key, key));
  return row?.result;
}

/**
 * Stores a result under its key and drops the scenario version's other results whose key starts
 * with `replaces` (results of the same kind made from layers or settings that are no longer the
 * current ones). One batch, which libSQL runs as one transaction on the client's own connection,
 * so concurrent requests storing results queue instead of failing with SQLITE_BUSY.
 */
export async function storeCachedResult({ key, replaces, scenarioVersionId, result, db }: { key: string; replaces: string; scenarioVersionId: number; result: unknown; db?: Database }) {
  const database = await resolveDb(db);
  await database.batch([
    database.delete(resultCache).where(and(eq(resultCache.scenarioVersionId, scenarioVersionId), like(resultCache.key, `${replaces}%`), ne(resultCache.key, key))),
    database.insert(resultCache).values({ key, scenarioVersionId, result }).onConflictDoUpdate({ target: resultCache.key, set: { result } }),
  ]);
}
