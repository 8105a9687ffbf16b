"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FACILITY_KIND_LABELS } from "@/components/exposure/labels";
import { intensityClassName } from "@/lib/colour/legends";
import { actionIsFor, type WorkspaceAction } from "@/lib/exposure/inputs";
import { actionsThatFit, describeProvenance, type IntensityScaleId, type Provenance, type SiteResult } from "@/lib/geo";
import { formatIntensity, formatKm, formatMotion, formatTimeS, formatWarningS } from "@/lib/workspace/format";
import type { LonLat } from "@/lib/workspace/rupture-trace";
import { channelName } from "./alert-rules-form";
import { NumberField } from "./fields";

/** A protective action and the seconds it takes (workspace settings). */
/** A facility the planner can pick for the card. */
export interface PickableFacility {
  name: string;
  kind: string;
  lon: number;
  lat: number;
}

function Row({ label, value, unit, testId }: { label: string; value: string; unit?: string; testId: string }) {
  return (
    <>
      <dt className="text-ink-muted">{label}</dt>
      <dd>
        <span data-testid={testId}>{value}</span>
        {unit ? ` ${unit}` : ""}
      </dd>
    </>
  );
}

/** Where the card is for: typed coordinates, a facility from the list, or a click on the map. */
function PointPicker({ point, onPick, facilities }: { point: LonLat | null; onPick: (p: LonLat) => void; facilities: PickableFacility[] }) {
  const [lon, setLon] = useState<number | undefined>(point?.lon);
  const [lat, setLat] = useState<number | undefined>(point?.lat);
  const valid = lon !== undefined && lat !== undefined && Number.isFinite(lon) && Number.isFinite(lat) && Math.abs(lat) <= 90 && Math.abs(lon) <= 180;
  return (
    <div className="space-y-2">
      <p className="text-xs text-ink-muted">Click anywhere on the map, pick a facility, or type a point.</p>
      <form
        className="grid grid-cols-[1fr_1fr_auto] items-end gap-2"
        onSubmit={(event) => {
          event.preventDefault();
          if (valid) onPick({ lon: lon!, lat: lat! });
        }}
      >
        <NumberField label="Longitude" unit="°" value={lon} onChange={setLon} testId="site-input-lon" />
        <NumberField label="Latitude" unit="°" value={lat} onChange={setLat} testId="site-input-lat" />
        <Button type="submit" variant="secondary" className="px-2 py-1" disabled={!valid} data-testid="site-input-show">
          Show
        </Button>
      </form>
      {facilities.length > 0 && (
        <label className="block space-y-0.5 text-xs">
          <span className="font-semibold">Facility</span>
          <select
            className="block w-full rounded-card border border-line-strong bg-surface px-2 py-1 text-sm"
            defaultValue=""
            data-testid="site-facility"
            onChange={(event) => {
              const f = facilities[Number(event.target.value)];
              if (f) onPick({ lon: f.lon, lat: f.lat });
            }}
          >
            <option value="">Choose a facility…</option>
            {facilities.map((f, i) => (
              <option key={i} value={i}>
                {f.name} ({f.kind})
              </option>
            ))}
          </select>
        </label>
      )}
    </div>
  );
}

/**
 * The site card: what the scenario means at one point — distances, P and S arrival, when the
 * alert is issued and reaches each channel, warning seconds per channel (whole seconds), whether
 * the place is alerted, shaking and intensity with the models' statuses, and the protective
 * actions that fit.
 */
