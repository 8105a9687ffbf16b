import { z } from "zod";
import { BboxBuilder } from "./bbox";
import { CellKeys } from "./cell-keys";
import { latCell, lonCell, numberCell } from "./csv-fields";
import { readCsvRows, type CsvColumns } from "./csv-reader";
import { addRowIssues } from "./csv-row-issues";
import { IssueCollector } from "./layer-file-error";
import { LAYER_LIMITS, type LayerLimits } from "./limits";
import type { ParsedLayer, PopulationLayer, SiteConditionLayer } from "./parsed-layer";

export interface ReadLayerOptions {
  limits?: LayerLimits;
  /** Share of the file checked so far, 0–1. */
  onProgress?: (fraction: number) => void;
}

export const POPULATION_COLUMNS: CsvColumns = { required: ["lon", "lat", "population"], optional: ["district"] };
export const SITE_CONDITION_COLUMNS: CsvColumns = { required: ["lon", "lat", "vs30"], optional: [] };

const populationRow = z.object({
  lon: lonCell,
  lat: latCell,
  population: numberCell.pipe(z.number().min(0, "must be 0 or more people")),
  district: z
    .string()
    .optional()
    .transform((name) => name?.trim() ?? "")
    .pipe(z.string().max(120, "is longer than 120 characters")),
});

/**
 * Vs30 in m/s. The bounds only catch values in the wrong unit (km/s gives 0.1–2): measured Vs30
 * runs from below 100 m/s in soft mud to about 3,000 m/s in hard rock (common practice, no source).
 */
const VS30_MIN_MS = 50;
const VS30_MAX_MS = 4000;
const siteConditionRow = z.object({
  lon: lonCell,
  lat: latCell,
  vs30: numberCell.pipe(
    z
      .number()
      .min(VS30_MIN_MS, `must be at least ${VS30_MIN_MS} m/s (Vs30 is in metres per second)`)
      .max(VS30_MAX_MS, `must be at most ${VS30_MAX_MS} m/s`),
  ),
});

/** Collects grid cells row by row, refusing cells given twice. */
class GridCollector {
  readonly lon: number[] = [];
  readonly lat: number[] = [];
  readonly value: number[] = [];
  readonly bbox = new BboxBuilder();
  private readonly keys = new CellKeys();

  constructor(private readonly issues: IssueCollector) {}

  /** Adds a cell; false (with an issue) when the same cell came earlier. */
  add(lonDeg: number, latDeg: number, value: number, rowNumber: number): boolean {
    const first = this.keys.seen(lonDeg, latDeg, rowNumber);
    if (first !== undefined) {
      this.issues.add(`row ${rowNumber}`, `is the same cell as row ${first} (${lonDeg}, ${latDeg}); each cell may appear once`);
      return false;
    }
    this.lon.push(lonDeg);
    this.lat.push(latDeg);
    this.value.push(value);
    this.bbox.add(lonDeg, latDeg);
    return true;
  }
}

/**
 * Reads a population grid CSV: `lon,lat,population` (degrees, people per cell) and an optional
 * `district` name per cell. Throws `LayerFileError` listing bad rows by row number and column.
 */
export async function readPopulationCsv(text: string, options: ReadLayerOptions = {}): Promise<PopulationLayer & ParsedLayer> {
  const issues = new IssueCollector();
  const cells = new GridCollector(issues);
  const districtIndex: number[] = [];
  const districtNames: string[] = [];
  const indexByName = new Map<string, number>();

  const { rowCount, columns } = await readCsvRows(text, {
    columns: POPULATION_COLUMNS,
    limits: options.limits ?? LAYER_LIMITS.population,
    issues,
    onProgress: options.onProgress,
    onRow: (raw, rowNumber) => {
      const parsed = populationRow.safeParse(raw);
      if (!parsed.success) return addRowIssues(issues, parsed.error, raw, rowNumber);
      const { lon, lat, population, district } = parsed.data;
      if (!cells.add(lon, lat, population, rowNumber)) return;
      let index = -1;
      if (district) {
        index = indexByName.get(district) ?? districtNames.length;
        if (index === districtNames.length) {
          indexByName.set(district, index);
          districtNames.push(district);
        }
      }
      districtIndex.push(index);
    },
  });
  issues.throwIfAny("rows");

  return {
    kind: "population",
    rowCount,
    bbox: cells.bbox.build(),
    lon: Float64Array.from(cells.lon),
    lat: Float64Array.from(cells.lat),
    people: Float64Array.from(cells.value),
    fileDistricts: columns.includes("district") ? { index: Int32Array.from(districtIndex), names: districtNames } : null,
  };
}

/** Reads a site-condition grid CSV: `lon,lat,vs30` (degrees, m/s). Throws `LayerFileError` listing bad rows. */
export async function readSiteConditionCsv(text: string, options: ReadLayerOptions = {}): Promise<SiteConditionLayer & ParsedLayer> {
  const issues = new IssueCollector();
  const cells = new GridCollector(issues);
  const { rowCount } = await readCsvRows(text, {
    columns: SITE_CONDITION_COLUMNS,
    limits: options.limits ?? LAYER_LIMITS["site-condition"],
    issues,
    onProgress: options.onProgress,
    onRow: (raw, rowNumber) => {
      const parsed = siteConditionRow.safeParse(raw);
      if (!parsed.success) return addRowIssues(issues, parsed.error, raw, rowNumber);
      cells.add(parsed.data.lon, parsed.data.lat, parsed.data.vs30, rowNumber);
    },
  });
  issues.throwIfAny("rows");
  return {
    kind: "site-condition",
    rowCount,
    bbox: cells.bbox.build(),
    lon: Float64Array.from(cells.lon),
    lat: Float64Array.from(cells.lat),
    vs30Ms: Float64Array.from(cells.value),
  };
}
