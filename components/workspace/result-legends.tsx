import { intensityLegend, populationLegend, warningLegend, type LegendRow } from "@/lib/colour/legends";
import { RESULT_LINE_COLOURS as L } from "@/lib/colour/ramps";
import type { IntensityScaleId, Provenance } from "@/lib/geo";
import type { LayerSwitchId } from "@/components/map/result-layers";

const ROW_PX = 20;
const WIDTH_PX = 210;

/** A legend's colour rows, each label written on its own swatch (SVG attributes only, for the CSP). */
function Swatches({ rows, testId }: { rows: LegendRow[]; testId: string }) {
  return (
    <svg width={WIDTH_PX} height={rows.length * ROW_PX} viewBox={`0 0 ${WIDTH_PX} ${rows.length * ROW_PX}`} role="list" data-testid={testId}>
      {rows.map((row, i) => (
        <g key={row.key} role="listitem" aria-label={row.label} data-colour={row.colour}>
          <rect x="0" y={i * ROW_PX} width={WIDTH_PX} height={ROW_PX} fill={row.colour} />
          <text x="8" y={i * ROW_PX + 14} fill={row.textColour} fontSize="12">
            {row.label}
          </text>
        </g>
      ))}
    </svg>
  );
}

function LineKey({ colour, dashed, label }: { colour: string; dashed?: boolean; label: string }) {
  return (
    <p className="flex items-center gap-2 text-xs">
      <svg width="28" height="10" viewBox="0 0 28 10" aria-hidden="true">
        <line x1="1" y1="5" x2="27" y2="5" stroke={colour} strokeWidth="2.5" strokeDasharray={dashed ? "5 3" : undefined} />
      </svg>
      {label}
    </p>
  );
}

function Legend({ title, children, testId }: { title: string; children: React.ReactNode; testId: string }) {
  return (
    <section className="space-y-1 rounded-card border border-line bg-surface p-2" data-testid={testId}>
      <h3 className="text-xs font-semibold">{title}</h3>
      {children}
    </section>
  );
}

/** One legend per visible result layer, with units and the statuses of the models behind it. */
export function ResultLegends({
  visible,
  breaksS,
  scale,
  provenance,
  primaryChannel,
}: {
  visible: Record<LayerSwitchId, boolean>;
  breaksS: readonly number[];
  scale: IntensityScaleId;
  provenance: Provenance | null;
  primaryChannel: string;
}) {
  const motion = provenance ? `${provenance.groundMotionModel.title} (${provenance.groundMotionModel.status})` : "";
  const conversion = provenance ? `${provenance.conversion.title} (${provenance.conversion.status})` : "";
  return (
    <div className="flex flex-wrap items-start gap-3" data-testid="result-legends">
      {visible.warning && (
        <Legend title={`Warning seconds, ${primaryChannel} (s)`} testId="legend-warning">
          <Swatches rows={warningLegend(breaksS)} testId="legend-warning-rows" />
          <p className="max-w-[210px] text-xs text-ink-muted">S-wave arrival minus the alert&apos;s arrival; velocity model {provenance?.velocityModel.title ?? "…"}.</p>
        </Legend>
      )}
      {visible.intensity && (
        <Legend title={scale === "jma" ? "Predicted JMA intensity class" : "Predicted MMI class"} testId="legend-intensity">
          <Swatches rows={intensityLegend(scale)} testId="legend-intensity-rows" />
          <p className="max-w-[210px] text-xs text-ink-muted">
            Ground motion: {motion}. Conversion: {conversion}.{scale === "jma" ? " Classes below 4 lie outside the conversion's published range." : ""}
          </p>
        </Legend>
      )}
      {(visible.alertArea || visible.blindZone) && (
        <Legend title="Outlines" testId="legend-outlines">
          {visible.alertArea && <LineKey colour={L.alertArea} dashed label="Alert area (predicted shaking reaches “alert area at”)" />}
          {visible.blindZone && <LineKey colour={L.blindZoneEdge} label="Blind zone edge: warning 0 s or less" />}
        </Legend>
      )}
      {visible.population && (
        <Legend title="Population density (people per km²)" testId="legend-population">
          <Swatches rows={populationLegend()} testId="legend-population-rows" />
          <p className="max-w-[210px] text-xs text-ink-muted">Averaged over 8 km squares of the scenario&apos;s population layer.</p>
        </Legend>
      )}
      {visible.facilities && (
        <Legend title="Facilities" testId="legend-facilities">
          <LineKey colour={L.facility} label="Rail segment" />
          <p className="flex items-center gap-2 text-xs">
            <svg width="28" height="12" viewBox="0 0 28 12" aria-hidden="true">
              <circle cx="8" cy="6" r="4" fill={L.facility} />
              <circle cx="20" cy="6" r="4" fill="#ffffff" stroke={L.facility} strokeWidth="2" />
            </svg>
            School or other site; hospital (open ring)
          </p>
        </Legend>
      )}
    </div>
  );
}
