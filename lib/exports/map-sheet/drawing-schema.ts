/** The composed sheet as the browser receives it for a PNG, checked before it is painted (STYLE.md §3). */
import { z } from "zod";

const paint = z.object({ hex: z.string().regex(/^#[0-9a-f]{6}$/i), opacity: z.number().min(0).max(1).optional() });
const weight = z.enum(["regular", "semibold", "bold"]);
const n = z.number().finite();

const primitive = z.discriminatedUnion("type", [
  z.object({ type: z.literal("text"), text: z.string(), xPt: n, yPt: n, sizePt: n, weight, colour: z.string() }),
  z.object({ type: z.literal("rect"), xPt: n, yPt: n, widthPt: n, heightPt: n, fill: paint.optional(), stroke: paint.optional(), strokeWidthPt: n.optional() }),
  z.object({ type: z.literal("line"), x1Pt: n, y1Pt: n, x2Pt: n, y2Pt: n, colour: z.string(), widthPt: n, dashPt: z.tuple([n, n]).optional() }),
  z.object({ type: z.literal("circle"), xPt: n, yPt: n, radiusPt: n, fill: paint.optional(), stroke: paint.optional(), strokeWidthPt: n.optional() }),
  z.object({ type: z.literal("polygon"), pointsPt: z.array(z.tuple([n, n])).min(3), fill: paint }),
  z.object({ type: z.literal("map-image"), xPt: n, yPt: n, widthPt: n, heightPt: n }),
]);

/** POST …/exports/map-sheet's answer for a PNG sheet. */
export const sheetDrawingResponseSchema = z.object({
  drawing: z.object({ widthPt: n.positive(), heightPt: n.positive(), title: z.string(), primitives: z.array(primitive) }),
  filename: z.string().regex(/^[a-z0-9.-]+$/),
});
