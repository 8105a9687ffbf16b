import { route } from "@/lib/api/handler";
import { downloadName } from "@/lib/exports/download-name";
import { exportScenarioFile, scenarioFileText } from "@/lib/exports/scenario-file";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadVs30Cells } from "@/lib/exports/server/export-source";
import { downloadResponse } from "@/lib/exports/server/respond";

/**
 * GET …/exports/scenario-file — the version as a self-contained scenario file (the README's
 * format) for re-import or the CLI: the site-condition layer written in as `vs30Grid`, the
 * workspace's intensity scale written in when the version names none.
 */
export const GET = route(async (_request, context: ExportRouteContext) => {
  const { user, source } = await beginExport(context, "export:files");
  const file = exportScenarioFile(source.storedScenario, { name: source.scenarioName, vs30Cells: await loadVs30Cells(source), intensityScale: source.workspaceScale });
  await recordExport({ userId: user.id, kind: "scenario-file", scenarioVersionId: source.versionId });
  return downloadResponse(scenarioFileText(file), {
    contentType: "application/json; charset=utf-8",
    filename: downloadName(source.scenarioName, source.versionNumber, "scenario", "json"),
  });
});
