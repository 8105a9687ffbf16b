import "server-only";
import { and, eq, max } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { layers, layerVersions, scenarios, scenarioVersions, type LayerKind } from "@/db/schema";
import { recordAudit, type Executor } from "@/lib/audit/record";
import { LeewayError } from "@/lib/errors";
import type { Scenario } from "@/lib/scenario/schema";

/** `scenario_versions.layer_versions` keys (as the seed writes them) and the layer kind each names. */
const LAYER_KEYS: Record<string, LayerKind> = {
  population: "population",
  districts: "districts",
  facilities: "facilities",
  stations: "stations",
  siteCondition: "site-condition",
};

const layerVersionIdsSchema = z.record(z.string(), z.number().int());

/** The newest version of every layer kind, as `{ population: id, … }`: what new work uses. */
async function currentLayerVersionIds(tx: Executor): Promise<Record<string, number>> {
  const ids: Record<string, number> = {};
  for (const [key, kind] of Object.entries(LAYER_KEYS)) {
    const [newest] = await tx
      .select({ id: max(layerVersions.id) })
      .from(layerVersions)
      .innerJoin(layers, eq(layers.id, layerVersions.layerId))
      .where(eq(layers.kind, kind));
    if (newest?.id) ids[key] = newest.id;
  }
  return ids;
}

/** Audit summary of a scenario file: a few figures, never the file. */
function summarize(scenario: Scenario) {
  return { source: `Mw ${scenario.source.mw}, ${scenario.source.depthKm} km, ${scenario.source.faultType}`, stations: scenario.stations.length };
}

/**
 * Creates a scenario with its first version (a draft) using today's layers, and the audit row, in
 * one transaction.
 */
export async function createScenario({ name, description, scenario, actorId }: { name: string; description?: string; scenario: Scenario; actorId: number }) {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(scenarios).values({ name, description: description ?? "", createdBy: actorId }).returning();
    const layerVersionIds = await currentLayerVersionIds(tx);
    const [version] = await tx
      .insert(scenarioVersions)
      .values({ scenarioId: row.id, number: 1, params: scenario, layerVersions: layerVersionIds, state: "draft", note: "Created", authorId: actorId })
      .returning();
    await recordAudit(tx, { actorId, action: "create", targetType: "scenario", targetId: row.id, detail: { after: { name, version: 1, ...summarize(scenario) } } });
    return { scenario: row, version };
  });
}

/**
 * Saves an edited scenario file as the scenario's next version (a draft); earlier versions, and
 * published or shared ones above all, are never changed. The new version records the layer
 * versions of the version it was edited from (`basedOn`, else the newest), or today's layers
 * when that one records none.
 */
export async function saveScenarioVersion({
  scenarioId,
  scenario,
  note,
  basedOn,
  actorId,
}: {
  scenarioId: number;
  scenario: Scenario;
  note?: string;
  basedOn?: number;
  actorId: number;
}) {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(scenarios).where(eq(scenarios.id, scenarioId));
    if (!row) throw new LeewayError("not-found", `There is no scenario ${scenarioId}.`);
    const [highest] = await tx.select({ number: max(scenarioVersions.number) }).from(scenarioVersions).where(eq(scenarioVersions.scenarioId, scenarioId));
    const latest = highest?.number ?? 0;
    const fromNumber = basedOn ?? latest;
    const [from] = await tx
      .select({ layerVersions: scenarioVersions.layerVersions })
      .from(scenarioVersions)
      .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, fromNumber)));
    if (basedOn !== undefined && !from) throw new LeewayError("invalid", `basedOn: scenario ${scenarioId} has no version ${basedOn}.`, { issues: [{ path: "basedOn", message: `no version ${basedOn}` }] });
    const recorded = layerVersionIdsSchema.safeParse(from?.layerVersions);
    const layerVersionIds = recorded.success && Object.keys(recorded.data).length > 0 ? recorded.data : await currentLayerVersionIds(tx);
    const number = latest + 1;
    const [version] = await tx
      .insert(scenarioVersions)
      .values({ scenarioId, number, params: scenario, layerVersions: layerVersionIds, state: "draft", note: note ?? "", authorId: actorId })
      .returning();
    await recordAudit(tx, {
      actorId,
      action: "save",
      targetType: "scenario-version",
      targetId: `${scenarioId}/${number}`,
      detail: { after: { scenario: row.name, version: number, basedOn: fromNumber || null, ...summarize(scenario), ...(note ? { note } : {}) } },
    });
    return { scenario: row, version };
  });
}
