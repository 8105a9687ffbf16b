"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { FeatureCollection } from "geojson";
import { useRouter } from "next/navigation";
import { useDeferredValue, useMemo, useReducer, useState } from "react";
import { LAYER_SWITCHES, type LayerSwitchId } from "@/components/map/result-layers";
import type { ScenarioState } from "@/db/schema";
import { layerFeaturesQuery } from "@/lib/api/layer-queries";
import { scenarioVersionQuery } from "@/lib/api/queries";
import { scenarioWrites } from "@/lib/api/scenario-writes";
import type { WorkspaceAction } from "@/lib/exposure/inputs";
import { describeProvenance, type Bbox, type IntensityScaleId } from "@/lib/geo";
import { DEFAULT_CHANNELS, DEFAULT_WARNING_BREAKS_S } from "@/lib/scenario/defaults";
import { parseScenario } from "@/lib/scenario/schema";
import { applyDraftAction, type ScenarioDraft } from "@/lib/workspace/draft";
import { populationDensitySquares } from "@/lib/workspace/population-density";
import { buildReplayModel, frontDistanceKm, frontRing, triggeredStations } from "@/lib/workspace/replay";
import type { LonLat } from "@/lib/workspace/rupture-trace";
import { useEngineClient, useEngineResults, useSiteResult } from "@/lib/workspace/use-engine-results";
import { useUnsavedChangesGuard } from "@/lib/workspace/use-unsaved-changes-guard";
import { AlertRulesForm, channelName } from "./alert-rules-form";
import { issueLookup } from "./issues";
import { LayerSwitches } from "./layer-switches";
import { ReplayPanel } from "./replay-panel";
import { ResultLegends } from "./result-legends";
import { ResultsSummary } from "./results-summary";
import { SaveBar } from "./save-bar";
import { SiteCard, type PickableFacility } from "./site-card";
import { SourceForm } from "./source-form";
import { StationTable } from "./station-table";
import { WorkspaceMap } from "./workspace-map";

/** A stored layer version the map can draw (through /api/layers/…/features). */
export interface LayerRef {
  layerId: number;
  number: number;
}

/** What the server page knows: who is looking, and the workspace's settings. */
export interface ScenarioWorkspaceProps {
  scenarioId: number;
  versionNumber: number;
  versionState: ScenarioState;
  /** The highest version number, whatever the role may see: a save becomes the next one. */
  latestNumber: number;
  canEdit: boolean;
  roleLabel: string;
  workspaceScale: IntensityScaleId;
  reactionTimeS: number;
  actions: WorkspaceAction[];
  /** Layers the scenario version records, when the role may read layers. */
  layers: { population?: LayerRef; facilities?: LayerRef };
}

type Tab = "source" | "stations" | "alert" | "site" | "replay";
const TABS: { id: Tab; label: string; editing: boolean }[] = [
  { id: "source", label: "Source", editing: true },
  { id: "stations", label: "Stations", editing: true },
  { id: "alert", label: "Alert rules", editing: true },
  { id: "site", label: "Site card", editing: false },
  { id: "replay", label: "Replay", editing: false },
];

const INITIAL_LAYERS = Object.fromEntries(LAYER_SWITCHES.map((s) => [s.id, s.initiallyOn])) as Record<LayerSwitchId, boolean>;

/** The map workspace of one scenario version: loads the version's scenario file, then edits it. */
export function ScenarioWorkspace(props: ScenarioWorkspaceProps) {
  const { data, error, isPending } = useQuery(scenarioVersionQuery(props.scenarioId, props.versionNumber));
  if (isPending) return <p className="text-ink-muted">Loading the scenario…</p>;
  if (error) return <p role="alert" className="text-error-ink">The scenario could not be loaded: {error.message}</p>;
  return <WorkspaceEditor key={`${props.scenarioId}/${props.versionNumber}`} {...props} initial={data.version.params as ScenarioDraft} layerVersions={data.version.layerVersions} />;
}

