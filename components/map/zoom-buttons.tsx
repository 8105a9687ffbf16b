/** Zoom and "whole region" buttons: plain buttons rather than MapLibre's control, whose icons are data: images the CSP refuses. */
export function ZoomButtons({ onZoomIn, onZoomOut, onFit }: { onZoomIn: () => void; onZoomOut: () => void; onFit: () => void }) {
  const button = "flex h-8 w-8 items-center justify-center text-lg leading-none text-ink hover:bg-tide-soft focus-visible:z-10";
  return (
    <div className="flex flex-col divide-y divide-line overflow-hidden rounded-card border border-line bg-surface shadow-sm">
      <button type="button" className={button} onClick={onZoomIn} aria-label="Zoom in" title="Zoom in">
        +
      </button>
      <button type="button" className={button} onClick={onZoomOut} aria-label="Zoom out" title="Zoom out">
        −
      </button>
      <button type="button" className={`${button} text-xs font-semibold`} onClick={onFit} aria-label="Show the whole region" title="Show the whole region">
        All
      </button>
    </div>
  );
}
