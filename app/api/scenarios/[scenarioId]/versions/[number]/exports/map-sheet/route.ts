import { parseWith, route } from "@/lib/api/handler";
import { LeewayError } from "@/lib/errors";
import { downloadName } from "@/lib/exports/download-name";
import { composeMapSheet } from "@/lib/exports/map-sheet/compose-sheet";
import { pngSize } from "@/lib/exports/map-sheet/png-size";
import { createSheetDocument, paintSheetPdf, pdfSheetFonts } from "@/lib/exports/map-sheet/sheet-pdf";
import { sheetLayout } from "@/lib/exports/map-sheet/sheet-layout";
import { mapSheetViewSchema } from "@/lib/exports/map-sheet/sheet-request";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { recordExport } from "@/lib/exports/server/export-log";
import { mapSheetContent } from "@/lib/exports/server/map-sheet-source";
import { readFontFile } from "@/lib/exports/server/read-font";
import { downloadResponse } from "@/lib/exports/server/respond";

/** The least resolution of the map image on paper (issue 9). */
const MIN_DPI = 150;
/** A print map image larger than this is refused (A3 at 300 dpi stays well below). */
const MAX_IMAGE_BYTES = 60 * 1024 * 1024;

/**
 * The request's parts: multipart form data (`view` as JSON text, `image` as PNG), or for a PNG
 * sheet, which needs no image on the server, a JSON body `{ "view": … }`.
 */
async function readRequest(request: Request): Promise<{ viewJson: unknown; form: FormData | null }> {
  if ((request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    const form = await request.formData().catch(() => {
      throw new LeewayError("invalid", "The map-sheet request's form data could not be read.");
    });
    const text = form.get("view");
    if (typeof text !== "string") throw new LeewayError("invalid", "The map-sheet request has no `view` field.");
    return { viewJson: parseJsonText(text, "The map-sheet `view` field"), form };
  }
  const body = parseJsonText(await request.text(), "The map-sheet request body") as { view?: unknown } | null;
  return { viewJson: body && typeof body === "object" ? body.view : undefined, form: null };
}

function parseJsonText(text: string, what: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    throw new LeewayError("invalid", `${what} is not valid JSON.`);
  }
}

/** The PNG the browser rendered, checked to cover the frame at ≥ 150 dpi. */
async function readImage(form: FormData | null, frame: { widthPt: number; heightPt: number }, label: string): Promise<Uint8Array> {
  const file = form?.get("image");
  if (!(file instanceof Blob)) throw new LeewayError("invalid", "A PDF map sheet needs the rendered map as an `image` field (PNG).");
  if (file.size > MAX_IMAGE_BYTES) throw new LeewayError("too-large", `The map image is ${(file.size / 1e6).toFixed(0)} MB; at most ${MAX_IMAGE_BYTES / 1e6} MB is accepted.`);
  const bytes = new Uint8Array(await file.arrayBuffer());
  const size = pngSize(bytes);
  if (!size) throw new LeewayError("invalid", "The map image is not a PNG file.");
  const needWidth = Math.ceil((frame.widthPt / 72) * MIN_DPI);
  const needHeight = Math.ceil((frame.heightPt / 72) * MIN_DPI);
  if (size.widthPx < needWidth || size.heightPx < needHeight) {
    throw new LeewayError("invalid", `The map image is ${size.widthPx} × ${size.heightPx} px; ${label} needs at least ${needWidth} × ${needHeight} px for ${MIN_DPI} dpi.`);
  }
  return bytes;
}

/**
 * POST …/exports/map-sheet — a map sheet of the print map the browser rendered (multipart: `view`
 * JSON, `image` PNG; or JSON `{ view }` for a PNG sheet). format "pdf": the PDF, composed here. format "png": the composed sheet as
 * marks (JSON) for the browser to paint around its own image, so both formats share one layout.
 */
export const POST = route(async (request, context: ExportRouteContext) => {
  const { user, source, now } = await beginExport(context, "export:files");
  const { viewJson, form } = await readRequest(request);
  const view = parseWith(mapSheetViewSchema, viewJson, "The map-sheet view");
  const layout = sheetLayout(view.paper, view.orientation);
  const label = `${view.paper.toUpperCase()} ${view.orientation}`;
  const image = view.format === "pdf" ? await readImage(form, layout.map, label) : null;
  const content = await mapSheetContent(source, view, now);
  const { doc, fonts } = await createSheetDocument(readFontFile);
  const drawing = composeMapSheet(content, layout, pdfSheetFonts(fonts));
  const what = `map-sheet-${view.paper}-${view.orientation}`;
  if (image) {
    const pdf = await paintSheetPdf(doc, fonts, drawing, image, now);
    await recordExport({ userId: user.id, kind: "map-sheet-pdf", scenarioVersionId: source.versionId });
    return downloadResponse(Buffer.from(pdf), { contentType: "application/pdf", filename: downloadName(source.scenarioName, source.versionNumber, what, "pdf") });
  }
  await recordExport({ userId: user.id, kind: "map-sheet-png", scenarioVersionId: source.versionId });
  return Response.json({ drawing, filename: downloadName(source.scenarioName, source.versionNumber, what, "png") }, { headers: { "cache-control": "no-store" } });
});
