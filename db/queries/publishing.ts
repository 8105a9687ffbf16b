import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { layerVersions, scenarios, scenarioVersions, type ScenarioRow, type ScenarioVersionRow } from "@/db/schema";
import { recordAudit, type Executor } from "@/lib/audit/record";
import { LeewayError } from "@/lib/errors";
import { computeHeadline, headlineSchema, type Headline, type HeadlineExposure } from "@/lib/publishing/headline";
import { nextVisibilityState, type VisibilityAction } from "@/lib/publishing/state";

/** `scenario_versions.layer_versions`: layer kind → layer version id. */
const layerVersionIdsSchema = z.record(z.string(), z.number().int());

/** Layer kind → layer version number, for the provenance line. */
async function layerVersionNumbers(executor: Executor, layerVersionIds: unknown): Promise<Record<string, number>> {
  const parsed = layerVersionIdsSchema.safeParse(layerVersionIds);
  const ids = parsed.success ? parsed.data : {};
  if (Object.keys(ids).length === 0) return {};
  const rows = await executor
    .select({ id: layerVersions.id, number: layerVersions.number })
    .from(layerVersions)
    .where(inArray(layerVersions.id, Object.values(ids)));
  const numberOf = new Map(rows.map((row) => [row.id, row.number]));
  return Object.fromEntries(Object.entries(ids).flatMap(([kind, id]) => (numberOf.has(id) ? [[kind, numberOf.get(id)!]] : [])));
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
 * row. Publishing freezes the headline figures (from `exposure`, computed by the caller before the
 * transaction because it takes a while) and the publisher; the version's scenario file and layer
 * versions are never changed here. `note` is the publication note (publish) or the reason
 * (unpublish), kept in the audit trail either way.
 */
export async function changeVersionVisibility({
  actorId,
  scenarioId,
  number,
  action,
  note,
  exposure,
}: {
  actorId: number;
  scenarioId: number;
  number: number;
  action: VisibilityAction;
  note?: string;
  /** Required to publish. */
  exposure?: HeadlineExposure;
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
      if (!exposure) throw new Error("Publishing needs the version's exposure figures (exposureForHeadline).");
      const now = new Date();
      headline = computeHeadline({
        versionNumber: version.number,
        params: version.params,
        layerVersions: await layerVersionNumbers(tx, version.layerVersions),
        computedAt: now,
        exposure,
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

/** What a headline is computed from: a version's scenario file and layer version numbers, and the headline stored at publication. */
export async function findHeadlineSource({ scenarioId, number }: { scenarioId: number; number: number }) {
  const [version] = await db
    .select()
    .from(scenarioVersions)
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, number)));
  if (!version) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
  const stored = headlineSchema.safeParse(version.headline);
  return {
    number: version.number,
    params: version.params,
    layerVersions: await layerVersionNumbers(db, version.layerVersions),
    stored: stored.success ? stored.data : null,
  };
}
