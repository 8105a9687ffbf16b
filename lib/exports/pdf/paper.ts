/** Paper sizes (ISO 216) in PDF points (1/72 in): A4 210 × 297 mm, A3 297 × 420 mm. */
export const PAPER_SIZES_PT = {
  a4: { widthPt: 595.28, heightPt: 841.89 },
  a3: { widthPt: 841.89, heightPt: 1190.55 },
} as const;

export const PAPERS = ["a4", "a3"] as const;
export type Paper = (typeof PAPERS)[number];

export const ORIENTATIONS = ["portrait", "landscape"] as const;
export type Orientation = (typeof ORIENTATIONS)[number];

/** Page width and height in pt for a paper and orientation. */
export function pageSizePt(paper: Paper, orientation: Orientation): { widthPt: number; heightPt: number } {
  const { widthPt, heightPt } = PAPER_SIZES_PT[paper];
  return orientation === "portrait" ? { widthPt, heightPt } : { widthPt: heightPt, heightPt: widthPt };
}

/** Millimetres to points. */
export const mmToPt = (mm: number) => (mm / 25.4) * 72;
