import type { ScaleLinear } from "d3-scale";
import type { ReactNode } from "react";

/** The drawing area of a chart in SVG units, shared by its frame and its marks. */
export interface ChartBox {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

/**
 * What every Leeway chart has around its marks: an accessible SVG (title and description), the
 * value grid with tick labels, the zero line, the rotated value-axis label, and an HTML legend
 * below (HTML so it wraps and prints). Plain SVG, so charts render on the server and print.
 */
export function ChartFrame({
  box,
  y,
  title,
  description,
  yLabel,
  formatValue,
  legend,
  testId,
  className,
  children,
}: {
  box: ChartBox;
  y: ScaleLinear<number, number>;
  title: string;
  description: string;
  yLabel: string;
  formatValue: (value: number) => string;
  legend: ReactNode;
  testId?: string;
  className: string;
  children: ReactNode;
}) {
  const { width, height, margin } = box;
  const titleId = `${testId ?? "chart"}-title`;
  const descId = `${testId ?? "chart"}-desc`;
  const midY = (height - margin.bottom + margin.top) / 2;
  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <svg viewBox={`0 0 ${width} ${height}`} className={`h-auto w-full ${className}`} role="img" aria-labelledby={`${titleId} ${descId}`}>
        <title id={titleId}>{title}</title>
        <desc id={descId}>{description}</desc>
        {y.ticks(5).map((tick) => (
          <g key={tick}>
            <line x1={margin.left} x2={width - margin.right} y1={y(tick)} y2={y(tick)} className="stroke-line" strokeWidth={1} />
            <text x={margin.left - 6} y={y(tick)} dy="0.32em" textAnchor="end" fontSize={11} className="fill-ink-muted">
              {formatValue(tick)}
            </text>
          </g>
        ))}
        {children}
        <line x1={margin.left} x2={width - margin.right} y1={y(0)} y2={y(0)} className="stroke-ink" strokeWidth={1} />
        <text x={14} y={midY} transform={`rotate(-90 14 ${midY})`} textAnchor="middle" fontSize={11} className="fill-ink-muted">
          {yLabel}
        </text>
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink">{legend}</ul>
      </figcaption>
    </figure>
  );
}
