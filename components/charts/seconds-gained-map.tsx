import type { SecondsGained } from "@/lib/exposure/contracts";
import { SECONDS_GAINED_LEGEND } from "@/lib/exposure/seconds-gained";
import type { DistrictShape } from "./district-map";
import { SwatchLegendItem } from "./swatch-legend-item";

const WIDTH = 560;
const PAD = 10;

/**
 * The seconds-gained layer drawn as a static SVG over district outlines (equirectangular, longitudes
 * scaled by cos(middle latitude)), with its legend. For the MapLibre workspace the same GeoJSON
 * comes from /api/compare.
 */
export function SecondsGainedMap({ layer, districts, bbox, testId }: { layer: SecondsGained; districts: DistrictShape[]; bbox: [number, number, number, number]; testId?: string }) {
  const [west, south, east, north] = bbox;
  const cosLat = Math.cos((((south + north) / 2) * Math.PI) / 180);
  const scale = (WIDTH - 2 * PAD) / ((east - west) * cosLat);
  const height = Math.ceil((north - south) * scale + 2 * PAD);
  const xy = ([lon, lat]: number[]) => `${(PAD + (lon - west) * cosLat * scale).toFixed(1)},${(PAD + (north - lat) * scale).toFixed(1)}`;
  const rings = (polygons: number[][][][]) => polygons.flatMap((polygon) => polygon.map((ring) => `M${ring.map(xy).join("L")}Z`)).join("");
  const outline = (d: DistrictShape) => rings(d.geometry.type === "Polygon" ? [d.geometry.coordinates] : d.geometry.coordinates);

  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <svg viewBox={`0 0 ${WIDTH} ${height}`} className="h-auto w-full max-w-xl rounded-card border border-line bg-surface" role="img" aria-label="Map of the seconds of warning gained or lost from A to B">
        {layer.features.map((f) => (
          <path key={f.properties.label} d={rings(f.geometry.coordinates)} fill={f.properties.colour} fillRule="evenodd" data-band={f.properties.label}>
            <title>{f.properties.label}</title>
          </path>
        ))}
        {districts.map((d) => (
          <path key={d.name} d={outline(d)} fill="none" className="stroke-ink" strokeWidth={0.6} />
        ))}
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink">
          {SECONDS_GAINED_LEGEND.map((band) => (
            <SwatchLegendItem key={band.label} colour={band.colour} label={band.label} />
          ))}
          <li>unshaded: within 1 s of A</li>
        </ul>
      </figcaption>
    </figure>
  );
}
