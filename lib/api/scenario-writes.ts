import { savedVersionSchema, type CreateScenarioBody, type SaveVersionBody, type SavedVersion } from "@/lib/workspace/save-contracts";
import { fetchJson } from "./fetch-json";

const json = (body: unknown): RequestInit => ({ method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

/** Mutation functions for the scenario-writing API (TanStack Query `useMutation`); both answer the saved version. */
export const scenarioWrites = {
  /** POST /api/scenarios: a new scenario with version 1. */
  create: (body: CreateScenarioBody): Promise<SavedVersion> => fetchJson("/api/scenarios", savedVersionSchema, json(body)),
  /** POST /api/scenarios/:id/versions: the next version of a scenario. */
  saveVersion: (scenarioId: number, body: SaveVersionBody): Promise<SavedVersion> => fetchJson(`/api/scenarios/${scenarioId}/versions`, savedVersionSchema, json(body)),
};
