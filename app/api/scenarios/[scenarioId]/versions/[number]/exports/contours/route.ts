import { route } from "@/lib/api/handler";
import { CAUTION } from "@/lib/caution";
import { buildContoursExport } from "@/lib/exports/contours-geojson";
import { downloadName } from "@/lib/exports/download-name";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { computeScenario } from "@/lib/exports/server/computed-scenario";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadVs30Cells } from "@/lib/exports/server/export-source";
import { downloadResponse } from "@/lib/exports/server/respond";

/** GET …/exports/contours — warning bands, intensity bands, blind zone and alert area as RFC 7946 GeoJSON. */
export const GET = route(async (_request, context: ExportRouteContext) => {
  const { user, source } = await beginExport(context, "export:files");
  const { engine, grid, contours, howItWasMade } = computeScenario(source, await loadVs30Cells(source));
  const collection = buildContoursExport(contours, {
    warningBreaksS: grid.warningBreaksS,
    intensityScale: grid.intensityScale,
    intensityClassLowerBounds: grid.intensityClassLowerBounds,
    channel: grid.channels[0].id,
    caution: CAUTION,
    provenance: engine.provenance,
    howItWasMade,
    notes: [...engine.notes, `traced on a grid of ${grid.width} × ${grid.height} cells of ${grid.cellKm} km`],
  });
  await recordExport({ userId: user.id, kind: "contours-geojson", scenarioVersionId: source.versionId });
  return downloadResponse(JSON.stringify(collection), {
    contentType: "application/geo+json",
    filename: downloadName(source.scenarioName, source.versionNumber, "contours", "geojson"),
  });
});
