/**
 * The caution and the "how it was made" record every engine result carries (BRIEF "Cautions and
 * provenance"). Deterministic: the caller passes the time of computation.
 */
import packageJson from "@/package.json";
import type { PublishedRelation } from "./ground-motion/types";

export { CAUTION } from "@/lib/caution";

/** Leeway's version, from package.json. */
export const LEEWAY_VERSION: string = packageJson.version;

/** What the caller knows about a computation that the scenario file does not say. */
export interface ProvenanceContext {
  /** ISO 8601 time of computation; `null` when not recorded. */
  computedAt?: string | null;
  /** The scenario version (as stored), when the scenario comes from the workspace. */
  scenarioVersion?: number | string | null;
  /** Versions of the layers used (population, Vs30, districts, facilities, stations…). */
  layerVersions?: Record<string, number | string>;
}

/** How a result was made. */
export interface Provenance {
  leewayVersion: string;
  groundMotionModel: PublishedRelation;
  /** Site amplification, or the model's own site term. */
  amplification: PublishedRelation | { id: "model-site-term"; title: string };
  conversion: PublishedRelation;
  velocityModel: PublishedRelation;
  alertStrategy: string;
  scenario: { name: string | null; version: number | string | null };
  layerVersions: Record<string, number | string>;
  computedAt: string | null;
}

/** The one-line "how it was made" text for maps, tables and exports. */
export function describeProvenance(p: Provenance): string {
  const layers = Object.entries(p.layerVersions).map(([name, version]) => `${name} v${version}`);
  return [
    `Leeway ${p.leewayVersion}`,
    `ground motion: ${p.groundMotionModel.title} (${p.groundMotionModel.status})`,
    `amplification: ${p.amplification.title}`,
    `conversion: ${p.conversion.title} (${p.conversion.status})`,
    `velocity model: ${p.velocityModel.title}`,
    `alert strategy: ${p.alertStrategy}`,
    `scenario: ${p.scenario.name ?? "unnamed"}${p.scenario.version === null ? "" : ` v${p.scenario.version}`}`,
    `layers: ${layers.length ? layers.join(", ") : "none"}`,
    `computed ${p.computedAt ?? "at an unrecorded time"}`,
  ].join("; ");
}
