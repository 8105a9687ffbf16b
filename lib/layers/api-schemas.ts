import type { Geometry } from "geojson";
import { z } from "zod";
import { LAYER_KINDS } from "@/db/schema";
import { positiveIntParam } from "@/lib/api/params";
import { LAYER_FORMATS } from "./formats";

/** Request and response shapes of the layer API, checked on both sides. */

export const layerNameSchema = z
  .string({ error: "is required" })
  .trim()
  .min(1, "is required")
  .max(120, "must be 120 characters or fewer");

const fileNameSchema = z
  .string({ error: "is required" })
  .trim()
  .min(1, "is required")
  .max(255, "must be 255 characters or fewer");

/** Query of POST /api/layers/preview. */
export const previewQuerySchema = z.object({ kind: z.enum(LAYER_KINDS), format: z.enum(LAYER_FORMATS) });

/** Query of POST /api/layers (a new layer). */
export const createLayerQuerySchema = previewQuerySchema.extend({ name: layerNameSchema, fileName: fileNameSchema });

/** Query of POST /api/layers/{layerId}/versions (a new version of a layer). */
export const addVersionQuerySchema = z.object({ format: z.enum(LAYER_FORMATS), fileName: fileNameSchema });

export const layerParamsSchema = z.object({ layerId: positiveIntParam });
export const layerVersionParamsSchema = z.object({ layerId: positiveIntParam, number: positiveIntParam });

/** Body of PATCH /api/layers/{layerId}. */
export const renameLayerBodySchema = z.object({ name: layerNameSchema }).strict();

const bboxSchema = z.tuple([z.number(), z.number(), z.number(), z.number()]).nullable();
const layerKindSchema = z.enum(LAYER_KINDS);

export const layerVersionSummarySchema = z.object({
  id: z.number(),
  number: z.number(),
  rowCount: z.number(),
  bbox: bboxSchema,
  sourceFile: z.string(),
  createdAt: z.string(),
  author: z.string().nullable(),
  /** One line of figures ("1,000,000 people in 48,211 cells"). */
  description: z.string(),
  /** How the version's cells got their districts, for population versions. */
  districtNote: z.string().nullable(),
});
export type LayerVersionSummary = z.infer<typeof layerVersionSummarySchema>;

export const layerListSchema = z.object({
  layers: z.array(
    z.object({ id: z.number(), kind: layerKindSchema, name: z.string(), versionCount: z.number(), latest: layerVersionSummarySchema }),
  ),
});
export type LayerList = z.infer<typeof layerListSchema>;

export const layerDetailSchema = z.object({
  layer: z.object({ id: z.number(), kind: layerKindSchema, name: z.string(), createdAt: z.string() }),
  versions: z.array(layerVersionSummarySchema),
  /** Frozen scenario versions (published or shared for exercises) that use a version of this layer. */
  frozenUses: z.array(z.object({ scenarioName: z.string(), number: z.number(), state: z.string(), layerVersionNumber: z.number() })),
});
export type LayerDetail = z.infer<typeof layerDetailSchema>;

export const storedLayerSchema = z.object({
  layer: z.object({ id: z.number(), name: z.string(), kind: layerKindSchema }),
  version: z.object({ number: z.number() }),
  reassigned: z.array(z.object({ layerId: z.number(), number: z.number() })),
});
export type StoredLayerResponse = z.infer<typeof storedLayerSchema>;

const featureSchema = z.object({
  type: z.literal("Feature"),
  // Drawn, not analysed: the map only needs a GeoJSON geometry object.
  geometry: z.custom<Geometry>((g) => typeof g === "object" && g !== null && typeof (g as { type?: unknown }).type === "string", "must be a GeoJSON geometry"),
  properties: z.object({ label: z.string(), value: z.number().optional(), kind: z.string().optional(), operating: z.boolean().optional() }),
});

export const layerFeaturesSchema = z.object({
  type: z.literal("FeatureCollection"),
  features: z.array(featureSchema),
  bbox: bboxSchema,
  /** Brief, "Cautions and provenance": what the picture is and where it came from. */
  provenance: z.string(),
  caution: z.string(),
});
export type LayerFeatures = z.infer<typeof layerFeaturesSchema>;

const issueSchema = z.object({ path: z.string(), message: z.string() });

export const layerPreviewSchema = z.discriminatedUnion("accepted", [
  z.object({
    accepted: z.literal(true),
    kind: layerKindSchema,
    format: z.enum(LAYER_FORMATS),
    rowCount: z.number(),
    bbox: z.tuple([z.number(), z.number(), z.number(), z.number()]),
    summary: z.record(z.string(), z.unknown()),
    sample: z.object({ columns: z.array(z.string()), rows: z.array(z.array(z.union([z.string(), z.number()]))) }),
    extent: z.object({ type: z.literal("FeatureCollection"), features: z.array(featureSchema) }),
  }),
  z.object({ accepted: z.literal(false), message: z.string(), issues: z.array(issueSchema), issueCount: z.number() }),
]);
export type LayerPreviewResponse = z.infer<typeof layerPreviewSchema>;

/** Lines of the preview's NDJSON stream: progress while checking, then the preview. */
export const previewStreamLineSchema = z.discriminatedUnion("type", [
  z.object({ type: z.literal("progress"), fraction: z.number() }),
  z.object({ type: z.literal("result"), preview: layerPreviewSchema }),
]);
export type PreviewStreamLine = z.infer<typeof previewStreamLineSchema>;
