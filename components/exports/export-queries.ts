import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/fetch-json";
import { exportFacilitiesSchema, exportLogSchema } from "./export-contracts";

/** The scenario's export log (newest first). */
export const exportLogQuery = (scenarioId: number) =>
  queryOptions({ queryKey: ["exports", scenarioId, "log"], queryFn: () => fetchJson(`/api/exports/${scenarioId}`, exportLogSchema) });

/** The facilities of a version that a handout can be made for. */
export const exportFacilitiesQuery = (scenarioId: number, versionNumber: number) =>
  queryOptions({
    queryKey: ["exports", scenarioId, "versions", versionNumber, "facilities"],
    queryFn: () => fetchJson(`/api/scenarios/${scenarioId}/versions/${versionNumber}/exports/facilities`, exportFacilitiesSchema),
  });
