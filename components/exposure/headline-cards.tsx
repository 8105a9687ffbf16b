import type { ExposureHeadlineFigure } from "@/lib/exposure/contracts";
import { formatPeople } from "./format";

/** The headline figures as large, plain numbers with their labels (council summary and exposure page). */
export function HeadlineCards({ figures }: { figures: ExposureHeadlineFigure[] }) {
  return (
    <dl className="grid gap-3 sm:grid-cols-3" data-testid="headline-figures">
      {figures.map((figure) => (
        <div key={figure.key} className="rounded-card border border-line bg-surface px-4 py-3 break-inside-avoid" data-testid={`headline-${figure.key}`}>
          <dt className="text-sm text-ink-muted">{figure.label}</dt>
          <dd className="text-2xl font-bold tabular-nums">
            {formatPeople(figure.value)} <span className="text-base font-normal text-ink-muted">{figure.unit}</span>
          </dd>
        </div>
      ))}
    </dl>
  );
}
