/**
 * What a drill handout says about one site or facility, in Leeway's words: warning seconds per
 * channel, expected shaking, whether the site is alerted, which protective actions fit, and the
 * timeline. Pure: built from the engine's site result and the scenario's timeline.
 */
import type { SiteResult } from "@/lib/geo/sites";
import { actionFits } from "@/lib/geo/actions";
import { displayedWarningS } from "@/lib/geo/warning";
import { timelineEvents, type TimelineEvent } from "./timeline-events";

/** A protective action of the workspace list. */
export interface HandoutAction {
  name: string;
  secondsNeeded: number;
}

/** One delivery channel's row. */
export interface HandoutChannelRow {
  channel: string;
  primary: boolean;
  deliveryS: number;
  /** When the alert reaches the site, s after origin (null: no alert reaches it). */
  alertS: number | null;
  /** Whole seconds as planners see them (rounded down); null when no alert reaches it. */
  warningWholeS: number | null;
  words: string;
}

/** One action's row: fits on the primary channel when warning ≥ reaction + its seconds. */
export interface HandoutActionRow extends HandoutAction {
  fits: boolean;
  words: string;
}

/** The handout's content. */
export interface HandoutContent {
  title: string;
  subtitle: string;
  facts: [string, string][];
  alerted: boolean;
  alertWords: string;
  channels: HandoutChannelRow[];
  reactionTimeS: number;
  actions: HandoutActionRow[];
  events: TimelineEvent[];
  notes: readonly string[];
  caution: string;
  howItWasMade: string;
}

/** Everything the content is made from. */
export interface HandoutInput {
  site: { name: string; kind: string; result: SiteResult };
  scenario: { name: string; versionNumber: number; mw: number; depthKm: number; faultType: string; stationsOperating: number; stationsTotal: number };
  timeline: { detectionS: number; triggerStations: number; pWindowS: number; telemetryS: number; processingS: number };
  intensityScaleLabel: string;
  reactionTimeS: number;
  actions: readonly HandoutAction[];
  notes: readonly string[];
  caution: string;
  howItWasMade: string;
}

const seconds = (s: number) => `${s.toFixed(1)} s`;

function channelWords(warningWholeS: number | null): string {
  if (warningWholeS === null) return "no alert reaches the site";
  if (warningWholeS <= 0) return "shaking arrives first (blind zone)";
  return `${warningWholeS} s before strong shaking`;
}

/** Builds the handout's content for one site. */
export function handoutContent(input: HandoutInput): HandoutContent {
  const r = input.site.result;
  const s = input.scenario;
  const channels = r.byChannel.map((c, k): HandoutChannelRow => {
    const warningWholeS = c.warningS === null ? null : displayedWarningS(c.warningS);
    return { channel: c.channel, primary: k === 0, deliveryS: c.deliveryS, alertS: c.alertS, warningWholeS, words: r.alerted ? channelWords(warningWholeS) : "not alerted" };
  });
  const primaryWarningS = r.byChannel[0]?.warningS ?? null;
  const actions = input.actions.map((a): HandoutActionRow => {
    const fits = r.alerted && primaryWarningS !== null && actionFits(primaryWarningS, input.reactionTimeS, { id: a.name, seconds: a.secondsNeeded });
    const needed = input.reactionTimeS + a.secondsNeeded;
    const words = !r.alerted ? "no alert here: cannot be started in time" : fits ? `fits (needs ${needed} s with the reaction time)` : `does not fit (needs ${needed} s with the reaction time)`;
    return { ...a, fits, words };
  });
  const lat = `${Math.abs(r.lat).toFixed(4)}° ${r.lat < 0 ? "S" : "N"}`;
  const lon = `${Math.abs(r.lon).toFixed(4)}° ${r.lon < 0 ? "W" : "E"}`;
  const t = input.timeline;
  return {
    title: `Drill handout: ${input.site.name}`,
    subtitle: `Exercise material from the planning scenario "${s.name}", version ${s.versionNumber}. Not a forecast.`,
    facts: [
      ["Site", `${input.site.name} (${input.site.kind}), ${lat}, ${lon}`],
      ["Scenario earthquake", `Mw ${s.mw.toFixed(1)} ${s.faultType}, ${s.depthKm} km deep, ${r.epicentralKm.toFixed(1)} km from the site (epicentre)`],
      ["Station network", `${s.stationsOperating} of ${s.stationsTotal} stations operating; the alert needs the P wave at ${t.triggerStations}`],
      ["Alert timing", `P window ${seconds(t.pWindowS)}, telemetry ${seconds(t.telemetryS)}, processing ${seconds(t.processingS)}`],
      ["Expected shaking", `${input.intensityScaleLabel} ${r.intensityClass} (${r.intensity.toFixed(1)}); PGV ${r.pgvCms.toFixed(1)} cm/s, PGA ${r.pgaCms2.toFixed(0)} cm/s²; site Vs30 ${r.vs30Ms.toFixed(0)} m/s`],
      ["Strong shaking arrives", `${seconds(r.sArrivalS)} after the earthquake starts`],
    ],
    alerted: r.alerted,
    alertWords: r.alerted
      ? `Alerted: the scenario's alert goes to this site.`
      : r.alertIssuedS === null
        ? "Not alerted: no alert reaches this site."
        : "Not alerted: the site lies outside the alert area, so people here get no alert.",
    channels,
    reactionTimeS: input.reactionTimeS,
    actions,
    events: timelineEvents({
      detectionS: t.detectionS,
      triggerStations: t.triggerStations,
      alertIssuedS: r.alertIssuedS,
      channels: r.byChannel.map((c) => ({ channel: c.channel, alertS: c.alertS })),
      sArrivalS: r.sArrivalS,
      alerted: r.alerted,
      reactionTimeS: input.reactionTimeS,
      action: input.actions[0] ?? null,
    }),
    notes: input.notes,
    caution: input.caution,
    howItWasMade: input.howItWasMade,
  };
}
