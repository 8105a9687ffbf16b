"use client";

import { useQuery } from "@tanstack/react-query";
import { EXPORT_KINDS, type ExportKind } from "@/lib/exports/export-kinds";
import { exportLogQuery } from "./export-queries";

const kindLabel = (kind: string) => EXPORT_KINDS[kind as ExportKind] ?? kind;

/** Who exported what from which version of this scenario, newest first. */
export function ExportLogPanel({ scenarioId }: { scenarioId: number }) {
  const { data, error, isPending } = useQuery(exportLogQuery(scenarioId));
  return (
    <section className="space-y-2" aria-labelledby="export-log-title" data-testid="export-log">
      <h3 id="export-log-title" className="font-semibold">
        Export log
      </h3>
      {isPending ? (
        <p className="text-sm text-ink-muted">Loading…</p>
      ) : error ? (
        <p role="alert" className="text-sm text-error-ink">
          The export log could not be loaded: {error.message}
        </p>
      ) : data.entries.length === 0 ? (
        <p className="text-sm text-ink-muted">Nothing has been exported from this scenario yet.</p>
      ) : (
        <table className="w-full text-left text-sm">
          <thead className="text-ink-muted">
            <tr>
              <th className="py-1 pr-3 font-semibold">When (UTC)</th>
              <th className="py-1 pr-3 font-semibold">Who</th>
              <th className="py-1 pr-3 font-semibold">What</th>
              <th className="py-1 font-semibold">Version</th>
            </tr>
          </thead>
          <tbody>
            {data.entries.map((entry, index) => (
              <tr key={`${entry.at}-${index}`} className="border-t border-line">
                <td className="py-1 pr-3 tabular-nums">{entry.at.slice(0, 16).replace("T", " ")}</td>
                <td className="py-1 pr-3">{entry.person ?? "someone no longer listed"}</td>
                <td className="py-1 pr-3">{kindLabel(entry.kind)}</td>
                <td className="py-1 tabular-nums">{entry.versionNumber}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
