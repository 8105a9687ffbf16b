/**
 * The drill handout as a PDF (A4 portrait, one or two pages): the exercise marking, the site's
 * figures, warning seconds per channel, the protective actions that fit, a horizontal timeline of
 * labelled events, and on every page the caution and the "how it was made" line. Text is real text
 * in Source Sans 3, so it can be searched, copied and read aloud.
 */
import { PDFDocument, type PDFPage } from "pdf-lib";
import { embedLeewayFonts, type PdfFonts } from "../pdf/fonts";
import { PageWriter, PRINT_COLOURS } from "../pdf/page-writer";
import { pageSizePt } from "../pdf/paper";
import { fontSafeText, wrapText } from "../pdf/text";
import type { HandoutContent } from "./handout-content";
import { layoutTimeline, type TimelineLayout } from "./timeline-layout";

const MARGIN_PT = 42;
const LABEL_SIZE_PT = 8;
const LANE_HEIGHT_PT = 13;

/** Height of a timeline with `lanes` label lanes, pt: labels above the axis, tick labels and a key below. */
const timelineHeightPt = (lanes: number) => 10 + lanes * LANE_HEIGHT_PT + 8 + 30;

/** Draws a laid-out timeline in a box whose top is `topPt`. */
function drawTimeline(page: PDFPage, fonts: PdfFonts, layout: TimelineLayout, leftPt: number, widthPt: number, topPt: number): void {
  const font = fonts.regular;
  const axisY = topPt - 10 - layout.lanes * LANE_HEIGHT_PT - 8;
  page.drawLine({ start: { x: leftPt, y: axisY }, end: { x: leftPt + widthPt, y: axisY }, thickness: 1, color: PRINT_COLOURS.ink });
  for (const t of layout.ticksS) {
    const x = layout.xOf(t);
    page.drawLine({ start: { x, y: axisY }, end: { x, y: axisY - 4 }, thickness: 0.6, color: PRINT_COLOURS.muted });
    const label = `${t} s`;
    page.drawText(label, { x: x - font.widthOfTextAtSize(label, 7) / 2, y: axisY - 13, size: 7, font, color: PRINT_COLOURS.muted });
  }
  for (const placed of layout.events) {
    const labelY = axisY + 8 + placed.lane * LANE_HEIGHT_PT;
    const colour = placed.event.kind === "site" ? PRINT_COLOURS.exercise : PRINT_COLOURS.ink;
    page.drawLine({ start: { x: placed.xPt, y: axisY }, end: { x: placed.xPt, y: labelY - 2 }, thickness: 0.6, color: colour });
    page.drawCircle({ x: placed.xPt, y: axisY, size: 2.2, color: colour });
    page.drawText(fontSafeText(font, placed.event.label), { x: placed.labelXPt, y: labelY, size: LABEL_SIZE_PT, font, color: colour });
  }
  page.drawText(fontSafeText(font, "Seconds after the earthquake starts. Dark: the alert system; brown: at the site."), {
    x: leftPt,
    y: axisY - 26,
    size: 7.5,
    font,
    color: PRINT_COLOURS.muted,
  });
}

/** The handout PDF's bytes. `readFont` returns a font file's bytes (fonts/). */
export async function renderHandoutPdf(content: HandoutContent, readFont: (file: string) => Promise<Uint8Array>, createdAt: Date): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(content.title);
  doc.setSubject("Leeway drill handout (exercise material)");
  doc.setCreator("Leeway");
  doc.setProducer("Leeway");
  doc.setCreationDate(createdAt);
  doc.setModificationDate(createdAt);
  const fonts = await embedLeewayFonts(doc, readFont);
  const size = pageSizePt("a4", "portrait");
  const footerLines = [content.caution, `How it was made: ${content.howItWasMade}`];
  const footerHeightPt = footerLines.reduce((h, text) => h + wrapText(fonts.regular, fontSafeText(fonts.regular, text), 7.5, size.widthPt - 2 * MARGIN_PT).length * 9.4, 14);
  const w = new PageWriter(doc, fonts, size, MARGIN_PT, footerHeightPt);

  w.paragraph("EXERCISE: planning scenario, not a real alert", { font: fonts.bold, sizePt: 9, colour: PRINT_COLOURS.exercise });
  w.space(4);
  w.paragraph(content.title, { font: fonts.bold, sizePt: 18 });
  w.paragraph(content.subtitle, { sizePt: 9.5, colour: PRINT_COLOURS.muted });
  w.space(10);
  w.paragraph(content.alertWords, { font: fonts.semibold, sizePt: 12 });
  w.space(6);
  w.facts(content.facts);
  w.space(12);

  w.paragraph("Warning seconds by channel", { font: fonts.semibold, sizePt: 12 });
  w.space(2);
  w.table(
    [
      { header: "Channel", share: 0.26 },
      { header: "Delivery", share: 0.14, align: "right" },
      { header: "Alert reaches site", share: 0.2, align: "right" },
      { header: "Warning", share: 0.14, align: "right" },
      { header: "", share: 0.26 },
    ],
    content.channels.map((c) => [
      `${c.channel}${c.primary ? " (primary)" : ""}`,
      `${c.deliveryS} s`,
      c.alertS === null ? "none" : `${c.alertS.toFixed(1)} s`,
      c.warningWholeS === null ? "–" : `${c.warningWholeS} s`,
      c.words,
    ]),
  );
  w.space(4);
  w.paragraph("Warning seconds are rounded down to whole seconds; times are seconds after the earthquake starts.", { sizePt: 8, colour: PRINT_COLOURS.muted });
  w.space(12);

  w.paragraph("Protective actions", { font: fonts.semibold, sizePt: 12 });
  w.paragraph(`An action fits when the warning on the primary channel is at least the reaction time (${content.reactionTimeS} s) plus the seconds it takes.`, {
    sizePt: 8.5,
    colour: PRINT_COLOURS.muted,
  });
  w.space(2);
  w.table(
    [
      { header: "Action", share: 0.42 },
      { header: "Takes", share: 0.12, align: "right" },
      { header: "", share: 0.46 },
    ],
    content.actions.map((a) => [a.name, `${a.secondsNeeded} s`, a.words]),
  );
  w.space(14);

  w.paragraph("Timeline", { font: fonts.semibold, sizePt: 12 });
  const layout = layoutTimeline(content.events, {
    leftPt: w.leftPt,
    rightPt: w.leftPt + w.widthPt,
    measure: (text) => fonts.regular.widthOfTextAtSize(fontSafeText(fonts.regular, text), LABEL_SIZE_PT),
  });
  const top = w.reserve(timelineHeightPt(layout.lanes));
  drawTimeline(w.current, fonts, layout, w.leftPt, w.widthPt, top);

  if (content.notes.length) {
    w.space(10);
    w.paragraph("Notes on this scenario", { font: fonts.semibold, sizePt: 10 });
    for (const note of content.notes) w.paragraph(`• ${note}`, { sizePt: 8, colour: PRINT_COLOURS.muted });
  }
  w.footer(footerLines);
  return doc.save();
}
