import type { GridSummary } from "@/lib/geo";
import { formatAreaKm2, formatIntensity, formatTimeS, formatWarningS } from "@/lib/workspace/format";
import type { EngineResults } from "@/lib/workspace/use-engine-results";

function Figure({ label, value, testId, unit }: { label: string; value: string; testId: string; unit?: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-muted">{label}</dt>
      <dd className="text-sm font-semibold">
        <span data-testid={testId}>{value}</span>
        {unit ? <span className="font-normal text-ink-muted"> {unit}</span> : null}
      </dd>
    </div>
  );
}

function gridLine(results: EngineResults): string {
  const s: GridSummary = results.summary;
  const what = results.kind === "preview" ? "Preview while dragging" : "Full grid";
  return `${what}: ${s.width} × ${s.height} cells of ${s.cellKm.toFixed(2)} km`;
}

/** The headline figures of the latest grid, and which grid they come from. */
export function ResultsSummary({ results, computing, scaleLabel }: { results: EngineResults | null; computing: boolean; scaleLabel: string }) {
  if (!results) return <p className="text-sm text-ink-muted" data-testid="results-summary">{computing ? "Computing…" : "No results yet."}</p>;
  const s = results.summary;
  return (
    <section className="space-y-1 rounded-card border border-line bg-surface p-3" data-testid="results-summary" data-kind={results.kind} data-busy={computing ? "true" : "false"}>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 sm:grid-cols-3 xl:grid-cols-6">
        <Figure label="Alert" value={s.alertIssued && s.alertIssuedS !== null ? `issued at ${formatTimeS(s.alertIssuedS)}` : "not issued"} unit={s.alertIssued ? "s" : undefined} testId="summary-alert-issued" />
        <Figure label="Detection (P at the k-th station)" value={formatTimeS(s.detectionS)} unit="s" testId="summary-detection-s" />
        <Figure label="Blind zone" value={s.blindZoneAreaKm2.toFixed(1)} unit="km²" testId="summary-blind-zone-km2" />
        <Figure label="Alert area" value={formatAreaKm2(s.alertAreaKm2)} unit="km²" testId="summary-alert-area-km2" />
        <Figure label="Longest warning, alerted places" value={s.alertedMaxWarningS === null ? "—" : formatWarningS(s.alertedMaxWarningS)} unit={s.alertedMaxWarningS === null ? undefined : "s"} testId="summary-max-warning-s" />
        <Figure label={`Strongest predicted shaking (${scaleLabel})`} value={formatIntensity(s.maxIntensity)} testId="summary-max-intensity" />
      </dl>
      <p className="text-xs text-ink-muted" data-testid="summary-grid">
        {gridLine(results)}
        {computing ? " · updating…" : ""}
      </p>
    </section>
  );
}
