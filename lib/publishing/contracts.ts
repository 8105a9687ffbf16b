import { z } from "zod";
import { SCENARIO_STATES } from "@/db/schema";

/** Body of POST …/publish: the note council members read with the notice. */
export const publishBodySchema = z.strictObject({
  note: z.string().trim().min(1, "Write a short note for council (what this version is for)").max(2000, "A note can be at most 2,000 characters"),
});

/** Body of DELETE …/publish: why the version is withdrawn (kept in the audit trail and sent to council). */
export const unpublishBodySchema = z.strictObject({
  reason: z.string().trim().min(1, "Say why the version is withdrawn").max(500, "A reason can be at most 500 characters"),
});

/** What the publish and share routes answer: the version's new state and who was e-mailed. */
export const visibilityResponseSchema = z.object({
  version: z.object({ number: z.number(), state: z.enum(SCENARIO_STATES), publishedAt: z.string().nullable() }),
  mail: z.object({ sent: z.array(z.string()), failed: z.array(z.object({ to: z.string(), reason: z.string() })) }),
});
export type VisibilityResponse = z.infer<typeof visibilityResponseSchema>;
