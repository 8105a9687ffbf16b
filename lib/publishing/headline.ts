import { z } from "zod";
import packageJson from "@/package.json";

/** One figure of a published version's headline, as e-mails and the council summary show it. */
const headlineFigureSchema = z.object({
  /** Stable key, so a recomputation can be compared figure by figure. */
  key: z.string(),
  label: z.string(),
  value: z.union([z.number(), z.string()]),
  /** Unit shown after the value (km, people); absent for plain counts and words. */
  unit: z.string().optional(),
});
export type HeadlineFigure = z.infer<typeof headlineFigureSchema>;

/** The "how it was made" record of the brief's "Cautions and provenance". */
const provenanceSchema = z.object({
  leewayVersion: z.string(),
  groundMotionModel: z.string(),
  amplification: z.string(),
  conversion: z.string(),
  velocityModel: z.string(),
  scenarioName: z.string(),
  scenarioVersion: z.number(),
  layers: z.array(z.object({ kind: z.string(), name: z.string(), version: z.number() })),
  /** ISO 8601, UTC. */
  computedAt: z.string(),
});
export type Provenance = z.infer<typeof provenanceSchema>;

/** The headline stored in `scenario_versions.headline`; parse stored JSON with it before use. */
export const headlineSchema = z.object({ figures: z.array(headlineFigureSchema), provenance: provenanceSchema });
export type Headline = z.infer<typeof headlineSchema>;

/** A layer version the scenario version was computed with. */
export interface HeadlineLayer {
  kind: string;
  name: string;
  version: number;
  /** The layer version's stored summary figures (total population, counts by kind, …). */
  summary: unknown;
}

export interface HeadlineInput {
  scenarioName: string;
  versionNumber: number;
  /** The version's scenario file (validated when it was saved). */
  params: unknown;
  layers: HeadlineLayer[];
  computedAt: Date;
}

/** The fields the headline reads; the scenario file was validated in full when it was saved. */
const headlineParamsSchema = z.object({
  source: z.object({ mw: z.number(), depthKm: z.number(), faultType: z.string() }),
  stations: z.array(z.object({ operating: z.boolean().optional() })).default([]),
  timing: z.object({ triggerStations: z.number().optional() }).optional(),
  groundMotionModel: z.string().optional(),
  intensityScale: z.enum(["jma", "mmi"]).optional(),
  velocityModel: z
    .union([
      z.object({ kind: z.literal("homogeneous"), vpKms: z.number(), vsKms: z.number() }),
      z.object({ kind: z.literal("layered"), name: z.string() }),
    ])
    .optional(),
});

/** Defaults of the scenario file (issue 3's schema): the first registered model, JMA, IASP91, two stations. */
const DEFAULT_MODEL = "si-midorikawa-1999";
const DEFAULT_SCALE = "jma";
const DEFAULT_TRIGGER_STATIONS = 2;

/** Readable names of the published relations behind each setting, for the provenance line. */
const MODEL_LABELS: Record<string, { model: string; amplification: string }> = {
  "si-midorikawa-1999": { model: "Si & Midorikawa (1999)", amplification: "Midorikawa et al. (1994) Vs30 amplification" },
  "bssa-2014": { model: "Boore et al. (2014)", amplification: "the model's own Vs30 site term" },
};
const CONVERSION_LABELS = {
  jma: "JMA intensity from PGV (Midorikawa et al. 1999)",
  mmi: "MMI from PGV (Worden et al. 2012)",
} as const;

function describeVelocityModel(model: z.infer<typeof headlineParamsSchema>["velocityModel"]): string {
  if (!model) return "IASP91 (layered, default)";
  if (model.kind === "homogeneous") return `homogeneous, Vp ${model.vpKms} km/s, Vs ${model.vsKms} km/s`;
  return `${model.name.toUpperCase()} (layered)`;
}

/** The population a population layer version holds, when its summary says. */
function layerPopulation(layers: HeadlineLayer[]): number | undefined {
  const population = layers.find((layer) => layer.kind === "population");
  const parsed = z.object({ totalPopulation: z.number() }).safeParse(population?.summary);
  return parsed.success ? parsed.data.totalPopulation : undefined;
}

