import type { z } from "zod";
import type { IssueCollector } from "./layer-file-error";

/** A latitude outside ±90 whose longitude would be a valid latitude: the columns are probably swapped. */
function swappedHint(cells: Record<string, string>): string {
  const lon = Number(cells.lon);
  const lat = Number(cells.lat);
  return Math.abs(lat) > 90 && Math.abs(lat) <= 180 && Math.abs(lon) <= 90 ? "; are the lon and lat columns swapped?" : "";
}

/** Adds a row's zod issues as `row N, column c` entries. */
export function addRowIssues(issues: IssueCollector, error: z.ZodError, cells: Record<string, string>, rowNumber: number): void {
  for (const issue of error.issues) {
    const column = String(issue.path[0] ?? "");
    const hint = column === "lat" ? swappedHint(cells) : "";
    issues.add(column ? `row ${rowNumber}, column ${column}` : `row ${rowNumber}`, `${issue.message}${hint}`);
  }
}
