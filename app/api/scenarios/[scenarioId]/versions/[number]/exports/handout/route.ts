import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { CAUTION } from "@/lib/caution";
import { LeewayError } from "@/lib/errors";
import { describeProvenance, evaluateFacilities, evaluateSites, getIntensityScale, prepareEngine } from "@/lib/geo";
import { downloadName } from "@/lib/exports/download-name";
import { actionIsFor } from "@/lib/exposure/inputs";
import { handoutContent } from "@/lib/exports/handout/handout-content";
import { renderHandoutPdf } from "@/lib/exports/handout/handout-pdf";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadFacilities, loadVs30Cells, type ExportSource } from "@/lib/exports/server/export-source";
import { readFontFile } from "@/lib/exports/server/read-font";
import { downloadResponse } from "@/lib/exports/server/respond";

const querySchema = z.union([
  z.strictObject({ facility: z.coerce.number({ error: "must be a facility number" }).int("must be a facility number").positive("must be a facility number") }),
  z.strictObject({
    lon: z.coerce.number({ error: "must be a number" }).min(-180, "must be within ±180°").max(180, "must be within ±180°"),
    lat: z.coerce.number({ error: "must be a number" }).min(-90, "must be within ±90°").max(90, "must be within ±90°"),
    name: z.string().trim().min(1, "must not be empty").max(80, "at most 80 characters").optional(),
  }),
], { error: "give either facility=N or lon=…&lat=… (and optionally name=…)" });

/** The site a handout is for: a point facility, a rail line at its point of shortest warning, or a typed point. */
async function siteOf(source: ExportSource, query: z.infer<typeof querySchema>, vs30Cells: Awaited<ReturnType<typeof loadVs30Cells>>) {
  if (!("facility" in query)) return { name: query.name ?? `Point ${query.lat.toFixed(3)}, ${query.lon.toFixed(3)}`, kind: "point", lon: query.lon, lat: query.lat };
  const facility = (await loadFacilities(source)).find((f) => f.id === query.facility);
  if (!facility) throw new LeewayError("not-found", `Version ${source.versionNumber} of "${source.scenarioName}" has no facility ${query.facility}.`);
  if (facility.geometry.type === "Point") {
    const [lon, lat] = facility.geometry.coordinates;
    return { name: facility.name, kind: facility.kind, lon, lat };
  }
  const lines = evaluateFacilities(source.scenario, { lines: [{ id: String(facility.id), coordinates: facility.geometry.coordinates }] }, { vs30Cells, ...source.context }).lines;
  const [lon, lat] = lines[0].minWarningAt;
  return { name: `${facility.name} (its point of shortest warning)`, kind: facility.kind, lon, lat };
}

/** GET …/exports/handout?facility=N | ?lon=…&lat=…[&name=…] — a one- or two-page drill handout (PDF) for one site. */
export const GET = route(async (request, context: ExportRouteContext) => {
  const { user, source, now } = await beginExport(context, "export:files");
  const query = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "The handout's site");
  const vs30Cells = await loadVs30Cells(source);
  const site = await siteOf(source, query, vs30Cells);
  const engine = prepareEngine(source.scenario, { vs30Cells, ...source.context }, [[site.lon, site.lat]]);
  const [siteResult] = evaluateSites(engine, [{ id: "site", lon: site.lon, lat: site.lat }]);
  const resolved = engine.scenario;
  const content = handoutContent({
    site: { name: site.name, kind: site.kind, result: siteResult },
    scenario: {
      name: source.scenarioName,
      versionNumber: source.versionNumber,
      mw: resolved.source.mw,
      depthKm: resolved.source.depthKm,
      faultType: resolved.source.faultType,
      stationsOperating: resolved.stations.filter((s) => s.operating).length,
      stationsTotal: resolved.stations.length,
    },
    timeline: { detectionS: engine.timeline.detectionS, ...resolved.timing },
    intensityScaleLabel: getIntensityScale(resolved.intensityScale).label,
    reactionTimeS: source.reactionTimeS,
    // A typed point is no facility: every action is listed for it.
    actions: source.actions.filter((a) => actionIsFor(a, site.kind === "point" ? null : site.kind)),
    notes: engine.notes,
    caution: CAUTION,
    howItWasMade: describeProvenance(engine.provenance),
  });
  const pdf = await renderHandoutPdf(content, readFontFile, now);
  await recordExport({ userId: user.id, kind: "handout-pdf", scenarioVersionId: source.versionId });
  return downloadResponse(Buffer.from(pdf), { contentType: "application/pdf", filename: downloadName(source.scenarioName, source.versionNumber, "handout", "pdf") });
});