/**
 * The headline figures frozen with a published version and sent to council, with the record of how
 * they were made. This is the one place that decides them: today it states the source, the network
 * and the population the layers hold; exposure figures join here when the engine provides them.
 * Deterministic apart from `computedAt`, so a recomputation can be compared with `headlineChanges`.
 */
export function computeHeadline(input: HeadlineInput): Headline {
  const parsed = headlineParamsSchema.safeParse(input.params);
  if (!parsed.success) {
    throw new Error(`Scenario version ${input.versionNumber} has no readable source; it cannot be published.`);
  }
  const params = parsed.data;
  const modelId = params.groundMotionModel ?? DEFAULT_MODEL;
  const labels = MODEL_LABELS[modelId] ?? { model: modelId, amplification: "as the model defines" };
  const operatingStations = params.stations.filter((station) => station.operating !== false).length;

  const figures: HeadlineFigure[] = [
    { key: "mw", label: "Magnitude (Mw)", value: params.source.mw },
    { key: "depthKm", label: "Depth", value: params.source.depthKm, unit: "km" },
    { key: "faultType", label: "Fault type", value: params.source.faultType },
    { key: "operatingStations", label: "Operating stations", value: operatingStations },
    {
      key: "triggerStations",
      label: "Stations needed to declare an event",
      value: params.timing?.triggerStations ?? DEFAULT_TRIGGER_STATIONS,
    },
  ];
  const population = layerPopulation(input.layers);
  if (population !== undefined) figures.push({ key: "layerPopulation", label: "People in the population layer", value: population, unit: "people" });

  return {
    figures,
    provenance: {
      leewayVersion: packageJson.version,
      groundMotionModel: labels.model,
      amplification: labels.amplification,
      conversion: CONVERSION_LABELS[params.intensityScale ?? DEFAULT_SCALE],
      velocityModel: describeVelocityModel(params.velocityModel),
      scenarioName: input.scenarioName,
      scenarioVersion: input.versionNumber,
      layers: input.layers.map(({ kind, name, version }) => ({ kind, name, version })),
      computedAt: input.computedAt.toISOString(),
    },
  };
}

/** Figures whose value differs between a stored headline and a recomputed one (by key), for the council summary's warning. */
export function headlineChanges(stored: Headline, recomputed: Headline): { key: string; label: string; stored?: HeadlineFigure["value"]; now?: HeadlineFigure["value"] }[] {
  const before = new Map(stored.figures.map((figure) => [figure.key, figure]));
  const after = new Map(recomputed.figures.map((figure) => [figure.key, figure]));
  const keys = new Set([...before.keys(), ...after.keys()]);
  return [...keys]
    .filter((key) => before.get(key)?.value !== after.get(key)?.value)
    .map((key) => ({ key, label: (after.get(key) ?? before.get(key))!.label, stored: before.get(key)?.value, now: after.get(key)?.value }));
}

/** Formats a figure's value with its unit, the way e-mails and pages print it. */
export function formatFigure(figure: HeadlineFigure): string {
  const value = typeof figure.value === "number" ? figure.value.toLocaleString("en-GB") : figure.value;
  return figure.unit ? `${value} ${figure.unit}` : value;
}

/** The one-line "how it was made" statement. */
export function formatProvenance(provenance: Provenance): string {
  const layers = provenance.layers.length
    ? provenance.layers.map((layer) => `${layer.kind} "${layer.name}" v${layer.version}`).join(", ")
    : "none recorded";
  return [
    `Leeway ${provenance.leewayVersion}`,
    `ground motion: ${provenance.groundMotionModel}`,
    `amplification: ${provenance.amplification}`,
    `intensity: ${provenance.conversion}`,
    `velocity model: ${provenance.velocityModel}`,
    `scenario "${provenance.scenarioName}" version ${provenance.scenarioVersion}`,
    `layers: ${layers}`,
    `computed ${provenance.computedAt.replace("T", " ").slice(0, 16)} UTC`,
  ].join(" · ");
}
