/** The CLI's input files: scenario JSON, sites, population and Vs30 CSVs. */
import { readFileSync } from "node:fs";
import { basename } from "node:path";
import { pathToFileURL } from "node:url";
import type { PopulationCells, SiteInput, Vs30Cells } from "@/lib/geo";
import { registerGroundMotionModel } from "@/lib/geo";
import type { GroundMotionModel } from "@/lib/geo/ground-motion/types";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";
import { CliError } from "./cli-error";
import { jsonErrorOffset } from "./json-error-offset";
import { numberColumn, readCsv, textColumn } from "./read-csv";

/** Line and column of a character offset, for JSON syntax errors. */
function lineAndColumn(text: string, offset: number): string {
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  return `line ${line}, column ${offset - before.lastIndexOf("\n")}`;
}

/** Reads and validates a scenario file; problems name the file and the JSON path. */
export function readScenarioFile(path: string): Scenario {
  const file = basename(path);
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch {
    throw new CliError(`cannot read ${path}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    const offset = jsonErrorOffset(text);
    const where = offset >= 0 ? ` (${lineAndColumn(text, offset)})` : "";
    throw new CliError(`${file}: not valid JSON${where}: ${(error as Error).message}`);
  }
  const parsed = parseScenario(json);
  if (!parsed.ok) {
    throw new CliError(
      `${file}: the scenario is not valid (${parsed.issues.length} problem${parsed.issues.length === 1 ? "" : "s"})`,
      parsed.issues.map((i) => `${file} ${i.path}: ${i.message}`),
    );
  }
  return parsed.scenario;
}

/** Sites CSV: `id,lon,lat`, optional `vs30` (m/s; an empty cell takes the scenario's site conditions). */
export function readSitesCsv(path: string): SiteInput[] {
  const { rows, values } = readCsv(path, {
    id: textColumn("id", true),
    lon: numberColumn("lon", true, -180, 180, "°"),
    lat: numberColumn("lat", true, -90, 90, "°"),
    vs30: numberColumn("vs30", false, 50, 4000, " m/s"),
  });
  return Array.from({ length: rows }, (_, i) => ({
    id: values.id![i],
    lon: values.lon![i],
    lat: values.lat![i],
    ...(values.vs30 && !Number.isNaN(values.vs30[i]) ? { vs30: values.vs30[i] } : {}),
  }));
}

/** Population CSV: `lon,lat,population`, optional `district` (names; empty = no district). */
export function readPopulationCsv(path: string): PopulationCells {
  const { values } = readCsv(path, {
    lon: numberColumn("lon", true, -180, 180, "°"),
    lat: numberColumn("lat", true, -90, 90, "°"),
    population: numberColumn("population", true, 0, 1e9, " people"),
    district: textColumn("district", false),
  });
  const cells: PopulationCells = { lon: Float64Array.from(values.lon!), lat: Float64Array.from(values.lat!), population: Float64Array.from(values.population!) };
  if (values.district) {
    const names = [...new Set(values.district.filter((d) => d !== ""))].sort((a, b) => a.localeCompare(b));
    const index = new Map(names.map((n, i) => [n, i]));
    cells.district = Int32Array.from(values.district, (d) => (d === "" ? -1 : (index.get(d) ?? -1)));
    cells.districtNames = names;
  }
  return cells;
}

/** Vs30 grid CSV (the site-condition upload layout): `lon,lat,vs30`. */
export function readVs30Csv(path: string): Vs30Cells {
  const { values } = readCsv(path, {
    lon: numberColumn("lon", true, -180, 180, "°"),
    lat: numberColumn("lat", true, -90, 90, "°"),
    vs30: numberColumn("vs30", true, 50, 4000, " m/s"),
  });
  return { lon: Float64Array.from(values.lon!), lat: Float64Array.from(values.lat!), vs30Ms: Float64Array.from(values.vs30!) };
}

/** Imports an ES module whose default (or `model`) export is a ground-motion model, and registers it. */
export async function registerModelModule(path: string): Promise<void> {
  let exported: { default?: GroundMotionModel; model?: GroundMotionModel };
  try {
    exported = await import(pathToFileURL(path).href);
  } catch (error) {
    throw new CliError(`cannot load ground-motion module ${path}: ${(error as Error).message}`);
  }
  const model = exported.default ?? exported.model;
  if (!model || typeof model.id !== "string" || typeof model.prepare !== "function") {
    throw new CliError(`${basename(path)}: the module must export a ground-motion model (id, prepare, …) as default or "model"`);
  }
  registerGroundMotionModel(model);
}

/** The `--computed-at` time as ISO 8601 (default now; SOURCE_DATE_EPOCH seconds when set, for reproducible runs). */
export function computedAtOption(value: string | true | undefined): string {
  if (typeof value === "string") {
    const time = Date.parse(value);
    if (Number.isNaN(time)) throw new CliError(`--computed-at must be an ISO 8601 time, got "${value}"`);
    return new Date(time).toISOString();
  }
  const epoch = process.env.SOURCE_DATE_EPOCH;
  if (epoch !== undefined && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString();
  return new Date().toISOString();
}
