"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { LAYER_KINDS, type LayerKind } from "@/db/schema";
import { layerPreviewSchema, previewStreamLineSchema, storedLayerSchema, type LayerPreviewResponse } from "@/lib/layers/api-schemas";
import { FORMATS_BY_KIND, formatFromFileName, LAYER_KIND_LABELS } from "@/lib/layers/formats";
import { formatBytes, LAYER_LIMITS } from "@/lib/layers/limits";
import { AcceptedPreview, RefusedPreview } from "./layer-preview";
import { ProgressBar } from "./progress-bar";
import { sendLayerFile } from "./send-layer-file";

/** Where an upload goes: a new layer of a chosen kind, or the next version of an existing layer. */
export type UploadTarget = { kind: "new" } | { kind: "version"; layerId: number; layerKind: LayerKind; layerName: string; nextNumber: number };

type Step =
  | { name: "choose" }
  | { name: "checking"; label: string; fraction: number | null }
  | { name: "previewed"; preview: LayerPreviewResponse }
  | { name: "saving"; label: string; fraction: number | null; preview: LayerPreviewResponse };

const FILE_HINTS: Record<LayerKind, string> = {
  population: "CSV with columns lon, lat, population (people per cell) and, optionally, district.",
  districts: "GeoJSON FeatureCollection of Polygons or MultiPolygons, each with a name property.",
  facilities: "CSV with name, kind, lon, lat — or GeoJSON Points with name and kind, and rail segments as LineStrings.",
  stations: "CSV with columns id, lon, lat and, optionally, operating (yes/no).",
  "site-condition": "CSV with columns lon, lat, vs30 (m/s).",
};

function baseName(fileName: string): string {
  return fileName.replace(/\.[^.]+$/, "").replace(/[_-]+/g, " ").trim();
}

/**
 * Upload in two steps: the file is sent to the preview route and checked without saving (progress for
 * the upload, then for the row checks), then saved on request (sent again and checked again, since the
 * server trusts no earlier answer). Everything runs in the background; the page stays usable.
 */
