import { z } from "zod";
import { MIN_PASSWORD_LENGTH } from "./password";

export type LinkKind = "invite" | "reset";
export type LinkProblem = "invalid" | "used" | "expired" | "inactive";

/** The form behind an invitation or reset link: the token from the address and the new password twice. */
export const newPasswordSchema = z
  .object({
    token: z.string().min(1, "The link is missing its token"),
    password: z
      .string()
      .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters`)
      .max(200, "Use at most 200 characters"),
    confirm: z.string(),
  })
  .refine((form) => form.password === form.confirm, { path: ["confirm"], message: "The two passwords are not the same" });

/** Each reason a link does not work, with what to do about it — shown as the page instead of the form. */
export const LINK_PROBLEMS: Record<LinkKind, Record<LinkProblem, { title: string; text: string; status: number }>> = {
  invite: {
    invalid: {
      title: "This invitation link is not valid",
      text: "The address may be incomplete or changed. Open the link from the e-mail again, copying the whole address, or ask your administrator for a new invitation.",
      status: 400,
    },
    used: {
      title: "This invitation has already been used",
      text: "Your password is already set: sign in with your e-mail address. If you have forgotten the password, use “Forgot your password?” on the sign-in page.",
      status: 410,
    },
    expired: {
      title: "This invitation has expired",
      text: "Invitation links work for 7 days. Ask your administrator to send a new one.",
      status: 410,
    },
    inactive: {
      title: "This account is deactivated",
      text: "Ask your administrator to reactivate it.",
      status: 403,
    },
  },
  reset: {
    invalid: {
      title: "This reset link is not valid",
      text: "The address may be incomplete or changed. Open the link from the e-mail again, copying the whole address, or ask for a new link.",
      status: 400,
    },
    used: {
      title: "This reset link has already been used",
      text: "Each link works once. Sign in with your new password, or ask for a new link.",
      status: 410,
    },
    expired: {
      title: "This reset link has expired",
      text: "Reset links work for one hour. Ask for a new link.",
      status: 410,
    },
    inactive: {
      title: "This account is deactivated",
      text: "Ask your administrator to reactivate it.",
      status: 403,
    },
  },
};
