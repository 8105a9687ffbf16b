"use client";

import { CAUTION } from "@/lib/caution";
import { DataFileControls, ExposureFileControls } from "./data-file-controls";
import { ExportLogPanel } from "./export-log-panel";
import { HandoutControls } from "./handout-controls";
import { MapSheetControls } from "./map-sheet-controls";
import { useExportAction } from "./use-export-action";

/**
 * The scenario page's exports: map sheet, drill handout, data files and the exercise message for
 * roles that may export files; exposure CSV for everyone; and the export log. The server checks
 * every export again (lib/auth/permissions.ts); `canExportFiles` only hides what it would refuse.
 */
export function ScenarioExports({ scenarioId, versionNumber, canExportFiles }: { scenarioId: number; versionNumber: number; canExportFiles: boolean }) {
  const { busy, error, run } = useExportAction(scenarioId);
  const exportsUrl = `/api/scenarios/${scenarioId}/versions/${versionNumber}/exports`;
  return (
    <section className="space-y-4 rounded-card border border-line bg-surface p-4" aria-labelledby="exports-title" data-testid="scenario-exports">
      <div>
        <h2 id="exports-title" className="text-base font-semibold">
          Exports of version {versionNumber}
        </h2>
        <p className="text-xs text-ink-muted">{CAUTION}</p>
      </div>
      {error && (
        <p role="alert" className="rounded-card bg-error-bg p-2 text-sm text-error-ink" data-testid="export-error">
          {error}
        </p>
      )}
      <div className="grid gap-4 lg:grid-cols-3">
        {canExportFiles && <MapSheetControls exportsUrl={exportsUrl} busy={busy} run={run} />}
        {canExportFiles && <HandoutControls scenarioId={scenarioId} versionNumber={versionNumber} exportsUrl={exportsUrl} busy={busy} run={run} />}
        <div className="space-y-3">
          <ExposureFileControls exportsUrl={exportsUrl} busy={busy} run={run} />
          {canExportFiles && <DataFileControls exportsUrl={exportsUrl} busy={busy} run={run} />}
        </div>
      </div>
      <ExportLogPanel scenarioId={scenarioId} />
    </section>
  );
}
