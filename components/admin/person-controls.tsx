"use client";

import { useActionState } from "react";
import { changeRoleAction, reinvitePersonAction, sendResetLinkAction, setActiveAction } from "@/app/(workspace)/admin/people/actions";
import type { Role } from "@/db/schema";
import { Button } from "@/components/ui/button";
import { IDLE, type ActionResult } from "@/lib/api/action-result";
import { ActionMessage } from "./action-message";
import { ROLE_OPTIONS } from "./role-options";

export interface PersonSummary {
  id: number;
  name: string;
  role: Role;
  active: boolean;
  hasPassword: boolean;
}

const ACTIONS = {
  role: changeRoleAction,
  active: setActiveAction,
  reinvite: reinvitePersonAction,
  reset: sendResetLinkAction,
} as const;

/**
 * Role change, deactivation and links for one person. The row's forms share one state, so the
 * message under the row always answers the form submitted last; each form names its server
 * action in `intent`, and each action checks the caller's role again on the server.
 */
export function PersonControls({ person }: { person: PersonSummary }) {
  const [result, submit, pending] = useActionState(async (previous: ActionResult | null, form: FormData) => {
    const intent = String(form.get("intent")) as keyof typeof ACTIONS;
    return ACTIONS[intent](previous, form);
  }, IDLE);

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-2">
        <form action={submit} className="flex items-center gap-2">
          <input type="hidden" name="intent" value="role" />
          <input type="hidden" name="userId" value={person.id} />
          <label className="sr-only" htmlFor={`role-${person.id}`}>
            Role of {person.name}
          </label>
          <select
            id={`role-${person.id}`}
            name="role"
            defaultValue={person.role}
            className="rounded-card border border-line-strong bg-surface px-2 py-1.5 text-sm"
          >
            {ROLE_OPTIONS.map((option) => (
              <option key={option.value} value={option.value}>
                {option.label}
              </option>
            ))}
          </select>
          <Button type="submit" variant="secondary" disabled={pending}>
            Change role
          </Button>
        </form>
        <form action={submit}>
          <input type="hidden" name="intent" value="active" />
          <input type="hidden" name="userId" value={person.id} />
          <input type="hidden" name="active" value={person.active ? "false" : "true"} />
          <Button type="submit" variant="secondary" disabled={pending}>
            {person.active ? "Deactivate" : "Reactivate"}
          </Button>
        </form>
        {person.active && (
          <form action={submit}>
            <input type="hidden" name="intent" value={person.hasPassword ? "reset" : "reinvite"} />
            <input type="hidden" name="userId" value={person.id} />
            <Button type="submit" variant="quiet" disabled={pending}>
              {person.hasPassword ? "Send password reset link" : "Send a new invitation"}
            </Button>
          </form>
        )}
      </div>
      <ActionMessage result={result} />
    </div>
  );
}