function WorkspaceEditor(props: ScenarioWorkspaceProps & { initial: ScenarioDraft; layerVersions: Record<string, number> }) {
  const { scenarioId, versionNumber, canEdit, workspaceScale } = props;
  const router = useRouter();
  const queryClient = useQueryClient();
  const [draft, dispatch] = useReducer(applyDraftAction, props.initial);
  const [savedJson, setSavedJson] = useState(() => JSON.stringify(props.initial));
  const dirty = useMemo(() => JSON.stringify(draft) !== savedJson, [draft, savedJson]);
  useUnsavedChangesGuard(dirty, "This scenario has unsaved changes. Leave without saving them?");

  // The workspace's intensity scale applies when the file names none (as on the server).
  const computed = useMemo(() => (draft.intensityScale ? draft : { ...draft, intensityScale: workspaceScale }), [draft, workspaceScale]);
  const parsed = useMemo(() => parseScenario(computed), [computed]);
  const scenario = parsed.ok ? parsed.scenario : null;
  const issueAt = useMemo(() => issueLookup(parsed.ok ? [] : parsed.issues), [parsed]);
  const scale = scenario?.intensityScale ?? workspaceScale;

  const [dragging, setDragging] = useState(false);
  const [view, setView] = useState<Bbox | null>(null);
  const context = useMemo(() => ({ scenarioVersion: dirty ? `${versionNumber}, unsaved edits` : versionNumber, layerVersions: props.layerVersions }), [dirty, versionNumber, props.layerVersions]);
  const client = useEngineClient();
  const { results, computing, issues: engineIssues } = useEngineResults(scenario, { interacting: dragging, visibleBbox: view, context, client });

  const [tab, setTab] = useState<Tab>(canEdit ? "source" : "site");
  const [addingStation, setAddingStation] = useState(false);
  const [sitePoint, setSitePoint] = useState<LonLat | null>(null);
  const site = useSiteResult(client, scenario, sitePoint, context);
  const [visible, setVisible] = useState(INITIAL_LAYERS);

  const population = useQuery({ ...layerFeaturesQuery(props.layers.population?.layerId ?? 0, props.layers.population?.number ?? 0), enabled: Boolean(props.layers.population) && visible.population });
  const facilityFeatures = useQuery({ ...layerFeaturesQuery(props.layers.facilities?.layerId ?? 0, props.layers.facilities?.number ?? 0), enabled: Boolean(props.layers.facilities) });
  const populationSquares = useMemo<FeatureCollection | null>(() => {
    const layer = population.data;
    if (!layer || !layer.bbox) return null;
    const points = layer.features.flatMap((f) => (f.geometry.type === "Point" && f.properties.value !== undefined ? [{ lon: f.geometry.coordinates[0], lat: f.geometry.coordinates[1], people: f.properties.value }] : []));
    return populationDensitySquares(points, layer.bbox);
  }, [population.data]);
  const facilities = (facilityFeatures.data as FeatureCollection | undefined) ?? null;
  const pickable = useMemo<PickableFacility[]>(
    () =>
      (facilityFeatures.data?.features ?? []).flatMap((f) =>
        f.geometry.type === "Point" ? [{ name: f.properties.label, kind: f.properties.kind ?? "facility", lon: f.geometry.coordinates[0], lat: f.geometry.coordinates[1] }] : [],
      ),
    [facilityFeatures.data],
  );

  // The replay is built from the engine on the main thread (about 15 ms): only while its tab is open, and a step behind a drag.
  const replayScenario = useDeferredValue(tab === "replay" ? scenario : null);
  const alertIssued = results?.summary.alertIssued ?? false;
  const replayModel = useMemo(() => (replayScenario ? buildReplayModel(replayScenario, alertIssued) : null), [replayScenario, alertIssued]);
  const [replayTimeS, setReplayTimeS] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const replayOverlay = useMemo(() => {
    if (!replayModel) return null;
    const fronts: FeatureCollection = { type: "FeatureCollection", features: [] };
    for (const phase of ["P", "S"] as const) {
      const km = frontDistanceKm(replayModel, phase, replayTimeS);
      if (km === null || km <= 0) continue;
      fronts.features.push({ type: "Feature", properties: { phase, label: `${phase} wave, ${replayTimeS.toFixed(1)} s` }, geometry: { type: "LineString", coordinates: frontRing(replayModel, km) } });
    }
    const triggered: FeatureCollection = {
      type: "FeatureCollection",
      features: triggeredStations(replayModel, replayTimeS).map((s) => ({ type: "Feature", properties: { id: s.id }, geometry: { type: "Point", coordinates: [s.lon, s.lat] } })),
    };
    return { fronts, triggered };
  }, [replayModel, replayTimeS]);

  const save = useMutation({
    mutationFn: (note: string) => scenarioWrites.saveVersion(scenarioId, { scenario: draft, basedOn: versionNumber, ...(note.trim() ? { note: note.trim() } : {}) }),
    onSuccess: async (saved) => {
      setSavedJson(JSON.stringify(draft));
      await queryClient.invalidateQueries({ queryKey: ["scenarios"] });
      router.push(`/scenarios/${scenarioId}?v=${saved.version.number}`);
    },
  });

  const primaryChannel = channelName((draft.channels ?? DEFAULT_CHANNELS.value)[0]?.id ?? "");
  const unavailable = new Set<LayerSwitchId>([...(props.layers.population ? [] : ["population" as const]), ...(props.layers.facilities ? [] : ["facilities" as const])]);
  const problems = parsed.ok ? engineIssues : parsed.issues;

  return (
    <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_27rem]" data-testid="scenario-workspace" data-dirty={dirty ? "true" : "false"}>
      <div className="min-w-0 space-y-3">
        <WorkspaceMap
          draft={draft}
          dispatch={dispatch}
          editable={canEdit}
          addingStation={addingStation}
          onStationAdded={() => setAddingStation(false)}
          results={results}
          visibleLayers={visible}
          population={populationSquares}
          facilities={facilities}
          replay={tab === "replay" ? replayOverlay : null}
          site={sitePoint}
          onPickSite={(point) => {
            setSitePoint(point);
            if (tab !== "replay") setTab("site");
          }}
          onInteractionChange={setDragging}
          onViewChange={setView}
          provenance={results ? `How it was made: ${describeProvenance(results.provenance)}.` : undefined}
        >
          <LayerSwitches visible={visible} unavailable={unavailable} onChange={(id, on) => setVisible((current) => ({ ...current, [id]: on }))} />
        </WorkspaceMap>
        <ResultsSummary results={results} computing={computing} scaleLabel={scale === "jma" ? "JMA intensity" : "MMI"} />
        {problems.length > 0 && (
          <div role="alert" className="rounded-card bg-error-bg p-3 text-sm text-error-ink" data-testid="scenario-issues">
            <p className="font-semibold">The scenario cannot be computed until these are fixed (the map shows the last good results):</p>
            <ul className="list-disc pl-5">
              {problems.slice(0, 8).map((issue) => (
                <li key={`${issue.path}:${issue.message}`}>
                  <code>{issue.path}</code>: {issue.message}
                </li>
              ))}
            </ul>
          </div>
        )}
        <ResultLegends visible={visible} breaksS={results?.grid.warningBreaksS ?? DEFAULT_WARNING_BREAKS_S.value} scale={scale} provenance={results?.provenance ?? null} primaryChannel={primaryChannel} />
        {results && results.notes.length > 0 && (
          <ul className="list-disc space-y-0.5 pl-5 text-xs text-ink-muted" data-testid="engine-notes">
            {results.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        )}
      </div>

      <aside className="space-y-3">
        {canEdit ? (
          <SaveBar
            dirty={dirty}
            valid={parsed.ok}
            saving={save.isPending}
            error={save.error ? save.error.message : null}
            versionNumber={versionNumber}
            latestNumber={props.latestNumber}
            versionState={props.versionState}
            onSave={(note) => save.mutate(note)}
            onDiscard={() => dispatch({ type: "replace", draft: props.initial })}
          />
        ) : (
          <p className="rounded-card border border-line bg-surface p-3 text-sm" data-testid="read-only-note">
            Read-only for your role ({props.roleLabel}): move around the map, use the site card and the replay. Nothing here is saved.
          </p>
        )}
        <div role="tablist" aria-label="Workspace panels" className="flex flex-wrap gap-1">
          {TABS.map((t) => (
            <button
              key={t.id}
              type="button"
              role="tab"
              aria-selected={tab === t.id}
              data-testid={`tab-${t.id}`}
              onClick={() => setTab(t.id)}
              className={`rounded-card px-3 py-1 text-sm ${tab === t.id ? "bg-tide text-on-tide" : "border border-line bg-surface text-ink hover:bg-tide-soft"}`}
            >
              {t.label}
              {t.editing && !canEdit ? " (view)" : ""}
            </button>
          ))}
        </div>
        <div role="tabpanel" className="rounded-card border border-line bg-surface p-3">
          <fieldset disabled={!canEdit} className="min-w-0">
            {tab === "source" && <SourceForm draft={draft} dispatch={dispatch} issueAt={issueAt} workspaceScale={workspaceScale} />}
            {tab === "stations" && <StationTable draft={draft} dispatch={dispatch} issueAt={issueAt} addingOnMap={addingStation} onAddOnMap={setAddingStation} />}
            {tab === "alert" && <AlertRulesForm draft={draft} dispatch={dispatch} issueAt={issueAt} scale={scale} />}
          </fieldset>
          {tab === "site" && (
            <SiteCard
              point={sitePoint}
              onPick={setSitePoint}
              site={site.site}
              alertIssued={site.alertIssued}
              provenance={site.provenance}
              notes={site.notes}
              facilities={pickable}
              actions={props.actions}
              reactionTimeS={props.reactionTimeS}
              scale={scale}
            />
          )}
          {tab === "replay" &&
            (replayModel ? (
              <ReplayPanel model={replayModel} timeS={replayTimeS} setTimeS={setReplayTimeS} playing={playing} setPlaying={setPlaying} speed={speed} setSpeed={setSpeed} />
            ) : (
              <p className="text-sm text-ink-muted">{scenario ? "Preparing the replay…" : "Fix the scenario's fields to replay it."}</p>
            ))}
        </div>
      </aside>
    </div>
  );
}
