import type { Metadata } from "next";
import { AuthFrame } from "@/components/people/auth-frame";
import { LinkProblem } from "@/components/people/link-problem";
import { NewPasswordForm } from "@/components/people/new-password-form";
import { inspectAuthToken } from "@/db/queries/tokens";
import { LINK_PROBLEMS } from "@/lib/auth/links";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password";
import { acceptInvitationAction } from "../actions";

export const metadata: Metadata = { title: "Accept your invitation" };

/** The page an invitation e-mail links to: choose a password, or learn why the link does not work. */
export default async function InvitePage(props: { params: Promise<{ token: string }> }) {
  const { token } = await props.params;
  const check = await inspectAuthToken({ kind: "invite", token });
  return (
    <AuthFrame>
      {check.status === "valid" ? (
        <NewPasswordForm
          token={token}
          email={check.email}
          heading={`Welcome, ${check.name}: choose your password`}
          minLength={MIN_PASSWORD_LENGTH}
          action={acceptInvitationAction}
        />
      ) : (
        <LinkProblem {...LINK_PROBLEMS.invite[check.status]} />
      )}
    </AuthFrame>
  );
}
