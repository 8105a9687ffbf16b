import { Wordmark } from "@/components/brand/wordmark";

/** The narrow page pages outside the workspace use (sign-in, invitation, password reset). */
export function AuthFrame({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-8 px-6 py-12">
      <Wordmark />
      {children}
    </main>
  );
}
