import "server-only";
import { and, eq, isNull, ne, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { authTokens, users, type Role, type User } from "@/db/schema";
import { recordAudit, type Executor } from "@/lib/audit/record";
import { LeewayError } from "@/lib/errors";
import { consumeAuthToken, issueAuthToken, type TokenCheck, type TokenKind } from "./tokens";

/** Everyone with an account, admins first, with whether they have set a password yet. */
export async function listPeople() {
  const pendingInvite = db
    .select({ userId: authTokens.userId, expiresAt: sql<number>`max(${authTokens.expiresAt})`.as("invite_expires_at") })
    .from(authTokens)
    .where(and(eq(authTokens.kind, "invite"), isNull(authTokens.usedAt)))
    .groupBy(authTokens.userId)
    .as("pending_invite");
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      active: users.active,
      isDemo: users.isDemo,
      hasPassword: sql<number>`${users.passwordHash} is not null`,
      createdAt: users.createdAt,
      inviteExpiresAtMs: pendingInvite.expiresAt,
    })
    .from(users)
    .leftJoin(pendingInvite, eq(pendingInvite.userId, users.id))
    .orderBy(users.role, users.name);
  return rows.map(({ hasPassword, inviteExpiresAtMs, ...row }) => ({
    ...row,
    hasPassword: Boolean(hasPassword),
    inviteExpiresAt: inviteExpiresAtMs === null ? null : new Date(inviteExpiresAtMs),
  }));
}
export type PersonRow = Awaited<ReturnType<typeof listPeople>>[number];

/** Active council members, the recipients of publication notices. */
export async function listActiveCouncilMembers() {
  return db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(and(eq(users.role, "council"), eq(users.active, true)))
    .orderBy(users.name);
}

async function loadPerson(tx: Executor, userId: number): Promise<User> {
  const [person] = await tx.select().from(users).where(eq(users.id, userId));
  if (!person) throw new LeewayError("not-found", `There is no person with id ${userId}.`);
  return person;
}

/** The last-admin rule: Leeway must always keep one active administrator who can manage people. */
async function assertAnotherActiveAdmin(tx: Executor, userId: number): Promise<void> {
  const [other] = await tx
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.role, "admin"), eq(users.active, true), ne(users.id, userId)))
    .limit(1);
  if (!other) {
    throw new LeewayError("conflict", "This is the last active administrator. Make someone else an administrator first.");
  }
}

/**
 * Creates an account without a password and an invitation link for it, in one transaction.
 * The caller e-mails the link; the token is returned only here.
 */
export async function invitePerson({ actorId, email, name, role }: { actorId: number | null; email: string; name: string; role: Role }) {
  const normalized = email.trim().toLowerCase();
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, normalized));
    if (existing) throw new LeewayError("conflict", `There is already an account for ${normalized}.`);
    const [person] = await tx.insert(users).values({ email: normalized, name: name.trim(), role }).returning();
    const link = await issueAuthToken(tx, { kind: "invite", userId: person.id });
    await recordAudit(tx, {
      actorId,
      action: "invite",
      targetType: "person",
      targetId: person.id,
      detail: { after: { email: person.email, name: person.name, role } },
    });
    return { person, ...link };
  });
}

/** A fresh invitation link for someone who has not set a password yet (the old link stops working). */
export async function reissueInvitation({ actorId, userId }: { actorId: number; userId: number }) {
  return db.transaction(async (tx) => {
    const person = await loadPerson(tx, userId);
    if (person.passwordHash) {
      throw new LeewayError("conflict", `${person.email} has already set a password; send a password reset link instead.`);
    }
    if (!person.active) throw new LeewayError("conflict", `${person.email} is deactivated; reactivate the account first.`);
    const link = await issueAuthToken(tx, { kind: "invite", userId });
    await recordAudit(tx, { actorId, action: "reinvite", targetType: "person", targetId: userId, detail: { after: { email: person.email } } });
    return { person, ...link };
  });
}

/**
 * Changes a person's role. The token version is bumped so any session holding the old role ends;
 * the session check also re-reads the role on every request.
 */
export async function changePersonRole({ actorId, userId, role }: { actorId: number; userId: number; role: Role }) {
  return db.transaction(async (tx) => {
    const person = await loadPerson(tx, userId);
    if (person.role === role) return person;
    if (person.role === "admin" && person.active) await assertAnotherActiveAdmin(tx, userId);
    const [updated] = await tx
      .update(users)
      .set({ role, tokenVersion: person.tokenVersion + 1 })
      .where(eq(users.id, userId))
      .returning();
    await recordAudit(tx, {
      actorId,
      action: "change-role",
      targetType: "person",
      targetId: userId,
      detail: { before: { email: person.email, role: person.role }, after: { email: person.email, role } },
    });
    return updated;
  });
}

/** Deactivates (ending every session at once) or reactivates an account. */
export async function setPersonActive({ actorId, userId, active }: { actorId: number; userId: number; active: boolean }) {
  return db.transaction(async (tx) => {
    const person = await loadPerson(tx, userId);
    if (person.active === active) return person;
    if (!active && userId === actorId) {
      throw new LeewayError("conflict", "You cannot deactivate your own account; ask another administrator.");
    }
    if (!active && person.role === "admin") await assertAnotherActiveAdmin(tx, userId);
    const [updated] = await tx
      .update(users)
      .set({ active, tokenVersion: person.tokenVersion + 1 })
      .where(eq(users.id, userId))
      .returning();
    await recordAudit(tx, {
      actorId,
      action: active ? "reactivate" : "deactivate",
      targetType: "person",
      targetId: userId,
      detail: { before: { email: person.email, active: person.active }, after: { email: person.email, active } },
    });
    return updated;
  });
}

/**
 * A password reset link for an active account, or null when there is none. Asked for by the person
 * (actorId null: they are not signed in) or by an administrator on their behalf.
 */
export async function issuePasswordReset({ actorId, email, userId }: { actorId: number | null } & ({ email: string; userId?: never } | { userId: number; email?: never })) {
  return db.transaction(async (tx) => {
    const where = userId !== undefined ? eq(users.id, userId) : eq(users.email, email.trim().toLowerCase());
    const [person] = await tx.select().from(users).where(where);
    if (!person || !person.active) return null;
    const link = await issueAuthToken(tx, { kind: "reset", userId: person.id });
    await recordAudit(tx, { actorId, action: "request-reset", targetType: "person", targetId: person.id, detail: { after: { email: person.email } } });
    return { person, ...link };
  });
}

/**
 * Sets a password through an invitation or reset link: uses the link up, stores the new hash and
 * bumps the token version (a reset ends every other session), all in one transaction.
 */
export async function setPasswordWithToken({ kind, token, passwordHash }: { kind: TokenKind; token: string; passwordHash: string }): Promise<TokenCheck> {
  return db.transaction(async (tx) => {
    const check = await consumeAuthToken(tx, { kind, token });
    if (check.status !== "valid") return check;
    await tx
      .update(users)
      .set({ passwordHash, tokenVersion: sql`${users.tokenVersion} + 1` })
      .where(eq(users.id, check.userId));
    await recordAudit(tx, {
      actorId: check.userId,
      action: kind === "invite" ? "accept-invitation" : "reset-password",
      targetType: "person",
      targetId: check.userId,
      detail: { after: { email: check.email } },
    });
    return check;
  });
}

