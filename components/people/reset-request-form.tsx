"use client";

import Link from "next/link";
import { useActionState } from "react";
import { requestPasswordResetAction } from "@/app/(auth)/reset-password/actions";
import { ActionMessage } from "@/components/admin/action-message";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { IDLE } from "@/lib/api/action-result";

/** Ask for a password reset link by e-mail. */
export function ResetRequestForm() {
  const [result, submit, pending] = useActionState(requestPasswordResetAction, IDLE);
  return (
    <form action={submit} className="space-y-4 rounded-card border border-line bg-surface p-6" noValidate>
      <h1 className="text-lg font-semibold">Forgot your password?</h1>
      <p className="text-sm text-ink-muted">Leeway e-mails you a link to choose a new one. The link works once, for one hour.</p>
      <TextField label="E-mail" name="email" type="email" autoComplete="username" required error={result?.fieldErrors?.email} />
      {result && !result.fieldErrors && <ActionMessage result={result} testId="reset-requested" />}
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? "Sending…" : "Send reset link"}
      </Button>
      <Link href="/sign-in" className="block text-sm text-tide underline">
        Back to sign-in
      </Link>
    </form>
  );
}
