"use client";

import { Button } from "@/components/ui/button";
import type { IntensityScaleId } from "@/lib/geo";
import { DEFAULT_ALERT_THRESHOLDS, DEFAULT_CHANNELS, DEFAULT_TIMING } from "@/lib/scenario/defaults";
import { moveItem, type DraftAction, type DraftChannel, type ScenarioDraft } from "@/lib/workspace/draft";
import { FieldGroup, NumberField } from "./fields";
import type { IssueLookup } from "./issues";

/** Planner's names of the default channels. */
export const CHANNEL_LABELS: Record<string, string> = {
  "cell-broadcast": "Cell broadcast",
  "phone-app": "Phone app",
  "siren-pa": "Sirens and PA",
  sirens: "Sirens",
  "radio-tv": "Radio and TV",
  machine: "Machine-to-machine",
};

/** A channel's name for people: its planner's label, else its id. */
export const channelName = (id: string) => CHANNEL_LABELS[id] ?? id;

/** The alert timeline, the alert thresholds and the ordered delivery channels. */
export function AlertRulesForm({ draft, dispatch, issueAt, scale }: { draft: ScenarioDraft; dispatch: (a: DraftAction) => void; issueAt: IssueLookup; scale: IntensityScaleId }) {
  const timing = draft.timing ?? {};
  const alert = draft.alert ?? {};
  const thresholds = DEFAULT_ALERT_THRESHOLDS[scale];
  const channels: DraftChannel[] = draft.channels ?? DEFAULT_CHANNELS.value.map((c) => ({ ...c }));
  const setChannels = (next: DraftChannel[]) => dispatch({ type: "set-channels", channels: next });
  const scaleName = scale === "jma" ? "JMA intensity" : "MMI";

  return (
    <div className="space-y-3" data-testid="alert-rules-form">
      <FieldGroup title="Alert timeline" note="Empty fields use Leeway's documented defaults (shown greyed); enter your operator's figures.">
        <div className="grid grid-cols-2 gap-2">
          <NumberField
            label="Stations to trigger"
            optional
            value={timing.triggerStations}
            placeholder={`${DEFAULT_TIMING.triggerStations.value} (two-station trigger)`}
            onChange={(triggerStations) => dispatch({ type: "set-timing", patch: { triggerStations } })}
            error={issueAt("timing.triggerStations")}
            testId="timing-trigger"
            step="1"
          />
          <NumberField label="P-wave data window" unit="s" optional value={timing.pWindowS} placeholder={String(DEFAULT_TIMING.pWindowS.value)} onChange={(pWindowS) => dispatch({ type: "set-timing", patch: { pWindowS } })} error={issueAt("timing.pWindowS")} testId="timing-window" />
          <NumberField label="Telemetry" unit="s" optional value={timing.telemetryS} placeholder={String(DEFAULT_TIMING.telemetryS.value)} onChange={(telemetryS) => dispatch({ type: "set-timing", patch: { telemetryS } })} error={issueAt("timing.telemetryS")} testId="timing-telemetry" />
          <NumberField label="Processing" unit="s" optional value={timing.processingS} placeholder={String(DEFAULT_TIMING.processingS.value)} onChange={(processingS) => dispatch({ type: "set-timing", patch: { processingS } })} error={issueAt("timing.processingS")} testId="timing-processing" />
        </div>
      </FieldGroup>

      <FieldGroup title="When to alert" note={`As ${scaleName} values. An alert is issued only if the strongest predicted shaking reaches "issue at"; it goes to places predicted to reach "alert area at".`}>
        <div className="grid grid-cols-2 gap-2">
          <NumberField label="Issue at" unit={scaleName} optional value={alert.issueAt} placeholder={String(thresholds.issueAt.value)} onChange={(issueAt) => dispatch({ type: "set-alert", patch: { issueAt } })} error={issueAt("alert.issueAt")} testId="alert-issue-at" />
          <NumberField label="Alert area at" unit={scaleName} optional value={alert.areaAt} placeholder={String(thresholds.areaAt.value)} onChange={(areaAt) => dispatch({ type: "set-alert", patch: { areaAt } })} error={issueAt("alert.areaAt")} testId="alert-area-at" />
          <NumberField label="Shaking that matters" unit={scaleName} optional value={alert.target} placeholder={String(thresholds.target.value)} onChange={(target) => dispatch({ type: "set-alert", patch: { target } })} error={issueAt("alert.target")} />
          <NumberField
            label="Magnitude known at alert time"
            unit="Mw"
            optional
            value={typeof alert.magnitude === "number" ? alert.magnitude : undefined}
            placeholder="the source's Mw"
            onChange={(magnitude) => dispatch({ type: "set-alert", patch: { magnitude } })}
            error={issueAt("alert.magnitude")}
          />
        </div>
      </FieldGroup>

      <FieldGroup title="Delivery channels" note="In order: the first is the primary channel, used for every single-channel figure.">
        {!draft.channels && <p className="text-xs text-ink-muted">Leeway&apos;s placeholder delays (no source) until you change one.</p>}
        <ol className="space-y-2" data-testid="channel-list">
          {channels.map((channel, index) => (
            <li key={index} className="grid grid-cols-[1fr_7rem_auto] items-end gap-2" data-testid={`channel-${index}`}>
              <div className="space-y-0.5">
                <label className="block text-xs font-semibold" htmlFor={`channel-id-${index}`}>
                  {index === 0 ? "Primary channel" : `Channel ${index + 1}`}
                </label>
                <input
                  id={`channel-id-${index}`}
                  value={channel.id}
                  onChange={(event) => setChannels(channels.map((c, i) => (i === index ? { ...c, id: event.target.value } : c)))}
                  className="block w-full rounded-card border border-line-strong bg-surface px-2 py-1 text-sm"
                />
                {issueAt(`channels[${index}].id`) && <span className="block text-xs text-error-ink">{issueAt(`channels[${index}].id`)}</span>}
              </div>
              <NumberField label="Delivery" unit="s" value={channel.deliveryS} onChange={(deliveryS) => setChannels(channels.map((c, i) => (i === index ? { ...c, deliveryS: deliveryS ?? Number.NaN } : c)))} error={issueAt(`channels[${index}].deliveryS`)} testId={`channel-delivery-${index}`} />
              <div className="flex gap-1 pb-0.5">
                <Button type="button" variant="secondary" className="px-2 py-1" aria-label={`Move ${channelName(channel.id)} up`} disabled={index === 0} onClick={() => setChannels(moveItem(channels, index, -1))}>
                  ↑
                </Button>
                <Button type="button" variant="secondary" className="px-2 py-1" aria-label={`Move ${channelName(channel.id)} down`} disabled={index === channels.length - 1} onClick={() => setChannels(moveItem(channels, index, 1))}>
                  ↓
                </Button>
                <Button type="button" variant="quiet" className="px-1 py-1" aria-label={`Remove ${channelName(channel.id)}`} disabled={channels.length === 1} onClick={() => setChannels(channels.filter((_, i) => i !== index))}>
                  Remove
                </Button>
              </div>
            </li>
          ))}
        </ol>
        {issueAt("channels") && <p className="text-xs text-error-ink">{issueAt("channels")}</p>}
        <Button type="button" variant="secondary" className="px-2 py-1" onClick={() => setChannels([...channels, { id: `channel-${channels.length + 1}`, deliveryS: 5 }])}>
          Add a channel
        </Button>
      </FieldGroup>
    </div>
  );
}
