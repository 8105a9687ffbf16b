/**
 * Live results for the map workspace. While something is being dragged, each change asks the
 * engine worker for the preview grid over the visible area (≥ 200 × 200 cells); once the drag
 * ends (or after a typed edit) it asks for the full grid at the scenario's cell size, which then
 * replaces the preview. Results older than the one shown are dropped.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import type { Bbox, ContourSet, EngineGrid, GridSummary, Provenance, SiteResult } from "@/lib/geo";
import type { ScenarioIssue, Scenario } from "@/lib/scenario/schema";
import { startEngineWorker, type EngineClient } from "./engine-client";
import { previewGrid } from "./preview-area";

/** Most cells of a full grid computed in the browser (contours are traced on at most 1 M cells). */
export const FULL_GRID_MAX_CELLS = 1_000_000;

/** What the map shows: the latest finished grid. */
export interface EngineResults {
  kind: "preview" | "full";
  grid: EngineGrid;
  summary: GridSummary;
  contours: ContourSet;
  notes: string[];
  provenance: Provenance;
  /** Which edit of the draft it belongs to. */
  revision: number;
}

/** Provenance the scenario file does not hold: which stored version and layers it comes from. */
export interface ResultContext {
  scenarioVersion: number | string | null;
  layerVersions: Record<string, number>;
}

/**
 * One engine worker per component, started on first use (inside an effect) and stopped when the
 * component unmounts.
 */
export function useEngineClient(): () => EngineClient {
  const client = useRef<EngineClient | null>(null);
  useEffect(
    () => () => {
      client.current?.dispose();
      client.current = null;
    },
    [],
  );
  return useCallback(() => (client.current ??= startEngineWorker()), []);
}

/** The newest value, for effects that read it without re-running when it changes. */
function useLatest<T>(value: T): { readonly current: T } {
  const ref = useRef(value);
  useEffect(() => {
    ref.current = value;
  }, [value]);
  return ref;
}

/**
 * Grid results for `scenario` (null while the draft does not parse). `interacting` is true during
 * a drag; `visibleBbox` is the map's view. `computing` is true while the results shown are not yet
 * those of the current scenario (or still a preview after the drag ended).
 */
export function useEngineResults(
  scenario: Scenario | null,
  { interacting, visibleBbox, context, client }: { interacting: boolean; visibleBbox: Bbox | null; context: ResultContext; client: () => EngineClient },
): { results: EngineResults | null; computing: boolean; issues: ScenarioIssue[] } {
  const [shown, setShown] = useState<{ results: EngineResults; scenario: Scenario } | null>(null);
  const [failed, setFailed] = useState<{ issues: ScenarioIssue[]; scenario: Scenario } | null>(null);
  const revision = useRef(0);
  const shownRevision = useRef(-1);
  const contextRef = useLatest(context);
  // The view only matters while dragging: a pan alone does not recompute the full grid.
  const previewBbox = interacting ? visibleBbox : null;

  useEffect(() => {
    if (!scenario) return;
    const engine = client();
    const current = ++revision.current;
    const kind = previewBbox ? "preview" : "full";
    const geometry = previewBbox
      ? previewGrid(previewBbox, scenario.area.bbox)
      : { bbox: scenario.area.bbox, cellKm: scenario.area.cellKm, maxCells: FULL_GRID_MAX_CELLS };
    if (kind === "full") engine.cancel("preview");
    const job = {
      kind: "grid" as const,
      scenario,
      bbox: geometry.bbox,
      cellKm: geometry.cellKm,
      maxCells: geometry.maxCells,
      contours: true,
      // A preview lasts one frame of a drag, and the site card asks for its own point: no PGA or P(exceed).
      detail: kind === "full",
      computedAt: new Date().toISOString(),
      scenarioVersion: contextRef.current.scenarioVersion,
      layerVersions: contextRef.current.layerVersions,
    };
    void engine.request(kind, job).then((response) => {
      if (!response || current < shownRevision.current) return;
      if (!response.ok) {
        setFailed({ issues: response.issues, scenario });
        return;
      }
      if (response.kind !== "grid" || !response.contours) return;
      shownRevision.current = current;
      setFailed(null);
      setShown({
        scenario,
        results: { kind, grid: response.grid, summary: response.summary, contours: response.contours, notes: response.notes, provenance: response.provenance, revision: current },
      });
    });
  }, [client, scenario, previewBbox, contextRef]);

  const results = shown?.results ?? null;
  const computing = scenario !== null && (shown?.scenario !== scenario || (results?.kind === "preview" && !previewBbox)) && failed?.scenario !== scenario;
  return { results, computing, issues: failed && failed.scenario === scenario ? failed.issues : [] };
}

/** What the site card shows for a point. */
export interface SiteCardResult {
  site: SiteResult | null;
  notes: string[];
  provenance: Provenance | null;
  alertIssued: boolean;
}

const NO_SITE: SiteCardResult = { site: null, notes: [], provenance: null, alertIssued: false };

/** The engine's values at one point (the site card), recomputed whenever the scenario or the point changes. */
export function useSiteResult(client: () => EngineClient, scenario: Scenario | null, point: { lon: number; lat: number } | null, context: ResultContext): SiteCardResult {
  const [state, setState] = useState<{ result: SiteCardResult; scenario: Scenario; point: { lon: number; lat: number } } | null>(null);
  const contextRef = useLatest(context);
  useEffect(() => {
    if (!scenario || !point) return;
    let live = true;
    void client()
      .request("site-card", {
        kind: "sites",
        scenario,
        sites: [{ id: "site", lon: point.lon, lat: point.lat }],
        computedAt: new Date().toISOString(),
        scenarioVersion: contextRef.current.scenarioVersion,
        layerVersions: contextRef.current.layerVersions,
      })
      .then((response) => {
        if (!live || !response || !response.ok || response.kind !== "sites") return;
        setState({ scenario, point, result: { site: response.sites[0] ?? null, notes: response.notes, provenance: response.provenance, alertIssued: response.alertIssued } });
      });
    return () => {
      live = false;
    };
  }, [client, scenario, point, contextRef]);
  // A result for an earlier point is not shown for the new one; one for an earlier edit of the scenario is, until the new one comes.
  return state && point && state.point === point ? state.result : NO_SITE;
}
