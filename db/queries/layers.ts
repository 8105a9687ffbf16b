import { and, asc, desc, eq, inArray, max, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/connect";
import { NO_DISTRICT, packGridChunks, unpackGridChunks, type GridColumns } from "@/db/grid-codec";
import { districts, facilities, gridChunks, layers, layerVersions, stations, users, type LayerKind } from "@/db/schema";
import { recordAudit, type Executor } from "@/lib/audit/record";
import { LeewayError } from "@/lib/errors";
import { assignDistricts } from "@/lib/layers/assign-districts";
import { LAYER_KIND_LABELS } from "@/lib/layers/formats";
import type { DistrictFeature, FacilityFeature, LayerContent, ParsedLayer } from "@/lib/layers/parsed-layer";
import { summarizeLayer, type PopulationSummary } from "@/lib/layers/summarize";

/*
 * Layers and their versions. Every function takes an optional `db`: the app passes none and gets
 * the server's handle (db/client, loaded on first use); tests, the benchmark and scripts pass their own.
 * This module does not import "server-only" for that reason; it holds no secrets, and its libSQL
 * import keeps it out of browser bundles anyway.
 */

type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];

async function resolveDb(db: Database | undefined): Promise<Database> {
  return db ?? (await import("@/db/client")).db;
}

/** How a population version's cells got their districts; stored in its summary. */
export type DistrictSource = "file" | "boundaries" | "none";

/** What Leeway stores in a population version's summary beyond the file's own figures. */
export interface StoredPopulationSummary extends PopulationSummary {
  districtSource: DistrictSource;
  /** The districts layer version the cells were placed in (boundaries), else null. */
  districtsLayerVersionId: number | null;
  /** Name of each district index the cells refer to. */
  districtNames: string[];
  /** People in cells outside every district. */
  peopleWithoutDistrict: number;
  /** When districts were reassigned: the population version the cells were copied from. */
  copiedFromVersion?: number;
}

const storedPopulationSummary = z.object({
  districtSource: z.enum(["file", "boundaries", "none"]).optional(),
  districtsLayerVersionId: z.number().nullable().optional(),
  districtNames: z.array(z.string()).optional(),
});

/** Rows per INSERT for row-per-item tables; well under SQLite's 32,766 bound parameters. */
const INSERT_BATCH_ROWS = 1000;

/** Reported inside the store's transaction after each batch is written. */
export interface StoreProgress {
  table: "grid_chunks" | "districts" | "facilities" | "stations";
  rowsWritten: number;
}

/** The newest version of any layer of this kind (the one new work uses), or undefined. */
export async function findCurrentLayerVersion({ kind, db }: { kind: LayerKind; db?: Executor }) {
  const database = db ?? (await resolveDb(undefined));
  const [row] = await database
    .select({ layerId: layers.id, layerName: layers.name, versionId: layerVersions.id, number: layerVersions.number })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(eq(layers.kind, kind))
    .orderBy(desc(layerVersions.id))
    .limit(1);
  return row;
}

/** A district layer version's outlines, by index (position i holds the district with idx i). */
async function loadDistricts(tx: Executor, layerVersionId: number): Promise<{ idx: number; name: string; geometry: DistrictFeature["geometry"] }[]> {
  const rows = await tx
    .select({ idx: districts.idx, name: districts.name, geometry: districts.geometry })
    .from(districts)
    .where(eq(districts.layerVersionId, layerVersionId))
    .orderBy(asc(districts.idx));
  return rows as { idx: number; name: string; geometry: DistrictFeature["geometry"] }[];
}

/** Names by district index; an index with no district (a gap) gets an empty name. */
function namesByIndex(rows: readonly { idx: number; name: string }[]): string[] {
  const names: string[] = [];
  for (const row of rows) names[row.idx] = row.name;
  return Array.from(names, (name) => name ?? "");
}

/** Places cells in districts: positions from `assignDistricts` mapped to the districts' stored idx. */
function placeCells(lon: Float64Array, lat: Float64Array, rows: readonly { idx: number; geometry: DistrictFeature["geometry"] }[]): Int32Array {
  const positions = assignDistricts(lon, lat, rows);
  return positions.map((p) => (p < 0 ? NO_DISTRICT : rows[p].idx));
}

function peopleWithout(district: Int32Array, people: Float64Array): number {
  let total = 0;
  for (let i = 0; i < district.length; i++) if (district[i] === NO_DISTRICT) total += people[i];
  return total;
}

