/**
 * Exposure on the server: a scenario version's layer versions are read from the database, the
 * engine runs, and the result is cached under a key of everything it depends on (cache-key.ts).
 * Callers check the role first (access.ts).
 */
import type { Database } from "@/db/connect";
import {
  describeLayerVersions,
  findExposureVersion,
  layerVersionIdsSchema,
  readCachedResult,
  readFacilities,
  readWorkspaceExposureSettings,
  storeCachedResult,
} from "@/db/queries/exposure";
import { readGridLayer } from "@/db/queries/layers";
import type { ScenarioVersionRow } from "@/db/schema";
import { LeewayError } from "@/lib/errors";
import { LEEWAY_VERSION } from "@/lib/geo";
import { parseScenario } from "@/lib/scenario/schema";
import { resultCacheKey } from "./cache-key";
import { computeExposureResult } from "./compute-exposure";
import { compareVersions } from "./compare-versions";
import { comparisonSchema, exposureResultSchema, thresholdStudySchema, type Comparison, type ExposureResult, type ThresholdStudy, type VersionRef } from "./contracts";
import { computeThresholdStudy } from "./threshold-study";
import { withWorkspaceScale, type ExposureInputs, type WorkspaceExposureSettings } from "./inputs";

/** A scenario version as the exposure services load it. */
export interface LoadedVersion {
  ref: VersionRef;
  row: ScenarioVersionRow;
  /** Layer kind → layer version id, as the version records them. */
  layerVersionIds: Record<string, number>;
}

/** Loads a scenario version; 404 when it does not exist. */
export async function loadVersion({ scenarioId, number, db }: { scenarioId: number; number: number; db?: Database }): Promise<LoadedVersion> {
  const found = await findExposureVersion({ scenarioId, number, db });
  if (!found) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
  const ids = layerVersionIdsSchema.safeParse(found.version.layerVersions);
  return {
    ref: { scenarioId: found.scenario.id, scenarioName: found.scenario.name, versionNumber: found.version.number, state: found.version.state },
    row: found.version,
    layerVersionIds: ids.success ? ids.data : {},
  };
}

/** The cache key of a computation of `kind` over one version with the current settings. */
export function versionCacheKey(prefix: string, version: LoadedVersion, settings: WorkspaceExposureSettings, extra: Record<string, unknown> = {}): string {
  return resultCacheKey(prefix, {
    leewayVersion: LEEWAY_VERSION,
    scenarioVersionId: version.row.id,
    params: version.row.params,
    layerVersionIds: version.layerVersionIds,
    settings,
    ...extra,
  });
}

/** Reads a version's scenario file and layers into engine inputs; 409 when the file or the population layer is missing. */
export async function loadInputs(version: LoadedVersion, settings: WorkspaceExposureSettings, { db, now }: { db?: Database; now: Date }): Promise<ExposureInputs> {
  const { ref, layerVersionIds: ids } = version;
  const parsed = parseScenario(version.row.params);
  if (!parsed.ok) {
    const first = parsed.issues[0];
    throw new LeewayError("conflict", `Version ${ref.versionNumber} of "${ref.scenarioName}" has a scenario file Leeway cannot compute (${first.path}: ${first.message}).`, {
      issues: parsed.issues,
    });
  }
  if (ids.population === undefined) {
    throw new LeewayError("conflict", `Version ${ref.versionNumber} of "${ref.scenarioName}" records no population layer, so there are no people to count.`);
  }
  const [population, siteCondition, facilities, described] = await Promise.all([
    readGridLayer({ layerVersionId: ids.population, db }),
    ids.siteCondition === undefined ? undefined : readGridLayer({ layerVersionId: ids.siteCondition, db }),
    ids.facilities === undefined ? [] : readFacilities({ layerVersionId: ids.facilities, db }),
    describeLayerVersions({ ids: Object.values(ids), db }),
  ]);
  const numberOf = new Map(described.map((d) => [d.id, d.number]));
  const layerVersions = Object.fromEntries(Object.entries(ids).flatMap(([kind, id]) => (numberOf.has(id) ? [[kind, numberOf.get(id)!]] : [])));
  return {
    scenario: withWorkspaceScale(parsed.scenario, settings.intensityScale),
    population: { lon: population.lon, lat: population.lat, population: population.value, district: population.district, districtNames: population.districtNames },
    vs30Cells: siteCondition && { lon: siteCondition.lon, lat: siteCondition.lat, vs30Ms: siteCondition.value },
    facilities,
    settings,
    context: { computedAt: now.toISOString(), scenarioVersion: ref.versionNumber, layerVersions },
  };
}

/**
 * Reads a cached result of `schema`'s shape, or computes, stores and returns it. A stored row that
 * no longer parses (an older format) is computed again.
 */
