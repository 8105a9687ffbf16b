import { findLayer, storeLayerVersion } from "@/db/queries/layers";
import { parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";
import { addVersionQuerySchema, layerParamsSchema } from "@/lib/layers/api-schemas";
import { decodeLayerFile } from "@/lib/layers/decode";
import { readLayerFile } from "@/lib/layers/read-layer-file";
import { readUploadBody } from "@/lib/layers/read-upload-body";

type Context = { params: Promise<{ layerId: string }> };

/**
 * POST /api/layers/{layerId}/versions?format=…&fileName=… — the body is the file. Stores it as the
 * layer's next version; earlier versions stay, so scenario versions that recorded them keep them.
 */
export const POST = route(async (request, context: Context) => {
  const { layerId } = parseWith(layerParamsSchema, await context.params, "The layer address is not valid");
  const user = await requirePermission("layer:edit");
  const query = parseWith(addVersionQuerySchema, Object.fromEntries(new URL(request.url).searchParams), "The upload's settings are not valid");
  const found = await findLayer({ layerId });
  if (!found) throw new LeewayError("not-found", `There is no layer ${layerId}.`);
  const { kind } = found.layer;
  const text = decodeLayerFile(kind, await readUploadBody(request, kind));
  const layer = await readLayerFile(kind, query.format, text);
  const stored = await storeLayerVersion({ layer, target: { layerId }, sourceFile: query.fileName, actorId: user.id });
  return Response.json(
    { layer: { id: layerId, name: found.layer.name, kind }, version: { number: stored.number }, reassigned: stored.reassigned },
    { status: 201 },
  );
});
