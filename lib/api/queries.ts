import { queryOptions } from "@tanstack/react-query";
import { scenarioListSchema, scenarioVersionSchema, stationNetworkSchema } from "./contracts";
import { fetchJson } from "./fetch-json";

/** One query definition per resource, shared by every component that reads it. */
export const scenarioListQuery = () =>
  queryOptions({ queryKey: ["scenarios"], queryFn: () => fetchJson("/api/scenarios", scenarioListSchema) });

export const scenarioVersionQuery = (scenarioId: number, number: number) =>
  queryOptions({
    queryKey: ["scenarios", scenarioId, "versions", number],
    queryFn: () => fetchJson(`/api/scenarios/${scenarioId}/versions/${number}`, scenarioVersionSchema),
  });

export const stationNetworkQuery = () =>
  queryOptions({ queryKey: ["stations"], queryFn: () => fetchJson("/api/stations", stationNetworkSchema) });