async function writeGrid(tx: Transaction, layerVersionId: number, columns: GridColumns, onProgress?: (p: StoreProgress) => void) {
  let rowsWritten = 0;
  for (const chunk of packGridChunks(columns)) {
    await tx.insert(gridChunks).values({ layerVersionId, ...chunk });
    rowsWritten += chunk.count;
    onProgress?.({ table: "grid_chunks", rowsWritten });
  }
}

async function writeInBatches<T>(items: readonly T[], table: StoreProgress["table"], insert: (batch: T[]) => Promise<unknown>, onProgress?: (p: StoreProgress) => void) {
  for (let start = 0; start < items.length; start += INSERT_BATCH_ROWS) {
    const batch = items.slice(start, start + INSERT_BATCH_ROWS);
    await insert(batch);
    onProgress?.({ table, rowsWritten: start + batch.length });
  }
}

async function nextVersionNumber(tx: Executor, layerId: number): Promise<number> {
  const [row] = await tx.select({ highest: max(layerVersions.number) }).from(layerVersions).where(eq(layerVersions.layerId, layerId));
  return (row?.highest ?? 0) + 1;
}

/** District membership of a population file: its own `district` column wins, else the current district boundaries. */
async function populationDistricts(tx: Executor, layer: Extract<ParsedLayer, { kind: "population" }>) {
  if (layer.fileDistricts) {
    return { district: layer.fileDistricts.index, names: layer.fileDistricts.names, source: "file" as const, districtsLayerVersionId: null };
  }
  const current = await findCurrentLayerVersion({ kind: "districts", db: tx });
  if (!current) return { district: new Int32Array(layer.lon.length).fill(NO_DISTRICT), names: [], source: "none" as const, districtsLayerVersionId: null };
  const rows = await loadDistricts(tx, current.versionId);
  return { district: placeCells(layer.lon, layer.lat, rows), names: namesByIndex(rows), source: "boundaries" as const, districtsLayerVersionId: current.versionId };
}

/**
 * After new district boundaries: the newest version of every population layer whose districts came
 * from boundaries (not from its own `district` column) gets a new version with the same cells placed
 * in the new districts. Older versions stay as they were, so published scenarios keep their figures.
 */
async function reassignPopulationLayers(tx: Transaction, districtsVersionId: number, actorId: number | null, onProgress?: (p: StoreProgress) => void) {
  const rows = await loadDistricts(tx, districtsVersionId);
  const names = namesByIndex(rows);
  const newest = await tx
    .select({ layerId: layers.id, versionId: max(layerVersions.id) })
    .from(layers)
    .innerJoin(layerVersions, eq(layerVersions.layerId, layers.id))
    .where(eq(layers.kind, "population"))
    .groupBy(layers.id);

  const reassigned: { layerId: number; number: number }[] = [];
  for (const { layerId, versionId } of newest) {
    if (versionId === null) continue;
    const [version] = await tx.select().from(layerVersions).where(eq(layerVersions.id, versionId));
    const stored = storedPopulationSummary.safeParse(version.summary);
    if (stored.success && stored.data.districtSource === "file") continue;

    const grid = unpackGridChunks(await tx.select().from(gridChunks).where(eq(gridChunks.layerVersionId, versionId)));
    const district = placeCells(grid.lon, grid.lat, rows);
    const number = await nextVersionNumber(tx, layerId);
    const summary: StoredPopulationSummary = {
      ...(version.summary as PopulationSummary),
      districtSource: "boundaries",
      districtsLayerVersionId: districtsVersionId,
      districtNames: names,
      peopleWithoutDistrict: peopleWithout(district, grid.value),
      copiedFromVersion: version.number,
    };
    const [created] = await tx
      .insert(layerVersions)
      .values({ layerId, number, rowCount: version.rowCount, bbox: version.bbox, summary, sourceFile: version.sourceFile, createdBy: actorId })
      .returning({ id: layerVersions.id });
    await writeGrid(tx, created.id, { ...grid, district }, onProgress);
    await recordAudit(tx, {
      actorId,
      action: "reassign-districts",
      targetType: "layer",
      targetId: layerId,
      detail: { before: { version: version.number }, after: { version: number, districtsLayerVersionId: districtsVersionId } },
    });
    reassigned.push({ layerId, number });
  }
  return reassigned;
}

export interface StoreLayerInput {
  layer: ParsedLayer;
  /** An existing layer to add a version to, or the name of a new layer. */
  target: { layerId: number } | { name: string };
  sourceFile: string;
  actorId: number | null;
  db?: Database;
  /** Called inside the transaction after each batch is written (the interrupted-upload test stops the process here). */
  onProgress?: (progress: StoreProgress) => void;
}

