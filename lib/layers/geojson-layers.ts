import type { MultiPolygon, Polygon } from "geojson";
import { BboxBuilder } from "./bbox";
import { checkAreaGeometry, checkLineGeometry, checkPointGeometry, type GeometryProblem } from "./geometry-checks";
import type { ReadLayerOptions } from "./grid-csv";
import { IssueCollector, LayerFileError } from "./layer-file-error";
import { LAYER_LIMITS, type LayerLimits } from "./limits";
import type { DistrictFeature, DistrictsLayer, FacilitiesLayer, FacilityFeature, ParsedLayer } from "./parsed-layer";
import { normaliseFacilityKind, POINT_FACILITY_KINDS } from "./point-csv";

interface RawFeature {
  type?: unknown;
  properties?: unknown;
  geometry?: unknown;
}

const BOM = "\uFEFF";
const MAX_NAME_CHARS = 200;

/** Parses the text as a GeoJSON FeatureCollection and returns its features, or throws a `LayerFileError`. */
function readFeatureCollection(text: string, limits: LayerLimits, expected: string): RawFeature[] {
  const body = text.startsWith(BOM) ? text.slice(1) : text;
  if (body.trim() === "") throw new LayerFileError(`The file is empty. Leeway expected a GeoJSON FeatureCollection of ${expected}. Nothing was saved.`);
  let json: unknown;
  try {
    json = JSON.parse(body);
  } catch (error) {
    throw new LayerFileError(`The file is not valid JSON (${(error as Error).message}). Nothing was saved.`);
  }
  const collection = json as { type?: unknown; features?: unknown };
  if (!collection || typeof collection !== "object" || collection.type !== "FeatureCollection" || !Array.isArray(collection.features)) {
    throw new LayerFileError(`The file is JSON but not a GeoJSON FeatureCollection (a "type": "FeatureCollection" with a "features" list of ${expected}). Nothing was saved.`);
  }
  if (collection.features.length === 0) throw new LayerFileError(`The FeatureCollection has no features. Nothing was saved.`);
  if (collection.features.length > limits.maxRows) {
    throw new LayerFileError(`The file has ${collection.features.length.toLocaleString("en")} features; Leeway accepts at most ${limits.maxRows.toLocaleString("en")} for this layer. Nothing was saved.`, {
      kind: "too-large",
    });
  }
  return collection.features as RawFeature[];
}

function properties(feature: RawFeature): Record<string, unknown> {
  return feature.properties && typeof feature.properties === "object" ? (feature.properties as Record<string, unknown>) : {};
}

/** "feature 3" or `feature 3 ("Harbourside")`: features count from 1 in file order. */
function featureLabel(index: number, name: unknown): string {
  return typeof name === "string" && name.trim() ? `feature ${index + 1} ("${name.trim().slice(0, 40)}")` : `feature ${index + 1}`;
}

function addProblems(issues: IssueCollector, label: string, problems: GeometryProblem[]): void {
  for (const problem of problems) issues.add(`${label}, ${problem.at}`, problem.message);
}

/** Reads `properties.name`: a non-empty text of at most 200 characters, or adds an issue. */
function readName(issues: IssueCollector, label: string, value: unknown): string | null {
  if (typeof value !== "string" || value.trim() === "") {
    issues.add(`${label}, properties.name`, "is missing; every feature needs a name");
    return null;
  }
  if (value.trim().length > MAX_NAME_CHARS) {
    issues.add(`${label}, properties.name`, `is longer than ${MAX_NAME_CHARS} characters`);
    return null;
  }
  return value.trim();
}

function addToBbox(bbox: BboxBuilder, coordinates: unknown): void {
  if (typeof coordinates === "number") return;
  if (Array.isArray(coordinates) && typeof coordinates[0] === "number") bbox.add(coordinates[0], coordinates[1] as number);
  else if (Array.isArray(coordinates)) for (const inner of coordinates) addToBbox(bbox, inner);
}

/**
 * Reads district boundaries: a GeoJSON FeatureCollection of Polygons or MultiPolygons, each with a
 * unique `name` property. Rings must be closed, positions [lon, lat] in range, and edges must not
 * cross. Throws `LayerFileError` naming each bad feature.
 */
