import { scaleBand, scaleLinear } from "d3-scale";
import { ChartFrame, type ChartBox } from "./chart-frame";
import { SwatchLegendItem } from "./swatch-legend-item";

/** One stack segment's series: its label, fill and the value per category. */
export interface StackSeries {
  key: string;
  label: string;
  colour: string;
  values: number[];
}

const BOX: ChartBox = { width: 720, height: 300, margin: { top: 12, right: 12, bottom: 44, left: 72 } };
const { width: WIDTH, height: HEIGHT, margin: MARGIN } = BOX;

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
  const legend = series.map((s) => (
    <SwatchLegendItem key={s.key} colour={s.colour} label={s.label} />
  ));

  return (
    <ChartFrame box={BOX} y={y} title={title} description={description} yLabel={yLabel} formatValue={formatValue} legend={legend} testId={testId} className="max-w-3xl">
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
    </ChartFrame>
  );
}
