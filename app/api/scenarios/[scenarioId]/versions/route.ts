import { saveScenarioVersion } from "@/db/queries/scenario-edits";
import { parseJsonBody, parseWith, route } from "@/lib/api/handler";
import { scenarioParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { requireValidScenario } from "@/lib/workspace/require-scenario";
import { saveVersionBodySchema } from "@/lib/workspace/save-contracts";
import { toSavedVersion } from "@/lib/workspace/saved-version";

/**
 * POST /api/scenarios/:scenarioId/versions — saves an edited scenario file as the next version
 * (planner, admin). Always a new number; earlier versions, published and shared ones included,
 * stay as they were. A bad file is refused (400, issues by JSON path) and nothing is written.
 */
export const POST = route(async (request, context: { params: Promise<{ scenarioId: string }> }) => {
  const { scenarioId } = parseWith(scenarioParamsSchema, await context.params, "Scenario address");
  const user = await requirePermission("scenario:edit");
  const body = await parseJsonBody(request, saveVersionBodySchema);
  const scenario = requireValidScenario(body.scenario);
  const saved = await saveScenarioVersion({ scenarioId, scenario, note: body.note, basedOn: body.basedOn, actorId: user.id });
  return Response.json(toSavedVersion(saved), { status: 201 });
});
