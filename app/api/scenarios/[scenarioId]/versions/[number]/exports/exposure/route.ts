import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { CAUTION } from "@/lib/caution";
import { computeExposure, describeProvenance } from "@/lib/geo";
import { downloadName } from "@/lib/exports/download-name";
import { EXPOSURE_TABLES, exposureCsv } from "@/lib/exports/exposure-csv";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadPopulation, loadVs30Cells } from "@/lib/exports/server/export-source";
import { downloadResponse } from "@/lib/exports/server/respond";

const querySchema = z.object({ table: z.enum(EXPOSURE_TABLES, `table must be one of ${EXPOSURE_TABLES.join(", ")}`).default("intensity-band") });

/**
 * GET …/exports/exposure?table=intensity-band|district|channel — one exposure table as CSV, from
 * the version's population layer. Everyone who may see the version may download it (brief: "download
 * exposure CSV").
 */
export const GET = route(async (request, context: ExportRouteContext) => {
  const { user, source } = await beginExport(context, "exposure:csv");
  const { table } = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "The table");
  const [population, vs30Cells] = await Promise.all([loadPopulation(source), loadVs30Cells(source)]);
  const result = computeExposure(source.scenario, population, {
    vs30Cells,
    ...source.context,
    actions: source.actions.map((a) => ({ id: a.id, seconds: a.secondsNeeded })),
    reactionS: source.reactionTimeS,
  });
  const csv = exposureCsv(result, table, { caution: CAUTION, howItWasMade: describeProvenance(result.provenance), notes: result.notes });
  await recordExport({ userId: user.id, kind: "exposure-csv", scenarioVersionId: source.versionId });
  return downloadResponse(csv, { contentType: "text/csv; charset=utf-8", filename: downloadName(source.scenarioName, source.versionNumber, `exposure-${table}`, "csv") });
});
