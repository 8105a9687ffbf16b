import { changeVersionVisibility } from "@/db/queries/publishing";
import { parseJsonBody, parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { publishBodySchema, unpublishBodySchema } from "@/lib/publishing/contracts";
import { exposureForHeadline } from "@/lib/publishing/headline-today";
import { notifyCouncil, toVisibilityResponse } from "@/lib/publishing/notify";

type Context = { params: Promise<{ scenarioId: string; number: string }> };

/** POST /api/scenarios/:scenarioId/versions/:number/publish — publish to council with a note; council members are e-mailed. */
export const POST = route(async (request, context: Context) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission("scenario:publish");
  const { note } = await parseJsonBody(request, publishBodySchema);
  const exposure = await exposureForHeadline({ scenarioId, number });
  const change = await changeVersionVisibility({ actorId: user.id, scenarioId, number, action: "publish", note, exposure });
  const mail = await notifyCouncil(change, { actorName: user.name, note });
  return Response.json(toVisibilityResponse(change, mail));
});

/** DELETE /api/scenarios/:scenarioId/versions/:number/publish — withdraw from council with a reason; council members are e-mailed. */
export const DELETE = route(async (request, context: Context) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission("scenario:publish");
  const { reason } = await parseJsonBody(request, unpublishBodySchema);
  const change = await changeVersionVisibility({ actorId: user.id, scenarioId, number, action: "unpublish", note: reason });
  const mail = await notifyCouncil(change, { actorName: user.name, note: reason });
  return Response.json(toVisibilityResponse(change, mail));
});
