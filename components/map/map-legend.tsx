import { MAP_COLOURS as C } from "@/lib/map/palette";

/** One legend row: a swatch drawn with SVG presentation attributes (no inline styles, for the CSP). */
function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <li className="flex items-center gap-2">
      <svg width="22" height="14" viewBox="0 0 22 14" aria-hidden="true" className="shrink-0">
        {children}
      </svg>
      <span>{label}</span>
    </li>
  );
}

/** The map's key: what each mark on the basemap and the overlays means. */
export function MapLegend() {
  return (
    <div className="rounded-card border border-line bg-surface/95 px-3 py-2 text-xs text-ink shadow-sm" data-testid="map-legend">
      <p className="mb-1 font-semibold">Key</p>
      <ul className="space-y-1">
        <Row label="Station, operating">
          <circle cx="11" cy="7" r="4.5" fill={C.station} stroke={C.stationOutline} strokeWidth="1.5" />
        </Row>
        <Row label="Station, out of service">
          <circle cx="11" cy="7" r="4.5" fill={C.stationOff} stroke={C.stationOffOutline} strokeWidth="1.5" />
        </Row>
        <Row label="Epicentre (hypothetical)">
          <circle cx="11" cy="7" r="5.5" fill="none" stroke={C.source} strokeWidth="1.8" />
          <circle cx="11" cy="7" r="2" fill={C.source} />
        </Row>
        <Row label="Town">
          <circle cx="11" cy="7" r="3.5" fill={C.townDot} stroke={C.labelHalo} strokeWidth="1.2" />
        </Row>
        <Row label="Rail line">
          <line x1="1" y1="7" x2="21" y2="7" stroke={C.rail} strokeWidth="3.5" />
          <line x1="1" y1="7" x2="21" y2="7" stroke={C.railTie} strokeWidth="1.5" strokeDasharray="3 4" />
        </Row>
        <Row label="District boundary">
          <line x1="1" y1="7" x2="21" y2="7" stroke={C.districtLine} strokeWidth="1.5" strokeDasharray="5 3" />
        </Row>
      </ul>
    </div>
  );
}
