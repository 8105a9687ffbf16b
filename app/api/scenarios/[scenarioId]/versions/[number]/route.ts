import { findScenario, findScenarioVersion } from "@/db/queries/scenarios";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { canViewScenarioState } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";

/** GET /api/scenarios/:scenarioId/versions/:number — one scenario version with its scenario file. */
export const GET = route(async (_request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requireUser();
  const scenario = await findScenario({ id: scenarioId });
  const row = scenario && (await findScenarioVersion({ scenarioId, number }));
  if (!scenario || !row) throw new LeewayError("not-found", `There is no version ${number} of scenario ${scenarioId}.`);
  if (!canViewScenarioState(user.role, row.version.state)) {
    throw new LeewayError("forbidden", `Your role (${user.role}) may not see ${row.version.state} scenario versions.`);
  }
  const { version } = row;
  return Response.json({
    scenario: { id: scenario.id, name: scenario.name },
    version: {
      number: version.number,
      state: version.state,
      note: version.note,
      author: row.author,
      createdAt: version.createdAt.toISOString(),
      publishedAt: version.publishedAt?.toISOString() ?? null,
      layerVersions: version.layerVersions,
      params: version.params,
    },
  });
});
