"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { layerListQuery } from "@/lib/api/layer-queries";
import { LAYER_KIND_LABELS } from "@/lib/layers/formats";

/** Every layer with its newest version, grouped by kind in the order of the list. */
export function LayerList() {
  const { data, error, isPending } = useQuery(layerListQuery());
  if (isPending) return <p className="text-ink-muted">Loading layers…</p>;
  if (error) return <p role="alert" className="text-error-ink">The layers could not be loaded: {error.message}</p>;
  if (data.layers.length === 0) return <p className="text-ink-muted">No layers yet. Upload one below.</p>;

  return (
    <div className="overflow-x-auto rounded-card border border-line bg-surface">
      <table className="w-full text-left text-sm" data-testid="layer-list">
        <thead className="border-b border-line text-ink-muted">
          <tr>
            <th className="px-3 py-2 font-semibold">Layer</th>
            <th className="px-3 py-2 font-semibold">Kind</th>
            <th className="px-3 py-2 font-semibold">Newest version</th>
            <th className="px-3 py-2 font-semibold">Contents</th>
            <th className="px-3 py-2 font-semibold">Uploaded</th>
          </tr>
        </thead>
        <tbody>
          {data.layers.map((layer) => (
            <tr key={layer.id} className="border-t border-line">
              <td className="px-3 py-2">
                <Link href={`/layers/${layer.id}`} className="font-semibold text-tide hover:underline">
                  {layer.name}
                </Link>
              </td>
              <td className="px-3 py-2">{LAYER_KIND_LABELS[layer.kind]}</td>
              <td className="px-3 py-2">
                {layer.latest.number} of {layer.versionCount}
              </td>
              <td className="px-3 py-2">{layer.latest.description || `${layer.latest.rowCount.toLocaleString("en")} rows`}</td>
              <td className="px-3 py-2 text-ink-muted">
                {layer.latest.createdAt.slice(0, 10)}
                {layer.latest.author ? ` · ${layer.latest.author}` : ""}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
