import "server-only";
import { unstable_rethrow } from "next/navigation";
import type { z } from "zod";
import { requirePermission, type CurrentUser } from "@/lib/auth/session";
import type { Permission } from "@/lib/auth/permissions";
import { LeewayError } from "@/lib/errors";
import type { ActionResult } from "./action-result";
import { toFieldIssues } from "./zod-issues";

/** The caller an action body receives: the signed-in person, or null for a public action. */
type ActorFor<P> = P extends "public" ? null : CurrentUser;

/** What an action's body returns on success: the message to show, and a status other than 200 if it means one. */
export interface ActionOutcome {
  message: string;
  status?: number;
  ok?: boolean;
}

/**
 * Builds a form server action. Server actions are public POST endpoints, so the order is fixed:
 * permission first (401/403 before anything is read), then the form parsed with its schema
 * (field messages, 400), then the body. Leeway's errors become their status; anything else is
 * logged and reported as a 500 that changed nothing.
 */
export function formAction<P extends Permission | "public", S extends z.ZodType>(
  /** Holders of this permission may call the action; "public" for links from e-mails, used before sign-in. */
  access: P,
  schema: S,
  run: (input: z.infer<S>, actor: ActorFor<P>) => Promise<ActionOutcome>,
): (previous: ActionResult | null, formData: FormData) => Promise<ActionResult> {
  return async (_previous, formData) => {
    try {
      const actor = (access === "public" ? null : await requirePermission(access as Permission)) as ActorFor<P>;
      const parsed = schema.safeParse(Object.fromEntries(formData));
      if (!parsed.success) {
        const issues = toFieldIssues(parsed.error);
        return {
          ok: false,
          status: 400,
          message: "Please correct the fields marked below.",
          fieldErrors: Object.fromEntries(issues.map((issue) => [issue.path, issue.message])),
        };
      }
      const outcome = await run(parsed.data, actor);
      const status = outcome.status ?? 200;
      return { ok: outcome.ok ?? status < 400, status, message: outcome.message };
    } catch (error) {
      // Next's redirect and not-found signals are errors too; they must reach the framework.
      unstable_rethrow(error);
      if (error instanceof LeewayError) {
        const fieldErrors = error.issues.length ? Object.fromEntries(error.issues.map((issue) => [issue.path, issue.message])) : undefined;
        return { ok: false, status: error.status, message: error.message, fieldErrors };
      }
      console.error(error);
      return { ok: false, status: 500, message: "Something went wrong on the server; nothing was changed." };
    }
  };
}
