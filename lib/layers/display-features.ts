import type { Feature, FeatureCollection, Geometry, Position } from "geojson";
import { BboxBuilder } from "./bbox";
import type { LayerContent } from "./parsed-layer";

/** Properties a drawn feature carries: a label and, for grid cells, the cell's value. */
export interface DisplayProperties {
  label: string;
  /** People for population cells, m/s for Vs30 cells. */
  value?: number;
  kind?: string;
  operating?: boolean;
}

export interface DisplayOptions {
  /** Most grid cells or points drawn; larger grids are merged into bins, other layers cut at this count. */
  maxPoints?: number;
  /** Most corners kept per ring or line; outlines are thinned evenly for drawing only. */
  maxCorners?: number;
}

/** Every k-th position with the last one kept, so a ring stays closed. */
function thin(positions: Position[], maxCorners: number): Position[] {
  if (positions.length <= maxCorners) return positions;
  const step = Math.ceil(positions.length / maxCorners);
  const kept = positions.filter((_, i) => i % step === 0);
  if (kept[kept.length - 1] !== positions[positions.length - 1]) kept.push(positions[positions.length - 1]);
  return kept;
}

/**
 * Grid cells for drawing: all of them when few, else merged into at most about `maxPoints` bins of a
 * regular lon/lat raster over their extent, each drawn at its cells' mean position with their summed
 * (people) or mean (Vs30) value. Binning keeps the layer's true outline, which every-k-th thinning of
 * a row-ordered grid would stripe.
 */
function binnedCells(lon: Float64Array, lat: Float64Array, values: Float64Array, maxPoints: number, merge: "sum" | "mean"): Feature<Geometry, DisplayProperties>[] {
  const n = lon.length;
  if (n <= maxPoints) {
    return Array.from({ length: n }, (_, i) => feature({ type: "Point", coordinates: [lon[i], lat[i]] }, { label: "", value: values[i] }));
  }
  const extent = new BboxBuilder();
  for (let i = 0; i < n; i++) extent.add(lon[i], lat[i]);
  const [west, south, east, north] = extent.build();
  const aspect = Math.max(1e-9, east - west) / Math.max(1e-9, north - south);
  const columns = Math.max(1, Math.round(Math.sqrt(maxPoints * aspect)));
  const rows = Math.max(1, Math.floor(maxPoints / columns));
  const count = new Uint32Array(columns * rows);
  const sumLon = new Float64Array(columns * rows);
  const sumLat = new Float64Array(columns * rows);
  const sumValue = new Float64Array(columns * rows);
  for (let i = 0; i < n; i++) {
    const c = Math.min(columns - 1, Math.floor(((lon[i] - west) / Math.max(1e-9, east - west)) * columns));
    const r = Math.min(rows - 1, Math.floor(((lat[i] - south) / Math.max(1e-9, north - south)) * rows));
    const bin = r * columns + c;
    count[bin] += 1;
    sumLon[bin] += lon[i];
    sumLat[bin] += lat[i];
    sumValue[bin] += values[i];
  }
  const binned: Feature<Geometry, DisplayProperties>[] = [];
  for (let bin = 0; bin < count.length; bin++) {
    if (count[bin] === 0) continue;
    const value = merge === "sum" ? sumValue[bin] : sumValue[bin] / count[bin];
    binned.push(feature({ type: "Point", coordinates: [sumLon[bin] / count[bin], sumLat[bin] / count[bin]] }, { label: "", value }));
  }
  return binned;
}

function feature(geometry: Geometry, properties: DisplayProperties): Feature<Geometry, DisplayProperties> {
  return { type: "Feature", geometry, properties };
}

/**
 * A small GeoJSON picture of a layer for maps and previews: grid cells merged into at most about
 * `maxPoints` bins, outlines and lines thinned to `maxCorners` per ring. For drawing only; the
 * stored layer keeps every cell and corner.
 */
export function toDisplayFeatures(layer: LayerContent, options: DisplayOptions = {}): FeatureCollection<Geometry, DisplayProperties> {
  const maxPoints = options.maxPoints ?? 4000;
  const maxCorners = options.maxCorners ?? 400;
  const features: Feature<Geometry, DisplayProperties>[] = [];

  switch (layer.kind) {
    case "population":
    case "site-condition":
      features.push(...binnedCells(layer.lon, layer.lat, layer.kind === "population" ? layer.people : layer.vs30Ms, maxPoints, layer.kind === "population" ? "sum" : "mean"));
      break;
    case "districts":
      for (const d of layer.districts) {
        const geometry: Geometry =
          d.geometry.type === "Polygon"
            ? { type: "Polygon", coordinates: d.geometry.coordinates.map((ring) => thin(ring, maxCorners)) }
            : { type: "MultiPolygon", coordinates: d.geometry.coordinates.map((rings) => rings.map((ring) => thin(ring, maxCorners))) };
        features.push(feature(geometry, { label: d.name }));
      }
      break;
    case "facilities":
      for (const f of layer.facilities.slice(0, maxPoints)) {
        const geometry: Geometry = f.geometry.type === "LineString" ? { type: "LineString", coordinates: thin(f.geometry.coordinates, maxCorners) } : f.geometry;
        features.push(feature(geometry, { label: f.name, kind: f.kind }));
      }
      break;
    case "stations":
      for (const s of layer.stations.slice(0, maxPoints)) {
        features.push(feature({ type: "Point", coordinates: [s.lon, s.lat] }, { label: s.code, operating: s.operating }));
      }
      break;
  }
  return { type: "FeatureCollection", features };
}
