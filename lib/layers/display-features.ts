import type { Feature, FeatureCollection, Geometry, Position } from "geojson";
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
  /** Most grid cells or points drawn; larger layers are thinned evenly. */
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

function feature(geometry: Geometry, properties: DisplayProperties): Feature<Geometry, DisplayProperties> {
  return { type: "Feature", geometry, properties };
}

/**
 * A small GeoJSON picture of a layer for maps and previews: grid cells thinned to `maxPoints`
 * (every k-th cell), outlines and lines thinned to `maxCorners` per ring. For drawing only; the
 * stored layer keeps every cell and corner.
 */
export function toDisplayFeatures(layer: LayerContent, options: DisplayOptions = {}): FeatureCollection<Geometry, DisplayProperties> {
  const maxPoints = options.maxPoints ?? 4000;
  const maxCorners = options.maxCorners ?? 400;
  const features: Feature<Geometry, DisplayProperties>[] = [];

  switch (layer.kind) {
    case "population":
    case "site-condition": {
      const values = layer.kind === "population" ? layer.people : layer.vs30Ms;
      const step = Math.max(1, Math.ceil(layer.lon.length / maxPoints));
      for (let i = 0; i < layer.lon.length; i += step) {
        features.push(feature({ type: "Point", coordinates: [layer.lon[i], layer.lat[i]] }, { label: "", value: values[i] }));
      }
      break;
    }
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
