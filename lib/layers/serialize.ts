import type { LayerKind, LayerVersionRow } from "@/db/schema";
import type { LayerVersionSummary } from "./api-schemas";
import { describeDistrictSource, describeLayerSummary } from "./describe-summary";

/** A layer version row as the API returns it. */
export function toLayerVersionSummary(kind: LayerKind, version: LayerVersionRow, author: string | null): LayerVersionSummary {
  return {
    id: version.id,
    number: version.number,
    rowCount: version.rowCount,
    bbox: version.bbox ?? null,
    sourceFile: version.sourceFile,
    createdAt: version.createdAt.toISOString(),
    author,
    description: describeLayerSummary(kind, version.summary),
    districtNote: kind === "population" ? describeDistrictSource(version.summary) : null,
  };
}
