import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { layers, layerVersions, scenarios, scenarioVersions, type ScenarioRow, type ScenarioVersionRow } from "@/db/schema";
import { recordAudit, type Executor } from "@/lib/audit/record";
import { LeewayError } from "@/lib/errors";
import { computeHeadline, headlineChanges, headlineSchema, type Headline, type HeadlineLayer } from "@/lib/publishing/headline";
import { nextVisibilityState, type VisibilityAction } from "@/lib/publishing/state";

/** `scenario_versions.layer_versions`: layer kind → layer version id. */
const layerVersionIdsSchema = z.record(z.string(), z.number().int());

/** The layer versions a scenario version records, with their layer's name and kind. */
async function loadHeadlineLayers(tx: Executor, layerVersionIds: unknown): Promise<HeadlineLayer[]> {
  const parsed = layerVersionIdsSchema.safeParse(layerVersionIds);
  const ids = parsed.success ? Object.values(parsed.data) : [];
  if (ids.length === 0) return [];
  const rows = await tx
    .select({ kind: layers.kind, name: layers.name, version: layerVersions.number, summary: layerVersions.summary })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(inArray(layerVersions.id, ids))
    .orderBy(layers.kind);
  return rows;
}

export interface VisibilityChange {
  scenario: ScenarioRow;
  before: ScenarioVersionRow;
  after: ScenarioVersionRow;
  /** Set when the change published the version. */
  headline: Headline | null;
}

/**
 * Publishes, unpublishes, shares or unshares a scenario version in one transaction with its audit
 * row. Publishing freezes the headline figures and the publisher; the version's scenario file and
 * layer versions are never changed here. `note` is the publication note (publish) or the reason
 * (unpublish), kept in the audit trail either way.
 */
export async function changeVersionVisibility({
  actorId,
  scenarioId,
  number,
  action,
  note,
}: {
  actorId: number;
  scenarioId: number;
  number: number;
  action: VisibilityAction;
  note?: string;
}): Promise<VisibilityChange> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ scenario: scenarios, version: scenarioVersions })
      .from(scenarioVersions)
      .innerJoin(scenarios, eq(scenarios.id, scenarioVersions.scenarioId))
      .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, number)));
    if (!row) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
    const { scenario, version } = row;

    const next = nextVisibilityState(version.state, action);
    if (!next.ok) throw new LeewayError("conflict", next.reason);

    let headline: Headline | null = null;
    const changes: Partial<ScenarioVersionRow> = { state: next.state };
    if (action === "publish") {
      const now = new Date();
      headline = computeHeadline({
        scenarioName: scenario.name,
        versionNumber: version.number,
        params: version.params,
        layers: await loadHeadlineLayers(tx, version.layerVersions),
        computedAt: now,
      });
      Object.assign(changes, { note: note ?? "", publishedAt: now, publishedBy: actorId, headline });
    }

    const [after] = await tx.update(scenarioVersions).set(changes).where(eq(scenarioVersions.id, version.id)).returning();
    await recordAudit(tx, {
      actorId,
      action,
      targetType: "scenario-version",
      targetId: `${scenarioId}/${number}`,
      detail: {
        before: { scenario: scenario.name, version: number, state: version.state },
        after: { scenario: scenario.name, version: number, state: next.state, ...(note ? { note } : {}) },
      },
    });
    return { scenario, before: version, after, headline };
  });
}

/**
 * For the council summary: the headline frozen at publication beside the one Leeway computes today
 * from the same scenario file and layer versions, and the figures that differ (an engine or model
 * change since publication). `stored` is null for a version that was never published.
 */
export async function compareHeadlineWithToday({ scenarioId, number }: { scenarioId: number; number: number }) {
  const [row] = await db
    .select({ scenario: scenarios, version: scenarioVersions })
    .from(scenarioVersions)
    .innerJoin(scenarios, eq(scenarios.id, scenarioVersions.scenarioId))
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, number)));
  if (!row) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
  const parsed = headlineSchema.safeParse(row.version.headline);
  const stored = parsed.success ? parsed.data : null;
  const today = computeHeadline({
    scenarioName: row.scenario.name,
    versionNumber: row.version.number,
    params: row.version.params,
    layers: await loadHeadlineLayers(db, row.version.layerVersions),
    computedAt: new Date(),
  });
  return { stored, today, changes: stored ? headlineChanges(stored, today) : [] };
}
