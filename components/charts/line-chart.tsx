import { scaleLinear, scalePoint } from "d3-scale";
import { ChartFrame, type ChartBox } from "./chart-frame";

/** One line: its label, colour, dash pattern (so lines differ without colour) and values per category. */
export interface LineSeries {
  key: string;
  label: string;
  colour: string;
  dash?: string;
  values: number[];
}

const BOX: ChartBox = { width: 640, height: 260, margin: { top: 12, right: 16, bottom: 44, left: 72 } };
const { width: WIDTH, height: HEIGHT, margin: MARGIN } = BOX;

/** A small line chart over ordered categories in plain SVG (d3-scale), with an optional marked category. */
export function LineChart({
  title,
  description,
  categories,
  series,
  marked,
  markedLabel,
  yLabel,
  formatValue,
  testId,
}: {
  title: string;
  description: string;
  categories: string[];
  series: LineSeries[];
  /** Index of a category to mark with a vertical rule (e.g. the current setting). */
  marked?: number;
  markedLabel?: string;
  yLabel: string;
  formatValue: (value: number) => string;
  testId?: string;
}) {
  const x = scalePoint<number>().domain(categories.map((_, i) => i)).range([MARGIN.left, WIDTH - MARGIN.right]).padding(0.3);
  const y = scaleLinear().domain([0, Math.max(1, ...series.flatMap((s) => s.values))]).nice().range([HEIGHT - MARGIN.bottom, MARGIN.top]);
  const legend = series.map((s) => (
    <li key={s.key} className="flex items-center gap-1.5">
      <svg aria-hidden="true" width="24" height="8">
        <line x1="0" x2="24" y1="4" y2="4" stroke={s.colour} strokeWidth={2} strokeDasharray={s.dash} />
      </svg>
      {s.label}
    </li>
  ));

  return (
    <ChartFrame box={BOX} y={y} title={title} description={description} yLabel={yLabel} formatValue={formatValue} legend={legend} testId={testId} className="max-w-2xl">
      {marked !== undefined && (
        <g>
          <line x1={x(marked)} x2={x(marked)} y1={MARGIN.top} y2={HEIGHT - MARGIN.bottom} className="stroke-ink-muted" strokeDasharray="2 3" strokeWidth={1} />
          {markedLabel && (
            <text x={(x(marked) ?? 0) + 4} y={MARGIN.top + 10} fontSize={11} className="fill-ink-muted">
              {markedLabel}
            </text>
          )}
        </g>
      )}
      {series.map((s) => (
        <g key={s.key}>
          <polyline fill="none" stroke={s.colour} strokeWidth={2} strokeDasharray={s.dash} points={s.values.map((v, i) => `${x(i)},${y(v)}`).join(" ")} />
          {s.values.map((v, i) => (
            <circle key={i} cx={x(i)} cy={y(v)} r={3} fill={s.colour}>
              <title>{`${s.label} at ${categories[i]}: ${formatValue(v)}`}</title>
            </circle>
          ))}
        </g>
      ))}
      {categories.map((category, i) => (
        <text key={category} x={x(i)} y={HEIGHT - MARGIN.bottom + 16} textAnchor="middle" fontSize={11} className="fill-ink">
          {category}
        </text>
      ))}
    </ChartFrame>
  );
}
