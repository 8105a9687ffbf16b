import { errorBodySchema } from "@/lib/api/contracts";
import { ApiRequestError } from "@/lib/api/fetch-json";

/** The file name a response's Content-Disposition gives, or `fallback`. */
function fileNameOf(response: Response, fallback: string): string {
  const match = /filename="([^"]+)"/.exec(response.headers.get("content-disposition") ?? "");
  return match ? match[1] : fallback;
}

/** Throws the server's message when a request failed. */
export async function ensureOk(response: Response): Promise<Response> {
  if (response.ok) return response;
  const body: unknown = await response.json().catch(() => undefined);
  const parsed = errorBodySchema.safeParse(body);
  throw new ApiRequestError(parsed.success ? parsed.data.error.message : `The export failed (${response.status}).`, response.status);
}

/** Saves a blob under a file name through a temporary link (the browser's own download). */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL goes.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Fetches one of Leeway's export routes and saves the file, or throws the server's message. */
export async function downloadExport(url: string, init?: RequestInit): Promise<void> {
  const response = await ensureOk(await fetch(url, init));
  saveBlob(await response.blob(), fileNameOf(response, "leeway-export"));
}
