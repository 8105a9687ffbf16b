// Reads an exported PDF the way a reader would (PDF.js): pages, page sizes and the text on them.
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** One page: its size in pt and its text items with their positions (pt from the bottom-left). */
export interface PdfPageText {
  widthPt: number;
  heightPt: number;
  items: { text: string; xPt: number; yPt: number; widthPt: number }[];
  text: string;
}

/** Every page of a PDF with its text. */
export async function readPdf(bytes: Uint8Array): Promise<PdfPageText[]> {
  const doc = await getDocument({ data: bytes, isEvalSupported: false, useSystemFonts: false }).promise;
  const pages: PdfPageText[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const [x0, y0, x1, y1] = page.view;
    const content = await page.getTextContent();
    const items = content.items.flatMap((item) => ("str" in item ? [{ text: item.str, xPt: item.transform[4], yPt: item.transform[5], widthPt: item.width }] : []));
    pages.push({ widthPt: x1 - x0, heightPt: y1 - y0, items, text: items.map((i) => i.text).join(" ") });
  }
  await doc.destroy();
  return pages;
}
