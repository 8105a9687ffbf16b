import { queryOptions } from "@tanstack/react-query";
import { layerDetailSchema, layerFeaturesSchema, layerListSchema } from "@/lib/layers/api-schemas";
import { fetchJson } from "./fetch-json";

/** Query definitions for layers, shared by every component that reads them. */
export const layerListQuery = () => queryOptions({ queryKey: ["layers"], queryFn: () => fetchJson("/api/layers", layerListSchema) });

export const layerDetailQuery = (layerId: number) =>
  queryOptions({ queryKey: ["layers", layerId], queryFn: () => fetchJson(`/api/layers/${layerId}`, layerDetailSchema) });

export const layerFeaturesQuery = (layerId: number, number: number) =>
  queryOptions({
    queryKey: ["layers", layerId, "versions", number, "features"],
    queryFn: () => fetchJson(`/api/layers/${layerId}/versions/${number}/features`, layerFeaturesSchema),
    // A stored version never changes.
    staleTime: Infinity,
  });
