import { z } from "zod";
import { findScenario } from "@/db/queries/scenarios";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioParamsSchema } from "@/lib/api/params";
import { visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";
import { LeewayError } from "@/lib/errors";
import { listScenarioExports } from "@/lib/exports/server/export-log";

const querySchema = z.object({ limit: z.coerce.number({ error: "must be a number" }).int("must be a whole number").min(1, "must be 1 or more").max(500, "must be at most 500").default(100) });

/**
 * GET /api/exports/:scenarioId[?limit=N] — the scenario's export log, newest first: who exported
 * what from which version. Lists only versions the caller's role may see.
 */
export const GET = route(async (request, context: { params: Promise<{ scenarioId: string }> }) => {
  const { scenarioId } = parseWith(scenarioParamsSchema, await context.params, "Scenario address");
  const { limit } = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "The export log query");
  const user = await requireUser();
  const scenario = await findScenario({ id: scenarioId });
  if (!scenario) throw new LeewayError("not-found", `There is no scenario ${scenarioId}.`);
  const entries = await listScenarioExports({ scenarioId, states: visibleStates(user.role), limit });
  return Response.json({ scenario: { id: scenario.id, name: scenario.name }, entries });
});
