/** What one can export, as recorded in the export log, with the words the log shows. */
export const EXPORT_KINDS = {
  "map-sheet-pdf": "Map sheet (PDF)",
  "map-sheet-png": "Map sheet (PNG)",
  "handout-pdf": "Drill handout (PDF)",
  "contours-geojson": "Contours and blind zone (GeoJSON)",
  "sites-csv": "Site values (CSV)",
  "exposure-csv": "Exposure table (CSV)",
  "scenario-file": "Scenario file (JSON)",
  "cap-exercise": "Exercise alert message (CAP 1.2)",
} as const;

export type ExportKind = keyof typeof EXPORT_KINDS;
