/**
 * Paints a composed map sheet into a one-page PDF with pdf-lib: the map as a PNG image scaled into
 * its frame, every text as real text in Source Sans 3, legends and marks as vector paths.
 */
import { PDFDocument, rgb } from "pdf-lib";
import { embedLeewayFonts, type PdfFonts } from "../pdf/fonts";
import { fontSafeText } from "../pdf/text";
import { hexToUnitRgb } from "./hex-colour";
import type { FontWeight, Paint, SheetDrawing } from "./primitives";
import type { SheetFonts } from "./compose-sheet";

const colour = (hex: string) => rgb(...hexToUnitRgb(hex));

/** Text measuring and font-safe spelling from embedded PDF fonts. */
export function pdfSheetFonts(fonts: PdfFonts): SheetFonts {
  return {
    widthPt: (text: string, weight: FontWeight, sizePt: number) => fonts[weight].widthOfTextAtSize(text, sizePt),
    safe: (text: string, weight: FontWeight) => fontSafeText(fonts[weight], text),
  };
}

/** A PDF document with Leeway's fonts embedded, ready for `paintSheetPdf`. */
export async function createSheetDocument(readFont: (file: string) => Promise<Uint8Array>): Promise<{ doc: PDFDocument; fonts: PdfFonts }> {
  const doc = await PDFDocument.create();
  return { doc, fonts: await embedLeewayFonts(doc, readFont) };
}

const paintOf = (p: Paint | undefined) => (p ? { color: colour(p.hex), opacity: p.opacity ?? 1 } : undefined);

/** pdf-lib's fill and border options for a filled and/or stroked shape (no stroke: no border). */
function shapePaint(shape: { fill?: Paint; stroke?: Paint; strokeWidthPt?: number }) {
  const fill = paintOf(shape.fill);
  const stroke = paintOf(shape.stroke);
  return {
    color: fill?.color,
    opacity: fill?.opacity,
    borderColor: stroke?.color,
    borderOpacity: stroke?.opacity,
    borderWidth: stroke ? (shape.strokeWidthPt ?? 0.5) : 0,
  };
}

/** Draws the sheet on a new page of `doc` and returns the PDF's bytes. */
export async function paintSheetPdf(doc: PDFDocument, fonts: PdfFonts, drawing: SheetDrawing, mapPng: Uint8Array, createdAt: Date): Promise<Uint8Array> {
  doc.setTitle(drawing.title);
  doc.setSubject("Leeway map sheet (planning scenario)");
  doc.setCreator("Leeway");
  doc.setProducer("Leeway");
  doc.setCreationDate(createdAt);
  doc.setModificationDate(createdAt);
  const page = doc.addPage([drawing.widthPt, drawing.heightPt]);
  const image = await doc.embedPng(mapPng);
  for (const p of drawing.primitives) {
    switch (p.type) {
      case "map-image":
        page.drawImage(image, { x: p.xPt, y: p.yPt, width: p.widthPt, height: p.heightPt });
        break;
      case "text":
        page.drawText(p.text, { x: p.xPt, y: p.yPt, size: p.sizePt, font: fonts[p.weight], color: colour(p.colour) });
        break;
      case "rect":
        page.drawRectangle({ x: p.xPt, y: p.yPt, width: p.widthPt, height: p.heightPt, ...shapePaint(p) });
        break;
      case "line":
        page.drawLine({ start: { x: p.x1Pt, y: p.y1Pt }, end: { x: p.x2Pt, y: p.y2Pt }, thickness: p.widthPt, color: colour(p.colour), dashArray: p.dashPt });
        break;
      case "circle":
        page.drawCircle({ x: p.xPt, y: p.yPt, size: p.radiusPt, ...shapePaint(p) });
        break;
      case "polygon": {
        // pdf-lib's SVG paths run with y down from the given origin: flip about the page's top.
        const [first, ...rest] = p.pointsPt;
        const path = `M ${first[0]} ${-first[1]} ${rest.map(([x, y]) => `L ${x} ${-y}`).join(" ")} Z`;
        page.drawSvgPath(path, { x: 0, y: 0, color: colour(p.fill.hex), opacity: p.fill.opacity ?? 1 });
        break;
      }
    }
  }
  return doc.save();
}
