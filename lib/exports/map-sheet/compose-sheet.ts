/**
 * Lays a map sheet out as marks (primitives.ts): header with title, scenario summary and the
 * date/version stamp; the map image in its frame with a north arrow, a scale bar and the frame's
 * edge longitudes; the legends and "what this map shows" in the panel; the caution and "how it was
 * made" in the footer. Pure: text is measured by the caller's fonts, so the PDF and the PNG share
 * one layout.
 */
import type { FontWeight, Paint, SheetDrawing, SheetPrimitive } from "./primitives";
import { kmPerPoint, scaleBarFor } from "./scale-bar";
import type { LegendSymbol, MapSheetContent } from "./sheet-content";
import type { Box, SheetLayout } from "./sheet-layout";

/** Text measuring and font-safe spelling from the fonts the sheet is drawn in. */
export interface SheetFonts {
  widthPt(text: string, weight: FontWeight, sizePt: number): number;
  /** The text with characters the font lacks spelled out. */
  safe(text: string, weight: FontWeight): string;
}

const INK = "#1f2a30";
const MUTED = "#4f5d65";
const RULE = "#c4cdd1";
const WHITE: Paint = { hex: "#ffffff", opacity: 0.88 };

/** Formats a longitude for the frame's edge labels: 151.2345° E. */
export function longitudeLabel(lonDeg: number): string {
  const wrapped = ((((lonDeg + 180) % 360) + 360) % 360) - 180;
  return `${Math.abs(wrapped).toFixed(4)}° ${wrapped < 0 ? "W" : "E"}`;
}

function wrap(fonts: SheetFonts, text: string, weight: FontWeight, sizePt: number, widthPt: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of fonts.safe(text, weight).split(/\s+/).filter(Boolean)) {
    const candidate = line ? `${line} ${word}` : word;
    if (line && fonts.widthPt(candidate, weight, sizePt) > widthPt) {
      lines.push(line);
      line = word;
    } else line = candidate;
  }
  if (line) lines.push(line);
  return lines;
}

class Marks {
  readonly list: SheetPrimitive[] = [];
  constructor(private readonly fonts: SheetFonts) {}

  width(text: string, weight: FontWeight, sizePt: number): number {
    return this.fonts.widthPt(this.fonts.safe(text, weight), weight, sizePt);
  }

  text(text: string, xPt: number, yPt: number, sizePt: number, weight: FontWeight = "regular", colour = INK, align: "left" | "right" = "left"): void {
    const safe = this.fonts.safe(text, weight);
    const x = align === "right" ? xPt - this.fonts.widthPt(safe, weight, sizePt) : xPt;
    this.list.push({ type: "text", text: safe, xPt: x, yPt, sizePt, weight, colour });
  }

  /** Wrapped lines from `topPt` down; returns the y below the last line. */
  paragraph(text: string, box: { xPt: number; widthPt: number }, topPt: number, sizePt: number, weight: FontWeight = "regular", colour = INK, leading = 1.25): number {
    let y = topPt;
    for (const line of wrap(this.fonts, text, weight, sizePt, box.widthPt)) {
      y -= sizePt * leading;
      this.text(line, box.xPt, y + sizePt * (leading - 1), sizePt, weight, colour);
    }
    return y;
  }

  symbol(symbol: LegendSymbol, xPt: number, yPt: number, widthPt: number, heightPt: number): void {
    if (symbol.kind === "fill") {
      this.list.push({ type: "rect", xPt, yPt, widthPt, heightPt, fill: symbol.fill, stroke: symbol.stroke ?? { hex: RULE }, strokeWidthPt: 0.5 });
    } else if (symbol.kind === "point") {
      this.list.push({ type: "circle", xPt: xPt + widthPt / 2, yPt: yPt + heightPt / 2, radiusPt: symbol.radiusPt, fill: symbol.fill, stroke: symbol.stroke, strokeWidthPt: 1 });
    } else {
      this.list.push({ type: "line", x1Pt: xPt, y1Pt: yPt + heightPt / 2, x2Pt: xPt + widthPt, y2Pt: yPt + heightPt / 2, colour: symbol.colour, widthPt: symbol.widthPt, dashPt: symbol.dashPt });
    }
  }
}

function header(m: Marks, content: MapSheetContent, box: Box, s: number): void {
  const top = box.yPt + box.heightPt;
  m.text(content.title, box.xPt, top - 16 * s, 16 * s, "bold");
  const stampWidth = Math.max(...content.stamp.map((line) => m.width(line, "semibold", 8 * s)));
  let y = top - 16 * s - 4 * s;
  for (const line of content.summary) y = m.paragraph(line, { xPt: box.xPt, widthPt: box.widthPt - stampWidth - 12 * s }, y, 8 * s, "regular", MUTED, 1.2);
  let stampY = top - 9 * s;
  for (const line of content.stamp) {
    m.text(line, box.xPt + box.widthPt, stampY, 8 * s, line === content.stamp[0] ? "semibold" : "regular", MUTED, "right");
    stampY -= 8 * s * 1.3;
  }
}

