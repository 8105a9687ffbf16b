/**
 * The map-sheet request the browser sends with the print map it rendered (POST …/exports/map-sheet,
 * multipart: `view` as JSON and, for a PDF, `image` as PNG). The view says what the print map
 * shows — centre, zoom, extent, and the colours of the scenario layers actually drawn — so the
 * sheet's legends match the map. Shared by the browser and the route handler.
 */
import { z } from "zod";
import { ORIENTATIONS, PAPERS } from "../pdf/paper";

/** Contour layers whose colours the browser reads from the drawn map (lib/geo's `layer` property). */
export const SHEET_LEGEND_LAYERS = ["warning", "intensity", "blind-zone", "alert-area"] as const;
export type SheetLegendLayer = (typeof SHEET_LEGEND_LAYERS)[number];

const lon = z.number().min(-180, "longitude must be within ±180°").max(360, "longitude must be at most 360° (past 180 across the antimeridian)");
const lat = z.number().min(-90, "latitude must be within ±90°").max(90, "latitude must be within ±90°");

export const mapSheetViewSchema = z
  .strictObject({
    paper: z.enum(PAPERS),
    orientation: z.enum(ORIENTATIONS),
    format: z.enum(["pdf", "png"]),
    centre: z.tuple([lon, lat]),
    zoom: z.number().min(0).max(24),
    /** [west, south, east, north] of the print map, degrees. */
    bounds: z.tuple([lon, lat, lon, lat]),
    legend: z
      .array(
        z.strictObject({
          layer: z.enum(SHEET_LEGEND_LAYERS),
          /** Band id (warning), class label (intensity), or "area" (blind zone, alert area). */
          key: z.string().min(1).max(40),
          fill: z.string().regex(/^#[0-9a-f]{6}$/i, "a colour must be #rrggbb"),
          opacity: z.number().min(0).max(1),
        }),
      )
      .max(80),
    /** Which of the workspace's point overlays the print map shows. */
    overlays: z.strictObject({ stations: z.boolean(), sources: z.boolean() }),
  })
  .superRefine((view, ctx) => {
    const [w, s, e, n] = view.bounds;
    if (!(e > w)) ctx.addIssue({ code: "custom", path: ["bounds", 2], message: "east must be greater than west" });
    if (!(n > s)) ctx.addIssue({ code: "custom", path: ["bounds", 3], message: "north must be greater than south" });
  });

export type MapSheetView = z.infer<typeof mapSheetViewSchema>;
