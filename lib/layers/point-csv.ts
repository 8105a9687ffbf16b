import { z } from "zod";
import { FACILITY_KINDS, type FacilityKind } from "@/db/schema";
import { BboxBuilder } from "./bbox";
import { booleanCell, latCell, lonCell, textCell } from "./csv-fields";
import { readCsvRows, type CsvColumns } from "./csv-reader";
import { addRowIssues } from "./csv-row-issues";
import type { ReadLayerOptions } from "./grid-csv";
import { IssueCollector } from "./layer-file-error";
import { LAYER_LIMITS } from "./limits";
import type { FacilitiesLayer, FacilityFeature, ParsedLayer, StationRecord, StationsLayer } from "./parsed-layer";

export const STATION_COLUMNS: CsvColumns = { required: ["id", "lon", "lat"], optional: ["operating"] };
export const FACILITY_COLUMNS: CsvColumns = { required: ["name", "kind", "lon", "lat"], optional: [] };

/** Kinds a facility point may have; rail segments are lines and come as GeoJSON. */
export const POINT_FACILITY_KINDS = FACILITY_KINDS.filter((kind) => kind !== "rail");

/** "Care home", "care_home" and "CARE-HOME" all mean `care-home`. */
export function normaliseFacilityKind(text: string): string {
  return text.trim().toLowerCase().replace(/[\s_]+/g, "-");
}

/** A facility kind cell: one of the point kinds, with a pointer to GeoJSON for rail. */
export const pointFacilityKind = z.string().transform((raw, ctx): FacilityKind => {
  const kind = normaliseFacilityKind(raw);
  if ((POINT_FACILITY_KINDS as readonly string[]).includes(kind)) return kind as FacilityKind;
  const message =
    kind === "rail"
      ? "is rail: rail segments are lines, so upload them as GeoJSON LineStrings"
      : `"${raw.trim()}" is not a facility kind; use one of ${POINT_FACILITY_KINDS.join(", ")}`;
  ctx.addIssue({ code: "custom", message });
  return z.NEVER;
});

const stationRow = z.object({
  id: textCell("station id", 32).pipe(z.string().regex(/^[A-Za-z0-9._-]+$/, "may hold only letters, digits, '.', '_' and '-'")),
  lon: lonCell,
  lat: latCell,
  operating: booleanCell(true).optional().transform((operating) => operating ?? true),
});

const facilityRow = z.object({ name: textCell("name", 200), kind: pointFacilityKind, lon: lonCell, lat: latCell });

/**
 * Reads a station CSV: `id,lon,lat` and an optional `operating` (true/false, yes/no, 1/0; empty = operating).
 * Station ids must be unique. Throws `LayerFileError` listing bad rows.
 */
export async function readStationsCsv(text: string, options: ReadLayerOptions = {}): Promise<StationsLayer & ParsedLayer> {
  const issues = new IssueCollector();
  const stations: StationRecord[] = [];
  const firstRowById = new Map<string, number>();
  const bbox = new BboxBuilder();
  const { rowCount } = await readCsvRows(text, {
    columns: STATION_COLUMNS,
    limits: options.limits ?? LAYER_LIMITS.stations,
    issues,
    onProgress: options.onProgress,
    onRow: (raw, rowNumber) => {
      const parsed = stationRow.safeParse(raw);
      if (!parsed.success) return addRowIssues(issues, parsed.error, raw, rowNumber);
      const { id, lon, lat, operating } = parsed.data;
      const first = firstRowById.get(id);
      if (first !== undefined) return issues.add(`row ${rowNumber}, column id`, `"${id}" is already used by row ${first}; station ids must be unique`);
      firstRowById.set(id, rowNumber);
      stations.push({ code: id, lon, lat, operating });
      bbox.add(lon, lat);
    },
  });
  issues.throwIfAny("rows");
  return { kind: "stations", rowCount, bbox: bbox.build(), stations };
}

/**
 * Reads a facility CSV: `name,kind,lon,lat`, points only (school, hospital, care-home, utility, other).
 * Throws `LayerFileError` listing bad rows.
 */
export async function readFacilitiesCsv(text: string, options: ReadLayerOptions = {}): Promise<FacilitiesLayer & ParsedLayer> {
  const issues = new IssueCollector();
  const facilities: FacilityFeature[] = [];
  const bbox = new BboxBuilder();
  const { rowCount } = await readCsvRows(text, {
    columns: FACILITY_COLUMNS,
    limits: options.limits ?? LAYER_LIMITS.facilities,
    issues,
    onProgress: options.onProgress,
    onRow: (raw, rowNumber) => {
      const parsed = facilityRow.safeParse(raw);
      if (!parsed.success) return addRowIssues(issues, parsed.error, raw, rowNumber);
      const { name, kind, lon, lat } = parsed.data;
      facilities.push({ name, kind, geometry: { type: "Point", coordinates: [lon, lat] } });
      bbox.add(lon, lat);
    },
  });
  issues.throwIfAny("rows");
  return { kind: "facilities", rowCount, bbox: bbox.build(), facilities };
}
