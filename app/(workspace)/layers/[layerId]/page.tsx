import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { LayerDetail } from "@/components/layers/layer-detail";
import { findLayer } from "@/db/queries/layers";
import { positiveIntParam } from "@/lib/api/params";
import { can } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Layer" };

const searchSchema = z.object({ v: positiveIntParam.optional() });

export default async function LayerPage(props: { params: Promise<{ layerId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [params, search, user] = await Promise.all([props.params, props.searchParams, requireUser()]);
  const layerId = positiveIntParam.safeParse(params.layerId);
  const query = searchSchema.safeParse(search);
  if (!layerId.success || !query.success || !can(user.role, "layer:view")) notFound();
  const found = await findLayer({ layerId: layerId.data });
  if (!found) notFound();

  return (
    <div className="space-y-4">
      <Link href="/layers" className="text-sm text-tide hover:underline">
        ← All layers
      </Link>
      <LayerDetail layerId={found.layer.id} selectedNumber={query.data.v} canEdit={can(user.role, "layer:edit")} />
    </div>
  );
}
