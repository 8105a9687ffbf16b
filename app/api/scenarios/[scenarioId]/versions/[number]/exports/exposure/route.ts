import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import { requirePermission } from "@/lib/auth/session";
import { writeCsv } from "@/lib/csv/write-csv";
import { loadVisibleVersion } from "@/lib/exposure/access";
import { EXPOSURE_CSV_TABLES, exposureCsv } from "@/lib/exposure/csv-tables";
import { exposureOf } from "@/lib/exposure/service";
import { downloadName } from "@/lib/exports/download-name";
import { recordExport } from "@/lib/exports/server/export-log";
import { downloadResponse } from "@/lib/exports/server/respond";

const querySchema = z.object({ table: z.enum(EXPOSURE_CSV_TABLES, `table must be one of ${EXPOSURE_CSV_TABLES.join(", ")}`).default("class-band") });

/**
 * GET …/exports/exposure?table=class-band|districts|channels|actions|facilities — one exposure
 * table as CSV, the same (cached) tables the exposure page shows (lib/exposure), recorded in the
 * export log. Everyone who may see the version may download it (brief: "download exposure CSV").
 */
export const GET = route(async (request, context: { params: Promise<{ scenarioId: string; number: string }> }) => {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const { table } = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "The table");
  const user = await requirePermission("exposure:csv");
  const version = await loadVisibleVersion({ role: user.role, scenarioId, number });
  const { exposure } = await exposureOf(version);
  const csv = writeCsv(exposureCsv(exposure, table));
  await recordExport({ userId: user.id, kind: "exposure-csv", scenarioVersionId: version.row.id });
  return downloadResponse(csv, { contentType: "text/csv; charset=utf-8", filename: downloadName(version.ref.scenarioName, number, `exposure-${table}`, "csv") });
});
