/**
 * The fonts of Leeway's PDFs: Source Sans 3 (SIL Open Font License, fonts/LICENSE-source-sans-3.txt),
 * the same family as the app. The WOFF files are embedded, not the WOFF2 ones: fontkit subsets
 * both, but its WOFF2 subsets came out four times larger for the same text; WOFF tables are plain
 * zlib streams. Subsetting keeps only the glyphs a document uses.
 */
import fontkit from "@pdf-lib/fontkit";
import type { PDFDocument, PDFFont } from "pdf-lib";

/** The font files by weight, in fonts/. */
export const PDF_FONT_FILES = {
  regular: "source-sans-3-latin-400-normal.woff",
  semibold: "source-sans-3-latin-600-normal.woff",
  bold: "source-sans-3-latin-700-normal.woff",
} as const;

export type PdfFontWeight = keyof typeof PDF_FONT_FILES;
export type PdfFonts = Record<PdfFontWeight, PDFFont>;

/** Embeds the three weights; `readFont` returns a file's bytes (from disk on the server). */
export async function embedLeewayFonts(doc: PDFDocument, readFont: (file: string) => Promise<Uint8Array>): Promise<PdfFonts> {
  doc.registerFontkit(fontkit);
  const entries = await Promise.all(
    (Object.entries(PDF_FONT_FILES) as [PdfFontWeight, string][]).map(async ([weight, file]) => [weight, await doc.embedFont(await readFont(file), { subset: true })] as const),
  );
  return Object.fromEntries(entries) as PdfFonts;
}
