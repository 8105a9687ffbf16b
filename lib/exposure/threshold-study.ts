/**
 * The alert-threshold study: the alert area's threshold (`alert.areaAt`) set in turn to the lower
 * edge of each intensity class, with everything else unchanged, and the expected people needlessly
 * alerted, alerted late and missed at each setting (METHODS.md §9). A higher threshold alerts a
 * subset of the places a lower one does, so expected missed people never fall and needlessly
 * alerted ones never rise as it goes up.
 */
import { CAUTION } from "@/lib/caution";
import { computeExposureWith, describeProvenance, getIntensityScale, prepareEngine } from "@/lib/geo";
import { resolveScenario } from "@/lib/scenario/resolve";
import type { ThresholdStudy } from "./contracts";
import { reachPoints } from "./compute-exposure";
import type { ExposureInputs } from "./inputs";

/** Runs the sweep over a version's inputs (one engine run per class edge). */
export function computeThresholdStudy(inputs: Pick<ExposureInputs, "scenario" | "population" | "vs30Cells" | "context">): ThresholdStudy {
  const { scenario, population, vs30Cells, context } = inputs;
  const resolved = resolveScenario(scenario);
  const scale = getIntensityScale(resolved.intensityScale);
  const reach = reachPoints(population);
  let provenance = "";
  let notes: string[] = [];
  let alertIssued = false;
  const rows = scale.classLowerBounds.map((areaAt, k) => {
    const variant = { ...scenario, alert: { ...scenario.alert, areaAt } };
    const engine = prepareEngine(variant, { vs30Cells, ...context }, reach);
    const exposure = computeExposureWith(engine, population);
    provenance ||= describeProvenance(engine.provenance);
    if (notes.length === 0) notes = engine.notes.filter((note) => !note.startsWith("default alert thresholds"));
    alertIssued ||= exposure.alertIssued;
    return {
      areaAt,
      intensityClass: scale.classes[k + 1],
      alertedPopulation: exposure.alertedPopulation,
      needless: exposure.expected.needless,
      late: exposure.expected.late,
      missed: exposure.expected.missed,
    };
  });
  return {
    format: 1,
    computedAt: context.computedAt,
    caution: CAUTION,
    provenance,
    notes: [...notes, `the alert is issued at ${resolved.alert.issueAt} whatever the alert-area threshold; the target shaking is ${resolved.alert.target}`],
    intensityScale: resolved.intensityScale,
    issueAt: resolved.alert.issueAt,
    currentAreaAt: resolved.alert.areaAt,
    target: resolved.alert.target,
    alertIssued,
    rows,
  };
}
