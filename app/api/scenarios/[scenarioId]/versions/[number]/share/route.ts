import { changeVersionVisibility } from "@/db/queries/publishing";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { toVisibilityResponse } from "@/lib/publishing/notify";

type Context = { params: Promise<{ scenarioId: string; number: string }> };

/** POST /api/scenarios/:scenarioId/versions/:number/share — share with trainers for exercises; no e-mail to council. */
export const POST = route(async (_request, context: Context) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission("scenario:share");
  const change = await changeVersionVisibility({ actorId: user.id, scenarioId, number, action: "share" });
  return Response.json(toVisibilityResponse(change));
});

/** DELETE /api/scenarios/:scenarioId/versions/:number/share — stop sharing; the version is a draft again. */
export const DELETE = route(async (_request, context: Context) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission("scenario:share");
  const change = await changeVersionVisibility({ actorId: user.id, scenarioId, number, action: "unshare" });
  return Response.json(toVisibilityResponse(change));
});
