import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requireUser } from "@/lib/auth/session";
import { CAUTION } from "@/lib/caution";
import { loadVisibleVersion } from "@/lib/exposure/access";
import type { ExposureResponse } from "@/lib/exposure/contracts";
import { exposureOf } from "@/lib/exposure/service";

/** GET /api/scenarios/:scenarioId/versions/:number/exposure — the version's exposure tables (computed once, then cached). */
export const GET = route(async (_request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requireUser();
  const version = await loadVisibleVersion({ role: user.role, scenarioId, number });
  const { exposure, cached } = await exposureOf(version);
  return Response.json({ caution: CAUTION, version: version.ref, cached, exposure } satisfies ExposureResponse);
});
