import { findLayerVersion, readLayerContent } from "@/db/queries/layers";
import { parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { CAUTION } from "@/lib/caution";
import { LeewayError } from "@/lib/errors";
import { layerVersionParamsSchema } from "@/lib/layers/api-schemas";
import { toDisplayFeatures } from "@/lib/layers/display-features";
import { layerProvenance } from "@/lib/layers/provenance";

type Context = { params: Promise<{ layerId: string; number: string }> };

/**
 * GET /api/layers/{layerId}/versions/{number}/features — a thinned GeoJSON picture of the version
 * for maps (at most 4,000 grid cells or points), with its provenance line and the caution.
 */
export const GET = route(async (_request, context: Context) => {
  const { layerId, number } = parseWith(layerVersionParamsSchema, await context.params, "The layer version address is not valid");
  await requirePermission("layer:view");
  const found = await findLayerVersion({ layerId, number });
  if (!found) throw new LeewayError("not-found", `Layer ${layerId} has no version ${number}.`);
  const content = await readLayerContent({ layerVersionId: found.version.id });
  const features = toDisplayFeatures(content);
  return Response.json({
    ...features,
    bbox: found.version.bbox ?? null,
    provenance: layerProvenance({ name: found.layer.name, number, sourceFile: found.version.sourceFile, author: found.author, createdAt: found.version.createdAt }),
    caution: CAUTION,
  });
});
