import "server-only";
import type { User } from "next-auth";
import { z } from "zod";
import { findUserByEmail } from "@/db/queries/users";
import { verifyPassword } from "./password";
import { checkSignInAllowed, clearSignInFailures, clientAddress, recordSignInFailure } from "./sign-in-limit";

const credentialsSchema = z.object({
  email: z.email(),
  password: z.string().min(1),
});

/** What the sign-in form shows for any failed attempt: it does not say which part was wrong. */
export const SIGN_IN_FAILED = "E-mail or password is not right.";

/** What it shows when the check itself failed (the database did not answer, …); details go to the log. */
export const SIGN_IN_UNAVAILABLE = "Sign-in is not available right now. Please try again in a minute.";

/** A refusal meant for the person signing in; any other error is the server's and is not shown. */
export class SignInRefusedError extends Error {}

/**
 * The credentials check behind next-auth: rate limit first (per account and per client address),
 * then the password, always spending one hash comparison. Throws with the message the form shows.
 */
export async function authorizeCredentials(raw: unknown, headers: Record<string, unknown> | undefined): Promise<User> {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) throw new SignInRefusedError(SIGN_IN_FAILED);
  const { email, password } = parsed.data;
  const address = clientAddress(headers);

  const limit = await checkSignInAllowed({ email, address });
  if (!limit.allowed) throw new SignInRefusedError(limit.message);

  const user = await findUserByEmail({ email });
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!user || !ok || !user.active) {
    await recordSignInFailure({ email, address });
    throw new SignInRefusedError(SIGN_IN_FAILED);
  }
  await clearSignInFailures({ email });
  return { id: String(user.id), email: user.email, name: user.name, role: user.role, tokenVersion: user.tokenVersion };
}
