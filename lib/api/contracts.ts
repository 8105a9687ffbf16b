import { z } from "zod";
import { ROLES, SCENARIO_STATES } from "@/db/schema";

/** Response shapes of Leeway's JSON API, checked by the browser before use. */
const state = z.enum(SCENARIO_STATES);

export const sourceSummarySchema = z
  .object({ lon: z.number(), lat: z.number(), depthKm: z.number(), mw: z.number(), faultType: z.string() })
  .nullable();

export const scenarioListSchema = z.object({
  scenarios: z.array(
    z.object({
      id: z.number(),
      name: z.string(),
      description: z.string(),
      versionCount: z.number(),
      latest: z.object({ number: z.number(), state, createdAt: z.string(), source: sourceSummarySchema }),
    }),
  ),
});
export type ScenarioList = z.infer<typeof scenarioListSchema>;

export const scenarioVersionSchema = z.object({
  scenario: z.object({ id: z.number(), name: z.string() }),
  version: z.object({
    number: z.number(),
    state,
    note: z.string(),
    author: z.string().nullable(),
    createdAt: z.string(),
    publishedAt: z.string().nullable(),
    layerVersions: z.record(z.string(), z.number()),
    params: z.unknown(),
  }),
});
export type ScenarioVersionResponse = z.infer<typeof scenarioVersionSchema>;

export const stationNetworkSchema = z.object({
  layer: z.object({ id: z.number(), name: z.string(), version: z.number() }).nullable(),
  stations: z.array(z.object({ code: z.string(), lon: z.number(), lat: z.number(), operating: z.boolean() })),
});
export type StationNetwork = z.infer<typeof stationNetworkSchema>;

export const errorBodySchema = z.object({
  error: z.object({ kind: z.string(), message: z.string() }),
});

export const roleSchema = z.enum(ROLES);
