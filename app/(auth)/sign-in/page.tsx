import type { Metadata } from "next";
import { Suspense } from "react";
import { Wordmark } from "@/components/brand/wordmark";
import { CautionNote } from "@/components/shell/caution-note";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default function SignInPage() {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-8 px-6 py-12">
      <div className="space-y-3">
        <Wordmark />
        <p className="text-ink-muted">
          Plan with earthquake early warning: how many seconds each place would get, where the blind zone lies and who
          is alerted.
        </p>
      </div>
      <Suspense>
        <SignInForm />
      </Suspense>
      <CautionNote />
    </main>
  );
}