export function SiteCard({
  point,
  onPick,
  site,
  alertIssued,
  provenance,
  notes,
  facilities,
  actions,
  reactionTimeS,
  scale,
}: {
  point: LonLat | null;
  onPick: (p: LonLat) => void;
  site: SiteResult | null;
  alertIssued: boolean;
  provenance: Provenance | null;
  notes: string[];
  facilities: PickableFacility[];
  actions: WorkspaceAction[];
  reactionTimeS: number;
  scale: IntensityScaleId;
}) {
  // A picked facility is judged by the actions meant for its kind; any other point by every action.
  const facility = point ? facilities.find((f) => f.lon === point.lon && f.lat === point.lat) : undefined;
  const meant = actions.filter((a) => actionIsFor(a, facility?.kind ?? null));
  const fits = site ? actionsThatFit(site.warningS, site.alerted, reactionTimeS, meant.map((a) => ({ id: a.name, seconds: a.secondsNeeded }))) : [];
  return (
    <div className="space-y-3" data-testid="site-card">
      <PointPicker key={point ? `${point.lon},${point.lat}` : "none"} point={point} onPick={onPick} facilities={facilities} />
      {point && !site && <p className="text-sm text-ink-muted">Computing…</p>}
      {site && (
        <>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
            <Row label="Point" value={`${site.lat.toFixed(4)}°, ${site.lon.toFixed(4)}°`} testId="site-point" />
            <Row label="From the epicentre" value={formatKm(site.epicentralKm)} unit="km" testId="site-epicentral-km" />
            <Row label="From the hypocentre" value={formatKm(site.hypocentralKm)} unit="km" testId="site-hypocentral-km" />
            <Row label="From the rupture" value={formatKm(site.ruptureKm)} unit="km" testId="site-rupture-km" />
            <Row label="P wave arrives" value={formatTimeS(site.pArrivalS)} unit="s after origin" testId="site-p-arrival-s" />
            <Row label="S wave arrives" value={formatTimeS(site.sArrivalS)} unit="s after origin" testId="site-s-arrival-s" />
            <Row label="Alert issued" value={site.alertIssuedS === null ? "no alert reaches here" : `${formatTimeS(site.alertIssuedS)}`} unit={site.alertIssuedS === null ? undefined : "s after origin"} testId="site-alert-issued-s" />
            <Row label="Alerted" value={site.alerted ? "yes" : alertIssued ? "no: below “alert area at”" : "no: no alert is issued"} testId="site-alerted" />
          </dl>
          {site.sIsHeadWave && (
            <p className="rounded-card bg-caution-bg px-2 py-1 text-xs text-caution-ink" data-testid="site-head-wave-note">
              Past the crossover distance the first S wave is the head wave (Sn), weaker and earlier than the strong shaking: the warning seconds here err on the short, safe side.
            </p>
          )}
          <table className="w-full text-sm" data-testid="site-channels">
            <caption className="text-left text-xs font-semibold">Per channel</caption>
            <thead className="text-left text-xs text-ink-muted">
              <tr>
                <th className="font-normal">Channel</th>
                <th className="font-normal">Alert reaches (s)</th>
                <th className="font-normal">Warning (whole s)</th>
              </tr>
            </thead>
            <tbody>
              {site.byChannel.map((c, i) => (
                <tr key={c.channel} className="border-t border-line" data-testid={`site-channel-${i}`}>
                  <td>
                    {channelName(c.channel)}
                    {i === 0 ? " (primary)" : ""}
                  </td>
                  <td data-testid={`site-channel-${i}-alert-s`}>{c.alertS === null ? "—" : formatTimeS(c.alertS)}</td>
                  <td data-testid={`site-channel-${i}-warning-s`}>{c.warningS === null ? "—" : c.warningS <= 0 ? `${formatWarningS(c.warningS)} (blind)` : formatWarningS(c.warningS)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
            <Row label="PGV" value={formatMotion(site.pgvCms)} unit="cm/s" testId="site-pgv" />
            <Row label="PGA (average site)" value={formatMotion(site.pgaCms2)} unit="cm/s²" testId="site-pga" />
            <Row label="Vs30" value={String(Math.round(site.vs30Ms))} unit="m/s" testId="site-vs30" />
            <Row label="JMA intensity" value={`${formatIntensity(site.jmaIntensity)} (${intensityClassName("jma", site.jmaClass)})`} testId="site-jma" />
            <Row label="MMI" value={`${formatIntensity(site.mmi)} (${intensityClassName("mmi", site.mmiClass)})`} testId="site-mmi" />
            <Row label={`Scenario scale (${scale.toUpperCase()})`} value={intensityClassName(scale, site.intensityClass)} testId="site-intensity-class" />
          </dl>
          {provenance && (
            <p className="text-xs text-ink-muted">
              Ground motion: {provenance.groundMotionModel.title} ({provenance.groundMotionModel.status}); conversion: {provenance.conversion.title} ({provenance.conversion.status}).
              {site.extrapolated ? " This point lies beyond the model's data: extrapolated." : ""}
            </p>
          )}
          <div className="space-y-1">
            <h3 className="text-xs font-semibold">Protective actions that fit (reaction {reactionTimeS} s, primary channel)</h3>
            {facility && <p className="text-xs text-ink-muted">Only the actions meant for this kind of facility ({FACILITY_KIND_LABELS[facility.kind] ?? facility.kind}).</p>}
            {fits.length === 0 ? (
              <p className="text-sm" data-testid="site-actions-none">
                {meant.length === 0 ? "None: no action of the workspace list is meant for this kind." : site.alerted ? "None: the warning is too short." : "None: this place is not alerted."}
              </p>
            ) : (
              <ul className="list-disc pl-5 text-sm" data-testid="site-actions">
                {fits.map((a) => (
                  <li key={a.id}>
                    {a.id} ({a.seconds} s)
                  </li>
                ))}
              </ul>
            )}
          </div>
          {notes.length > 0 && (
            <ul className="list-disc pl-5 text-xs text-ink-muted">
              {notes.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          )}
          {provenance && <p className="text-xs text-ink-muted">How it was made: {describeProvenance(provenance)}</p>}
        </>
      )}
    </div>
  );
}
