import type { Metadata } from "next";
import { AuthFrame } from "@/components/people/auth-frame";
import { LinkProblem } from "@/components/people/link-problem";
import { LINK_PROBLEMS } from "@/lib/auth/links";

export const metadata: Metadata = { title: "Invitation" };

/** /invite without its token: the link was cut short. */
export default function InviteWithoutToken() {
  return (
    <AuthFrame>
      <LinkProblem {...LINK_PROBLEMS.invite.invalid} />
    </AuthFrame>
  );
}
