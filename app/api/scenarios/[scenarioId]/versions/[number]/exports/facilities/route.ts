import { route } from "@/lib/api/handler";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { loadFacilities } from "@/lib/exports/server/export-source";

/** GET …/exports/facilities — the version's facilities a handout can be made for (number, name, kind). */
export const GET = route(async (_request, context: ExportRouteContext) => {
  const { source } = await beginExport(context, "export:files");
  const facilities = await loadFacilities(source);
  return Response.json({
    facilities: facilities.map((f) => ({ id: f.id, name: f.name, kind: f.kind, line: f.geometry.type === "LineString" })),
  });
});
