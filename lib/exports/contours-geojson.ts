/**
 * Contours and the blind zone as one RFC 7946 GeoJSON FeatureCollection for GIS use. Each feature
 * keeps the engine's `layer` property and gains `units` and the breaks it was traced at, so a
 * file opened on its own says what its numbers mean. The caution and the "how it was made" record
 * are foreign members of the collection (RFC 7946 §6.1). Coordinates are [longitude, latitude]
 * (§3.1.1), outer rings counter-clockwise and holes clockwise (§3.1.6), as traced by lib/geo.
 */
import type { ContourSet } from "@/lib/geo/contours";
import type { Provenance } from "@/lib/geo/provenance";

/** What the export adds besides the traced contours. */
export interface ContoursExportContext {
  warningBreaksS: readonly number[];
  intensityScale: string;
  intensityClassLowerBounds: readonly number[];
  /** Channel the warning bands and the blind zone are for. */
  channel: string;
  caution: string;
  provenance: Provenance;
  /** The "how it was made" line. */
  howItWasMade: string;
  notes: readonly string[];
}

type Geometry = { type: "MultiPolygon"; coordinates: [number, number][][][] };

/** One exported feature. */
export interface ExportFeature {
  type: "Feature";
  properties: Record<string, string | number | boolean | null | readonly number[]>;
  geometry: Geometry;
}

/** The exported collection. */
export interface ContoursExport {
  type: "FeatureCollection";
  features: ExportFeature[];
  caution: string;
  howItWasMade: string;
  provenance: Provenance;
  notes: readonly string[];
}

/** Builds the exported FeatureCollection: warning bands, intensity bands, blind zone, alert area. */
export function buildContoursExport(contours: ContourSet, context: ContoursExportContext): ContoursExport {
  const warningBreaksS = [...context.warningBreaksS];
  const intensityBreaks = [...context.intensityClassLowerBounds];
  const features: ExportFeature[] = [
    ...contours.warning.features.map((f) => ({
      type: "Feature" as const,
      properties: { ...f.properties, units: "s", channel: context.channel, breaksS: warningBreaksS, rule: "lowerS < warning seconds ≤ upperS" },
      geometry: f.geometry,
    })),
    ...contours.intensity.features.map((f) => ({
      type: "Feature" as const,
      properties: {
        ...f.properties,
        units: `${context.intensityScale} intensity (dimensionless)`,
        breaks: intensityBreaks,
        rule: "lowerIntensity ≤ intensity < upperIntensity",
      },
      geometry: f.geometry,
    })),
    ...contours.blindZone.features.map((f) => ({
      type: "Feature" as const,
      properties: { ...f.properties, units: "s", upperS: 0, rule: "warning seconds ≤ 0 (shaking arrives before the alert)" },
      geometry: f.geometry,
    })),
    ...contours.alertArea.features.map((f) => ({
      type: "Feature" as const,
      properties: { ...f.properties, units: "none", rule: "places the scenario's alert goes to" },
      geometry: f.geometry,
    })),
  ];
  return { type: "FeatureCollection", features, caution: context.caution, howItWasMade: context.howItWasMade, provenance: context.provenance, notes: context.notes };
}
