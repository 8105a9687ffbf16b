import type { Metadata } from "next";
import { LayerList } from "@/components/layers/layer-list";
import { UploadPanel } from "@/components/layers/upload-panel";
import { can } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Layers" };

export default async function LayersPage() {
  const user = await requireUser();
  if (!can(user.role, "layer:view")) {
    return <p role="alert">Your role ({user.role}) does not work with layers; published scenarios show the layers they used.</p>;
  }
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-bold">Layers</h1>
        <p className="max-w-3xl text-ink-muted">
          Population, district boundaries, facilities, stations and site conditions your scenarios are computed with. Every upload becomes a new version; a
          scenario version keeps the layer versions it used.
        </p>
      </div>
      <LayerList />
      {can(user.role, "layer:edit") && <UploadPanel target={{ kind: "new" }} />}
    </div>
  );
}
