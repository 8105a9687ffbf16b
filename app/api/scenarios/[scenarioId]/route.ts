import { findScenario, listScenarioVersions } from "@/db/queries/scenarios";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioParamsSchema } from "@/lib/api/params";
import { visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";

/** GET /api/scenarios/:scenarioId — one scenario with the versions the caller's role may see. */
export const GET = route(async (_request, context: { params: Promise<{ scenarioId: string }> }) => {
  const { scenarioId } = parseWith(scenarioParamsSchema, await context.params, "Scenario address");
  const user = await requireUser();
  const scenario = await findScenario({ id: scenarioId });
  if (!scenario) throw new LeewayError("not-found", `There is no scenario ${scenarioId}.`);
  const versions = await listScenarioVersions({ scenarioId, states: visibleStates(user.role) });
  if (versions.length === 0) {
    throw new LeewayError("forbidden", `Your role (${user.role}) may not see scenario ${scenarioId}.`);
  }
  return Response.json({
    scenario: { id: scenario.id, name: scenario.name, description: scenario.description },
    versions: versions.map((v) => ({
      number: v.number,
      state: v.state,
      note: v.note,
      author: v.author,
      createdAt: v.createdAt.toISOString(),
      publishedAt: v.publishedAt?.toISOString() ?? null,
    })),
  });
});
