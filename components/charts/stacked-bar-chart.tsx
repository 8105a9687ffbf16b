import { scaleBand, scaleLinear } from "d3-scale";

/** One stack segment's series: its label, fill and the value per category. */
export interface StackSeries {
  key: string;
  label: string;
  colour: string;
  values: number[];
}

const WIDTH = 720;
const HEIGHT = 300;
const MARGIN = { top: 12, right: 12, bottom: 44, left: 72 };

/**
 * A stacked bar chart in plain SVG (d3-scale for the axes), one bar per category, series stacked
 * bottom to top in the given order. Renders on the server, so it prints; the legend is HTML.
 */
export function StackedBarChart({
  title,
  description,
  categories,
  series,
  yLabel,
  formatValue,
  testId,
}: {
  title: string;
  description: string;
  categories: string[];
  series: StackSeries[];
  yLabel: string;
  formatValue: (value: number) => string;
  testId?: string;
}) {
  const totals = categories.map((_, c) => series.reduce((sum, s) => sum + s.values[c], 0));
  const x = scaleBand<number>().domain(categories.map((_, c) => c)).range([MARGIN.left, WIDTH - MARGIN.right]).padding(0.25);
  const y = scaleLinear().domain([0, Math.max(1, ...totals)]).nice().range([HEIGHT - MARGIN.bottom, MARGIN.top]);
  const titleId = `${testId ?? "chart"}-title`;
  const descId = `${testId ?? "chart"}-desc`;

  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-auto w-full max-w-3xl" role="img" aria-labelledby={`${titleId} ${descId}`}>
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
        {categories.map((category, c) => {
          let base = 0;
          return (
            <g key={category} data-category={category}>
              {series.map((s) => {
                const value = s.values[c];
                const top = base + value;
                const rect = value > 0 && (
                  <rect key={s.key} x={x(c)} width={x.bandwidth()} y={y(top)} height={y(base) - y(top)} fill={s.colour} className="stroke-surface" strokeWidth={0.5}>
                    <title>{`${category}, ${s.label}: ${formatValue(value)}`}</title>
                  </rect>
                );
                base = top;
                return rect;
              })}
              <text x={(x(c) ?? 0) + x.bandwidth() / 2} y={HEIGHT - MARGIN.bottom + 16} textAnchor="middle" fontSize={11} className="fill-ink">
                {category}
              </text>
            </g>
          );
        })}
        <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(0)} y2={y(0)} className="stroke-ink" strokeWidth={1} />
        <text x={14} y={(HEIGHT - MARGIN.bottom + MARGIN.top) / 2} transform={`rotate(-90 14 ${(HEIGHT - MARGIN.bottom + MARGIN.top) / 2})`} textAnchor="middle" fontSize={11} className="fill-ink-muted">
          {yLabel}
        </text>
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink">
          {series.map((s) => (
            <li key={s.key} className="flex items-center gap-1.5">
              <svg aria-hidden="true" width="12" height="12">
                <rect x="0.5" y="0.5" width="11" height="11" rx="2" fill={s.colour} className="stroke-line-strong" />
              </svg>
              {s.label}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
