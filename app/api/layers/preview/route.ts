import { parseWith, route } from "@/lib/api/handler";
import { requirePermission } from "@/lib/auth/session";
import { previewQuerySchema } from "@/lib/layers/api-schemas";
import { decodeLayerFile } from "@/lib/layers/decode";
import type { LayerFormat } from "@/lib/layers/formats";
import { LayerFileError } from "@/lib/layers/layer-file-error";
import { previewAccepted, previewRefused, type LayerPreview } from "@/lib/layers/preview";
import { readLayerFile } from "@/lib/layers/read-layer-file";
import { readUploadBody } from "@/lib/layers/read-upload-body";
import type { LayerKind } from "@/db/schema";

const NDJSON = "application/x-ndjson";

async function preview(kind: LayerKind, format: LayerFormat, text: string, onProgress?: (fraction: number) => void): Promise<LayerPreview> {
  try {
    return previewAccepted(await readLayerFile(kind, format, text, { onProgress }), format);
  } catch (error) {
    if (error instanceof LayerFileError) return previewRefused(error);
    throw error;
  }
}

/**
 * POST /api/layers/preview?kind=…&format=csv|geojson — the body is the file. Checks it without
 * writing anything and answers with the preview (first rows, figures, a thinned picture of the
 * extent) or the reasons it would be refused. With `Accept: application/x-ndjson` the answer streams
 * `{"type":"progress","fraction":…}` lines while rows are checked, then `{"type":"result",…}`.
 */
export const POST = route(async (request) => {
  await requirePermission("layer:edit");
  const query = parseWith(previewQuerySchema, Object.fromEntries(new URL(request.url).searchParams), "The upload's settings are not valid");
  const bytes = await readUploadBody(request, query.kind);
  const text = decodeLayerFile(query.kind, bytes);

  if (!request.headers.get("accept")?.includes(NDJSON)) return Response.json(await preview(query.kind, query.format, text));

  const encoder = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const send = (line: { type: "progress"; fraction: number } | { type: "result"; preview: LayerPreview }) => controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
      try {
        send({ type: "result", preview: await preview(query.kind, query.format, text, (fraction) => send({ type: "progress", fraction })) });
        controller.close();
      } catch (error) {
        console.error(error);
        controller.error(error);
      }
    },
  });
  // no-transform keeps the server's compression from holding progress lines back.
  return new Response(stream, { headers: { "content-type": NDJSON, "cache-control": "no-store, no-transform" } });
});
