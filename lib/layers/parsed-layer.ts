import type { LineString, MultiPolygon, Point, Polygon } from "geojson";
import type { FacilityKind } from "@/db/schema";

/** [west, south, east, north], degrees. */
export type Bbox = [number, number, number, number];

/** Population cells: centre lon/lat in degrees and people per cell. */
export interface PopulationLayer {
  kind: "population";
  lon: Float64Array;
  lat: Float64Array;
  people: Float64Array;
  /**
   * Districts named in the file's `district` column: per cell an index into `names`, −1 where the
   * cell is blank. Null when the file has no such column (districts then come from the district boundaries).
   */
  fileDistricts: { index: Int32Array; names: string[] } | null;
}

/** Site-condition cells: centre lon/lat in degrees and Vs30 in m/s. */
export interface SiteConditionLayer {
  kind: "site-condition";
  lon: Float64Array;
  lat: Float64Array;
  vs30Ms: Float64Array;
}

export interface DistrictFeature {
  name: string;
  geometry: Polygon | MultiPolygon;
}

export interface DistrictsLayer {
  kind: "districts";
  districts: DistrictFeature[];
}

export interface FacilityFeature {
  name: string;
  kind: FacilityKind;
  /** A Point, or a LineString for a rail segment. */
  geometry: Point | LineString;
}

export interface FacilitiesLayer {
  kind: "facilities";
  facilities: FacilityFeature[];
}

export interface StationRecord {
  code: string;
  lon: number;
  lat: number;
  operating: boolean;
}

export interface StationsLayer {
  kind: "stations";
  stations: StationRecord[];
}

/** The contents of a layer of any kind. */
export type LayerContent = PopulationLayer | SiteConditionLayer | DistrictsLayer | FacilitiesLayer | StationsLayer;

/** A layer file that passed every check, ready to preview or store. */
export type ParsedLayer = LayerContent & {
  /** Data rows or features in the file. */
  rowCount: number;
  bbox: Bbox;
};
