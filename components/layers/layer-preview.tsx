"use client";

import type { LayerKind } from "@/db/schema";
import type { LayerPreviewResponse } from "@/lib/layers/api-schemas";
import { describeLayerSummary } from "@/lib/layers/describe-summary";
import { IssueList } from "./issue-list";
import { LayerMap } from "./layer-map";

type Accepted = Extract<LayerPreviewResponse, { accepted: true }>;

function formatCell(value: string | number): string {
  return typeof value === "number" ? String(value) : value;
}

/** What a checked file holds, before it is saved: figures, the first rows and its extent on the map. */
export function AcceptedPreview({ preview, fileName }: { preview: Accepted; fileName: string }) {
  const [west, south, east, north] = preview.bbox;
  const figures = describeLayerSummary(preview.kind as LayerKind, preview.summary);
  return (
    <div className="space-y-4" data-testid="upload-preview">
      <p className="rounded-card bg-ok-bg px-3 py-2 text-sm text-ok-ink">
        <strong className="font-semibold">All {preview.rowCount.toLocaleString("en")} rows passed the checks.</strong> {figures}. Nothing is saved until you
        save it.
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-muted">Rows</dt>
        <dd data-testid="preview-row-count">{preview.rowCount.toLocaleString("en")}</dd>
        <dt className="text-ink-muted">Extent</dt>
        <dd>
          {south.toFixed(3)}° to {north.toFixed(3)}° latitude, {west.toFixed(3)}° to {east.toFixed(3)}° longitude
        </dd>
      </dl>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="preview-rows">
          <caption className="pb-1 text-left text-ink-muted">First rows as Leeway read them</caption>
          <thead>
            <tr>
              {preview.sample.columns.map((column) => (
                <th key={column} className="py-1 pr-4 font-semibold">
                  {column}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {preview.sample.rows.map((row, i) => (
              <tr key={i} className="border-t border-line">
                {row.map((cell, j) => (
                  <td key={j} className="py-1 pr-4">
                    {formatCell(cell)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <LayerMap
        key={fileName}
        features={preview.extent}
        bbox={preview.bbox}
        provenance={`Preview of ${fileName}, not saved; large layers are thinned for drawing.`}
      />
    </div>
  );
}

/** Why a file would be refused, and its problems by row. */
export function RefusedPreview({ preview }: { preview: Extract<LayerPreviewResponse, { accepted: false }> }) {
  return (
    <div role="alert" className="space-y-3 rounded-card bg-error-bg p-3 text-error-ink" data-testid="upload-refused">
      <p className="font-semibold">{preview.message}</p>
      <IssueList issues={preview.issues} issueCount={preview.issueCount} />
    </div>
  );
}
