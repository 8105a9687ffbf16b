/**
 * Makes a map sheet from the workspace's live map: renders the print map, then either sends it to
 * the server for the PDF, or asks the server for the composed sheet and paints the PNG here.
 */
import type { Map as MapLibreMap } from "maplibre-gl";
import { sheetDrawingResponseSchema } from "@/lib/exports/map-sheet/drawing-schema";
import { MAP_SHEET_DPI, sheetLayout } from "@/lib/exports/map-sheet/sheet-layout";
import type { MapSheetView } from "@/lib/exports/map-sheet/sheet-request";
import type { Orientation, Paper } from "@/lib/exports/pdf/paper";
import { downloadExport, ensureOk, saveBlob } from "./download";
import { paintSheetCanvas } from "./paint-sheet-canvas";
import { renderPrintMap } from "./print-map";

export interface SheetChoice {
  paper: Paper;
  orientation: Orientation;
  format: "pdf" | "png";
}

/** Produces and downloads the sheet; throws with the server's message when it refuses. */
export async function makeMapSheet(live: MapLibreMap, exportsUrl: string, choice: SheetChoice): Promise<void> {
  const layout = sheetLayout(choice.paper, choice.orientation);
  const printed = await renderPrintMap(live, layout.map, MAP_SHEET_DPI);
  const view: MapSheetView = { ...choice, ...printed.view };
  const url = `${exportsUrl}/map-sheet`;
  if (choice.format === "pdf") {
    const form = new FormData();
    form.set("view", JSON.stringify(view));
    form.set("image", printed.png, "map.png");
    await downloadExport(url, { method: "POST", body: form });
    return;
  }
  const response = await ensureOk(await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ view }) }));
  const { drawing, filename } = sheetDrawingResponseSchema.parse(await response.json());
  // Decoded without an <img>: the app's Content-Security-Policy allows no blob: images.
  const image = await createImageBitmap(printed.png);
  await document.fonts.ready;
  const canvas = paintSheetCanvas(drawing, image, MAP_SHEET_DPI, getComputedStyle(document.body).fontFamily);
  const png = await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("the sheet could not be saved as PNG"))), "image/png"));
  saveBlob(png, filename);
}
