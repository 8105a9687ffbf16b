/** A CSV download: UTF-8 text/csv with the header/comment convention of lib/csv, saved under `fileName`. */
export function csvResponse(text: string, fileName: string): Response {
  return new Response(text, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName.replace(/[^\w.-]/g, "_")}"`,
      "cache-control": "no-store",
    },
  });
}
