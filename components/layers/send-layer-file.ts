import { errorBodySchema } from "@/lib/api/contracts";
import { ApiRequestError } from "@/lib/api/fetch-json";

export interface SendLayerFileOptions {
  url: string;
  file: File;
  /** Asks the preview route for its NDJSON progress stream. */
  streamProgress?: boolean;
  /** Bytes sent so far / total, from the browser's upload progress events. */
  onUploadProgress?: (fraction: number) => void;
  /** Each complete NDJSON line as it arrives (the preview's progress and result lines). */
  onLine?: (line: unknown) => void;
  signal?: AbortSignal;
}

/**
 * Sends a layer file as the raw request body with XMLHttpRequest, because fetch() reports no upload
 * progress. Resolves with the parsed JSON body (or the NDJSON lines, through `onLine`) on a 2xx
 * status; rejects with `ApiRequestError` carrying the server's message otherwise.
 */
export function sendLayerFile({ url, file, streamProgress, onUploadProgress, onLine, signal }: SendLayerFileOptions): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    let consumed = 0;
    const readLines = () => {
      const text = xhr.responseText;
      let end = text.indexOf("\n", consumed);
      while (end >= 0) {
        const line = text.slice(consumed, end).trim();
        consumed = end + 1;
        if (line) onLine?.(JSON.parse(line));
        end = text.indexOf("\n", consumed);
      }
    };

    xhr.open("POST", url);
    xhr.setRequestHeader("content-type", file.type || "application/octet-stream");
    xhr.setRequestHeader("accept", streamProgress ? "application/x-ndjson" : "application/json");
    xhr.upload.onprogress = (event) => event.lengthComputable && onUploadProgress?.(event.loaded / event.total);
    xhr.onprogress = () => streamProgress && xhr.status >= 200 && xhr.status < 300 && readLines();
    xhr.onerror = () => reject(new ApiRequestError("The upload could not reach the server; nothing was saved.", 0));
    xhr.onabort = () => reject(new DOMException("The upload was cancelled.", "AbortError"));
    xhr.onload = () => {
      if (xhr.status < 200 || xhr.status >= 300) {
        let body: unknown;
        try {
          body = JSON.parse(xhr.responseText);
        } catch {
          body = undefined;
        }
        const parsed = errorBodySchema.safeParse(body);
        reject(new ApiRequestError(parsed.success ? parsed.data.error.message : `The upload failed (${xhr.status}).`, xhr.status));
        return;
      }
      if (streamProgress) {
        readLines();
        resolve(undefined);
      } else {
        resolve(xhr.responseText ? JSON.parse(xhr.responseText) : undefined);
      }
    };
    signal?.addEventListener("abort", () => xhr.abort(), { once: true });
    xhr.send(file);
  });
}
