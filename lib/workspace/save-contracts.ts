/**
 * Bodies and answers of the scenario-writing API: creating a scenario (POST /api/scenarios) and
 * saving a new version (POST /api/scenarios/:id/versions). The scenario file itself is checked by
 * `parseScenario` in the handler, so its issues keep their scenario-file JSON paths.
 */
import { z } from "zod";
import { SCENARIO_STATES } from "@/db/schema";

/** POST /api/scenarios: a name, an optional description and the first version's scenario file. */
export const createScenarioBodySchema = z.strictObject({
  name: z.string().trim().min(1, "Give the scenario a name").max(120, "A name can be at most 120 characters"),
  description: z.string().trim().max(1000, "A description can be at most 1,000 characters").optional(),
  scenario: z.unknown(),
});
export type CreateScenarioBody = z.input<typeof createScenarioBodySchema>;

/** POST /api/scenarios/:id/versions: the scenario file, what changed, and the version the edit started from. */
export const saveVersionBodySchema = z.strictObject({
  scenario: z.unknown(),
  note: z.string().trim().max(500, "A note can be at most 500 characters").optional(),
  basedOn: z.number().int().positive().optional(),
});
export type SaveVersionBody = z.input<typeof saveVersionBodySchema>;

/** What both routes answer (201). */
export const savedVersionSchema = z.object({
  scenario: z.object({ id: z.number(), name: z.string() }),
  version: z.object({ number: z.number(), state: z.enum(SCENARIO_STATES), createdAt: z.string(), layerVersions: z.record(z.string(), z.number()) }),
});
export type SavedVersion = z.infer<typeof savedVersionSchema>;
