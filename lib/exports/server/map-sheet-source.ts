import "server-only";
import { CAUTION } from "@/lib/caution";
import { describeProvenance, LEEWAY_VERSION, prepareEngine } from "@/lib/geo";
import type { MapSheetContent } from "../map-sheet/sheet-content";
import { sheetLegend, sheetNote } from "../map-sheet/sheet-legend";
import type { MapSheetView } from "../map-sheet/sheet-request";
import { loadVs30Cells, type ExportSource } from "./export-source";

const FAULT_WORDS: Record<string, string> = { crustal: "crustal", interplate: "subduction interface", intraslab: "intraslab" };

/** The sheet's content for a scenario version and the print map the browser rendered. */
export async function mapSheetContent(source: ExportSource, view: MapSheetView, now: Date): Promise<MapSheetContent> {
  const engine = prepareEngine(source.scenario, { vs30Cells: await loadVs30Cells(source), ...source.context });
  const sc = engine.scenario;
  const operating = sc.stations.filter((s) => s.operating).length;
  const channels = engine.timeline.channels.map((c) => `${c.id} +${c.deliveryS} s`).join(", ");
  const primary = sc.channels[0].id;
  const rupture = sc.source.rupture ? `, rupture ${sc.source.rupture.lengthKm ?? "scaled"} km long` : ", point source";
  return {
    title: `${source.scenarioName}: warning seconds and shaking`,
    summary: [
      `Source: Mw ${sc.source.mw.toFixed(1)} ${FAULT_WORDS[sc.source.faultType] ?? sc.source.faultType} earthquake, ${sc.source.depthKm} km deep at ${sc.source.lat.toFixed(3)}°, ${sc.source.lon.toFixed(3)}°${rupture}.`,
      `Network: ${operating} of ${sc.stations.length} stations operating; alert after the P wave reaches ${sc.timing.triggerStations}.`,
      `Timing: P window ${sc.timing.pWindowS} s, telemetry ${sc.timing.telemetryS} s, processing ${sc.timing.processingS} s; alert issued ${engine.timeline.alertIssuedS.toFixed(1)} s after origin; delivery ${channels}.`,
    ],
    stamp: [`Scenario version ${source.versionNumber} (${source.state})`, `Made ${now.toISOString().slice(0, 16).replace("T", " ")} UTC`, `Leeway ${LEEWAY_VERSION}`],
    legend: sheetLegend(view, {
      warningBreaksS: sc.warningBreaksS,
      primaryChannel: primary,
      intensityScaleLabel: engine.scale.label,
      intensityClasses: engine.scale.classes,
      intensityClassLowerBounds: engine.scale.classLowerBounds,
    }),
    note: sheetNote(view, primary),
    caution: CAUTION,
    howItWasMade: describeProvenance(engine.provenance),
    bounds: view.bounds,
    centreLatDeg: view.centre[1],
  };
}