export interface StoredLayerVersion {
  layerId: number;
  layerVersionId: number;
  number: number;
  /** Population layers that got a new version because district boundaries changed. */
  reassigned: { layerId: number; number: number }[];
}

/**
 * Stores a checked layer file as a new layer version, in ONE transaction: the layer (when new), the
 * version row, its contents, any population versions re-placed in new districts, and the audit rows.
 * On any failure nothing is written. Throws `LeewayError` (404 unknown layer, 400 wrong kind).
 */
export async function storeLayerVersion(input: StoreLayerInput): Promise<StoredLayerVersion> {
  const database = await resolveDb(input.db);
  const { layer, actorId, onProgress } = input;

  return database.transaction(async (tx) => {
    let layerId: number;
    if ("layerId" in input.target) {
      const [existing] = await tx.select().from(layers).where(eq(layers.id, input.target.layerId));
      if (!existing) throw new LeewayError("not-found", `There is no layer ${input.target.layerId}.`);
      if (existing.kind !== layer.kind) {
        throw new LeewayError(
          "invalid",
          `Layer "${existing.name}" holds ${LAYER_KIND_LABELS[existing.kind].toLowerCase()}; this file is ${LAYER_KIND_LABELS[layer.kind].toLowerCase()}. Nothing was saved.`,
        );
      }
      layerId = existing.id;
    } else {
      const [created] = await tx.insert(layers).values({ kind: layer.kind, name: input.target.name, createdBy: actorId }).returning({ id: layers.id });
      layerId = created.id;
    }

    const number = await nextVersionNumber(tx, layerId);
    const population = layer.kind === "population" ? await populationDistricts(tx, layer) : undefined;
    const summary =
      layer.kind === "population" && population
        ? ({
            ...(summarizeLayer(layer) as PopulationSummary),
            districtSource: population.source,
            districtsLayerVersionId: population.districtsLayerVersionId,
            districtNames: population.names,
            peopleWithoutDistrict: peopleWithout(population.district, layer.people),
          } satisfies StoredPopulationSummary)
        : summarizeLayer(layer);

    const [version] = await tx
      .insert(layerVersions)
      .values({ layerId, number, rowCount: layer.rowCount, bbox: layer.bbox, summary, sourceFile: input.sourceFile, createdBy: actorId })
      .returning({ id: layerVersions.id });
    const layerVersionId = version.id;

    let reassigned: StoredLayerVersion["reassigned"] = [];
    switch (layer.kind) {
      case "population":
        await writeGrid(tx, layerVersionId, { lon: layer.lon, lat: layer.lat, value: layer.people, district: population?.district }, onProgress);
        break;
      case "site-condition":
        await writeGrid(tx, layerVersionId, { lon: layer.lon, lat: layer.lat, value: layer.vs30Ms }, onProgress);
        break;
      case "districts":
        await writeInBatches(
          layer.districts.map((d, idx) => ({ layerVersionId, idx, name: d.name, geometry: d.geometry })),
          "districts",
          (batch) => tx.insert(districts).values(batch),
          onProgress,
        );
        reassigned = await reassignPopulationLayers(tx, layerVersionId, actorId, onProgress);
        break;
      case "facilities":
        await writeInBatches(
          layer.facilities.map((f) => ({ layerVersionId, name: f.name, kind: f.kind, geometry: f.geometry })),
          "facilities",
          (batch) => tx.insert(facilities).values(batch),
          onProgress,
        );
        break;
      case "stations":
        await writeInBatches(
          layer.stations.map((s) => ({ layerVersionId, ...s })),
          "stations",
          (batch) => tx.insert(stations).values(batch),
          onProgress,
        );
        break;
    }

    await recordAudit(tx, {
      actorId,
      action: "upload",
      targetType: "layer",
      targetId: layerId,
      detail: { after: { kind: layer.kind, version: number, rows: layer.rowCount, file: input.sourceFile } },
    });
    return { layerId, layerVersionId, number, reassigned };
  });
}

/** A grid layer version as typed arrays, ready for the exposure engine. */
export interface GridLayer {
  /** Cell centre longitude, degrees. */
  lon: Float64Array;
  /** Cell centre latitude, degrees. */
  lat: Float64Array;
  /** People per cell (population) or Vs30 in m/s (site condition). */
  value: Float64Array;
  /** District index per cell into `districtNames`; −1 outside every district (always −1 for site condition). */
  district: Int32Array;
  districtNames: string[];
}

