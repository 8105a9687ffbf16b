"use client";

import Link from "next/link";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { ActionMessage } from "@/components/admin/action-message";
import { IDLE, type ActionResult } from "@/lib/api/action-result";

/** Choose a password through an invitation or reset link; the action uses the link up. */
export function NewPasswordForm({
  token,
  email,
  heading,
  minLength,
  action,
}: {
  token: string;
  email: string;
  heading: string;
  minLength: number;
  action: (previous: ActionResult | null, form: FormData) => Promise<ActionResult>;
}) {
  const [result, submit, pending] = useActionState(action, IDLE);
  if (result?.ok) {
    return (
      <div className="space-y-3 rounded-card border border-line bg-surface p-6">
        <ActionMessage result={result} testId="password-set" />
        <Link href="/sign-in" className="inline-block font-semibold text-tide underline">
          Go to sign-in
        </Link>
      </div>
    );
  }
  return (
    <form action={submit} className="space-y-4 rounded-card border border-line bg-surface p-6" noValidate>
      <h1 className="text-lg font-semibold">{heading}</h1>
      <p className="text-sm text-ink-muted">For {email}. Use at least {minLength} characters; a few unrelated words make a good one.</p>
      <input type="hidden" name="token" value={token} />
      {/* Lets password managers store the new password under the right account. */}
      <input type="email" name="username" value={email} autoComplete="username" readOnly hidden />
      <TextField label="New password" name="password" type="password" autoComplete="new-password" minLength={minLength} required error={result?.fieldErrors?.password} />
      <TextField label="New password again" name="confirm" type="password" autoComplete="new-password" required error={result?.fieldErrors?.confirm} />
      {result && !result.fieldErrors && <ActionMessage result={result} />}
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? "Saving…" : "Set password"}
      </Button>
    </form>
  );
}
