/**
 * Where things go on a map sheet, by paper and orientation, in PDF points (origin bottom-left).
 * Landscape: the map on the left, legends and notes in a column on the right. Portrait: the map on
 * top, legends and notes below it. The header (title and scenario summary) and the footer (caution
 * and "how it was made") span the page. The map frame's size fixes how much ground the sheet
 * shows at the screen's scale, so the extent adapts to the sheet.
 */
import { mmToPt, pageSizePt, type Orientation, type Paper } from "../pdf/paper";

export interface Box {
  xPt: number;
  yPt: number;
  widthPt: number;
  heightPt: number;
}

/** The regions of one sheet. */
export interface SheetLayout {
  paper: Paper;
  orientation: Orientation;
  widthPt: number;
  heightPt: number;
  header: Box;
  map: Box;
  panel: Box;
  footer: Box;
  /** Text sizes scale with the paper (A3 is A4 × √2). */
  scale: number;
}

const MARGIN_MM = 10;
const GAP_MM = 4;

/** The layout of a sheet. */
export function sheetLayout(paper: Paper, orientation: Orientation): SheetLayout {
  const { widthPt, heightPt } = pageSizePt(paper, orientation);
  const scale = paper === "a3" ? Math.SQRT2 : 1;
  const margin = mmToPt(MARGIN_MM);
  const gap = mmToPt(GAP_MM);
  const headerHeight = 70 * scale;
  const footerHeight = 66 * scale;
  const innerWidth = widthPt - 2 * margin;
  const header: Box = { xPt: margin, yPt: heightPt - margin - headerHeight, widthPt: innerWidth, heightPt: headerHeight };
  const footer: Box = { xPt: margin, yPt: margin, widthPt: innerWidth, heightPt: footerHeight };
  const bodyTop = header.yPt - gap;
  const bodyBottom = footer.yPt + footer.heightPt + gap;
  const bodyHeight = bodyTop - bodyBottom;
  if (orientation === "landscape") {
    const panelWidth = 200 * scale;
    const map: Box = { xPt: margin, yPt: bodyBottom, widthPt: innerWidth - panelWidth - gap, heightPt: bodyHeight };
    const panel: Box = { xPt: margin + map.widthPt + gap, yPt: bodyBottom, widthPt: panelWidth, heightPt: bodyHeight };
    return { paper, orientation, widthPt, heightPt, header, map, panel, footer, scale };
  }
  const panelHeight = 190 * scale;
  const map: Box = { xPt: margin, yPt: bodyBottom + panelHeight + gap, widthPt: innerWidth, heightPt: bodyHeight - panelHeight - gap };
  const panel: Box = { xPt: margin, yPt: bodyBottom, widthPt: innerWidth, heightPt: panelHeight };
  return { paper, orientation, widthPt, heightPt, header, map, panel, footer, scale };
}

/** CSS pixels per inch: the screen's nominal scale, kept on paper so the sheet shows the screen's scale. */
export const CSS_PX_PER_INCH = 96;

/** The print map's size in CSS pixels for a frame, and the pixel ratio that renders it at `dpi`. */
export function printMapSize(frame: Pick<Box, "widthPt" | "heightPt">, dpi: number): { cssWidth: number; cssHeight: number; pixelRatio: number } {
  return {
    cssWidth: Math.round((frame.widthPt / 72) * CSS_PX_PER_INCH),
    cssHeight: Math.round((frame.heightPt / 72) * CSS_PX_PER_INCH),
    pixelRatio: dpi / CSS_PX_PER_INCH,
  };
}

/** Resolution of the map image on the sheet (the issue asks for at least 150 dpi). */
export const MAP_SHEET_DPI = 200;
