/**
 * The scenario being edited in the map workspace: a scenario file (lib/scenario) changed by one
 * action at a time, from the map (drags, clicks) or the forms. Invalid typed values are kept as
 * they are (NaN for text that is not a number), so the scenario schema names the field; nothing
 * is computed or saved until the draft parses.
 */
import type { z } from "zod";
import type { scenarioSchema } from "@/lib/scenario/schema";
import { dragRuptureEnd, type LonLat } from "./rupture-trace";

/** A scenario file as the forms hold it (the schema's input type). */
export type ScenarioDraft = z.input<typeof scenarioSchema>;
export type DraftSource = ScenarioDraft["source"];
export type DraftRupture = NonNullable<DraftSource["rupture"]>;
export type DraftStation = ScenarioDraft["stations"][number];
export type DraftChannel = NonNullable<ScenarioDraft["channels"]>[number];
export type DraftTiming = NonNullable<ScenarioDraft["timing"]>;
export type DraftAlert = NonNullable<ScenarioDraft["alert"]>;

/** One edit. */
export type DraftAction =
  | { type: "replace"; draft: ScenarioDraft }
  | { type: "move-source"; to: LonLat }
  | { type: "set-source"; patch: Partial<Omit<DraftSource, "rupture">> }
  | { type: "set-rupture"; rupture: DraftRupture | undefined }
  /** `fixed`: the other end, where it was when the drag began. */
  | { type: "drag-rupture-end"; which: "start" | "end"; to: LonLat; fixed: LonLat }
  | { type: "add-station"; at: LonLat }
  | { type: "move-station"; index: number; to: LonLat }
  | { type: "set-station"; index: number; patch: Partial<DraftStation> }
  | { type: "delete-station"; index: number }
  | { type: "set-timing"; patch: Partial<DraftTiming> }
  | { type: "set-alert"; patch: Partial<DraftAlert> }
  | { type: "set-channels"; channels: DraftChannel[] }
  | { type: "set-models"; patch: Partial<Pick<ScenarioDraft, "velocityModel" | "groundMotionModel" | "intensityScale" | "vs30" | "name">> }
  | { type: "set-area"; patch: Partial<ScenarioDraft["area"]> };

/** Coordinates from the map are kept to 4 decimals (about 10 m): finer than any planning figure needs. */
const roundDeg = (deg: number) => Math.round(deg * 1e4) / 1e4;
const roundTenth = (value: number) => Math.round(value * 10) / 10;
const at = (p: LonLat) => ({ lon: roundDeg(p.lon), lat: roundDeg(p.lat) });

/** A station id not yet used in the draft: N1, N2, … */
export function nextStationId(stations: readonly DraftStation[]): string {
  const taken = new Set(stations.map((s) => s.id));
  let n = 1;
  while (taken.has(`N${n}`)) n++;
  return `N${n}`;
}

/** Drops keys whose value is undefined, so "left to the default" stays absent from the file. */
function withoutUndefined<T extends object>(value: T): T {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
}

/** Applies one edit; the draft is never changed in place. */
export function applyDraftAction(draft: ScenarioDraft, action: DraftAction): ScenarioDraft {
  switch (action.type) {
    case "replace":
      return action.draft;
    case "move-source":
      return { ...draft, source: { ...draft.source, ...at(action.to) } };
    case "set-source":
      return { ...draft, source: withoutUndefined({ ...draft.source, ...action.patch }) };
    case "set-rupture":
      return { ...draft, source: withoutUndefined({ ...draft.source, rupture: action.rupture && withoutUndefined(action.rupture) }) };
    case "drag-rupture-end": {
      const rupture = draft.source.rupture;
      if (!rupture || rupture.lengthKm === undefined) return draft;
      const moved = dragRuptureEnd(rupture.mode ?? "unilateral", action.which, action.fixed, action.to);
      if (!moved) return draft;
      return {
        ...draft,
        source: { ...draft.source, ...at(moved.epicentre), rupture: { ...rupture, strikeDeg: roundTenth(moved.strikeDeg) % 360, lengthKm: Math.max(0.1, roundTenth(moved.lengthKm)) } },
      };
    }
    case "add-station":
      return { ...draft, stations: [...draft.stations, { id: nextStationId(draft.stations), ...at(action.at) }] };
    case "move-station":
      return { ...draft, stations: draft.stations.map((s, i) => (i === action.index ? { ...s, ...at(action.to) } : s)) };
    case "set-station":
      return { ...draft, stations: draft.stations.map((s, i) => (i === action.index ? withoutUndefined({ ...s, ...action.patch }) : s)) };
    case "delete-station":
      return { ...draft, stations: draft.stations.filter((_, i) => i !== action.index) };
    case "set-timing":
      return { ...draft, timing: withoutUndefined({ ...draft.timing, ...action.patch }) };
    case "set-alert":
      return { ...draft, alert: withoutUndefined({ ...draft.alert, ...action.patch }) };
    case "set-channels":
      return { ...draft, channels: action.channels };
    case "set-models":
      return withoutUndefined({ ...draft, ...action.patch });
    case "set-area":
      return { ...draft, area: { ...draft.area, ...action.patch } };
  }
}

/** Moves item `index` one place up (−1) or down (+1); the first channel is the primary one. */
export function moveItem<T>(items: readonly T[], index: number, by: -1 | 1): T[] {
  const target = index + by;
  if (target < 0 || target >= items.length) return [...items];
  const next = [...items];
  [next[index], next[target]] = [next[target], next[index]];
  return next;
}
