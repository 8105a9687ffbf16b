/** What a map sheet says, before it is laid out (built on the server from the scenario version). */
import type { Paint } from "./primitives";

/** How a legend row's symbol is drawn. */
export type LegendSymbol =
  | { kind: "fill"; fill: Paint; stroke?: Paint }
  | { kind: "point"; fill: Paint; stroke: Paint; radiusPt: number }
  | { kind: "line"; colour: string; widthPt: number; dashPt?: [number, number] };

export interface LegendItem {
  label: string;
  symbol: LegendSymbol;
}

/** One legend block: a title naming what and in which unit, and its rows. */
export interface LegendGroup {
  title: string;
  items: LegendItem[];
}

/** The sheet's words and figures. */
export interface MapSheetContent {
  title: string;
  /** Source, Mw, depth; network; timing — one line each. */
  summary: string[];
  /** Right of the header: when it was made, which version, which Leeway. */
  stamp: string[];
  legend: LegendGroup[];
  /** "What this map shows", in plain words. */
  note: string;
  caution: string;
  howItWasMade: string;
  /** The print map's extent [west, south, east, north], degrees, and its centre latitude. */
  bounds: [number, number, number, number];
  centreLatDeg: number;
}