/**
 * Reads a population or site-condition layer version in one query of a few packed rows
 * (65,536 cells each) instead of one row per cell. Throws `LeewayError` 404 for an unknown version
 * and 400 for a version of another kind.
 */
export async function readGridLayer({ layerVersionId, db }: { layerVersionId: number; db?: Database }): Promise<GridLayer> {
  const database = await resolveDb(db);
  const [version] = await database
    .select({ kind: layers.kind, summary: layerVersions.summary })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(eq(layerVersions.id, layerVersionId));
  if (!version) throw new LeewayError("not-found", `There is no layer version ${layerVersionId}.`);
  if (version.kind !== "population" && version.kind !== "site-condition") {
    throw new LeewayError("invalid", `Layer version ${layerVersionId} holds ${LAYER_KIND_LABELS[version.kind].toLowerCase()}, not a grid.`);
  }
  const rows = await database.select().from(gridChunks).where(eq(gridChunks.layerVersionId, layerVersionId));
  const grid = unpackGridChunks(rows);
  const district = grid.district ?? new Int32Array(grid.lon.length).fill(NO_DISTRICT);
  const districtNames = version.kind === "population" ? await districtNamesOf(database, version.summary) : [];
  return { lon: grid.lon, lat: grid.lat, value: grid.value, district, districtNames };
}

/**
 * The names a population version's district indices refer to: from its summary when Leeway stored
 * it; for versions written without them (the demo seed), the boundaries named there or else the
 * newest districts layer version.
 */
async function districtNamesOf(database: Database, summary: unknown): Promise<string[]> {
  const stored = storedPopulationSummary.safeParse(summary);
  if (stored.success && stored.data.districtNames) return stored.data.districtNames;
  const districtsVersionId =
    (stored.success ? stored.data.districtsLayerVersionId : null) ?? (await findCurrentLayerVersion({ kind: "districts", db: database }))?.versionId;
  return districtsVersionId ? namesByIndex(await loadDistricts(database, districtsVersionId)) : [];
}

/** A layer version's contents in the shapes the readers produce, for maps and previews. */
export async function readLayerContent({ layerVersionId, db }: { layerVersionId: number; db?: Database }): Promise<LayerContent> {
  const database = await resolveDb(db);
  const [version] = await database
    .select({ kind: layers.kind })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(eq(layerVersions.id, layerVersionId));
  if (!version) throw new LeewayError("not-found", `There is no layer version ${layerVersionId}.`);
  switch (version.kind) {
    case "population": {
      const grid = await readGridLayer({ layerVersionId, db: database });
      return { kind: "population", lon: grid.lon, lat: grid.lat, people: grid.value, fileDistricts: null };
    }
    case "site-condition": {
      const grid = await readGridLayer({ layerVersionId, db: database });
      return { kind: "site-condition", lon: grid.lon, lat: grid.lat, vs30Ms: grid.value };
    }
    case "districts":
      return { kind: "districts", districts: await loadDistricts(database, layerVersionId) };
    case "facilities": {
      const rows = await database.select().from(facilities).where(eq(facilities.layerVersionId, layerVersionId)).orderBy(asc(facilities.id));
      return { kind: "facilities", facilities: rows.map((f) => ({ name: f.name, kind: f.kind, geometry: f.geometry as FacilityFeature["geometry"] })) };
    }
    case "stations": {
      const rows = await database.select().from(stations).where(eq(stations.layerVersionId, layerVersionId)).orderBy(asc(stations.code));
      return { kind: "stations", stations: rows.map((s) => ({ code: s.code, lon: s.lon, lat: s.lat, operating: s.operating })) };
    }
  }
}

/** Scenario versions, frozen for council or exercises, that recorded a version of this layer. */
async function frozenUsesOf(database: Executor, layerId: number) {
  return database.all<{ scenarioName: string; number: number; state: string; layerVersionNumber: number }>(sql`
    SELECT s.name AS scenarioName, sv.number AS number, sv.state AS state, lv.number AS layerVersionNumber
    FROM scenario_versions sv
    JOIN scenarios s ON s.id = sv.scenario_id
    JOIN json_each(sv.layer_versions) used
    JOIN layer_versions lv ON lv.id = used.value
    WHERE lv.layer_id = ${layerId} AND sv.state IN ('published', 'shared')
    ORDER BY s.name, sv.number`);
}

