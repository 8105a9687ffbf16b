import type { ResultSet } from "@libsql/client";
import type { BaseSQLiteDatabase } from "drizzle-orm/sqlite-core";
import { auditLog } from "@/db/schema";
import type * as schema from "@/db/schema";

/** The app's database or a transaction inside it; audit rows go into the same transaction as the change they describe. */
export type Executor = BaseSQLiteDatabase<"async", ResultSet, typeof schema>;

/** What an audit row can be about; the audit trail page filters by these. */
export const AUDIT_TARGETS = ["scenario", "scenario-version", "layer", "person", "settings"] as const;
export type AuditTarget = (typeof AUDIT_TARGETS)[number];

/** A short before/after value: a few named fields, never a whole file. */
export type AuditSummary = Record<string, string | number | boolean | null>;

export interface AuditDetail {
  before?: AuditSummary;
  after?: AuditSummary;
}

export interface AuditEntry {
  /** Who did it; null for the system or for someone not signed in (a password reset request). */
  actorId: number | null;
  /** A verb in kebab-case: `create`, `save`, `upload`, `publish`, `unpublish`, `share`, `invite`, `change-role`, … */
  action: string;
  targetType: AuditTarget;
  /** The target's id, or `scenarioId/number` for a scenario version. */
  targetId: string | number | null;
  detail?: AuditDetail;
}

/** Longest string kept in a summary; the trail is for "what changed", not for contents. */
const MAX_SUMMARY_STRING = 200;
const ACTION_PATTERN = /^[a-z][a-z-]*$/;

function shorten(summary: AuditSummary | undefined): AuditSummary | undefined {
  if (!summary) return undefined;
  return Object.fromEntries(
    Object.entries(summary).map(([key, value]) =>
      typeof value === "string" && value.length > MAX_SUMMARY_STRING ? [key, `${value.slice(0, MAX_SUMMARY_STRING - 1)}…`] : [key, value],
    ),
  );
}

/**
 * Writes one row of the audit trail. Call it with the transaction that makes the change, so the
 * change and its record are committed together or not at all.
 */
export async function recordAudit(tx: Executor, entry: AuditEntry): Promise<void> {
  if (!ACTION_PATTERN.test(entry.action)) {
    throw new Error(`Audit action "${entry.action}" must be a kebab-case verb such as "publish".`);
  }
  const detail = entry.detail ? { before: shorten(entry.detail.before), after: shorten(entry.detail.after) } : null;
  await tx.insert(auditLog).values({
    actorId: entry.actorId,
    action: entry.action,
    targetType: entry.targetType,
    targetId: entry.targetId === null ? null : String(entry.targetId),
    detail,
  });
}
