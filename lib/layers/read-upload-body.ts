import type { LayerKind } from "@/db/schema";
import { checkLayerFileSize } from "./decode";
import { LayerFileError } from "./layer-file-error";

/**
 * Reads an upload's raw body (the file itself, not a form). A declared Content-Length beyond the
 * kind's limit is refused before reading; a body shorter than declared (a dropped connection, or a
 * proxy's buffer limit) is refused rather than checked half.
 */
export async function readUploadBody(request: Request, kind: LayerKind): Promise<Uint8Array> {
  const declared = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declared)) checkLayerFileSize(kind, declared);
  const bytes = new Uint8Array(await request.arrayBuffer());
  checkLayerFileSize(kind, bytes.byteLength);
  if (Number.isFinite(declared) && bytes.byteLength < declared) {
    throw new LayerFileError(`The upload arrived incomplete (${bytes.byteLength.toLocaleString("en")} of ${declared.toLocaleString("en")} bytes). Nothing was saved; please try again.`);
  }
  return bytes;
}
