import { listLayers, storeLayerVersion } from "@/db/queries/layers";
import { parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { createLayerQuerySchema } from "@/lib/layers/api-schemas";
import { decodeLayerFile } from "@/lib/layers/decode";
import { readLayerFile } from "@/lib/layers/read-layer-file";
import { readUploadBody } from "@/lib/layers/read-upload-body";
import { toLayerVersionSummary } from "@/lib/layers/serialize";

/** GET /api/layers — every layer with its newest version. */
export const GET = route(async () => {
  await requirePermission("layer:view");
  const rows = await listLayers();
  return Response.json({
    layers: rows.map(({ layer, latest, author, versionCount }) => ({
      id: layer.id,
      kind: layer.kind,
      name: layer.name,
      versionCount,
      latest: toLayerVersionSummary(layer.kind, latest, author),
    })),
  });
});

/**
 * POST /api/layers?kind=…&format=csv|geojson&name=…&fileName=… — the body is the file. Checks it
 * whole and stores it as version 1 of a new layer; a file with any bad row is refused (400, the first
 * 50 problems listed) and nothing is written.
 */
export const POST = route(async (request) => {
  const user = await requirePermission("layer:edit");
  const query = parseWith(createLayerQuerySchema, Object.fromEntries(new URL(request.url).searchParams), "The upload's settings are not valid");
  const text = decodeLayerFile(query.kind, await readUploadBody(request, query.kind));
  const layer = await readLayerFile(query.kind, query.format, text);
  const stored = await storeLayerVersion({ layer, target: { name: query.name }, sourceFile: query.fileName, actorId: user.id });
  return Response.json(
    { layer: { id: stored.layerId, name: query.name, kind: query.kind }, version: { number: stored.number }, reassigned: stored.reassigned },
    { status: 201 },
  );
});
