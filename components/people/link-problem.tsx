import Link from "next/link";

/** Shown instead of the form when an invitation or reset link cannot be used, with what to do next. */
export function LinkProblem({ title, text }: { title: string; text: string }) {
  return (
    <div role="alert" data-testid="link-problem" className="space-y-3 rounded-card border border-line bg-surface p-6">
      <h1 className="text-lg font-semibold">{title}</h1>
      <p>{text}</p>
      <p className="flex gap-4 text-sm">
        <Link href="/sign-in" className="text-tide underline">Sign in</Link>
        <Link href="/reset-password" className="text-tide underline">Ask for a reset link</Link>
      </p>
    </div>
  );
}
