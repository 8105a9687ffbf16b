import type { Metadata } from "next";
import { AuthFrame } from "@/components/people/auth-frame";
import { LinkProblem } from "@/components/people/link-problem";
import { NewPasswordForm } from "@/components/people/new-password-form";
import { inspectAuthToken } from "@/db/queries/tokens";
import { LINK_PROBLEMS } from "@/lib/auth/links";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password";
import { resetPasswordAction } from "../actions";

export const metadata: Metadata = { title: "Choose a new password" };

/** The page a reset e-mail links to. */
export default async function ResetPasswordPage(props: { params: Promise<{ token: string }> }) {
  const { token } = await props.params;
  const check = await inspectAuthToken({ kind: "reset", token });
  return (
    <AuthFrame>
      {check.status === "valid" ? (
        <NewPasswordForm token={token} email={check.email} heading="Choose a new password" minLength={MIN_PASSWORD_LENGTH} action={resetPasswordAction} />
      ) : (
        <LinkProblem {...LINK_PROBLEMS.reset[check.status]} />
      )}
    </AuthFrame>
  );
}
