/** Shapes of the export API's JSON answers, checked by the browser (STYLE.md §3). */
import { z } from "zod";

export const exportLogSchema = z.object({
  scenario: z.object({ id: z.number(), name: z.string() }),
  entries: z.array(z.object({ at: z.string(), kind: z.string(), versionNumber: z.number(), person: z.string().nullable() })),
});
export type ExportLog = z.infer<typeof exportLogSchema>;

export const exportFacilitiesSchema = z.object({
  facilities: z.array(z.object({ id: z.number(), name: z.string(), kind: z.string(), line: z.boolean() })),
});
