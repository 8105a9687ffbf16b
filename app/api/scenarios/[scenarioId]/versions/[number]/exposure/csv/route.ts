import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { writeCsv } from "@/lib/csv/write-csv";
import { loadVisibleVersion } from "@/lib/exposure/access";
import { csvResponse } from "@/lib/exposure/csv-response";
import { EXPOSURE_CSV_TABLES, exposureCsv } from "@/lib/exposure/csv-tables";
import { exposureOf } from "@/lib/exposure/service";

const querySchema = z.object({ table: z.enum(EXPOSURE_CSV_TABLES, `must be one of ${EXPOSURE_CSV_TABLES.join(", ")}`) });

/** GET /api/scenarios/:scenarioId/versions/:number/exposure/csv?table=… — one exposure table as CSV (caution on the first line). */
export const GET = route(async (request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const { table } = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "CSV request");
  const user = await requirePermission("exposure:csv");
  const version = await loadVisibleVersion({ role: user.role, scenarioId, number });
  const { exposure } = await exposureOf(version);
  return csvResponse(writeCsv(exposureCsv(exposure, table)), `leeway-exposure-${scenarioId}-v${number}-${table}.csv`);
});
