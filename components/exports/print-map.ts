/**
 * Renders the workspace's current map again at print size for a map sheet: a second MapLibre map,
 * off screen, with the live map's style (its layers, sources and data as drawn), centre and zoom,
 * at CSS size frame × 96 px per inch (the screen's scale on paper) and a pixel ratio that gives the
 * sheet's dpi. From it come the PNG, the extent, and the colours of the scenario layers drawn.
 */
import type { Map as MapLibreMap, MapGeoJSONFeature } from "maplibre-gl";
import { OVERLAY_SOURCE_IDS } from "@/components/map/layers";
import { printMapSize, type Box } from "@/lib/exports/map-sheet/sheet-layout";
import { SHEET_LEGEND_LAYERS, type MapSheetView, type SheetLegendLayer } from "@/lib/exports/map-sheet/sheet-request";

/** What the print map gives the sheet. */
export interface PrintMap {
  png: Blob;
  widthPx: number;
  heightPx: number;
  view: Pick<MapSheetView, "centre" | "zoom" | "bounds" | "legend" | "overlays">;
}

const IDLE_TIMEOUT_MS = 60_000;

/** "#rrggbb" and alpha from a MapLibre colour (its toString is "rgba(r,g,b,a)" in 0–255, not premultiplied) or a CSS hex. */
function toHex(value: unknown): { hex: string; alpha: number } | null {
  const text = typeof value === "string" ? value : value && typeof value === "object" ? String(value) : "";
  if (/^#[0-9a-f]{6}$/i.test(text)) return { hex: text.toLowerCase(), alpha: 1 };
  const m = /^rgba?\((\d+(?:\.\d+)?),\s*(\d+(?:\.\d+)?),\s*(\d+(?:\.\d+)?)(?:,\s*([\d.]+))?\)$/.exec(text);
  if (!m) return null;
  const hex = `#${[m[1], m[2], m[3]].map((c) => Math.round(Number(c)).toString(16).padStart(2, "0")).join("")}`;
  return { hex, alpha: m[4] === undefined ? 1 : Number(m[4]) };
}

const isLegendLayer = (value: unknown): value is SheetLegendLayer => SHEET_LEGEND_LAYERS.includes(value as SheetLegendLayer);

/** The key a contour feature is listed under: its band (warning), class (intensity) or "area". */
function legendKey(feature: MapGeoJSONFeature, layer: SheetLegendLayer): string | null {
  const p = feature.properties ?? {};
  if (layer === "warning") return typeof p.band === "string" ? p.band : null;
  if (layer === "intensity") return typeof p.intensityClass === "string" ? p.intensityClass : null;
  return "area";
}

/** The colours of the scenario layers the map drew, one entry per layer and key. */
function legendOf(map: MapLibreMap): MapSheetView["legend"] {
  const seen = new Map<string, MapSheetView["legend"][number]>();
  for (const feature of map.queryRenderedFeatures()) {
    const layerName = feature.properties?.layer;
    if (!isLegendLayer(layerName)) continue;
    // Areas are filled; the alert area is drawn as its outline, so its line colour is what the legend shows.
    const drawnAs = feature.layer.type === "fill" ? "fill" : feature.layer.type === "line" && layerName === "alert-area" ? "line" : null;
    if (!drawnAs) continue;
    const key = legendKey(feature, layerName);
    const paint = feature.layer.paint as Record<string, unknown> | undefined;
    const colour = toHex(paint?.[`${drawnAs}-color`]);
    if (!key || !colour) continue;
    const opacityValue = paint?.[`${drawnAs}-opacity`];
    const opacity = typeof opacityValue === "number" ? opacityValue : 1;
    const id = `${layerName}/${key}`;
    if (!seen.has(id)) seen.set(id, { layer: layerName, key, fill: colour.hex, opacity: Math.round(opacity * colour.alpha * 1000) / 1000 });
  }
  return [...seen.values()];
}

/** Renders `live` at the size of `frame` (pt) and `dpi`; the off-screen map is removed afterwards. */
export async function renderPrintMap(live: MapLibreMap, frame: Pick<Box, "widthPt" | "heightPt">, dpi: number): Promise<PrintMap> {
  const maplibregl = await import("maplibre-gl");
  const { cssWidth, cssHeight, pixelRatio } = printMapSize(frame, dpi);
  const container = document.createElement("div");
  // Off screen but laid out, so WebGL draws it at full size (CSSOM, not a style attribute, for the CSP).
  Object.assign(container.style, { position: "fixed", left: "-20000px", top: "0", width: `${cssWidth}px`, height: `${cssHeight}px` });
  container.setAttribute("aria-hidden", "true");
  container.dataset.testid = "print-map";
  document.body.append(container);
  const map = new maplibregl.Map({
    container,
    style: live.getStyle(),
    center: live.getCenter(),
    zoom: live.getZoom(),
    bearing: 0,
    pitch: 0,
    pixelRatio,
    maxCanvasSize: [8192, 8192],
    interactive: false,
    attributionControl: false,
    fadeDuration: 0,
    canvasContextAttributes: { preserveDrawingBuffer: true },
  });
  try {
    // Errors do not stop the print: the basemap has no files for empty tiles, and each missing one
    // is reported as an error while the map draws on. Only a map that never settles fails.
    let lastError = "";
    map.on("error", (event) => {
      lastError = event.error?.message ?? String(event);
    });
    await new Promise<void>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`the print map did not finish drawing within a minute${lastError ? ` (last error: ${lastError})` : ""}`)), IDLE_TIMEOUT_MS);
      map.once("idle", () => {
        clearTimeout(timer);
        resolve();
      });
    });
    const canvas = map.getCanvas();
    const png = await new Promise<Blob>((resolve, reject) => canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error("the print map could not be saved as PNG"))), "image/png"));
    const b = map.getBounds();
    const c = map.getCenter();
    const sources = new Set(map.queryRenderedFeatures().map((f) => f.source));
    return {
      png,
      widthPx: canvas.width,
      heightPx: canvas.height,
      view: {
        centre: [c.lng, c.lat],
        zoom: map.getZoom(),
        bounds: [b.getWest(), b.getSouth(), b.getEast(), b.getNorth()],
        legend: legendOf(map),
        overlays: { stations: sources.has(OVERLAY_SOURCE_IDS.stations), sources: sources.has(OVERLAY_SOURCE_IDS.sources) },
      },
    };
  } finally {
    map.remove();
    container.remove();
  }
}
