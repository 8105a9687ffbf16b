import "server-only";
import { and, desc, eq, gte, lt, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { auditLog, users } from "@/db/schema";
import type { AuditDetail, AuditTarget } from "@/lib/audit/record";

export interface AuditFilter {
  targetType?: AuditTarget;
  action?: string;
  actorId?: number;
  /** Inclusive lower bound. */
  from?: Date;
  /** Exclusive upper bound. */
  to?: Date;
  /** Rows with a smaller id than this (the page before); the trail is read newest first. */
  beforeId?: number;
}

/** Rows per page of the audit trail. */
export const AUDIT_PAGE_SIZE = 100;

/** The audit trail, newest first, one page at a time, with the actor's name. */
export async function listAuditEntries({ filter, limit = AUDIT_PAGE_SIZE }: { filter: AuditFilter; limit?: number }) {
  const conditions: SQL[] = [];
  if (filter.targetType) conditions.push(eq(auditLog.targetType, filter.targetType));
  if (filter.action) conditions.push(eq(auditLog.action, filter.action));
  if (filter.actorId) conditions.push(eq(auditLog.actorId, filter.actorId));
  if (filter.from) conditions.push(gte(auditLog.at, filter.from));
  if (filter.to) conditions.push(lt(auditLog.at, filter.to));
  if (filter.beforeId) conditions.push(lt(auditLog.id, filter.beforeId));

  const rows = await db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      action: auditLog.action,
      targetType: auditLog.targetType,
      targetId: auditLog.targetId,
      detail: auditLog.detail,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(and(...conditions))
    .orderBy(desc(auditLog.id))
    // One extra row tells whether an older page exists.
    .limit(limit + 1);

  return {
    entries: rows.slice(0, limit).map((row) => ({ ...row, detail: row.detail as AuditDetail | null })),
    hasOlder: rows.length > limit,
  };
}

/** The actions and the people that occur in the trail, for the filter menus. */
export async function listAuditFilterOptions() {
  const [actions, actors] = await Promise.all([
    db.selectDistinct({ action: auditLog.action }).from(auditLog).orderBy(auditLog.action),
    db
      .selectDistinct({ id: users.id, name: users.name, email: users.email })
      .from(auditLog)
      .innerJoin(users, eq(users.id, auditLog.actorId))
      .orderBy(users.name),
  ]);
  return { actions: actions.map((row) => row.action), actors };
}