function mapFrame(m: Marks, content: MapSheetContent, box: Box, s: number): void {
  m.list.push({ type: "map-image", ...box });
  m.list.push({ type: "rect", ...box, stroke: { hex: INK }, strokeWidthPt: 0.8 });

  // The frame's edge longitudes, just above the frame: the first starts at the left edge, the
  // second ends at the right edge (readers of the PDF find the frame from them).
  const [west, , east] = content.bounds;
  const edgeY = box.yPt + box.heightPt + 3 * s;
  m.text(longitudeLabel(west), box.xPt, edgeY, 6.5 * s, "regular", MUTED);
  m.text(longitudeLabel(east), box.xPt + box.widthPt, edgeY, 6.5 * s, "regular", MUTED, "right");

  // North arrow: the map is drawn north-up (the workspace disables rotation).
  const r = 11 * s;
  const cx = box.xPt + box.widthPt - r - 8 * s;
  const cy = box.yPt + box.heightPt - r - 8 * s;
  m.list.push({ type: "circle", xPt: cx, yPt: cy, radiusPt: r, fill: WHITE, stroke: { hex: RULE }, strokeWidthPt: 0.6 });
  m.list.push({ type: "polygon", pointsPt: [[cx, cy + r * 0.8], [cx + r * 0.34, cy - r * 0.1], [cx, cy + r * 0.08], [cx - r * 0.34, cy - r * 0.1]], fill: { hex: INK } });
  m.text("N", cx - m.width("N", "bold", 7 * s) / 2, cy - r * 0.72, 7 * s, "bold");

  // Scale bar at the frame's centre latitude, in a white box at the bottom left.
  const bar = scaleBarFor(kmPerPoint(west, east, box.widthPt, content.centreLatDeg), Math.min(140 * s, box.widthPt * 0.3));
  const pad = 6 * s;
  const barX = box.xPt + pad + 4 * s;
  const barY = box.yPt + pad + 12 * s;
  const barH = 3.5 * s;
  m.list.push({ type: "rect", xPt: box.xPt + pad, yPt: box.yPt + pad, widthPt: bar.lengthPt + 8 * s, heightPt: 26 * s, fill: WHITE });
  const half = bar.lengthPt / 2;
  m.list.push({ type: "rect", xPt: barX, yPt: barY, widthPt: half, heightPt: barH, fill: { hex: INK } });
  m.list.push({ type: "rect", xPt: barX + half, yPt: barY, widthPt: half, heightPt: barH, fill: { hex: "#ffffff" }, stroke: { hex: INK }, strokeWidthPt: 0.6 });
  // "0" starts where the bar starts and the length label ends where it ends.
  m.text("0", barX, barY - 8 * s, 7 * s, "regular", INK);
  m.text(bar.label, barX + bar.lengthPt, barY - 8 * s, 7 * s, "regular", INK, "right");
  m.text(`scale at ${Math.abs(content.centreLatDeg).toFixed(2)}° ${content.centreLatDeg < 0 ? "S" : "N"}`, barX, barY + barH + 3 * s, 6 * s, "regular", MUTED);
}

function panel(m: Marks, fonts: SheetFonts, content: MapSheetContent, box: Box, s: number): void {
  const columnWidth = Math.min(box.widthPt, 200 * s);
  const columns = Math.max(1, Math.floor((box.widthPt + 10 * s) / (columnWidth + 10 * s)));
  const rowHeight = 11.5 * s;
  let column = 0;
  let y = box.yPt + box.heightPt;
  const x = () => box.xPt + column * (columnWidth + 10 * s);
  const need = (h: number) => {
    if (y - h < box.yPt && column + 1 < columns) {
      column++;
      y = box.yPt + box.heightPt;
    }
  };
  for (const group of content.legend) {
    need(rowHeight * 3);
    y = m.paragraph(group.title, { xPt: x(), widthPt: columnWidth }, y, 8.5 * s, "semibold", INK, 1.2) - 3 * s;
    for (const item of group.items) {
      need(rowHeight);
      y -= rowHeight;
      m.symbol(item.symbol, x(), y + 1.5 * s, 16 * s, 8 * s);
      m.text(item.label, x() + 21 * s, y + 2.5 * s, 7.5 * s);
    }
    y -= 5 * s;
  }
  const noteLines = wrap(fonts, content.note, "regular", 7.5 * s, columnWidth).length;
  need(12 * s + noteLines * 7.5 * s * 1.25);
  y -= 10 * s;
  m.text("What this map shows", x(), y, 8.5 * s, "semibold");
  y -= 2 * s;
  m.paragraph(content.note, { xPt: x(), widthPt: columnWidth }, y, 7.5 * s, "regular", MUTED);
}

function footer(m: Marks, content: MapSheetContent, box: Box, s: number): void {
  const top = box.yPt + box.heightPt;
  m.list.push({ type: "line", x1Pt: box.xPt, y1Pt: top, x2Pt: box.xPt + box.widthPt, y2Pt: top, colour: RULE, widthPt: 0.5 });
  const y = m.paragraph(content.caution, box, top - 2 * s, 7.5 * s, "semibold", INK);
  m.paragraph(`How it was made: ${content.howItWasMade}`, box, y - 2 * s, 6.5 * s, "regular", MUTED);
}

/** The marks of a map sheet. */
export function composeMapSheet(content: MapSheetContent, layout: SheetLayout, fonts: SheetFonts): SheetDrawing {
  const m = new Marks(fonts);
  const s = layout.scale;
  header(m, content, layout.header, s);
  mapFrame(m, content, layout.map, s);
  panel(m, fonts, content, layout.panel, s);
  footer(m, content, layout.footer, s);
  return { widthPt: layout.widthPt, heightPt: layout.heightPt, primitives: m.list, title: content.title };
}
