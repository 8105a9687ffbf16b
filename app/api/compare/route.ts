import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { CAUTION } from "@/lib/caution";
import { compareFromRequest } from "@/lib/exposure/compare-request";
import type { ComparisonResponse } from "@/lib/exposure/contracts";

/**
 * GET /api/compare?a=scenarioId:version&b=scenarioId:version — version B beside version A: blind
 * zone, people moved between warning bands, facilities, and the seconds-gained layer. Both must be
 * visible to the caller and on the same population layer version (409 otherwise, with the reason).
 */
export const GET = route(async (request) => {
  const user = await requireUser();
  const { comparison, cached } = await compareFromRequest(request, user.role);
  return Response.json({ caution: CAUTION, cached, comparison } satisfies ComparisonResponse);
});
