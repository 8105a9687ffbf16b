import { RESULT_LINE_COLOURS as L } from "@/lib/colour/ramps";
import { frontDistanceKm, type ReplayModel } from "@/lib/workspace/replay";
import { channelName } from "./alert-rules-form";

const W = 400;
const H = 240;
const M = { left: 40, right: 12, top: 12, bottom: 32 };

/** Ticks at a round step that gives about five per axis. */
function ticks(max: number): number[] {
  const raw = max / 5;
  const step = [1, 2, 5, 10, 20, 25, 50, 100, 200, 500].find((s) => s >= raw) ?? 1000;
  return Array.from({ length: Math.floor(max / step) + 1 }, (_, i) => i * step);
}

/**
 * Distance from the epicentre against time since origin: the P and S first-arrival curves, each
 * station's P pick, the moment the alert is issued and reaches each channel, the blind zone (the
 * distances the S wave reaches before the primary channel's alert), and the replay's time.
 */
export function TimeDistanceStrip({ model, timeS }: { model: ReplayModel; timeS: number }) {
  const maxKm = model.maxDistanceKm;
  const x = (t: number) => M.left + (Math.min(t, model.endS) / model.endS) * (W - M.left - M.right);
  const y = (km: number) => H - M.bottom - (Math.min(km, maxKm) / maxKm) * (H - M.top - M.bottom);
  const curve = (times: Float64Array) => {
    const points: string[] = [];
    const every = Math.max(1, Math.floor(times.length / 200));
    for (let i = 0; i < times.length; i += every) {
      const km = i * model.curve.stepKm;
      if (km > maxKm || times[i] > model.endS) break;
      points.push(`${x(times[i]).toFixed(1)},${y(km).toFixed(1)}`);
    }
    return points.join(" ");
  };
  const primary = model.channels[0];
  const blindKm = model.alertIssued ? (frontDistanceKm(model, "S", primary.alertS) ?? 0) : 0;
  const bottom = H - M.bottom;

  return (
    <figure className="space-y-1" data-testid="time-distance-strip">
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label="Distance from the epicentre against time since origin, with the P and S waves and the alert">
        <rect x={M.left} y={M.top} width={W - M.left - M.right} height={bottom - M.top} fill="#ffffff" stroke="#d6d1c4" />
        {blindKm > 0 && <rect x={M.left} y={y(blindKm)} width={W - M.left - M.right} height={bottom - y(blindKm)} fill={L.blindZoneEdge} fillOpacity="0.1" />}
        {ticks(model.endS).map((t) => (
          <g key={`t${t}`}>
            <line x1={x(t)} x2={x(t)} y1={bottom} y2={bottom + 4} stroke="#4f5d66" />
            <text x={x(t)} y={bottom + 15} fontSize="10" textAnchor="middle" fill="#4f5d66">
              {t}
            </text>
          </g>
        ))}
        {ticks(maxKm).map((km) => (
          <g key={`d${km}`}>
            <line x1={M.left - 4} x2={M.left} y1={y(km)} y2={y(km)} stroke="#4f5d66" />
            <text x={M.left - 6} y={y(km) + 3} fontSize="10" textAnchor="end" fill="#4f5d66">
              {km}
            </text>
          </g>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 4} fontSize="10" textAnchor="middle" fill="#1c2730">
          time since origin (s)
        </text>
        <text x={10} y={(M.top + bottom) / 2} fontSize="10" textAnchor="middle" fill="#1c2730" transform={`rotate(-90 10 ${(M.top + bottom) / 2})`}>
          distance (km)
        </text>
        <polyline points={curve(model.curve.pS)} fill="none" stroke={L.pFront} strokeWidth="1.6" />
        <polyline points={curve(model.curve.sS)} fill="none" stroke={L.sFront} strokeWidth="1.6" />
        {model.alertIssued && (
          <line x1={x(model.alertIssuedS)} x2={x(model.alertIssuedS)} y1={M.top} y2={bottom} stroke={L.alertArea} strokeDasharray="4 3" />
        )}
        {model.alertIssued &&
          model.channels.map((c, i) => (
            <g key={c.id}>
              <line x1={x(c.alertS)} x2={x(c.alertS)} y1={M.top} y2={bottom} stroke={L.alertArea} strokeWidth={i === 0 ? 1.6 : 0.8} />
              <text x={x(c.alertS) + 2} y={M.top + 10 + i * 11} fontSize="9" fill={L.alertArea}>
                {channelName(c.id)}
              </text>
            </g>
          ))}
        {model.stations
          .filter((s) => s.operating && s.epicentralKm <= maxKm)
          .map((s) => (
            <circle key={s.id} cx={x(s.pArrivalS)} cy={y(s.epicentralKm)} r="2.6" fill={timeS >= s.pArrivalS ? L.triggeredStation : "#ffffff"} stroke={L.triggeredStation} strokeWidth="1" />
          ))}
        <line x1={x(timeS)} x2={x(timeS)} y1={M.top} y2={bottom} stroke="#1c2730" strokeWidth="1" />
      </svg>
      <figcaption className="flex flex-wrap gap-x-3 text-xs text-ink-muted">
        <span className="text-tide">— P wave</span>
        <span className="text-[#8a3b12]">— S wave</span>
        <span>● station picks the P wave</span>
        <span>| alert reaches a channel (thick: primary)</span>
        {blindKm > 0 && <span>shaded: blind zone, 0–{blindKm.toFixed(0)} km</span>}
      </figcaption>
    </figure>
  );
}
