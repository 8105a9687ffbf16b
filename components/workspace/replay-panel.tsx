"use client";

import { useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { frontDistanceKm, triggeredStations, type ReplayModel } from "@/lib/workspace/replay";
import { formatKm, formatTimeS } from "@/lib/workspace/format";
import { channelName } from "./alert-rules-form";
import { NumberField } from "./fields";
import { TimeDistanceStrip } from "./time-distance-strip";

const SPEEDS = [1, 2, 5] as const;

/** Advances the replay clock in real time × speed while playing; stops at the end. */
function usePlayback(model: ReplayModel, playing: boolean, speed: number, timeS: number, setTimeS: (t: number) => void, stop: () => void) {
  const clock = useRef({ timeS, setTimeS, stop });
  useEffect(() => {
    clock.current = { timeS, setTimeS, stop };
  });
  useEffect(() => {
    if (!playing) return;
    let frame = 0;
    let last = performance.now();
    const tick = (now: number) => {
      const next = clock.current.timeS + ((now - last) / 1000) * speed;
      last = now;
      if (next >= model.endS) {
        clock.current.setTimeS(model.endS);
        clock.current.stop();
        return;
      }
      clock.current.setTimeS(next);
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [playing, speed, model.endS]);
}

/**
 * Replay controls and what has happened by the chosen time since origin: where the P and S fronts
 * are, which stations have picked the P wave, and which alert moments have passed. Plain text and
 * thin lines only: no countdown, no flashing.
 */
export function ReplayPanel({
  model,
  timeS,
  setTimeS,
  playing,
  setPlaying,
  speed,
  setSpeed,
}: {
  model: ReplayModel;
  timeS: number;
  setTimeS: (t: number) => void;
  playing: boolean;
  setPlaying: (on: boolean) => void;
  speed: number;
  setSpeed: (s: number) => void;
}) {
  usePlayback(model, playing, speed, timeS, setTimeS, () => setPlaying(false));
  const pKm = frontDistanceKm(model, "P", timeS);
  const sKm = frontDistanceKm(model, "S", timeS);
  const triggered = triggeredStations(model, timeS);
  const operating = model.stations.filter((s) => s.operating).length;
  const issued = model.alertIssued && timeS >= model.alertIssuedS;

  return (
    <div className="space-y-3" data-testid="replay-panel">
      <div className="flex flex-wrap items-end gap-2">
        <Button type="button" variant="secondary" className="px-3 py-1" onClick={() => (timeS >= model.endS ? (setTimeS(0), setPlaying(true)) : setPlaying(!playing))} data-testid="replay-play">
          {playing ? "Pause" : "Play"}
        </Button>
        <label className="text-xs">
          <span className="block font-semibold">Speed</span>
          <select value={speed} onChange={(event) => setSpeed(Number(event.target.value))} className="rounded-card border border-line-strong bg-surface px-2 py-1 text-sm">
            {SPEEDS.map((s) => (
              <option key={s} value={s}>
                {s}× real time
              </option>
            ))}
          </select>
        </label>
        <div className="w-28">
          <NumberField
            label="Time since origin"
            unit="s"
            value={Math.round(timeS * 10) / 10}
            onChange={(t) => {
              if (t === undefined || !Number.isFinite(t)) return;
              setPlaying(false);
              setTimeS(Math.min(model.endS, Math.max(0, t)));
            }}
            testId="replay-time"
          />
        </div>
      </div>
      <label className="block text-xs">
        <span className="sr-only">Scrub through time since origin</span>
        <input
          type="range"
          min={0}
          max={model.endS}
          step={0.1}
          value={timeS}
          onChange={(event) => {
            setPlaying(false);
            setTimeS(Number(event.target.value));
          }}
          className="w-full accent-tide"
          data-testid="replay-slider"
        />
      </label>
      <TimeDistanceStrip model={model} timeS={timeS} />
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm" data-testid="replay-state" data-time-s={timeS.toFixed(1)}>
        <dt className="text-ink-muted">Time since origin</dt>
        <dd data-testid="replay-time-s">{formatTimeS(timeS)} s</dd>
        <dt className="text-ink-muted">P front</dt>
        <dd>
          <span data-testid="replay-p-front-km">{pKm === null ? "not yet at the surface" : formatKm(pKm)}</span>
          {pKm === null ? "" : " km from the epicentre"}
        </dd>
        <dt className="text-ink-muted">S front</dt>
        <dd>
          <span data-testid="replay-s-front-km">{sKm === null ? "not yet at the surface" : formatKm(sKm)}</span>
          {sKm === null ? "" : " km from the epicentre"}
        </dd>
        <dt className="text-ink-muted">Stations triggered</dt>
        <dd>
          <span data-testid="replay-triggered-count">{triggered.length}</span> of {operating} operating (alert needs {model.triggerStations})
        </dd>
      </dl>
      <p className="text-xs text-ink-muted" data-testid="replay-triggered-list">
        {triggered.length ? triggered.map((s) => s.id).join(", ") : "No station has picked the P wave yet."}
      </p>
      <ol className="space-y-0.5 text-sm" data-testid="replay-alerts">
        <li data-testid="replay-alert-issued" data-state={issued ? "reached" : "pending"}>
          {model.alertIssued ? `Alert issued at ${formatTimeS(model.alertIssuedS)} s` : "No alert is issued: predicted shaking stays below “issue at”."}
          {model.alertIssued ? (issued ? " — issued" : " — not yet") : ""}
        </li>
        {model.alertIssued &&
          model.channels.map((c, i) => {
            const reached = timeS >= c.alertS;
            return (
              <li key={c.id} data-testid={`replay-alert-${i}`} data-channel={c.id} data-alert-s={c.alertS.toFixed(2)} data-state={reached ? "reached" : "pending"} className={reached ? "font-semibold" : "text-ink-muted"}>
                {channelName(c.id)}
                {i === 0 ? " (primary)" : ""}: alert reaches people at {formatTimeS(c.alertS)} s{reached ? " — reached" : ""}
              </li>
            );
          })}
      </ol>
    </div>
  );
}
