import { deleteLayer, findLayer, renameLayer } from "@/db/queries/layers";
import { parseJsonBody, parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";
import { layerParamsSchema, renameLayerBodySchema } from "@/lib/layers/api-schemas";
import { toLayerVersionSummary } from "@/lib/layers/serialize";

type Context = { params: Promise<{ layerId: string }> };

/** GET /api/layers/{layerId} — the layer, all its versions and the frozen scenario versions using it. */
export const GET = route(async (_request, context: Context) => {
  const { layerId } = parseWith(layerParamsSchema, await context.params, "The layer address is not valid");
  await requirePermission("layer:view");
  const found = await findLayer({ layerId });
  if (!found) throw new LeewayError("not-found", `There is no layer ${layerId}.`);
  return Response.json({
    layer: { id: found.layer.id, kind: found.layer.kind, name: found.layer.name, createdAt: found.layer.createdAt.toISOString() },
    versions: found.versions.map(({ version, author }) => toLayerVersionSummary(found.layer.kind, version, author)),
    frozenUses: found.frozenUses,
  });
});

/** PATCH /api/layers/{layerId} with `{ "name": … }` — renames the layer. */
export const PATCH = route(async (request, context: Context) => {
  const { layerId } = parseWith(layerParamsSchema, await context.params, "The layer address is not valid");
  const user = await requirePermission("layer:edit");
  const { name } = await parseJsonBody(request, renameLayerBodySchema);
  const layer = await renameLayer({ layerId, name, actorId: user.id });
  return Response.json({ layer: { id: layer.id, kind: layer.kind, name: layer.name } });
});

/** DELETE /api/layers/{layerId} — deletes the layer and its versions; 409 while a frozen scenario version uses it. */
export const DELETE = route(async (_request, context: Context) => {
  const { layerId } = parseWith(layerParamsSchema, await context.params, "The layer address is not valid");
  const user = await requirePermission("layer:edit");
  await deleteLayer({ layerId, actorId: user.id });
  return new Response(null, { status: 204 });
});