export function UploadPanel({ target }: { target: UploadTarget }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const fileInputId = useId();
  const [kind, setKind] = useState<LayerKind>(target.kind === "version" ? target.layerKind : "population");
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState("");
  const [step, setStep] = useState<Step>({ name: "choose" });
  const [failure, setFailure] = useState<string | null>(null);
  const abortRef = useRef<AbortController | null>(null);

  const busy = step.name === "checking" || step.name === "saving";
  const limits = LAYER_LIMITS[kind];

  function reset(nextFile: File | null) {
    abortRef.current?.abort();
    setFile(nextFile);
    setFailure(null);
    setStep({ name: "choose" });
    if (nextFile && target.kind === "new" && !name) setName(baseName(nextFile.name));
  }

  function report(error: unknown) {
    if (error instanceof DOMException && error.name === "AbortError") setFailure("Cancelled; nothing was saved.");
    else setFailure(error instanceof Error ? error.message : String(error));
  }

  async function check() {
    if (!file) return;
    const controller = new AbortController();
    abortRef.current = controller;
    setFailure(null);
    setStep({ name: "checking", label: "Uploading", fraction: 0 });
    let preview: LayerPreviewResponse | undefined;
    try {
      const query = new URLSearchParams({ kind, format: formatFromFileName(file.name) });
      await sendLayerFile({
        url: `/api/layers/preview?${query}`,
        file,
        streamProgress: true,
        signal: controller.signal,
        onUploadProgress: (fraction) => setStep(fraction < 1 ? { name: "checking", label: "Uploading", fraction } : { name: "checking", label: "Checking rows", fraction: null }),
        onLine: (raw) => {
          const line = previewStreamLineSchema.parse(raw);
          if (line.type === "progress") setStep({ name: "checking", label: "Checking rows", fraction: line.fraction });
          else preview = layerPreviewSchema.parse(line.preview);
        },
      });
      if (!preview) throw new Error("The server's answer ended before the check finished; nothing was saved.");
      setStep({ name: "previewed", preview });
    } catch (error) {
      report(error);
      setStep({ name: "choose" });
    }
  }

  async function save(preview: LayerPreviewResponse) {
    if (!file) return;
    const controller = new AbortController();
    abortRef.current = controller;
    setFailure(null);
    setStep({ name: "saving", label: "Uploading", fraction: 0, preview });
    try {
      const format = formatFromFileName(file.name);
      const url =
        target.kind === "new"
          ? `/api/layers?${new URLSearchParams({ kind, format, name, fileName: file.name })}`
          : `/api/layers/${target.layerId}/versions?${new URLSearchParams({ format, fileName: file.name })}`;
      const body = await sendLayerFile({
        url,
        file,
        signal: controller.signal,
        onUploadProgress: (fraction) =>
          setStep(fraction < 1 ? { name: "saving", label: "Uploading", fraction, preview } : { name: "saving", label: "Checking and saving", fraction: null, preview }),
      });
      const stored = storedLayerSchema.parse(body);
      await queryClient.invalidateQueries({ queryKey: ["layers"] });
      setFile(null);
      setName("");
      setStep({ name: "choose" });
      router.push(`/layers/${stored.layer.id}?v=${stored.version.number}`);
    } catch (error) {
      report(error);
      setStep({ name: "previewed", preview });
    }
  }

  const preview = step.name === "previewed" || step.name === "saving" ? step.preview : null;
  const saveLabel = target.kind === "new" ? "Save as a new layer" : `Save as version ${target.nextNumber}`;

  return (
    <section className="space-y-4 rounded-card border border-line bg-surface p-4" aria-labelledby={`${fileInputId}-heading`}>
      <h2 id={`${fileInputId}-heading`} className="text-lg font-semibold">
        {target.kind === "new" ? "Upload a layer" : `Upload a new version of “${target.layerName}”`}
      </h2>
      <div className="grid gap-4 md:grid-cols-2">
        {target.kind === "new" && (
          <label className="block space-y-1">
            <span className="text-sm font-semibold text-ink">Kind of layer</span>
            <select
              value={kind}
              disabled={busy}
              onChange={(event) => {
                setKind(event.target.value as LayerKind);
                reset(file);
              }}
              className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink"
            >
              {LAYER_KINDS.map((k) => (
                <option key={k} value={k}>
                  {LAYER_KIND_LABELS[k]}
                </option>
              ))}
            </select>
          </label>
        )}
        <label htmlFor={fileInputId} className="block space-y-1">
          <span className="text-sm font-semibold text-ink">File</span>
          <input
            id={fileInputId}
            type="file"
            disabled={busy}
            accept={FORMATS_BY_KIND[kind].map((f) => (f === "csv" ? ".csv,text/csv" : ".geojson,.json,application/geo+json")).join(",")}
            onChange={(event) => reset(event.target.files?.[0] ?? null)}
            className="block w-full text-sm file:mr-3 file:rounded-card file:border file:border-line-strong file:bg-surface file:px-3 file:py-1.5 file:font-semibold"
          />
        </label>
        {target.kind === "new" && (
          <TextField label="Layer name" value={name} disabled={busy} maxLength={120} onChange={(event) => setName(event.target.value)} />
        )}
      </div>
      <p className="text-sm text-ink-muted">
        {FILE_HINTS[kind]} UTF-8, commas between columns, decimal points. At most {formatBytes(limits.maxBytes)} and {limits.maxRows.toLocaleString("en")}{" "}
        {kind === "districts" || kind === "facilities" ? "rows or features" : "rows"}.
      </p>

      <div className="flex flex-wrap items-center gap-3">
        <Button type="button" onClick={check} disabled={!file || busy || (target.kind === "new" && !name.trim())}>
          Check file
        </Button>
        {busy && (
          <Button type="button" variant="secondary" onClick={() => abortRef.current?.abort()}>
            Cancel
          </Button>
        )}
      </div>

      {(step.name === "checking" || step.name === "saving") && <ProgressBar label={step.label} fraction={step.fraction} />}
      {failure && (
        <p role="alert" className="rounded-card bg-error-bg px-3 py-2 text-sm text-error-ink" data-testid="upload-error">
          {failure}
        </p>
      )}

      {preview?.accepted && file && (
        <>
          <AcceptedPreview preview={preview} fileName={file.name} />
          <Button type="button" onClick={() => save(preview)} disabled={busy}>
            {saveLabel}
          </Button>
        </>
      )}
      {preview && !preview.accepted && <RefusedPreview preview={preview} />}
    </section>
  );
}
