import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { signInAttempts } from "@/db/schema";

/** At most `maxAttempts` counted attempts per key in a fixed window of `windowMs` from the first one. */
export interface AttemptRule {
  maxAttempts: number;
  windowMs: number;
}

const MINUTE_MS = 60 * 1000;

/**
 * Failed sign-ins allowed before a pause (documented in docs/people.md). Per account: enough for
 * honest typos, few enough to stop guessing. Per address: higher, since an office shares one.
 */
export const SIGN_IN_RULES = {
  account: { maxAttempts: 5, windowMs: 15 * MINUTE_MS },
  address: { maxAttempts: 20, windowMs: 15 * MINUTE_MS },
} as const satisfies Record<string, AttemptRule>;

/** Password reset e-mails per account per hour, so the form cannot be used to flood someone's mailbox. */
export const RESET_REQUEST_RULE: AttemptRule = { maxAttempts: 3, windowMs: 60 * MINUTE_MS };

/** Counter keys; the e-mail is normalized so `Ann@X` and `ann@x` share one counter. */
export const attemptKeys = {
  account: (email: string) => `sign-in:account:${email.trim().toLowerCase()}`,
  address: (address: string) => `sign-in:address:${address}`,
  reset: (email: string) => `reset:account:${email.trim().toLowerCase()}`,
};

/** Milliseconds until the key may try again; 0 when it may now. */
export async function blockedForMs({ key, rule, now = new Date() }: { key: string; rule: AttemptRule; now?: Date }): Promise<number> {
  const row = await db.query.signInAttempts.findFirst({ where: eq(signInAttempts.key, key) });
  if (!row) return 0;
  const windowEndsMs = row.windowStart.getTime() + rule.windowMs;
  if (windowEndsMs <= now.getTime() || row.failures < rule.maxAttempts) return 0;
  return windowEndsMs - now.getTime();
}

/**
 * Counts one attempt in a single upsert, so app instances sharing the database never lose a count:
 * a window that has run out starts again at 1.
 */
export async function countAttempt({ key, rule, now = new Date() }: { key: string; rule: AttemptRule; now?: Date }): Promise<void> {
  const windowOpenedAfterMs = now.getTime() - rule.windowMs;
  const expired = sql`${signInAttempts.windowStart} <= ${windowOpenedAfterMs}`;
  await db
    .insert(signInAttempts)
    .values({ key, failures: 1, windowStart: now })
    .onConflictDoUpdate({
      target: signInAttempts.key,
      set: {
        failures: sql`case when ${expired} then 1 else ${signInAttempts.failures} + 1 end`,
        windowStart: sql`case when ${expired} then ${now.getTime()} else ${signInAttempts.windowStart} end`,
      },
    });
}

export async function clearAttempts({ key }: { key: string }): Promise<void> {
  await db.delete(signInAttempts).where(eq(signInAttempts.key, key));
}

function minutes(ms: number): string {
  const count = Math.max(1, Math.ceil(ms / MINUTE_MS));
  return count === 1 ? "1 minute" : `${count} minutes`;
}

/**
 * Whether a sign-in may be tried now, and if not the message to show. Checked before the password,
 * so a paused account cannot be probed; unknown e-mails are counted too, so the pause reveals nothing.
 */
export async function checkSignInAllowed({ email, address, now = new Date() }: { email: string; address: string; now?: Date }): Promise<{ allowed: true } | { allowed: false; message: string }> {
  const [accountMs, addressMs] = await Promise.all([
    blockedForMs({ key: attemptKeys.account(email), rule: SIGN_IN_RULES.account, now }),
    blockedForMs({ key: attemptKeys.address(address), rule: SIGN_IN_RULES.address, now }),
  ]);
  if (accountMs > 0) {
    return {
      allowed: false,
      message: `Too many failed sign-ins for this account. Try again in ${minutes(accountMs)}, or use "Forgot your password?" to set a new one.`,
    };
  }
  if (addressMs > 0) {
    return { allowed: false, message: `Too many failed sign-ins from your network address. Try again in ${minutes(addressMs)}.` };
  }
  return { allowed: true };
}

/** Counts a failed sign-in against both the account and the address. */
export async function recordSignInFailure({ email, address, now = new Date() }: { email: string; address: string; now?: Date }): Promise<void> {
  await countAttempt({ key: attemptKeys.account(email), rule: SIGN_IN_RULES.account, now });
  await countAttempt({ key: attemptKeys.address(address), rule: SIGN_IN_RULES.address, now });
}

/** A successful sign-in clears the account's counter (the address's runs out on its own). */
export async function clearSignInFailures({ email }: { email: string }): Promise<void> {
  await clearAttempts({ key: attemptKeys.account(email) });
}

/**
 * The client's address for the per-address limit: the right-most X-Forwarded-For entry, which is
 * the one added by the nearest proxy (Next adds the socket address when no proxy did). Entries to
 * its left come from the client and could be forged.
 */
export function clientAddress(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.["x-forwarded-for"];
  const value = Array.isArray(forwarded) ? forwarded.join(",") : typeof forwarded === "string" ? forwarded : "";
  const last = value.split(",").map((part) => part.trim()).filter(Boolean).pop();
  return last ?? "unknown";
}
