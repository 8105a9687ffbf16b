/**
 * Places a horizontal timeline on a page: an axis in seconds with round ticks, a tick per event
 * and each label in the first lane where it does not touch another label (lanes stack upwards).
 * Pure: widths come from a measuring function, so the PDF and a test lay it out alike.
 */
import type { TimelineEvent } from "./timeline-events";

/** A placed label. */
export interface PlacedEvent {
  event: TimelineEvent;
  /** Where the event sits on the axis, pt from the page's left edge. */
  xPt: number;
  /** Left edge of the label, pt. */
  labelXPt: number;
  labelWidthPt: number;
  /** 0 is the lane nearest the axis. */
  lane: number;
}

/** The laid-out timeline. */
export interface TimelineLayout {
  /** The axis runs from 0 s to this, s. */
  endS: number;
  ticksS: number[];
  events: PlacedEvent[];
  lanes: number;
  /** s → pt. */
  xOf: (s: number) => number;
}

const NICE_STEPS_S = [1, 2, 5, 10, 15, 20, 30, 60, 120, 300];

/** A round step giving at most `maxTicks` intervals over `spanS`. */
export function tickStepS(spanS: number, maxTicks: number): number {
  return NICE_STEPS_S.find((step) => spanS / step <= maxTicks) ?? Math.ceil(spanS / maxTicks / 60) * 60;
}

/** Lays out `events` between `leftPt` and `rightPt`; labels are `measure(label)` pt wide and need `gapPt` between them. */
export function layoutTimeline(
  events: readonly TimelineEvent[],
  { leftPt, rightPt, measure, gapPt = 6, maxTicks = 10 }: { leftPt: number; rightPt: number; measure: (text: string) => number; gapPt?: number; maxTicks?: number },
): TimelineLayout {
  const lastS = Math.max(1, ...events.map((e) => e.atS));
  const step = tickStepS(lastS * 1.05, maxTicks);
  const endS = Math.ceil((lastS * 1.05) / step) * step;
  const xOf = (s: number) => leftPt + ((rightPt - leftPt) * s) / endS;
  const ticksS: number[] = [];
  for (let s = 0; s <= endS + 1e-9; s += step) ticksS.push(Math.round(s * 1000) / 1000);

  const laneEnds: number[] = [];
  const placed = events.map((event): PlacedEvent => {
    const xPt = xOf(event.atS);
    const labelWidthPt = measure(event.label);
    // Centred on its tick, but kept inside the axis's span.
    const labelXPt = Math.min(Math.max(leftPt, xPt - labelWidthPt / 2), rightPt - labelWidthPt);
    let lane = laneEnds.findIndex((end) => end + gapPt <= labelXPt);
    if (lane < 0) {
      lane = laneEnds.length;
      laneEnds.push(-Infinity);
    }
    laneEnds[lane] = labelXPt + labelWidthPt;
    return { event, xPt, labelXPt, labelWidthPt, lane };
  });
  return { endS, ticksS, events: placed, lanes: laneEnds.length, xOf };
}
