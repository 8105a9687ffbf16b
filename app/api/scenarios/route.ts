import { createScenario } from "@/db/queries/scenario-edits";
import { listScenarios } from "@/db/queries/scenarios";
import { parseJsonBody, route } from "@/lib/api/handler";
import { requirePermission, requireUser } from "@/lib/auth/session";
import { visibleStates } from "@/lib/auth/permissions";
import { summarizeScenario } from "@/lib/api/scenario-summary";
import { toSavedVersion } from "@/lib/workspace/saved-version";
import { requireValidScenario } from "@/lib/workspace/require-scenario";
import { createScenarioBodySchema } from "@/lib/workspace/save-contracts";

/** GET /api/scenarios — the scenarios the caller's role may see, each with its newest visible version. */
export const GET = route(async () => {
  const user = await requireUser();
  const rows = await listScenarios({ states: visibleStates(user.role) });
  return Response.json({
    scenarios: rows.map((row) => ({
      id: row.id,
      name: row.name,
      description: row.description,
      versionCount: row.versionCount,
      latest: {
        number: row.versionNumber,
        state: row.state,
        createdAt: row.createdAt.toISOString(),
        source: summarizeScenario(row.params),
      },
    })),
  });
});

/**
 * POST /api/scenarios — a new scenario from a name and a scenario file (planner, admin): version 1,
 * a draft, using today's layers. A bad file is refused (400, issues by JSON path) and nothing is written.
 */
export const POST = route(async (request) => {
  const user = await requirePermission("scenario:edit");
  const body = await parseJsonBody(request, createScenarioBodySchema);
  const scenario = requireValidScenario(body.scenario);
  const created = await createScenario({ name: body.name, description: body.description, scenario, actorId: user.id });
  return Response.json(toSavedVersion(created), { status: 201 });
});
