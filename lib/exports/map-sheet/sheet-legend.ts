/**
 * The map sheet's legends: the scenario layers the print map actually shows, in the colours the
 * browser read from it, labelled from the scenario (band limits in seconds, intensity classes with
 * their scale); then the workspace's point overlays in the basemap palette.
 */
import { MAP_COLOURS } from "@/lib/map/palette";
import { warningBands } from "@/lib/geo/warning";
import type { LegendGroup, LegendItem } from "./sheet-content";
import type { MapSheetView } from "./sheet-request";

/** What the labels need from the scenario. */
export interface LegendScenario {
  warningBreaksS: readonly number[];
  primaryChannel: string;
  intensityScaleLabel: string;
  intensityClasses: readonly string[];
  intensityClassLowerBounds: readonly number[];
}

function intensityRange(classes: readonly string[], bounds: readonly number[], key: string): string {
  const i = classes.indexOf(key);
  if (i < 0) return key;
  const lower = i === 0 ? null : bounds[i - 1];
  const upper = i < bounds.length ? bounds[i] : null;
  const range = lower === null ? `below ${upper}` : upper === null ? `${lower} and above` : `${lower} to ${upper}`;
  return `${key} (${range})`;
}

/** Legend groups for the layers in `view`, in a fixed order. */
export function sheetLegend(view: Pick<MapSheetView, "legend" | "overlays">, scenario: LegendScenario): LegendGroup[] {
  const groups: LegendGroup[] = [];
  const of = (layer: string) => view.legend.filter((entry) => entry.layer === layer);
  const bands = warningBands(scenario.warningBreaksS);
  const warning = of("warning")
    .map((entry) => ({ entry, index: bands.findIndex((b) => b.id === entry.key) }))
    .filter(({ index }) => index >= 0)
    .sort((a, b) => a.index - b.index)
    .map(({ entry, index }): LegendItem => ({ label: bands[index].label, symbol: { kind: "fill", fill: { hex: entry.fill, opacity: entry.opacity } } }));
  if (warning.length) groups.push({ title: `Warning seconds before strong shaking (s), ${scenario.primaryChannel}`, items: warning });

  const intensity = of("intensity")
    .map((entry) => ({ entry, index: scenario.intensityClasses.indexOf(entry.key) }))
    .filter(({ index }) => index >= 0)
    .sort((a, b) => a.index - b.index)
    .map(({ entry }): LegendItem => ({
      label: intensityRange(scenario.intensityClasses, scenario.intensityClassLowerBounds, entry.key),
      symbol: { kind: "fill", fill: { hex: entry.fill, opacity: entry.opacity } },
    }));
  if (intensity.length) groups.push({ title: `Expected intensity, ${scenario.intensityScaleLabel} (no unit)`, items: intensity });

  const areas: LegendItem[] = [];
  const blind = of("blind-zone")[0];
  if (blind) areas.push({ label: "Blind zone: shaking before any alert (warning ≤ 0 s)", symbol: { kind: "fill", fill: { hex: blind.fill, opacity: blind.opacity } } });
  const alertArea = of("alert-area")[0];
  // The workspace draws the alert area as a dashed outline (components/map/result-layers.ts).
  if (alertArea) areas.push({ label: "Alert area: places the alert goes to", symbol: { kind: "line", colour: alertArea.fill, widthPt: 1.5, dashPt: [3, 2] } });
  if (areas.length) groups.push({ title: "Areas", items: areas });

  const points: LegendItem[] = [];
  if (view.overlays.sources) points.push({ label: "Epicentre (hypothetical)", symbol: { kind: "point", fill: { hex: MAP_COLOURS.source }, stroke: { hex: MAP_COLOURS.sourceHalo }, radiusPt: 3 } });
  if (view.overlays.stations) {
    points.push({ label: "Station, operating", symbol: { kind: "point", fill: { hex: MAP_COLOURS.station }, stroke: { hex: MAP_COLOURS.stationOutline }, radiusPt: 3 } });
    points.push({ label: "Station, out of service", symbol: { kind: "point", fill: { hex: MAP_COLOURS.stationOff }, stroke: { hex: MAP_COLOURS.stationOffOutline }, radiusPt: 3 } });
  }
  points.push({ label: "Town", symbol: { kind: "point", fill: { hex: MAP_COLOURS.townDot }, stroke: { hex: MAP_COLOURS.labelHalo }, radiusPt: 2.5 } });
  points.push({ label: "Rail line", symbol: { kind: "line", colour: MAP_COLOURS.rail, widthPt: 2.5 } });
  points.push({ label: "District boundary", symbol: { kind: "line", colour: MAP_COLOURS.districtLine, widthPt: 1, dashPt: [4, 2] } });
  groups.push({ title: "Map marks", items: points });
  return groups;
}

/** "What this map shows", in plain words, for the layers on the map. */
export function sheetNote(view: Pick<MapSheetView, "legend">, primaryChannel: string): string {
  const has = (layer: string) => view.legend.some((entry) => entry.layer === layer);
  const parts = ["A hypothetical earthquake from a planning scenario, drawn on Leeway's own map of an invented region."];
  if (has("warning")) parts.push(`Coloured bands give the seconds between the alert reaching people by ${primaryChannel} and the start of strong shaking (the S wave).`);
  if (has("blind-zone")) parts.push("In the blind zone the shaking arrives before any alert can.");
  if (has("intensity")) parts.push("Intensity bands show the expected strength of shaking; real shaking can be one class stronger or weaker.");
  if (has("alert-area")) parts.push("Only places inside the alert area receive the alert.");
  parts.push("Figures are estimates for planning and drills, not a forecast of any real event.");
  return parts.join(" ");
}
