import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { authTokens, users } from "@/db/schema";
import type { Executor } from "@/lib/audit/record";

export type TokenKind = (typeof authTokens.$inferSelect)["kind"];

const HOUR_MS = 60 * 60 * 1000;

/**
 * How long a link stays valid (documented in docs/people.md): an invitation a week, so it survives
 * a weekend; a password reset one hour, because it is asked for by the person about to use it.
 */
export const TOKEN_LIFETIME_MS: Record<TokenKind, number> = {
  invite: 7 * 24 * HOUR_MS,
  reset: 1 * HOUR_MS,
};

/** 32 random bytes as base64url: 43 characters, the only shape a genuine token has. */
const TOKEN_BYTES = 32;
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** Only this hash is stored, so a copy of the database does not hold usable links. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/**
 * Creates a single-use link token for a person and returns it (the only time it exists in clear).
 * Older unused tokens of the same kind for that person are withdrawn: only the newest link works.
 */
export async function issueAuthToken(
  tx: Executor,
  { kind, userId, now = new Date() }: { kind: TokenKind; userId: number; now?: Date },
): Promise<{ token: string; expiresAt: Date }> {
  const token = randomBytes(TOKEN_BYTES).toString("base64url");
  const expiresAt = new Date(now.getTime() + TOKEN_LIFETIME_MS[kind]);
  await tx.delete(authTokens).where(and(eq(authTokens.userId, userId), eq(authTokens.kind, kind), isNull(authTokens.usedAt)));
  await tx.insert(authTokens).values({ kind, tokenHash: hashToken(token), userId, expiresAt });
  return { token, expiresAt };
}

/** Why a link does or does not work; each failure gets its own page. */
export type TokenCheck =
  | { status: "valid"; userId: number; email: string; name: string; expiresAt: Date }
  | { status: "invalid" | "used" | "expired" | "inactive" };

async function checkToken(executor: Executor, kind: TokenKind, token: string, now: Date): Promise<TokenCheck> {
  // A token of the wrong shape was mistyped or altered; it is not even looked up.
  if (!TOKEN_PATTERN.test(token)) return { status: "invalid" };
  const [row] = await executor
    .select({ token: authTokens, email: users.email, name: users.name, active: users.active })
    .from(authTokens)
    .innerJoin(users, eq(users.id, authTokens.userId))
    .where(and(eq(authTokens.tokenHash, hashToken(token)), eq(authTokens.kind, kind)));
  if (!row) return { status: "invalid" };
  if (row.token.usedAt) return { status: "used" };
  if (row.token.expiresAt.getTime() <= now.getTime()) return { status: "expired" };
  if (!row.active) return { status: "inactive" };
  return { status: "valid", userId: row.token.userId, email: row.email, name: row.name, expiresAt: row.token.expiresAt };
}

/** Looks a link up without using it (to show the set-password form or the right error page). */
export async function inspectAuthToken({ kind, token, now = new Date() }: { kind: TokenKind; token: string; now?: Date }) {
  return checkToken(db, kind, token, now);
}

/**
 * Uses a link up inside the caller's transaction. The conditional update makes it single-use even
 * when two requests race: only one of them changes the row.
 */
export async function consumeAuthToken(
  tx: Executor,
  { kind, token, now = new Date() }: { kind: TokenKind; token: string; now?: Date },
): Promise<TokenCheck> {
  const check = await checkToken(tx, kind, token, now);
  if (check.status !== "valid") return check;
  const claimed = await tx
    .update(authTokens)
    .set({ usedAt: now })
    .where(and(eq(authTokens.tokenHash, hashToken(token)), isNull(authTokens.usedAt), gt(authTokens.expiresAt, now)))
    .returning({ id: authTokens.id });
  return claimed.length === 1 ? check : { status: "used" };
}
