import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requireUser } from "@/lib/auth/session";
import { CAUTION } from "@/lib/caution";
import { loadVisibleVersion } from "@/lib/exposure/access";
import type { ThresholdStudyResponse } from "@/lib/exposure/contracts";
import { thresholdStudyOf } from "@/lib/exposure/service";

/** GET /api/scenarios/:scenarioId/versions/:number/threshold-study — expected needless, late and missed people per alert-area threshold. */
export const GET = route(async (_request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requireUser();
  const version = await loadVisibleVersion({ role: user.role, scenarioId, number });
  const { study, cached } = await thresholdStudyOf(version);
  return Response.json({ caution: CAUTION, version: version.ref, cached, study } satisfies ThresholdStudyResponse);
});
