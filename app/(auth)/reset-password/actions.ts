"use server";

import { z } from "zod";
import { issuePasswordReset, setPasswordWithToken } from "@/db/queries/people";
import { formAction } from "@/lib/api/action";
import { LINK_PROBLEMS, newPasswordSchema } from "@/lib/auth/links";
import { hashPassword } from "@/lib/auth/password";
import { attemptKeys, blockedForMs, countAttempt, RESET_REQUEST_RULE } from "@/lib/auth/sign-in-limit";
import { appUrl } from "@/lib/mail/links";
import { passwordResetMessage } from "@/lib/mail/messages";
import { sendEach } from "@/lib/mail/transport";

const requestSchema = z.object({ email: z.email("Enter the e-mail address you sign in with") });

/**
 * Sends a reset link when the address belongs to an active account. The answer is the same either
 * way, and the e-mail is sent after answering, so neither the words nor the timing tell whether
 * the account exists.
 */
export const requestPasswordResetAction = formAction("public", requestSchema, async ({ email }) => {
  const key = attemptKeys.reset(email);
  const waitMs = await blockedForMs({ key, rule: RESET_REQUEST_RULE });
  if (waitMs > 0) {
    return { ok: false, status: 429, message: `Several reset links were asked for ${email} recently. Try again in ${Math.ceil(waitMs / 60_000)} minutes.` };
  }
  await countAttempt({ key, rule: RESET_REQUEST_RULE });
  const reset = await issuePasswordReset({ actorId: null, email });
  if (reset) {
    void sendEach([
      passwordResetMessage({ to: reset.person.email, name: reset.person.name, link: appUrl(`/reset-password/${reset.token}`), expiresAt: reset.expiresAt }),
    ]);
  }
  return { message: `If ${email} has an active Leeway account, a reset link is on its way. It works once, for one hour.` };
});

/** Sets a new password through a reset link; every other session of the account ends. */
export const resetPasswordAction = formAction("public", newPasswordSchema, async ({ token, password }) => {
  const check = await setPasswordWithToken({ kind: "reset", token, passwordHash: await hashPassword(password) });
  if (check.status !== "valid") {
    const problem = LINK_PROBLEMS.reset[check.status];
    return { ok: false, status: problem.status, message: `${problem.title}. ${problem.text}` };
  }
  return { message: `Your new password is set. Sign in with ${check.email}.` };
});
