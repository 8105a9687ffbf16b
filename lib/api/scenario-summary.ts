import { z } from "zod";

/** The few source fields lists show; params were validated in full when the version was written. */
const sourceSummarySchema = z.object({
  name: z.string().optional(),
  source: z.object({
    lon: z.number(),
    lat: z.number(),
    depthKm: z.number(),
    mw: z.number(),
    faultType: z.string(),
  }),
});

export type SourceSummary = z.infer<typeof sourceSummarySchema>["source"];

export function summarizeScenario(params: unknown): SourceSummary | null {
  const parsed = sourceSummarySchema.safeParse(params);
  return parsed.success ? parsed.data.source : null;
}
