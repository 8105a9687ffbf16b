import { SwatchLegendItem } from "./swatch-legend-item";

/** A district outline in GeoJSON coordinates (lon, lat degrees). */
export interface DistrictShape {
  name: string;
  geometry: { type: "Polygon"; coordinates: number[][][] } | { type: "MultiPolygon"; coordinates: number[][][][] };
}

/** One shading class: values ≥ `from` (and below the next class) get `colour`. */
export interface MapClass {
  from: number;
  label: string;
  colour: string;
}

const WIDTH = 560;
const PAD = 12;
const KM_PER_DEG_LAT = 111.2;

function polygonsOf(shape: DistrictShape): number[][][][] {
  return shape.geometry.type === "Polygon" ? [shape.geometry.coordinates] : shape.geometry.coordinates;
}

/** Picks a round scale-bar length, km, near a fifth of the map's width. */
function scaleBarKm(mapWidthKm: number): number {
  const target = mapWidthKm / 5;
  return [5, 10, 20, 25, 50, 100, 200].reduce((best, km) => (Math.abs(km - target) < Math.abs(best - target) ? km : best));
}

/**
 * A static map of districts shaded by a value (e.g. the share of residents in the blind zone), with
 * the epicentre, a scale bar and a north mark: plain SVG, so it prints with the council summary.
 * Projection: equirectangular with longitudes scaled by cos(middle latitude), true to scale along
 * the middle latitude, which is close enough for an island of a few hundred km.
 */
export function DistrictMap({
  title,
  description,
  districts,
  valueOf,
  classes,
  epicentre,
  testId,
}: {
  title: string;
  description: string;
  districts: DistrictShape[];
  /** The value shaded for a district, or null for no data. */
  valueOf: (name: string) => number | null;
  classes: MapClass[];
  epicentre?: [number, number];
  testId?: string;
}) {
  const positions = [...districts.flatMap((d) => polygonsOf(d).flat()).flat(), ...(epicentre ? [epicentre] : [])];
  const lons = positions.map((p) => p[0]);
  const lats = positions.map((p) => p[1]);
  const [west, east, south, north] = [Math.min(...lons), Math.max(...lons), Math.min(...lats), Math.max(...lats)];
  const cosLat = Math.cos((((south + north) / 2) * Math.PI) / 180);
  const scale = (WIDTH - 2 * PAD) / Math.max(1e-9, (east - west) * cosLat);
  const height = Math.ceil((north - south) * scale + 2 * PAD + 28);
  const project = (lon: number, lat: number): [number, number] => [PAD + (lon - west) * cosLat * scale, PAD + (north - lat) * scale];
  const pathOf = (shape: DistrictShape) =>
    polygonsOf(shape)
      .flatMap((polygon) => polygon.map((ring) => `M${ring.map(([lon, lat]) => project(lon, lat).map((v) => v.toFixed(1)).join(",")).join("L")}Z`))
      .join("");
  const colourOf = (value: number | null) => {
    if (value === null) return "none";
    let colour = classes[0].colour;
    for (const c of classes) if (value >= c.from) colour = c.colour;
    return colour;
  };
  const barKm = scaleBarKm((east - west) * cosLat * KM_PER_DEG_LAT);
  const barPx = (barKm / KM_PER_DEG_LAT) * scale;
  const titleId = `${testId ?? "district-map"}-title`;
  const descId = `${testId ?? "district-map"}-desc`;

  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <svg viewBox={`0 0 ${WIDTH} ${height}`} className="h-auto w-full max-w-xl" role="img" aria-labelledby={`${titleId} ${descId}`}>
        <title id={titleId}>{title}</title>
        <desc id={descId}>{description}</desc>
        {districts.map((d) => (
          <path key={d.name} d={pathOf(d)} fill={colourOf(valueOf(d.name))} fillRule="evenodd" className="stroke-ink" strokeWidth={0.6}>
            <title>{d.name}</title>
          </path>
        ))}
        {epicentre && (
          <g transform={`translate(${project(...epicentre).join(",")})`}>
            <path d="M-6,-6L6,6M-6,6L6,-6" className="stroke-ink" strokeWidth={2.5} />
            <text x={9} y={4} fontSize={11} className="fill-ink">
              epicentre
            </text>
          </g>
        )}
        <g transform={`translate(${PAD},${height - 14})`}>
          <line x1={0} x2={barPx} y1={0} y2={0} className="stroke-ink" strokeWidth={2} />
          <text x={barPx + 6} y={4} fontSize={11} className="fill-ink">
            {barKm} km
          </text>
        </g>
        <text x={WIDTH - PAD} y={PAD + 10} textAnchor="end" fontSize={12} fontWeight={600} className="fill-ink">
          N ↑
        </text>
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink">
          {classes.map((c) => (
            <SwatchLegendItem key={c.label} colour={c.colour} label={c.label} />
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
