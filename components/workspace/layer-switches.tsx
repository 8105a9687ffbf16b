"use client";

import { LAYER_SWITCHES, type LayerSwitchId } from "@/components/map/result-layers";

/** Check boxes that show or hide the workspace's map layers; switches for data the role may not read are left out. */
export function LayerSwitches({
  visible,
  onChange,
  unavailable,
}: {
  visible: Record<LayerSwitchId, boolean>;
  onChange: (id: LayerSwitchId, on: boolean) => void;
  unavailable: ReadonlySet<LayerSwitchId>;
}) {
  return (
    <fieldset className="rounded-card border border-line bg-surface/95 px-3 py-2 text-xs shadow-sm" data-testid="layer-switches">
      <legend className="sr-only">Map layers</legend>
      <p className="mb-1 font-semibold">Layers</p>
      <ul className="space-y-0.5">
        {LAYER_SWITCHES.filter((s) => !unavailable.has(s.id)).map((s) => (
          <li key={s.id}>
            <label className="flex items-center gap-2">
              <input type="checkbox" checked={visible[s.id]} onChange={(event) => onChange(s.id, event.target.checked)} data-testid={`layer-${s.id}`} />
              {s.label}
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
