import { listScenarios } from "@/db/queries/scenarios";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { visibleStates } from "@/lib/auth/permissions";
import { summarizeScenario } from "@/lib/api/scenario-summary";

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
