/**
 * The shapes of exposure results as the API sends them and the result cache stores them: zod
 * schemas, so the browser checks what it receives and the server re-checks what it reads back
 * from the cache (a row written by an older format is recomputed, not trusted).
 */
import { z } from "zod";

const warningBandSchema = z.object({ id: z.string(), label: z.string(), lowerS: z.number().nullable(), upperS: z.number().nullable() });
export type ExposureBand = z.infer<typeof warningBandSchema>;

/** Alerted people per warning band of one intensity class, with those not alerted. */
const classBandRowSchema = z.object({
  intensityClass: z.string(),
  /** Alerted people per warning band, in the order of `warningBands`. */
  alertedByBand: z.array(z.number()),
  notAlerted: z.number(),
  total: z.number(),
});
export type ClassBandRow = z.infer<typeof classBandRowSchema>;

const classBandTableSchema = z.object({
  rows: z.array(classBandRowSchema),
  bandTotals: z.array(z.number()),
  notAlertedTotal: z.number(),
  total: z.number(),
});
export type ClassBandTable = z.infer<typeof classBandTableSchema>;

const districtRowSchema = z.object({
  district: z.string().nullable(),
  population: z.number(),
  alertedPopulation: z.number(),
  blindZonePopulation: z.number(),
  alertedWithWarningPopulation: z.number(),
});
export type DistrictRow = z.infer<typeof districtRowSchema>;

const channelRowSchema = z.object({
  channel: z.string(),
  deliveryS: z.number(),
  primary: z.boolean(),
  blindZonePopulation: z.number(),
  alertedPopulation: z.number(),
  alertedWithWarningPopulation: z.number(),
  bands: z.array(z.object({ warningBand: z.string(), population: z.number(), alertedPopulation: z.number() })),
});
export type ChannelRow = z.infer<typeof channelRowSchema>;

/** A protective action of the workspace list, with the alerted people who can complete it. */
const actionRowSchema = z.object({ id: z.string(), name: z.string(), secondsNeeded: z.number(), population: z.number() });
export type ActionRow = z.infer<typeof actionRowSchema>;

const facilityRowSchema = z.object({
  id: z.number(),
  name: z.string(),
  kind: z.string(),
  geometry: z.enum(["point", "line"]),
  /** Lines only: length along the geodesics, km. */
  lengthKm: z.number().nullable(),
  /** Primary channel, full precision (lines: the shortest along the line); null when no alert reaches it. */
  warningS: z.number().nullable(),
  /** Intensity on the scenario's scale (lines: the strongest along the line). */
  intensity: z.number(),
  intensityClass: z.string(),
  /** Share of the facility that is alerted, 0–1 (points: 0 or 1). */
  alertedShare: z.number(),
  /**
   * Per action of `actions`, in that order: fits when the whole facility is alerted and warning ≥
   * reaction + seconds; null when the action is not for this kind of facility.
   */
  actionFits: z.array(z.boolean().nullable()),
});
export type FacilityRow = z.infer<typeof facilityRowSchema>;

const headlineFigureSchema = z.object({ key: z.string(), label: z.string(), value: z.number(), unit: z.string().optional() });
export type ExposureHeadlineFigure = z.infer<typeof headlineFigureSchema>;

/** What one exposure computation yields; stored as-is in the result cache. */
export const exposureResultSchema = z.object({
  format: z.literal(1),
  computedAt: z.string(),
  caution: z.string(),
  /** The "how it was made" line. */
  provenance: z.string(),
  notes: z.array(z.string()),
  usesDefaultDelays: z.boolean(),
  intensityScale: z.enum(["jma", "mmi"]),
  intensityClasses: z.array(z.string()),
  warningBands: z.array(warningBandSchema),
  reactionTimeS: z.number(),
  alertIssued: z.boolean(),
  totals: z.object({
    totalPopulation: z.number(),
    blindZonePopulation: z.number(),
    blindZoneAreaKm2: z.number(),
    alertedPopulation: z.number(),
    notAlertedPopulation: z.number(),
    alertedWithWarningPopulation: z.number(),
    alertedWithTenSecondsPopulation: z.number(),
    noAlertPopulation: z.number(),
  }),
  classByBand: classBandTableSchema,
  byDistrict: z.array(districtRowSchema),
  byChannel: z.array(channelRowSchema),
  actions: z.array(actionRowSchema),
  facilities: z.array(facilityRowSchema),
  expected: z.object({ needless: z.number(), late: z.number(), missed: z.number(), target: z.number(), note: z.string() }),
  headline: z.array(headlineFigureSchema),
});
export type ExposureResult = z.infer<typeof exposureResultSchema>;

