import { buffer } from "@turf/turf";
import type { Feature, FeatureCollection, Geometry } from "geojson";
import { toLonLat } from "./frame";
import type { Region } from "./index";

/** Source-layer names of Leeway's basemap tiles; the map style (lib/map) refers to these. */
export const BASEMAP_LAYER_NAMES = ["shelf", "land", "districts", "district-boundaries", "district-labels", "rail", "towns"] as const;
export type BasemapLayerName = (typeof BASEMAP_LAYER_NAMES)[number];

/** Offshore bands drawn as paler water around the coast: outer edge distance from the shore, km. */
const SHELF_BANDS_KM = [25, 8] as const;

const feature = <G extends Geometry>(geometry: G, properties: Record<string, string | number>): Feature<G> => ({ type: "Feature", geometry, properties });

/**
 * The region as the GeoJSON layers the basemap tiles are cut from: the island, its shallow-water
 * bands, district areas, the boundaries between them and label points, the rail line and the towns (name, rank 1 = largest,
 * population).
 */
export function basemapLayers(region: Region): Record<BasemapLayerName, FeatureCollection> {
  const collection = (features: Feature[]): FeatureCollection => ({ type: "FeatureCollection", features });
  const land = feature(region.land, { name: region.name });
  const shelf = SHELF_BANDS_KM.map((km, band) => {
    const buffered = buffer(land, km, { units: "kilometers" });
    if (!buffered) throw new Error(`the ${km} km shelf band came out empty`);
    return feature(buffered.geometry, { band, outerKm: km });
  });
  return {
    shelf: collection(shelf),
    land: collection([land]),
    districts: collection(region.districts.map((d) => feature(d.geometry, { idx: d.idx, name: d.name }))),
    "district-boundaries": collection(region.districtBoundaries.map((line) => feature(line, {}))),
    // A district's seed lies inside it by construction (it is the district's Voronoi site), so it is the label point.
    "district-labels": collection(region.districts.map((d) => feature({ type: "Point", coordinates: toLonLat(d.seedKm) }, { idx: d.idx, name: d.name }))),
    rail: collection(region.facilities.filter((f) => f.kind === "rail").map((f) => feature(f.geometry, { name: f.name }))),
    towns: collection(region.towns.map((t) => feature({ type: "Point", coordinates: [t.lon, t.lat] }, { name: t.name, rank: t.rank, population: t.population }))),
  };
}
