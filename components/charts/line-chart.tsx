import { scaleLinear, scalePoint } from "d3-scale";

/** One line: its label, colour, dash pattern (so lines differ without colour) and values per category. */
export interface LineSeries {
  key: string;
  label: string;
  colour: string;
  dash?: string;
  values: number[];
}

const WIDTH = 640;
const HEIGHT = 260;
const MARGIN = { top: 12, right: 16, bottom: 44, left: 72 };

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
  const titleId = `${testId ?? "line-chart"}-title`;
  const descId = `${testId ?? "line-chart"}-desc`;
  const midY = (HEIGHT - MARGIN.bottom + MARGIN.top) / 2;

  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-auto w-full max-w-2xl" role="img" aria-labelledby={`${titleId} ${descId}`}>
        <title id={titleId}>{title}</title>
        <desc id={descId}>{description}</desc>
        {y.ticks(5).map((tick) => (
          <g key={tick}>
            <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(tick)} y2={y(tick)} className="stroke-line" strokeWidth={1} />
            <text x={MARGIN.left - 6} y={y(tick)} dy="0.32em" textAnchor="end" fontSize={11} className="fill-ink-muted">
              {formatValue(tick)}
            </text>
          </g>
        ))}
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
        <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(0)} y2={y(0)} className="stroke-ink" strokeWidth={1} />
        <text x={14} y={midY} transform={`rotate(-90 14 ${midY})`} textAnchor="middle" fontSize={11} className="fill-ink-muted">
          {yLabel}
        </text>
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink">
          {series.map((s) => (
            <li key={s.key} className="flex items-center gap-1.5">
              <svg aria-hidden="true" width="24" height="8">
                <line x1="0" x2="24" y1="4" y2="4" stroke={s.colour} strokeWidth={2} strokeDasharray={s.dash} />
              </svg>
              {s.label}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
