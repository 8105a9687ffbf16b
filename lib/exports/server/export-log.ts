import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { exportLog, scenarioVersions, users, type ScenarioState } from "@/db/schema";
import type { ExportKind } from "../export-kinds";

/** Records one export: who, what and which scenario version. */
export async function recordExport({ userId, kind, scenarioVersionId }: { userId: number; kind: ExportKind; scenarioVersionId: number }): Promise<void> {
  await db.insert(exportLog).values({ userId, kind, scenarioVersionId });
}

/** One row of a scenario's export log. */
export interface ExportLogEntry {
  at: string;
  kind: string;
  versionNumber: number;
  person: string | null;
}

/** Exports of a scenario's versions in the given states, newest first (at most `limit`). */
export async function listScenarioExports({ scenarioId, states, limit }: { scenarioId: number; states: ScenarioState[]; limit: number }): Promise<ExportLogEntry[]> {
  const rows = await db
    .select({ at: exportLog.at, kind: exportLog.kind, versionNumber: scenarioVersions.number, person: users.name })
    .from(exportLog)
    .innerJoin(scenarioVersions, eq(scenarioVersions.id, exportLog.scenarioVersionId))
    .leftJoin(users, eq(users.id, exportLog.userId))
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), inArray(scenarioVersions.state, states)))
    .orderBy(desc(exportLog.at), desc(exportLog.id))
    .limit(limit);
  return rows.map((r) => ({ at: r.at.toISOString(), kind: r.kind, versionNumber: r.versionNumber, person: r.person }));
}
