import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { writeCsv } from "@/lib/csv/write-csv";
import { compareFromRequest } from "@/lib/exposure/compare-request";
import { csvResponse } from "@/lib/exposure/csv-response";
import { COMPARISON_CSV_TABLES, comparisonCsv } from "@/lib/exposure/csv-tables";

const tableSchema = z.object({ table: z.enum(COMPARISON_CSV_TABLES, `must be one of ${COMPARISON_CSV_TABLES.join(", ")}`) });

/** GET /api/compare/csv?a=…&b=…&table=summary|transitions|facilities — one comparison table as CSV (caution on the first line). */
export const GET = route(async (request) => {
  const { table } = parseWith(tableSchema, { table: new URL(request.url).searchParams.get("table") ?? undefined }, "CSV request");
  const user = await requirePermission("exposure:csv");
  const { comparison } = await compareFromRequest(request, user.role);
  const { a, b } = comparison;
  return csvResponse(
    writeCsv(comparisonCsv(comparison, table)),
    `leeway-compare-${a.version.scenarioId}-v${a.version.versionNumber}-${b.version.scenarioId}-v${b.version.versionNumber}-${table}.csv`,
  );
});
