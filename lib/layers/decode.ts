import type { LayerKind } from "@/db/schema";
import { LAYER_KIND_LABELS } from "./formats";
import { LayerFileError } from "./layer-file-error";
import { formatBytes, LAYER_LIMITS } from "./limits";

/** Refuses a file larger than the kind's limit, before any of it is read. */
export function checkLayerFileSize(kind: LayerKind, byteLength: number, maxBytes = LAYER_LIMITS[kind].maxBytes): void {
  if (byteLength > maxBytes) {
    // Just over the limit both round to the same "2 MB"; then the exact count shows the difference.
    const size = formatBytes(byteLength) === formatBytes(maxBytes) ? `${byteLength.toLocaleString("en")} bytes` : formatBytes(byteLength);
    throw new LayerFileError(
      `The file is ${size}; Leeway accepts at most ${formatBytes(maxBytes)} for a ${LAYER_KIND_LABELS[kind].toLowerCase()} layer. Nothing was saved.`,
      { kind: "too-large" },
    );
  }
}

/**
 * Turns an uploaded file into text: checks its size, then decodes strict UTF-8 (a byte-order mark is
 * dropped). Throws `LayerFileError` for an oversized file or bytes that are not UTF-8.
 */
export function decodeLayerFile(kind: LayerKind, bytes: Uint8Array, maxBytes = LAYER_LIMITS[kind].maxBytes): string {
  checkLayerFileSize(kind, bytes.byteLength, maxBytes);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new LayerFileError("The file is not UTF-8 text. Save it as UTF-8 (\"CSV UTF-8\" in most spreadsheets) and upload it again. Nothing was saved.");
  }
}
