"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { changePersonRole, invitePerson, issuePasswordReset, reissueInvitation, setPersonActive } from "@/db/queries/people";
import { ROLES } from "@/db/schema";
import { formAction } from "@/lib/api/action";
import { positiveIntParam } from "@/lib/api/params";
import { appUrl } from "@/lib/mail/links";
import { invitationMessage, passwordResetMessage } from "@/lib/mail/messages";
import { sendEach, type DeliveryReport } from "@/lib/mail/transport";

const PEOPLE_PATH = "/admin/people";

const roleField = z.enum(ROLES, { error: "Choose one of the roles: admin, planner, trainer, council" });
const userIdField = positiveIntParam;

/** The sentence that tells the admin whether the e-mail went out (the change itself is saved either way). */
function mailOutcome(done: string, report: DeliveryReport, retry: string) {
  if (report.failed.length === 0) return { message: `${done} E-mail sent to ${report.sent.join(", ")}.` };
  return { message: `${done} The e-mail could not be sent (${report.failed[0].reason}); ${retry}` };
}

const inviteSchema = z.object({
  name: z.string().trim().min(1, "Enter the person's name").max(120, "A name can be at most 120 characters"),
  email: z.email("Enter an e-mail address such as ann@council.example").max(254, "An e-mail address can be at most 254 characters"),
  role: roleField,
});

/** Invites someone by e-mail with a role; the account exists from now on, without a password. */
export const invitePersonAction = formAction("admin:people", inviteSchema, async (input, actor) => {
  const { person, token, expiresAt } = await invitePerson({ actorId: actor.id, ...input });
  revalidatePath(PEOPLE_PATH);
  const report = await sendEach([
    invitationMessage({ to: person.email, name: person.name, role: person.role, inviterName: actor.name, link: appUrl(`/invite/${token}`), expiresAt }),
  ]);
  return mailOutcome(`${person.name} is invited as ${person.role}.`, report, 'use "Send a new invitation" once mail works.');
});

/** A new invitation link for someone who has not set a password yet. */
export const reinvitePersonAction = formAction("admin:people", z.object({ userId: userIdField }), async ({ userId }, actor) => {
  const { person, token, expiresAt } = await reissueInvitation({ actorId: actor.id, userId });
  const report = await sendEach([
    invitationMessage({ to: person.email, name: person.name, role: person.role, inviterName: actor.name, link: appUrl(`/invite/${token}`), expiresAt }),
  ]);
  revalidatePath(PEOPLE_PATH);
  return mailOutcome(`A new invitation for ${person.name} is ready; the old link no longer works.`, report, "try again once mail works.");
});

/** Changes a person's role; their sessions end, so the new role applies from their next request. */
export const changeRoleAction = formAction("admin:people", z.object({ userId: userIdField, role: roleField }), async ({ userId, role }, actor) => {
  const person = await changePersonRole({ actorId: actor.id, userId, role });
  revalidatePath(PEOPLE_PATH);
  return { message: `${person.name} is now ${person.role}.` };
});

/** Deactivates (ending every session at once) or reactivates an account. */
export const setActiveAction = formAction(
  "admin:people",
  z.object({ userId: userIdField, active: z.enum(["true", "false"], { error: "active must be true or false" }) }),
  async ({ userId, active }, actor) => {
    const person = await setPersonActive({ actorId: actor.id, userId, active: active === "true" });
    revalidatePath(PEOPLE_PATH);
    return { message: person.active ? `${person.name} can sign in again.` : `${person.name} is deactivated and signed out.` };
  },
);

/** E-mails a password reset link to a person on their behalf. */
export const sendResetLinkAction = formAction("admin:people", z.object({ userId: userIdField }), async ({ userId }, actor) => {
  const reset = await issuePasswordReset({ actorId: actor.id, userId });
  if (!reset) return { ok: false, status: 409, message: "Only active accounts can get a password reset link." };
  const report = await sendEach([
    passwordResetMessage({ to: reset.person.email, name: reset.person.name, link: appUrl(`/reset-password/${reset.token}`), expiresAt: reset.expiresAt }),
  ]);
  return mailOutcome(`A password reset link for ${reset.person.name} is ready.`, report, "try again once mail works.");
});
