/** A labelled progress bar; `fraction` null draws an indeterminate bar (work under way, length unknown). */
export function ProgressBar({ label, fraction }: { label: string; fraction: number | null }) {
  const percent = fraction === null ? null : Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div className="space-y-1" data-testid="upload-progress">
      <div className="flex justify-between text-sm">
        <span>{label}</span>
        {percent !== null && <span className="text-ink-muted">{percent}%</span>}
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent ?? undefined}
        className="h-2 overflow-hidden rounded-full bg-tide-soft"
      >
        <div className={`h-full bg-tide transition-[width] ${percent === null ? "w-1/3 animate-pulse" : ""}`} style={percent === null ? undefined : { width: `${percent}%` }} />
      </div>
    </div>
  );
}
