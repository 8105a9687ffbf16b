import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { writeCsv } from "@/lib/csv/write-csv";
import { loadVisibleVersion } from "@/lib/exposure/access";
import { csvResponse } from "@/lib/exposure/csv-response";
import { thresholdStudyCsv } from "@/lib/exposure/csv-tables";
import { thresholdStudyOf } from "@/lib/exposure/service";

/** GET /api/scenarios/:scenarioId/versions/:number/threshold-study/csv — the study's table as CSV (caution on the first line). */
export const GET = route(async (_request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission("exposure:csv");
  const version = await loadVisibleVersion({ role: user.role, scenarioId, number });
  const { study } = await thresholdStudyOf(version);
  return csvResponse(writeCsv(thresholdStudyCsv(study)), `leeway-threshold-study-${scenarioId}-v${number}.csv`);
});
