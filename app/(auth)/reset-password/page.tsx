import type { Metadata } from "next";
import { AuthFrame } from "@/components/people/auth-frame";
import { ResetRequestForm } from "@/components/people/reset-request-form";

export const metadata: Metadata = { title: "Reset your password" };

export default function RequestResetPage() {
  return (
    <AuthFrame>
      <ResetRequestForm />
    </AuthFrame>
  );
}
