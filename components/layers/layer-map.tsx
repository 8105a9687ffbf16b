"use client";

import type { FeatureCollection } from "geojson";
import { RegionMap } from "@/components/map/region-map";

/** Margin around a layer's extent when the map fits it, degrees (also gives a single point some room). */
const MARGIN_DEG = 0.05;

/**
 * A layer drawn over the region map, fitted to its extent. The map fits bounds only when it starts,
 * so callers give it a `key` that changes with the layer shown.
 */
export function LayerMap({ features, bbox, provenance }: { features: FeatureCollection; bbox: [number, number, number, number] | null; provenance: string }) {
  const bounds: [number, number, number, number] | undefined = bbox
    ? [bbox[0] - MARGIN_DEG, bbox[1] - MARGIN_DEG, bbox[2] + MARGIN_DEG, bbox[3] + MARGIN_DEG]
    : undefined;
  return <RegionMap stations={[]} sources={[]} overlay={features} bounds={bounds} provenance={provenance} />;
}
