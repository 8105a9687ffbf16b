import { queryOptions } from "@tanstack/react-query";
import { comparisonResponseSchema, exposureResponseSchema, thresholdStudyResponseSchema } from "@/lib/exposure/contracts";
import { versionPairQuery, type VersionPair } from "@/lib/exposure/version-pair";
import { fetchJson } from "./fetch-json";

/** Query definitions for exposure results, shared by server prefetch (hydration) and client hooks. */
export const exposureQuery = (scenarioId: number, number: number) =>
  queryOptions({
    queryKey: ["scenarios", scenarioId, "versions", number, "exposure"],
    queryFn: () => fetchJson(`/api/scenarios/${scenarioId}/versions/${number}/exposure`, exposureResponseSchema),
  });

export const thresholdStudyQuery = (scenarioId: number, number: number) =>
  queryOptions({
    queryKey: ["scenarios", scenarioId, "versions", number, "threshold-study"],
    queryFn: () => fetchJson(`/api/scenarios/${scenarioId}/versions/${number}/threshold-study`, thresholdStudyResponseSchema),
  });

export const comparisonQuery = (pair: VersionPair) =>
  queryOptions({
    queryKey: ["compare", pair.a.scenarioId, pair.a.number, pair.b.scenarioId, pair.b.number],
    queryFn: () => fetchJson(`/api/compare?${versionPairQuery(pair)}`, comparisonResponseSchema),
    // A refusal (different population layers) will not change on a retry.
    retry: false,
  });
