/**
 * Writes flowing content down A4/A3 pages with pdf-lib: wrapped paragraphs, two-column fact
 * lists and simple tables, starting a new page when the next block does not fit above the footer.
 * Every page gets the same footer (the caution and the "how it was made" line) and a page number.
 */
import { rgb, type PDFDocument, type PDFFont, type PDFPage, type RGB } from "pdf-lib";
import type { PdfFonts } from "./fonts";
import { fontSafeText, wrapText } from "./text";

/** Leeway's print colours (own values): ink, muted text, rules, and the exercise marking. */
export const PRINT_COLOURS = {
  ink: rgb(0x1f / 255, 0x2a / 255, 0x30 / 255),
  muted: rgb(0x4f / 255, 0x5d / 255, 0x65 / 255),
  rule: rgb(0xc4 / 255, 0xcd / 255, 0xd1 / 255),
  exercise: rgb(0x8a / 255, 0x4b / 255, 0x0f / 255),
  panel: rgb(0xf3 / 255, 0xf1 / 255, 0xeb / 255),
} as const;

/** A table column: header, width share (fractions of the text width) and alignment. */
export interface TableColumn {
  header: string;
  share: number;
  align?: "left" | "right";
}

export class PageWriter {
  private page!: PDFPage;
  private y = 0;
  readonly pages: PDFPage[] = [];

  constructor(
    private readonly doc: PDFDocument,
    readonly fonts: PdfFonts,
    private readonly size: { widthPt: number; heightPt: number },
    private readonly marginPt: number,
    private readonly footerHeightPt: number,
  ) {
    this.newPage();
  }

  get leftPt(): number {
    return this.marginPt;
  }

  get widthPt(): number {
    return this.size.widthPt - 2 * this.marginPt;
  }

  /** The current page, for drawings the writer does not know (a timeline). */
  get current(): PDFPage {
    return this.page;
  }

  /** Distance of the cursor from the page's bottom, pt. */
  get cursorPt(): number {
    return this.y;
  }

  newPage(): void {
    this.page = this.doc.addPage([this.size.widthPt, this.size.heightPt]);
    this.pages.push(this.page);
    this.y = this.size.heightPt - this.marginPt;
  }

  /** Starts a new page unless `heightPt` fits above the footer. */
  ensureSpace(heightPt: number): void {
    if (this.y - heightPt < this.marginPt + this.footerHeightPt) this.newPage();
  }

  space(pt: number): void {
    this.y -= pt;
  }

  /** Reserves `heightPt` and returns the top of the reserved box (pt from the bottom). */
  reserve(heightPt: number): number {
    this.ensureSpace(heightPt);
    const top = this.y;
    this.y -= heightPt;
    return top;
  }

  /** A wrapped paragraph. */
  paragraph(text: string, { font = this.fonts.regular, sizePt = 10, colour = PRINT_COLOURS.ink, leading = 1.3 }: { font?: PDFFont; sizePt?: number; colour?: RGB; leading?: number } = {}): void {
    const lines = wrapText(font, fontSafeText(font, text), sizePt, this.widthPt);
    const lineHeight = sizePt * leading;
    for (const line of lines) {
      this.ensureSpace(lineHeight);
      this.y -= lineHeight;
      this.page.drawText(line, { x: this.marginPt, y: this.y + (lineHeight - sizePt) / 2, size: sizePt, font, color: colour });
    }
  }

  /** Label–value pairs in two columns. */
  facts(pairs: readonly [string, string][], { labelWidthPt = 130, sizePt = 10 }: { labelWidthPt?: number; sizePt?: number } = {}): void {
    const lineHeight = sizePt * 1.3;
    for (const [label, value] of pairs) {
      const lines = wrapText(this.fonts.regular, fontSafeText(this.fonts.regular, value), sizePt, this.widthPt - labelWidthPt);
      this.ensureSpace(lineHeight * lines.length);
      this.page.drawText(fontSafeText(this.fonts.semibold, label), { x: this.marginPt, y: this.y - lineHeight + 3, size: sizePt, font: this.fonts.semibold, color: PRINT_COLOURS.muted });
      for (const line of lines) {
        this.y -= lineHeight;
        this.page.drawText(line, { x: this.marginPt + labelWidthPt, y: this.y + 3, size: sizePt, font: this.fonts.regular, color: PRINT_COLOURS.ink });
      }
      this.y -= 2;
    }
  }

  /** A table with a header row and rules between rows; cells are single lines. */
  table(columns: readonly TableColumn[], rows: readonly (readonly string[])[], { sizePt = 9.5 }: { sizePt?: number } = {}): void {
    const rowHeight = sizePt * 1.7;
    const widths = columns.map((c) => c.share * this.widthPt);
    const drawRow = (cells: readonly string[], font: PDFFont, colour: RGB) => {
      this.ensureSpace(rowHeight);
      this.y -= rowHeight;
      let x = this.marginPt;
      cells.forEach((cell, k) => {
        const text = fontSafeText(font, cell);
        const w = font.widthOfTextAtSize(text, sizePt);
        const cx = columns[k].align === "right" ? x + widths[k] - w - 4 : x + 2;
        this.page.drawText(text, { x: cx, y: this.y + rowHeight * 0.32, size: sizePt, font, color: colour });
        x += widths[k];
      });
      this.page.drawLine({ start: { x: this.marginPt, y: this.y }, end: { x: this.marginPt + this.widthPt, y: this.y }, thickness: 0.5, color: PRINT_COLOURS.rule });
    };
    drawRow(
      columns.map((c) => c.header),
      this.fonts.semibold,
      PRINT_COLOURS.muted,
    );
    for (const row of rows) drawRow(row, this.fonts.regular, PRINT_COLOURS.ink);
  }

  /** Draws the footer on every page: wrapped lines at the bottom and "page n of m". */
  footer(lines: readonly string[], sizePt = 7.5): void {
    const font = this.fonts.regular;
    this.pages.forEach((page, index) => {
      let y = this.marginPt + this.footerHeightPt - sizePt;
      page.drawLine({ start: { x: this.marginPt, y: y + sizePt + 4 }, end: { x: this.marginPt + this.widthPt, y: y + sizePt + 4 }, thickness: 0.5, color: PRINT_COLOURS.rule });
      for (const text of lines) {
        for (const line of wrapText(font, fontSafeText(font, text), sizePt, this.widthPt)) {
          page.drawText(line, { x: this.marginPt, y, size: sizePt, font, color: PRINT_COLOURS.muted });
          y -= sizePt * 1.25;
        }
      }
      const label = `Page ${index + 1} of ${this.pages.length}`;
      page.drawText(label, { x: this.marginPt + this.widthPt - font.widthOfTextAtSize(label, sizePt), y: this.marginPt - sizePt - 2, size: sizePt, font, color: PRINT_COLOURS.muted });
    });
  }
}
