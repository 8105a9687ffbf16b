/**
 * The events of a drill handout's timeline, in seconds after the earthquake starts: origin,
 * detection, alert issued, the alert reaching the site through each channel, the S wave's arrival
 * and the moment the first protective action is done. Pure.
 */

/** One labelled moment. */
export interface TimelineEvent {
  id: string;
  label: string;
  atS: number;
  /** "system": what the alert system does; "site": what happens at the site. */
  kind: "system" | "site";
}

/** What the events are computed from. */
export interface TimelineInput {
  detectionS: number;
  triggerStations: number;
  alertIssuedS: number | null;
  /** Per channel, in the scenario's order (the first is primary). */
  channels: readonly { channel: string; alertS: number | null }[];
  sArrivalS: number;
  alerted: boolean;
  reactionTimeS: number;
  /** The action whose completion the timeline shows (the first of the workspace list). */
  action: { name: string; secondsNeeded: number } | null;
}

/** The events, ordered by time (ties keep the order above). */
export function timelineEvents(input: TimelineInput): TimelineEvent[] {
  const events: TimelineEvent[] = [
    { id: "origin", label: "Earthquake starts", atS: 0, kind: "system" },
    { id: "detection", label: `P wave at ${input.triggerStations} station${input.triggerStations === 1 ? "" : "s"}`, atS: input.detectionS, kind: "system" },
  ];
  if (input.alertIssuedS !== null) events.push({ id: "issued", label: "Alert issued", atS: input.alertIssuedS, kind: "system" });
  if (input.alerted) {
    for (const c of input.channels) if (c.alertS !== null) events.push({ id: `alert-${c.channel}`, label: `Alert by ${c.channel}`, atS: c.alertS, kind: "site" });
  }
  events.push({ id: "s-arrival", label: "Strong shaking (S wave)", atS: input.sArrivalS, kind: "site" });
  const primary = input.channels[0];
  if (input.alerted && input.action && primary?.alertS !== null && primary?.alertS !== undefined) {
    const doneS = primary.alertS + input.reactionTimeS + input.action.secondsNeeded;
    // Past the S arrival the action is still shown, so a drill sees how late it would end.
    const label = doneS <= input.sArrivalS ? `${input.action.name} done` : `${input.action.name} would end`;
    events.push({ id: "action-done", label, atS: doneS, kind: "site" });
  }
  return events.map((e, order) => ({ e, order })).sort((a, b) => a.e.atS - b.e.atS || a.order - b.order).map(({ e }) => e);
}
