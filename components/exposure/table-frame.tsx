import type { ReactNode } from "react";
import { DEFAULT_DELAYS_NOTE } from "@/lib/scenario/defaults";
import { CAUTION } from "@/lib/caution";

/**
 * A titled exposure table with what every Leeway table carries: a CSV download, the "how it was
 * made" line, the default-delays statement when defaults were used, and the caution.
 */
export function TableFrame({
  title,
  description,
  csvHref,
  provenance,
  usesDefaultDelays,
  children,
  testId,
}: {
  title: string;
  description?: ReactNode;
  /** Absent for tables that have no CSV of their own. */
  csvHref?: string;
  provenance: string;
  usesDefaultDelays: boolean;
  children: ReactNode;
  testId?: string;
}) {
  return (
    <section className="space-y-2 break-inside-avoid" data-testid={testId}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-lg font-bold">{title}</h2>
        {csvHref && (
          <a href={csvHref} download className="no-print text-sm font-semibold text-tide hover:underline">
            Download CSV
          </a>
        )}
      </div>
      {description && <p className="max-w-4xl text-sm text-ink-muted">{description}</p>}
      {children}
      <footer className="space-y-1 text-xs text-ink-muted">
        {usesDefaultDelays && <p className="inline-block rounded-card bg-caution-bg px-2 py-0.5 font-semibold text-caution-ink">{DEFAULT_DELAYS_NOTE}</p>}
        <p data-testid="provenance">How it was made: {provenance}</p>
        <p>{CAUTION}</p>
      </footer>
    </section>
  );
}
