import type { FeatureCollection, Geometry } from "geojson";
import { toDisplayFeatures, type DisplayProperties } from "./display-features";
import type { LayerFormat } from "./formats";
import { LayerFileError } from "./layer-file-error";
import type { Bbox, ParsedLayer } from "./parsed-layer";
import { sampleRows, summarizeLayer, type LayerSummary } from "./summarize";
import type { FieldIssue } from "@/lib/errors";

/** What a planner sees before saving a file that passed every check. */
export interface AcceptedPreview {
  accepted: true;
  kind: ParsedLayer["kind"];
  format: LayerFormat;
  rowCount: number;
  bbox: Bbox;
  summary: LayerSummary;
  sample: { columns: string[]; rows: (string | number)[][] };
  /** A thinned picture of the layer for the extent map. */
  extent: FeatureCollection<Geometry, DisplayProperties>;
}

/** What a planner sees for a file that would be refused: the reason and the first problems. */
export interface RefusedPreview {
  accepted: false;
  message: string;
  issues: FieldIssue[];
  issueCount: number;
}

export type LayerPreview = AcceptedPreview | RefusedPreview;

export function previewAccepted(layer: ParsedLayer, format: LayerFormat): AcceptedPreview {
  return {
    accepted: true,
    kind: layer.kind,
    format,
    rowCount: layer.rowCount,
    bbox: layer.bbox,
    summary: summarizeLayer(layer),
    sample: sampleRows(layer),
    extent: toDisplayFeatures(layer, { maxPoints: 3000, maxCorners: 300 }),
  };
}

export function previewRefused(error: LayerFileError): RefusedPreview {
  return { accepted: false, message: error.message, issues: error.issues, issueCount: error.issueCount };
}
