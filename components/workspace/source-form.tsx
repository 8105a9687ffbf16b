"use client";

import { FAULT_TYPE_LABELS } from "@/components/scenarios/fault-type";
import { listGroundMotionModels, type IntensityScaleId } from "@/lib/geo";
import { FAULT_TYPES, MECHANISMS } from "@/lib/geo/ground-motion/types";
import { DEFAULT_MODELS } from "@/lib/scenario/defaults";
import type { DraftAction, ScenarioDraft } from "@/lib/workspace/draft";
import { FieldGroup, NumberField, SmallSelect } from "./fields";
import type { IssueLookup } from "./issues";

const MECHANISM_LABELS: Record<(typeof MECHANISMS)[number], string> = {
  unspecified: "Not specified",
  "strike-slip": "Strike-slip",
  normal: "Normal",
  reverse: "Reverse",
};

type VelocityChoice = "iasp91" | "ak135" | "homogeneous";

/** Default Vp and Vs offered when a planner picks the homogeneous model: IASP91's upper crust (METHODS §1). */
const HOMOGENEOUS_START = { vpKms: 5.8, vsKms: 3.36 };

/** The source: epicentre, depth, magnitude, fault type, finite rupture, and the models used for it. */
export function SourceForm({ draft, dispatch, issueAt, workspaceScale }: { draft: ScenarioDraft; dispatch: (a: DraftAction) => void; issueAt: IssueLookup; workspaceScale: IntensityScaleId }) {
  const { source } = draft;
  const rupture = source.rupture;
  const vm = draft.velocityModel;
  const velocityChoice: VelocityChoice = vm?.kind === "homogeneous" ? "homogeneous" : (vm?.name ?? "iasp91");
  const models = listGroundMotionModels();
  const setSource = (patch: Partial<Omit<ScenarioDraft["source"], "rupture">>) => dispatch({ type: "set-source", patch });

  return (
    <div className="space-y-3" data-testid="source-form">
      <FieldGroup title="Epicentre and size" note="Drag the epicentre on the map, or type it here.">
        <div className="grid grid-cols-2 gap-2">
          <NumberField label="Longitude" unit="°" value={source.lon} onChange={(lon) => setSource({ lon })} error={issueAt("source.lon")} testId="source-lon" />
          <NumberField label="Latitude" unit="°" value={source.lat} onChange={(lat) => setSource({ lat })} error={issueAt("source.lat")} testId="source-lat" />
          <NumberField label="Depth" unit="km" value={source.depthKm} onChange={(depthKm) => setSource({ depthKm })} error={issueAt("source.depthKm")} testId="source-depth" />
          <NumberField label="Magnitude" unit="Mw" value={source.mw} onChange={(mw) => setSource({ mw })} error={issueAt("source.mw")} testId="source-mw" />
          <SmallSelect
            label="Fault type"
            value={source.faultType}
            options={FAULT_TYPES.map((value) => ({ value, label: FAULT_TYPE_LABELS[value] ?? value }))}
            onChange={(faultType) => setSource({ faultType })}
            error={issueAt("source.faultType")}
          />
          <SmallSelect
            label="Mechanism"
            value={source.mechanism ?? "unspecified"}
            options={MECHANISMS.map((value) => ({ value, label: MECHANISM_LABELS[value] }))}
            onChange={(mechanism) => setSource({ mechanism: mechanism === "unspecified" ? undefined : mechanism })}
          />
        </div>
      </FieldGroup>

      <FieldGroup
        title="Finite rupture"
        note={rupture ? "Set strike and length, then drag the two ends of the red line on the map. Empty length or width: Wells & Coppersmith (1994) for the magnitude." : "Without a rupture the source is a point."}
      >
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={rupture !== undefined}
            data-testid="rupture-toggle"
            onChange={(event) => dispatch({ type: "set-rupture", rupture: event.target.checked ? { strikeDeg: 0, dipDeg: 45, mode: "bilateral" } : undefined })}
          />
          Model a finite rupture
        </label>
        {rupture && (
          <div className="grid grid-cols-2 gap-2">
            <NumberField label="Strike" unit="°" value={rupture.strikeDeg} onChange={(strikeDeg) => dispatch({ type: "set-rupture", rupture: { ...rupture, strikeDeg: strikeDeg ?? Number.NaN } })} error={issueAt("source.rupture.strikeDeg")} testId="rupture-strike" />
            <NumberField label="Dip" unit="°" value={rupture.dipDeg} onChange={(dipDeg) => dispatch({ type: "set-rupture", rupture: { ...rupture, dipDeg: dipDeg ?? Number.NaN } })} error={issueAt("source.rupture.dipDeg")} />
            <NumberField label="Length" unit="km" optional value={rupture.lengthKm} onChange={(lengthKm) => dispatch({ type: "set-rupture", rupture: { ...rupture, lengthKm } })} error={issueAt("source.rupture.lengthKm")} placeholder="from magnitude" testId="rupture-length" />
            <NumberField label="Width" unit="km" optional value={rupture.widthKm} onChange={(widthKm) => dispatch({ type: "set-rupture", rupture: { ...rupture, widthKm } })} error={issueAt("source.rupture.widthKm")} placeholder="from magnitude" />
            <SmallSelect
              label="Grows"
              value={rupture.mode ?? "unilateral"}
              options={[
                { value: "unilateral", label: "One way, along strike" },
                { value: "bilateral", label: "Both ways from the middle" },
              ]}
              onChange={(mode) => dispatch({ type: "set-rupture", rupture: { ...rupture, mode } })}
            />
          </div>
        )}
      </FieldGroup>

      <FieldGroup title="Models and site conditions">
        <div className="grid grid-cols-2 gap-2">
          <SmallSelect<VelocityChoice>
            label="Velocity model"
            value={velocityChoice}
            testId="velocity-model"
            options={[
              { value: "iasp91", label: "IASP91 (layered)" },
              { value: "ak135", label: "AK135 (layered)" },
              { value: "homogeneous", label: "Homogeneous" },
            ]}
            onChange={(choice) =>
              dispatch({
                type: "set-models",
                patch: { velocityModel: choice === "homogeneous" ? { kind: "homogeneous", ...HOMOGENEOUS_START } : { kind: "layered", name: choice } },
              })
            }
          />
          <SmallSelect
            label="Ground-motion model"
            value={draft.groundMotionModel ?? DEFAULT_MODELS.groundMotionModel.value}
            options={models.map((m) => ({ value: m.id, label: `${m.title} (${m.status})` }))}
            onChange={(groundMotionModel) => dispatch({ type: "set-models", patch: { groundMotionModel } })}
            error={issueAt("groundMotionModel")}
          />
          {vm?.kind === "homogeneous" && (
            <>
              <NumberField label="Vp" unit="km/s" value={vm.vpKms} onChange={(vpKms) => dispatch({ type: "set-models", patch: { velocityModel: { ...vm, vpKms: vpKms ?? Number.NaN } } })} error={issueAt("velocityModel.vpKms")} testId="velocity-vp" />
              <NumberField label="Vs" unit="km/s" value={vm.vsKms} onChange={(vsKms) => dispatch({ type: "set-models", patch: { velocityModel: { ...vm, vsKms: vsKms ?? Number.NaN } } })} error={issueAt("velocityModel.vsKms")} testId="velocity-vs" />
            </>
          )}
          <SmallSelect<IntensityScaleId | "workspace">
            label="Intensity scale"
            value={draft.intensityScale ?? "workspace"}
            options={[
              { value: "workspace", label: `Workspace setting (${workspaceScale.toUpperCase()})` },
              { value: "jma", label: "JMA seismic intensity" },
              { value: "mmi", label: "Modified Mercalli (MMI)" },
            ]}
            onChange={(scale) => dispatch({ type: "set-models", patch: { intensityScale: scale === "workspace" ? undefined : scale } })}
          />
          <NumberField label="Vs30 off the site-condition grid" unit="m/s" value={draft.vs30} onChange={(vs30) => dispatch({ type: "set-models", patch: { vs30: vs30 ?? Number.NaN } })} error={issueAt("vs30")} />
        </div>
      </FieldGroup>

      <FieldGroup title="Area computed" note="West, south, east, north in degrees; the full grid uses this cell size.">
        <div className="grid grid-cols-4 gap-2">
          {(["West", "South", "East", "North"] as const).map((label, index) => (
            <NumberField
              key={label}
              label={label}
              unit="°"
              value={draft.area.bbox[index]}
              onChange={(value) => {
                const bbox = [...draft.area.bbox] as typeof draft.area.bbox;
                bbox[index] = value ?? Number.NaN;
                dispatch({ type: "set-area", patch: { bbox } });
              }}
              error={issueAt(`area.bbox[${index}]`)}
              testId={`area-${label.toLowerCase()}`}
            />
          ))}
        </div>
        <NumberField label="Cell size" unit="km" value={draft.area.cellKm} onChange={(cellKm) => dispatch({ type: "set-area", patch: { cellKm: cellKm ?? Number.NaN } })} error={issueAt("area.cellKm")} testId="area-cell-km" />
      </FieldGroup>
    </div>
  );
}
