"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { layerDetailQuery, layerFeaturesQuery } from "@/lib/api/layer-queries";
import { LAYER_KIND_LABELS } from "@/lib/layers/formats";
import { DeleteLayerButton } from "./delete-layer-button";
import { LayerMap } from "./layer-map";
import { RenameLayerForm } from "./rename-layer-form";
import { UploadPanel } from "./upload-panel";

function VersionMap({ layerId, number }: { layerId: number; number: number }) {
  const { data, error, isPending } = useQuery(layerFeaturesQuery(layerId, number));
  if (isPending) return <p className="text-ink-muted">Loading the map…</p>;
  if (error) return <p role="alert" className="text-error-ink">The layer could not be drawn: {error.message}</p>;
  return <LayerMap key={`${layerId}/${number}`} features={{ type: "FeatureCollection", features: data.features }} bbox={data.bbox} provenance={data.provenance} />;
}

/** One layer: its versions, the chosen version on the map, and (for editors) rename, a new version and delete. */
export function LayerDetail({ layerId, selectedNumber, canEdit }: { layerId: number; selectedNumber?: number; canEdit: boolean }) {
  const { data, error, isPending } = useQuery(layerDetailQuery(layerId));
  if (isPending) return <p className="text-ink-muted">Loading the layer…</p>;
  if (error) return <p role="alert" className="text-error-ink">The layer could not be loaded: {error.message}</p>;

  const { layer, versions, frozenUses } = data;
  const selected = versions.find((v) => v.number === selectedNumber) ?? versions[0];
  const usedBy = new Map<number, string[]>();
  for (const use of frozenUses) {
    usedBy.set(use.layerVersionNumber, [...(usedBy.get(use.layerVersionNumber) ?? []), `${use.scenarioName} v${use.number} (${use.state === "published" ? "published" : "exercise"})`]);
  }
  const blockedBy = frozenUses.length
    ? `${frozenUses.length === 1 ? "a frozen scenario version uses it" : `${frozenUses.length} frozen scenario versions use it`}`
    : null;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-bold" data-testid="layer-name">
          {layer.name}
        </h1>
        <span className="text-sm text-ink-muted">
          {LAYER_KIND_LABELS[layer.kind]} · {versions.length} {versions.length === 1 ? "version" : "versions"}
        </span>
      </div>

      {selected && (
        <section className="space-y-2" aria-label={`Version ${selected.number} on the map`}>
          <h2 className="text-lg font-semibold">
            Version {selected.number}
            <span className="ml-2 text-sm font-normal text-ink-muted">{selected.description}</span>
          </h2>
          {selected.districtNote && <p className="text-sm text-ink-muted">{selected.districtNote}</p>}
          <VersionMap layerId={layer.id} number={selected.number} />
        </section>
      )}

      <section className="space-y-2">
        <h2 className="text-lg font-semibold">Versions</h2>
        <div className="overflow-x-auto rounded-card border border-line bg-surface">
          <table className="w-full text-left text-sm" data-testid="layer-versions">
            <thead className="border-b border-line text-ink-muted">
              <tr>
                <th className="px-3 py-2 font-semibold">Version</th>
                <th className="px-3 py-2 font-semibold">Contents</th>
                <th className="px-3 py-2 font-semibold">File</th>
                <th className="px-3 py-2 font-semibold">Uploaded</th>
                <th className="px-3 py-2 font-semibold">Used by frozen scenarios</th>
              </tr>
            </thead>
            <tbody>
              {versions.map((version) => (
                <tr key={version.number} className={`border-t border-line ${version.number === selected?.number ? "bg-tide-soft" : ""}`}>
                  <td className="px-3 py-2">
                    <Link href={`/layers/${layer.id}?v=${version.number}`} className="font-semibold text-tide hover:underline" aria-current={version.number === selected?.number ? "true" : undefined}>
                      {version.number}
                    </Link>
                  </td>
                  <td className="px-3 py-2">{version.description || `${version.rowCount.toLocaleString("en")} rows`}</td>
                  <td className="px-3 py-2">{version.sourceFile}</td>
                  <td className="px-3 py-2 text-ink-muted">
                    {version.createdAt.slice(0, 16).replace("T", " ")} UTC{version.author ? ` · ${version.author}` : ""}
                  </td>
                  <td className="px-3 py-2 text-ink-muted">{usedBy.get(version.number)?.join(", ") ?? "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      {canEdit && (
        <>
          <UploadPanel target={{ kind: "version", layerId: layer.id, layerKind: layer.kind, layerName: layer.name, nextNumber: (versions[0]?.number ?? 0) + 1 }} />
          <section className="space-y-3 rounded-card border border-line bg-surface p-4">
            <h2 className="text-lg font-semibold">Manage</h2>
            <RenameLayerForm key={layer.name} layerId={layer.id} name={layer.name} />
            <DeleteLayerButton layerId={layer.id} name={layer.name} blockedBy={blockedBy} />
          </section>
        </>
      )}
    </div>
  );
}
