import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { CAUTION } from "@/lib/caution";
import { computeSites, describeProvenance } from "@/lib/geo";
import { downloadName } from "@/lib/exports/download-name";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadFacilities, loadVs30Cells } from "@/lib/exports/server/export-source";
import { downloadResponse } from "@/lib/exports/server/respond";
import { siteValuesCsv, type NamedSite } from "@/lib/exports/site-values-csv";

/** A typed point: `lon,lat` in degrees. */
const pointSchema = z
  .string()
  .regex(/^-?\d+(\.\d+)?,-?\d+(\.\d+)?$/, "write a point as lon,lat in degrees, e.g. 151.2,-33.9")
  .transform((text) => text.split(",").map(Number) as [number, number])
  .refine(([lon, lat]) => lon >= -180 && lon <= 180 && lat >= -90 && lat <= 90, "longitude must be within ±180° and latitude within ±90°");

const querySchema = z.object({ point: z.array(pointSchema).max(200, "at most 200 typed points") });

/**
 * GET …/exports/sites[?point=lon,lat…] — site values as CSV: every point facility of the version's
 * facilities layer, then any typed points (named point-1, point-2, … in the order given).
 */
export const GET = route(async (request, context: ExportRouteContext) => {
  const { user, source } = await beginExport(context, "export:files");
  const { point } = parseWith(querySchema, { point: new URL(request.url).searchParams.getAll("point") }, "The typed points");
  const points = (await loadFacilities(source)).flatMap((f) => (f.geometry.type === "Point" ? [{ ...f, lonLat: f.geometry.coordinates }] : []));
  const labelled = [
    ...points.map((f) => ({ id: `facility-${f.id}`, name: f.name, kind: f.kind, lon: f.lonLat[0], lat: f.lonLat[1] })),
    ...point.map(([lon, lat], k) => ({ id: `point-${k + 1}`, name: `Typed point ${k + 1}`, kind: "point", lon, lat })),
  ];
  const result = computeSites(source.scenario, labelled.map(({ id, lon, lat }) => ({ id, lon, lat })), { vs30Cells: await loadVs30Cells(source), ...source.context });
  const named: NamedSite[] = result.sites.map((site, k) => ({ result: site, name: labelled[k].name, kind: labelled[k].kind }));
  const channels = result.sites[0]?.byChannel.map((c) => c.channel) ?? [];
  const csv = siteValuesCsv(named, channels, { caution: CAUTION, howItWasMade: describeProvenance(result.provenance), notes: result.notes });
  await recordExport({ userId: user.id, kind: "sites-csv", scenarioVersionId: source.versionId });
  return downloadResponse(csv, { contentType: "text/csv; charset=utf-8", filename: downloadName(source.scenarioName, source.versionNumber, "sites", "csv") });
});
