import { route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { compareFromRequest } from "@/lib/exposure/compare-request";

/**
 * GET /api/compare/seconds-gained?a=…&b=… — the seconds-gained layer as a GeoJSON file (a map
 * export: the brief's GeoJSON row), with the caution and both "how it was made" lines as foreign members.
 */
export const GET = route(async (request) => {
  const user = await requirePermission("export:files");
  const { comparison } = await compareFromRequest(request, user.role);
  const { a, b, secondsGained } = comparison;
  const body = { ...secondsGained, caution: comparison.caution, howItWasMade: { a: a.provenance, b: b.provenance }, notes: comparison.notes };
  return new Response(JSON.stringify(body), {
    headers: {
      "content-type": "application/geo+json; charset=utf-8",
      "content-disposition": `attachment; filename="leeway-seconds-gained-${a.version.scenarioId}-v${a.version.versionNumber}-${b.version.scenarioId}-v${b.version.versionNumber}.geojson"`,
      "cache-control": "no-store",
    },
  });
});
