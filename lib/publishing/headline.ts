import { z } from "zod";
import { LeewayError } from "@/lib/errors";
import { describeProvenance, prepareEngine } from "@/lib/geo";
import { resolveScenario } from "@/lib/scenario/resolve";
import { parseScenario } from "@/lib/scenario/schema";

/** One figure of a published version's headline, as e-mails and the council summary show it. */
const headlineFigureSchema = z.object({
  /** Stable key, so a recomputation can be compared figure by figure. */
  key: z.string(),
  label: z.string(),
  value: z.union([z.number(), z.string()]),
  /** Unit shown after the value (km, people, facilities); absent for plain counts and words. */
  unit: z.string().optional(),
});
export type HeadlineFigure = z.infer<typeof headlineFigureSchema>;

/** The headline stored in `scenario_versions.headline`; parse stored JSON with it before use. */
export const headlineSchema = z.object({
  figures: z.array(headlineFigureSchema),
  /** The "how it was made" line (BRIEF "Cautions and provenance"). */
  provenance: z.string(),
  /** Why the exposure figures are missing (no population layer, …); null when they are there. */
  exposureNote: z.string().nullable(),
});
export type Headline = z.infer<typeof headlineSchema>;

/** The exposure computation's headline figures and provenance line, or why there are none. */
export type HeadlineExposure = { figures: HeadlineFigure[]; provenance: string } | { unavailable: string };

export interface HeadlineInput {
  versionNumber: number;
  /** The version's scenario file. */
  params: unknown;
  /** Layer kind → layer version number, as the version records them. */
  layerVersions: Record<string, number>;
  computedAt: Date;
  exposure: HeadlineExposure;
}

/**
 * The headline frozen with a published version and sent to council: the source and network in
 * a few figures, then the exposure engine's own headline figures (people in the blind zone,
 * people alerted 10 s or more ahead, facilities where an action does not fit) and its provenance
 * line. Without exposure figures the line comes from the engine prepared for the same scenario,
 * and `exposureNote` says why. Deterministic apart from the computation time, so a recomputation
 * can be compared with `headlineChanges`.
 */
export function computeHeadline(input: HeadlineInput): Headline {
  const parsed = parseScenario(input.params);
  if (!parsed.ok) {
    const first = parsed.issues[0];
    throw new LeewayError("conflict", `Version ${input.versionNumber} has a scenario file Leeway cannot compute (${first.path}: ${first.message}); save a corrected version and publish that.`);
  }
  const scenario = resolveScenario(parsed.scenario);
  const figures: HeadlineFigure[] = [
    { key: "mw", label: "Magnitude (Mw)", value: scenario.source.mw },
    { key: "depthKm", label: "Depth", value: scenario.source.depthKm, unit: "km" },
    { key: "faultType", label: "Fault type", value: scenario.source.faultType },
    { key: "operatingStations", label: "Operating stations", value: scenario.stations.filter((station) => station.operating).length },
    { key: "triggerStations", label: "Stations needed to declare an event", value: scenario.timing.triggerStations },
  ];

  if ("figures" in input.exposure) {
    return { figures: [...figures, ...input.exposure.figures], provenance: input.exposure.provenance, exposureNote: null };
  }
  const engine = prepareEngine(parsed.scenario, {
    computedAt: input.computedAt.toISOString(),
    scenarioVersion: input.versionNumber,
    layerVersions: input.layerVersions,
  });
  return { figures, provenance: describeProvenance(engine.provenance), exposureNote: input.exposure.unavailable };
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
