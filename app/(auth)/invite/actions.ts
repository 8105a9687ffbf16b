"use server";

import { setPasswordWithToken } from "@/db/queries/people";
import { formAction } from "@/lib/api/action";
import { LINK_PROBLEMS, newPasswordSchema } from "@/lib/auth/links";
import { hashPassword } from "@/lib/auth/password";

/** The invitee sets their password through the invitation link; the link is used up. */
export const acceptInvitationAction = formAction("public", newPasswordSchema, async ({ token, password }) => {
  const check = await setPasswordWithToken({ kind: "invite", token, passwordHash: await hashPassword(password) });
  if (check.status !== "valid") {
    const problem = LINK_PROBLEMS.invite[check.status];
    return { ok: false, status: problem.status, message: `${problem.title}. ${problem.text}` };
  }
  return { message: `Welcome to Leeway, ${check.name}. Your password is set: sign in with ${check.email}.` };
});
