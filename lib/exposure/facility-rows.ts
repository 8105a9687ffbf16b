import { actionFits, evaluateFacilities, getIntensityScale, type EngineOptions, type LineFacility } from "@/lib/geo";
import { resolveScenario } from "@/lib/scenario/resolve";
import type { Scenario } from "@/lib/scenario/schema";
import type { FacilityRow } from "./contracts";
import { actionIsFor, type WorkspaceAction } from "./inputs";

/** Rail lines are sampled this often along their geodesics (the issue asks for ≤ 0.5 km). */
export const LINE_SAMPLE_STEP_KM = 0.5;

/** A facility as stored with its layer version: a GeoJSON Point, or a LineString for rail. */
export interface StoredFacility {
  id: number;
  name: string;
  kind: string;
  geometry: { type: "Point"; coordinates: [number, number] } | { type: "LineString"; coordinates: [number, number][] };
}

/**
 * Each facility with its warning seconds, intensity and which actions fit (null where an action is
 * not for the facility's kind). A line counts by its worst sample (shortest warning, strongest
 * shaking); an action fits on a line only when every sample is alerted, since a train cannot stop
 * on the stretch that got no alert.
 */
export function facilityRows(
  scenario: Scenario,
  facilities: readonly StoredFacility[],
  options: EngineOptions & { actions: readonly WorkspaceAction[]; reactionTimeS: number },
): FacilityRow[] {
  const points = facilities.filter((f) => f.geometry.type === "Point");
  const lines = facilities.filter((f) => f.geometry.type === "LineString");
  const result = evaluateFacilities(
    scenario,
    {
      points: points.map((f) => ({ id: String(f.id), lon: f.geometry.coordinates[0] as number, lat: f.geometry.coordinates[1] as number })),
      lines: lines.map((f): LineFacility => ({ id: String(f.id), coordinates: f.geometry.coordinates as [number, number][] })),
    },
    { ...options, stepKm: LINE_SAMPLE_STEP_KM },
  );
  const scale = getIntensityScale(resolveScenario(scenario).intensityScale);
  const fits = (kind: string, warningS: number | null, alertedShare: number) =>
    options.actions.map((action) =>
      actionIsFor(action, kind) ? alertedShare === 1 && warningS !== null && actionFits(warningS, options.reactionTimeS, { id: action.id, seconds: action.secondsNeeded }) : null,
    );

  const byId = new Map<string, FacilityRow>();
  result.points.forEach((site, k) => {
    const f = points[k];
    const alertedShare = site.alerted ? 1 : 0;
    byId.set(site.id, {
      id: f.id,
      name: f.name,
      kind: f.kind,
      geometry: "point",
      lengthKm: null,
      warningS: site.warningS,
      intensity: site.intensity,
      intensityClass: site.intensityClass,
      alertedShare,
      actionFits: fits(f.kind, site.warningS, alertedShare),
    });
  });
  result.lines.forEach((line, k) => {
    const f = lines[k];
    byId.set(line.id, {
      id: f.id,
      name: f.name,
      kind: f.kind,
      geometry: "line",
      lengthKm: line.lengthKm,
      warningS: line.minWarningS,
      intensity: line.maxIntensity,
      intensityClass: scale.classes[scale.classIndex(line.maxIntensity)],
      alertedShare: line.alertedShare,
      actionFits: fits(f.kind, line.minWarningS, line.alertedShare),
    });
  });
  // Keep the layer's own order.
  return facilities.map((f) => byId.get(String(f.id))!);
}