export async function cached<T>({
  key,
  replaces,
  scenarioVersionId,
  parse,
  compute,
  db,
}: {
  key: string;
  replaces: string;
  scenarioVersionId: number;
  parse: (stored: unknown) => T | undefined;
  compute: () => Promise<T>;
  db?: Database;
}): Promise<{ value: T; cached: boolean }> {
  const stored = await readCachedResult({ key, db });
  const hit = stored === undefined ? undefined : parse(stored);
  if (hit !== undefined) return { value: hit, cached: true };
  const value = await compute();
  await storeCachedResult({ key, replaces, scenarioVersionId, result: value, db });
  return { value, cached: false };
}

const EXPOSURE_PREFIX = "exposure:";

/** The exposure tables of a loaded version, from the cache when its inputs are unchanged. */
export async function exposureOf(version: LoadedVersion, { db, now = new Date() }: { db?: Database; now?: Date } = {}): Promise<{ exposure: ExposureResult; cached: boolean }> {
  const settings = await readWorkspaceExposureSettings({ db });
  const { value, cached: hit } = await cached({
    key: versionCacheKey(EXPOSURE_PREFIX, version, settings),
    replaces: EXPOSURE_PREFIX,
    scenarioVersionId: version.row.id,
    parse: (stored) => exposureResultSchema.safeParse(stored).data,
    compute: async () => computeExposureResult(await loadInputs(version, settings, { db, now })),
    db,
  });
  return { exposure: value, cached: hit };
}

const THRESHOLD_PREFIX = "threshold-study:";

/** The alert-threshold study of a loaded version, from the cache when its inputs are unchanged. */
export async function thresholdStudyOf(version: LoadedVersion, { db, now = new Date() }: { db?: Database; now?: Date } = {}): Promise<{ study: ThresholdStudy; cached: boolean }> {
  const settings = await readWorkspaceExposureSettings({ db });
  const { value, cached: hit } = await cached({
    key: versionCacheKey(THRESHOLD_PREFIX, version, settings),
    replaces: THRESHOLD_PREFIX,
    scenarioVersionId: version.row.id,
    parse: (stored) => thresholdStudySchema.safeParse(stored).data,
    compute: async () => computeThresholdStudy(await loadInputs(version, settings, { db, now })),
    db,
  });
  return { study: value, cached: hit };
}

/** Names a version's population layer version, for the refusal message. */
async function populationLabel(version: LoadedVersion, db: Database | undefined): Promise<string> {
  const id = version.layerVersionIds.population;
  if (id === undefined) return "no population layer";
  const [described] = await describeLayerVersions({ ids: [id], db });
  return described ? `population layer "${described.name}" version ${described.number}` : `population layer version id ${id}`;
}

/**
 * Compares version B with version A. Refused (409, with the reason) unless both record the same
 * population layer version: otherwise a change in people would pass for a change in warning.
 */
export async function comparisonOf(a: LoadedVersion, b: LoadedVersion, { db, now = new Date() }: { db?: Database; now?: Date } = {}): Promise<{ comparison: Comparison; cached: boolean }> {
  const name = (v: LoadedVersion) => `"${v.ref.scenarioName}" version ${v.ref.versionNumber}`;
  if (a.layerVersionIds.population === undefined || a.layerVersionIds.population !== b.layerVersionIds.population) {
    const [labelA, labelB] = await Promise.all([populationLabel(a, db), populationLabel(b, db)]);
    throw new LeewayError(
      "conflict",
      `These versions cannot be compared: ${name(a)} uses ${labelA} and ${name(b)} uses ${labelB}. A comparison needs both on the same population layer version, so that only the warning changes, not the people.`,
    );
  }
  const settings = await readWorkspaceExposureSettings({ db });
  const prefix = `compare:${b.row.id}:`;
  const { value, cached: hit } = await cached({
    key: resultCacheKey(prefix, { a: versionCacheKey("", a, settings), b: versionCacheKey("", b, settings) }),
    replaces: prefix,
    scenarioVersionId: a.row.id,
    parse: (stored) => comparisonSchema.safeParse(stored).data,
    compute: async () => {
      const exposureA = await exposureOf(a, { db, now });
      const exposureB = await exposureOf(b, { db, now });
      const [inputsA, inputsB] = await Promise.all([loadInputs(a, settings, { db, now }), loadInputs(b, settings, { db, now })]);
      return compareVersions(
        { ref: a.ref, inputs: inputsA, exposure: exposureA.exposure },
        { ref: b.ref, inputs: inputsB, exposure: exposureB.exposure },
        now.toISOString(),
      );
    },
    db,
  });
  return { comparison: value, cached: hit };
}
