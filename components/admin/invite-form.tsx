"use client";

import { useActionState } from "react";
import { invitePersonAction } from "@/app/(workspace)/admin/people/actions";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { IDLE } from "@/lib/api/action-result";
import { ActionMessage } from "./action-message";
import { ROLE_OPTIONS } from "./role-options";

/** Invite someone by e-mail with a role; they choose their password through the link. */
export function InviteForm() {
  const [result, submit, pending] = useActionState(invitePersonAction, IDLE);
  return (
    <form action={submit} className="space-y-3 rounded-card border border-line bg-surface p-4" aria-labelledby="invite-heading" noValidate>
      <h2 id="invite-heading" className="text-lg font-semibold">
        Invite someone
      </h2>
      <div className="grid gap-3 md:grid-cols-3">
        <TextField label="Name" name="name" autoComplete="off" required error={result?.fieldErrors?.name} />
        <TextField label="E-mail" name="email" type="email" autoComplete="off" required error={result?.fieldErrors?.email} />
        <SelectField label="Role" name="role" defaultValue="council" options={ROLE_OPTIONS} error={result?.fieldErrors?.role} />
      </div>
      <ActionMessage result={result} testId="invite-result" />
      <Button type="submit" disabled={pending}>
        {pending ? "Sending invitation…" : "Send invitation"}
      </Button>
    </form>
  );
}