export async function readDistrictsGeojson(text: string, options: ReadLayerOptions = {}): Promise<DistrictsLayer & ParsedLayer> {
  const features = readFeatureCollection(text, options.limits ?? LAYER_LIMITS.districts, "district Polygons or MultiPolygons with a name");
  const issues = new IssueCollector();
  const districts: DistrictFeature[] = [];
  const firstByName = new Map<string, number>();
  const bbox = new BboxBuilder();

  for (const [i, feature] of features.entries()) {
    const props = properties(feature);
    const label = featureLabel(i, props.name);
    const name = readName(issues, label, props.name);
    const problems = checkAreaGeometry(feature.geometry);
    addProblems(issues, label, problems);
    if (name !== null) {
      const first = firstByName.get(name);
      if (first !== undefined) issues.add(`${label}, properties.name`, `"${name}" is already the name of feature ${first + 1}; district names must be unique`);
      else firstByName.set(name, i);
    }
    if (name !== null && problems.length === 0) {
      const geometry = feature.geometry as Polygon | MultiPolygon;
      districts.push({ name, geometry: { type: geometry.type, coordinates: geometry.coordinates } as Polygon | MultiPolygon });
      addToBbox(bbox, geometry.coordinates);
    }
    if (i % 50 === 49) {
      options.onProgress?.((i + 1) / features.length);
      await new Promise((resolve) => setTimeout(resolve, 0));
    }
  }
  issues.throwIfAny("features");
  options.onProgress?.(1);
  return { kind: "districts", rowCount: features.length, bbox: bbox.build(), districts };
}

/** What is wrong with a Point facility's kind, or null when it is a point kind. */
function pointKindProblem(kind: string | undefined, raw: unknown): string | null {
  const allowed = POINT_FACILITY_KINDS.join(", ");
  if (kind === undefined) return `is missing; a facility point is one of ${allowed}`;
  if (kind === "rail") return `"rail" is for LineStrings (rail segments); a facility point is one of ${allowed}`;
  if (!(POINT_FACILITY_KINDS as readonly string[]).includes(kind)) return `"${String(raw)}" is not a facility kind; use one of ${allowed}`;
  return null;
}

/**
 * Reads facilities: a GeoJSON FeatureCollection of Points (school, hospital, care-home, utility, other)
 * and LineStrings (rail segments; `kind` "rail" or left out), each with a `name`. Throws `LayerFileError`
 * naming each bad feature.
 */
export async function readFacilitiesGeojson(text: string, options: ReadLayerOptions = {}): Promise<FacilitiesLayer & ParsedLayer> {
  const features = readFeatureCollection(text, options.limits ?? LAYER_LIMITS.facilities, "facility Points and rail LineStrings with a name and kind");
  const issues = new IssueCollector();
  const facilities: FacilityFeature[] = [];
  const bbox = new BboxBuilder();

  for (const [i, feature] of features.entries()) {
    const props = properties(feature);
    const label = featureLabel(i, props.name);
    const name = readName(issues, label, props.name);
    const geometry = (feature.geometry ?? {}) as { type?: unknown; coordinates?: unknown };
    const kind = typeof props.kind === "string" ? normaliseFacilityKind(props.kind) : undefined;

    if (geometry.type === "Point") {
      const problems = checkPointGeometry(geometry.coordinates);
      addProblems(issues, label, problems);
      const kindProblem = pointKindProblem(kind, props.kind);
      if (kindProblem) {
        issues.add(`${label}, properties.kind`, kindProblem);
      } else if (name !== null && problems.length === 0) {
        const [lon, lat] = geometry.coordinates as number[];
        facilities.push({ name, kind: kind as FacilityFeature["kind"], geometry: { type: "Point", coordinates: [lon, lat] } });
        bbox.add(lon, lat);
      }
    } else if (geometry.type === "LineString") {
      const problems = checkLineGeometry(geometry.coordinates);
      addProblems(issues, label, problems);
      if (kind !== undefined && kind !== "rail") {
        issues.add(`${label}, properties.kind`, `"${String(props.kind)}" is not rail; LineStrings are rail segments (kind "rail" or no kind)`);
      } else if (name !== null && problems.length === 0) {
        const coordinates = (geometry.coordinates as number[][]).map(([lon, lat]) => [lon, lat]);
        facilities.push({ name, kind: "rail", geometry: { type: "LineString", coordinates } });
        addToBbox(bbox, coordinates);
      }
    } else if (geometry.type === "MultiLineString") {
      issues.add(`${label}, geometry`, "is a MultiLineString; give each rail segment its own LineString feature");
    } else {
      issues.add(`${label}, geometry`, `must be a Point or a LineString, not ${JSON.stringify(geometry.type ?? null)}`);
    }
  }
  issues.throwIfAny("features");
  options.onProgress?.(1);
  return { kind: "facilities", rowCount: features.length, bbox: bbox.build(), facilities };
}
