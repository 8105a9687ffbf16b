/**
 * Paints a composed map sheet (lib/exports/map-sheet/primitives.ts) onto a canvas for the PNG:
 * the same marks the server paints into the PDF, with the print map's image in its frame. PDF
 * points are scaled to pixels at the sheet's resolution and y is flipped (PDF's y runs up).
 */
import type { FontWeight, Paint, SheetDrawing } from "@/lib/exports/map-sheet/primitives";

const WEIGHTS: Record<FontWeight, number> = { regular: 400, semibold: 600, bold: 700 };

function rgba({ hex, opacity = 1 }: Paint): string {
  const n = parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${opacity})`;
}

/** Draws `drawing` at `dpi` with `mapImage` in the map frame; `fontFamily` is the page's (Source Sans 3). */
export function paintSheetCanvas(drawing: SheetDrawing, mapImage: CanvasImageSource, dpi: number, fontFamily: string): HTMLCanvasElement {
  const scale = dpi / 72;
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(drawing.widthPt * scale);
  canvas.height = Math.round(drawing.heightPt * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("this browser cannot draw on a canvas");
  const X = (pt: number) => pt * scale;
  const Y = (pt: number) => (drawing.heightPt - pt) * scale;
  ctx.fillStyle = "#ffffff";
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  for (const p of drawing.primitives) {
    ctx.save();
    switch (p.type) {
      case "map-image":
        ctx.drawImage(mapImage, X(p.xPt), Y(p.yPt + p.heightPt), X(p.widthPt), p.heightPt * scale);
        break;
      case "text":
        ctx.font = `${WEIGHTS[p.weight]} ${p.sizePt * scale}px ${fontFamily}`;
        ctx.fillStyle = p.colour;
        ctx.textBaseline = "alphabetic";
        ctx.fillText(p.text, X(p.xPt), Y(p.yPt));
        break;
      case "rect":
        if (p.fill) {
          ctx.fillStyle = rgba(p.fill);
          ctx.fillRect(X(p.xPt), Y(p.yPt + p.heightPt), p.widthPt * scale, p.heightPt * scale);
        }
        if (p.stroke) {
          ctx.strokeStyle = rgba(p.stroke);
          ctx.lineWidth = (p.strokeWidthPt ?? 0.5) * scale;
          ctx.strokeRect(X(p.xPt), Y(p.yPt + p.heightPt), p.widthPt * scale, p.heightPt * scale);
        }
        break;
      case "line":
        ctx.strokeStyle = p.colour;
        ctx.lineWidth = p.widthPt * scale;
        if (p.dashPt) ctx.setLineDash(p.dashPt.map((d) => d * scale));
        ctx.beginPath();
        ctx.moveTo(X(p.x1Pt), Y(p.y1Pt));
        ctx.lineTo(X(p.x2Pt), Y(p.y2Pt));
        ctx.stroke();
        break;
      case "circle":
        ctx.beginPath();
        ctx.arc(X(p.xPt), Y(p.yPt), p.radiusPt * scale, 0, 2 * Math.PI);
        if (p.fill) {
          ctx.fillStyle = rgba(p.fill);
          ctx.fill();
        }
        if (p.stroke) {
          ctx.strokeStyle = rgba(p.stroke);
          ctx.lineWidth = (p.strokeWidthPt ?? 0.5) * scale;
          ctx.stroke();
        }
        break;
      case "polygon":
        ctx.beginPath();
        p.pointsPt.forEach(([x, y], i) => (i === 0 ? ctx.moveTo(X(x), Y(y)) : ctx.lineTo(X(x), Y(y))));
        ctx.closePath();
        ctx.fillStyle = rgba(p.fill);
        ctx.fill();
        break;
    }
    ctx.restore();
  }
  return canvas;
}
