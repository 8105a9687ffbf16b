import "server-only";
import { CAUTION } from "@/lib/caution";

/**
 * A file download: `Content-Disposition: attachment`, never cached (exports depend on the
 * caller's role and are logged), and the caution in a header as well as in the file.
 */
export function downloadResponse(body: BodyInit, { contentType, filename }: { contentType: string; filename: string }): Response {
  return new Response(body, {
    status: 200,
    headers: {
      "content-type": contentType,
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "no-store",
      "x-leeway-caution": CAUTION,
    },
  });
}