/** The scenario version a result belongs to. */
export const versionRefSchema = z.object({
  scenarioId: z.number(),
  scenarioName: z.string(),
  versionNumber: z.number(),
  state: z.enum(["draft", "shared", "published"]),
});
export type VersionRef = z.infer<typeof versionRefSchema>;

/** GET …/exposure answers with this. */
export const exposureResponseSchema = z.object({ caution: z.string(), version: versionRefSchema, cached: z.boolean(), exposure: exposureResultSchema });
export type ExposureResponse = z.infer<typeof exposureResponseSchema>;

/** One setting of the alert-area threshold and what it gives (expected counts, METHODS.md §9). */
const thresholdRowSchema = z.object({
  areaAt: z.number(),
  /** The class that starts at `areaAt`. */
  intensityClass: z.string(),
  alertedPopulation: z.number(),
  needless: z.number(),
  late: z.number(),
  missed: z.number(),
});
export type ThresholdRow = z.infer<typeof thresholdRowSchema>;

export const thresholdStudySchema = z.object({
  format: z.literal(1),
  computedAt: z.string(),
  caution: z.string(),
  provenance: z.string(),
  notes: z.array(z.string()),
  intensityScale: z.enum(["jma", "mmi"]),
  issueAt: z.number(),
  /** The scenario's own alert-area threshold. */
  currentAreaAt: z.number(),
  target: z.number(),
  alertIssued: z.boolean(),
  rows: z.array(thresholdRowSchema),
});
export type ThresholdStudy = z.infer<typeof thresholdStudySchema>;

export const thresholdStudyResponseSchema = z.object({ caution: z.string(), version: versionRefSchema, cached: z.boolean(), study: thresholdStudySchema });
export type ThresholdStudyResponse = z.infer<typeof thresholdStudyResponseSchema>;

/** A facility whose action fits in one version and not in the other. */
const facilityChangeSchema = z.object({
  name: z.string(),
  kind: z.string(),
  action: z.string(),
  secondsNeeded: z.number(),
  warningA: z.number().nullable(),
  warningB: z.number().nullable(),
  change: z.enum(["gains", "loses"]),
});
export type FacilityChange = z.infer<typeof facilityChangeSchema>;

const comparedVersionSchema = z.object({
  version: versionRefSchema,
  provenance: z.string(),
  blindZoneAreaKm2: z.number(),
  blindZonePopulation: z.number(),
  alertedPopulation: z.number(),
  alertedWithTenSecondsPopulation: z.number(),
});
export type ComparedVersion = z.infer<typeof comparedVersionSchema>;

const geometrySchema = z.object({ type: z.literal("MultiPolygon"), coordinates: z.array(z.array(z.array(z.tuple([z.number(), z.number()])))) });

export const secondsGainedSchema = z.object({
  type: z.literal("FeatureCollection"),
  features: z.array(
    z.object({
      type: z.literal("Feature"),
      properties: z.object({ layer: z.literal("seconds-gained"), label: z.string(), lowerS: z.number().nullable(), upperS: z.number().nullable(), colour: z.string() }),
      geometry: geometrySchema,
    }),
  ),
});
export type SecondsGained = z.infer<typeof secondsGainedSchema>;

export const comparisonSchema = z.object({
  format: z.literal(1),
  computedAt: z.string(),
  caution: z.string(),
  notes: z.array(z.string()),
  a: comparedVersionSchema,
  b: comparedVersionSchema,
  /** Warning bands (primary channel, alerted or not), the rows and columns of the matrix. */
  bands: z.array(warningBandSchema),
  /** People by band in A (rows) × band in B (columns). */
  matrix: z.array(z.array(z.number())),
  /** Row sums: A's people per band; column sums: B's. */
  rowTotals: z.array(z.number()),
  columnTotals: z.array(z.number()),
  totalPopulation: z.number(),
  /** People whose band is later (more warning) in B than in A, and earlier. */
  movedToMoreWarning: z.number(),
  movedToLessWarning: z.number(),
  facilities: z.array(facilityChangeSchema),
  secondsGained: secondsGainedSchema,
  /** Cell size of the grid the areas and the seconds-gained layer come from, km, and its [west, south, east, north]. */
  gridCellKm: z.number(),
  gridBbox: z.tuple([z.number(), z.number(), z.number(), z.number()]),
});
export type Comparison = z.infer<typeof comparisonSchema>;

/** GET /api/compare answers with this. */
export const comparisonResponseSchema = z.object({ caution: z.string(), cached: z.boolean(), comparison: comparisonSchema });
export type ComparisonResponse = z.infer<typeof comparisonResponseSchema>;
