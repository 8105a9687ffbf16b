/**
 * What a map sheet is drawn from: a list of simple marks in PDF points, origin at the page's
 * bottom-left, y up (PDF's own space). The server paints them into a PDF with pdf-lib; the
 * browser paints the same list onto a canvas for the PNG, so both formats look alike.
 */

/** A colour as #rrggbb, with an opacity 0–1. */
export interface Paint {
  hex: string;
  opacity?: number;
}

export type FontWeight = "regular" | "semibold" | "bold";

export type SheetPrimitive =
  | { type: "text"; text: string; xPt: number; yPt: number; sizePt: number; weight: FontWeight; colour: string }
  | { type: "rect"; xPt: number; yPt: number; widthPt: number; heightPt: number; fill?: Paint; stroke?: Paint; strokeWidthPt?: number }
  | { type: "line"; x1Pt: number; y1Pt: number; x2Pt: number; y2Pt: number; colour: string; widthPt: number; dashPt?: [number, number] }
  | { type: "circle"; xPt: number; yPt: number; radiusPt: number; fill?: Paint; stroke?: Paint; strokeWidthPt?: number }
  | { type: "polygon"; pointsPt: [number, number][]; fill: Paint }
  | { type: "map-image"; xPt: number; yPt: number; widthPt: number; heightPt: number };

/** A whole sheet: page size and marks in drawing order. */
export interface SheetDrawing {
  widthPt: number;
  heightPt: number;
  primitives: SheetPrimitive[];
  /** Title, for the PDF's metadata. */
  title: string;
}