/** Every layer with its newest version, newest layers first within each kind. */
export async function listLayers({ db }: { db?: Database } = {}) {
  const database = await resolveDb(db);
  const rows = await database
    .select({ layer: layers, version: layerVersions, author: users.name })
    .from(layers)
    .innerJoin(layerVersions, eq(layerVersions.layerId, layers.id))
    .leftJoin(users, eq(users.id, layerVersions.createdBy))
    .orderBy(asc(layers.kind), desc(layers.id), desc(layerVersions.number));
  const byLayer = new Map<number, { layer: (typeof rows)[number]["layer"]; latest: (typeof rows)[number]["version"]; author: string | null; versionCount: number }>();
  for (const row of rows) {
    const seen = byLayer.get(row.layer.id);
    if (seen) seen.versionCount += 1;
    else byLayer.set(row.layer.id, { layer: row.layer, latest: row.version, author: row.author, versionCount: 1 });
  }
  return [...byLayer.values()];
}

/** One layer with all its versions (newest first) and the frozen scenario versions that use it; undefined when unknown. */
export async function findLayer({ layerId, db }: { layerId: number; db?: Database }) {
  const database = await resolveDb(db);
  const [layer] = await database.select().from(layers).where(eq(layers.id, layerId));
  if (!layer) return undefined;
  const versions = await database
    .select({ version: layerVersions, author: users.name })
    .from(layerVersions)
    .leftJoin(users, eq(users.id, layerVersions.createdBy))
    .where(eq(layerVersions.layerId, layerId))
    .orderBy(desc(layerVersions.number));
  return { layer, versions, frozenUses: await frozenUsesOf(database, layerId) };
}

/** Renames a layer (its versions keep their numbers). Throws 404 for an unknown layer. */
export async function renameLayer({ layerId, name, actorId, db }: { layerId: number; name: string; actorId: number | null; db?: Database }) {
  const database = await resolveDb(db);
  return database.transaction(async (tx) => {
    const [layer] = await tx.select().from(layers).where(eq(layers.id, layerId));
    if (!layer) throw new LeewayError("not-found", `There is no layer ${layerId}.`);
    await tx.update(layers).set({ name }).where(eq(layers.id, layerId));
    await recordAudit(tx, { actorId, action: "rename", targetType: "layer", targetId: layerId, detail: { before: { name: layer.name }, after: { name } } });
    return { ...layer, name };
  });
}

/**
 * Deletes a layer with all its versions and contents. Refused (409) while a published or
 * exercise-shared scenario version uses any of its versions: those versions are frozen.
 */
export async function deleteLayer({ layerId, actorId, db }: { layerId: number; actorId: number | null; db?: Database }) {
  const database = await resolveDb(db);
  await database.transaction(async (tx) => {
    const [layer] = await tx.select().from(layers).where(eq(layers.id, layerId));
    if (!layer) throw new LeewayError("not-found", `There is no layer ${layerId}.`);
    const uses = await frozenUsesOf(tx, layerId);
    if (uses.length) {
      const named = uses
        .slice(0, 3)
        .map((u) => `"${u.scenarioName}" version ${u.number} (${u.state === "published" ? "published" : "shared for exercises"})`)
        .join(", ");
      throw new LeewayError(
        "conflict",
        `Layer "${layer.name}" cannot be deleted: ${uses.length === 1 ? "a frozen scenario version uses it" : `${uses.length} frozen scenario versions use it`}: ${named}. Nothing was deleted.`,
      );
    }
    const versionIds = (await tx.select({ id: layerVersions.id }).from(layerVersions).where(eq(layerVersions.layerId, layerId))).map((v) => v.id);
    // The foreign keys cascade too; deleting contents first keeps the result independent of the PRAGMA.
    if (versionIds.length) {
      for (const table of [gridChunks, districts, facilities, stations]) await tx.delete(table).where(inArray(table.layerVersionId, versionIds));
      await tx.delete(layerVersions).where(eq(layerVersions.layerId, layerId));
    }
    await tx.delete(layers).where(eq(layers.id, layerId));
    await recordAudit(tx, {
      actorId,
      action: "delete",
      targetType: "layer",
      targetId: layerId,
      detail: { before: { name: layer.name, kind: layer.kind, versions: versionIds.length } },
    });
  });
}

/** A version of a layer by its number, with the layer; undefined when either is unknown. */
export async function findLayerVersion({ layerId, number, db }: { layerId: number; number: number; db?: Database }) {
  const database = await resolveDb(db);
  const [row] = await database
    .select({ layer: layers, version: layerVersions, author: users.name })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .leftJoin(users, eq(users.id, layerVersions.createdBy))
    .where(and(eq(layerVersions.layerId, layerId), eq(layerVersions.number, number)));
  return row;
}
