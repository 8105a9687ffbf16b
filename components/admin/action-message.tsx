import type { ActionResult } from "@/lib/api/action-result";

/** The answer of a form's server action, announced to screen readers; errors as alerts. */
export function ActionMessage({ result, testId }: { result: ActionResult | null; testId?: string }) {
  if (!result) return null;
  return (
    <p
      role={result.ok ? "status" : "alert"}
      data-testid={testId}
      className={`rounded-card px-3 py-2 text-sm ${result.ok ? "bg-ok-bg text-ok-ink" : "bg-error-bg text-error-ink"}`}
    >
      {result.message}
    </p>
  );
}
