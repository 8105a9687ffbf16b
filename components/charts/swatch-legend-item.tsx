/** One entry of a chart or map legend: a filled square in the series' colour and its label. */
export function SwatchLegendItem({ colour, label }: { colour: string; label: string }) {
  return (
    <li className="flex items-center gap-1.5">
      <svg aria-hidden="true" width="12" height="12">
        <rect x="0.5" y="0.5" width="11" height="11" rx="2" fill={colour} className="stroke-line-strong" />
      </svg>
      {label}
    </li>
  );
}
