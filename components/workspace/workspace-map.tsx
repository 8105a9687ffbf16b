"use client";

import type { ExpressionSpecification } from "@maplibre/maplibre-gl-style-spec";
import type { Feature, FeatureCollection, Geometry } from "geojson";
import type { GeoJSONSource, Map as MapLibreMap, MapMouseEvent } from "maplibre-gl";
import { useEffect, useMemo, useRef, useState } from "react";
import { MAP_LAYER_IDS } from "@/components/map/layers";
import { RegionMap, type MapSource, type MapStation } from "@/components/map/region-map";
import { LAYER_SWITCHES, RESULT_LAYER_IDS, RESULT_SOURCE_IDS, warningFillColour, workspaceMapExtension, type LayerSwitchId } from "@/components/map/result-layers";
import { warningBands, type Bbox } from "@/lib/geo";
import { DEFAULT_WARNING_BREAKS_S } from "@/lib/scenario/defaults";
import type { DraftAction, ScenarioDraft } from "@/lib/workspace/draft";
import { ruptureTraceEnds, type LonLat } from "@/lib/workspace/rupture-trace";
import type { EngineResults } from "@/lib/workspace/use-engine-results";

/** Props of {@link WorkspaceMap}. */
export interface WorkspaceMapProps {
  draft: ScenarioDraft;
  dispatch: (action: DraftAction) => void;
  /** Drag handles and station dragging are offered only to people who may edit. */
  editable: boolean;
  /** The next click on the map adds a station there. */
  addingStation: boolean;
  onStationAdded: () => void;
  results: EngineResults | null;
  visibleLayers: Record<LayerSwitchId, boolean>;
  population: FeatureCollection | null;
  facilities: FeatureCollection | null;
  /** Replay overlays: wave fronts and triggered stations. */
  replay: { fronts: FeatureCollection; triggered: FeatureCollection } | null;
  site: LonLat | null;
  onPickSite: (point: LonLat) => void;
  onInteractionChange: (dragging: boolean) => void;
  onViewChange: (bbox: Bbox) => void;
  provenance?: string;
  children?: React.ReactNode;
}

type DragTarget = { kind: "source" } | { kind: "rupture"; which: "start" | "end"; fixed: LonLat } | { kind: "station"; index: number };

const NONE: FeatureCollection = { type: "FeatureCollection", features: [] };
const finite = (...values: unknown[]) => values.every((v) => typeof v === "number" && Number.isFinite(v));
const point = (lon: number, lat: number, properties: Record<string, unknown>): Feature<Geometry> => ({ type: "Feature", geometry: { type: "Point", coordinates: [lon, lat] }, properties });

/** Grab handles for the epicentre and the rupture's ends, and the rupture line. */
function editHandles(draft: ScenarioDraft): { handles: FeatureCollection; line: FeatureCollection } {
  const { source } = draft;
  if (!finite(source.lon, source.lat)) return { handles: NONE, line: NONE };
  const features = [point(source.lon, source.lat, { role: "source" })];
  const rupture = source.rupture;
  if (!rupture || !finite(rupture.strikeDeg, rupture.lengthKm)) return { handles: { type: "FeatureCollection", features }, line: NONE };
  const { start, end } = ruptureTraceEnds(source, { strikeDeg: rupture.strikeDeg, lengthKm: rupture.lengthKm!, mode: rupture.mode ?? "unilateral" });
  features.push(point(start.lon, start.lat, { role: "rupture-start" }), point(end.lon, end.lat, { role: "rupture-end" }));
  const line: FeatureCollection = {
    type: "FeatureCollection",
    features: [{ type: "Feature", geometry: { type: "LineString", coordinates: [[start.lon, start.lat], [end.lon, end.lat]] }, properties: {} }],
  };
  return { handles: { type: "FeatureCollection", features }, line };
}

function setData(map: MapLibreMap, sourceId: string, data: FeatureCollection) {
  map.getSource<GeoJSONSource>(sourceId)?.setData(data);
}

/** The region map with the workspace's results, edit handles and replay drawn on it, and its drags. */
export function WorkspaceMap(props: WorkspaceMapProps) {
  const { draft, editable, results, visibleLayers, population, facilities, replay, site } = props;
  const [map, setMap] = useState<MapLibreMap | null>(null);
  // Map event handlers read the newest props through this ref (they are attached once).
  const latest = useRef(props);
  useEffect(() => {
    latest.current = props;
  });
  const bandIds = useMemo(() => warningBands(results?.grid.warningBreaksS ?? DEFAULT_WARNING_BREAKS_S.value).map((b) => b.id), [results?.grid.warningBreaksS]);
  // The extension is read once, when the map is created; later band ids are set as paint properties.
  const [extension] = useState(() => workspaceMapExtension(bandIds));

  const stations: MapStation[] = useMemo(
    () => draft.stations.filter((s) => finite(s.lon, s.lat)).map((s) => ({ id: s.id, lon: s.lon, lat: s.lat, operating: s.operating !== false })),
    [draft.stations],
  );
  const { source } = draft;
  const sources: MapSource[] = useMemo(
    () => (finite(source.lon, source.lat, source.mw, source.depthKm) ? [{ name: draft.name ?? "Source", lon: source.lon, lat: source.lat, mw: source.mw, depthKm: source.depthKm, faultType: source.faultType }] : []),
    [draft.name, source.lon, source.lat, source.mw, source.depthKm, source.faultType],
  );

  // Contours go to the map only for visible layers: handing GeoJSON to MapLibre's worker costs main-thread time.
  const contoursOnMap = useRef(new Map<string, FeatureCollection>());
  useEffect(() => {
    if (!map || !results) return;
    const layers: [LayerSwitchId, string, FeatureCollection][] = [
      ["warning", RESULT_SOURCE_IDS.warning, results.contours.warning],
      ["intensity", RESULT_SOURCE_IDS.intensity, results.contours.intensity],
      ["alertArea", RESULT_SOURCE_IDS.alertArea, results.contours.alertArea],
      ["blindZone", RESULT_SOURCE_IDS.blindZone, results.contours.blindZone],
    ];
    for (const [switchId, sourceId, data] of layers) {
      if (!visibleLayers[switchId] || contoursOnMap.current.get(sourceId) === data) continue;
      setData(map, sourceId, data);
      contoursOnMap.current.set(sourceId, data);
    }
  }, [map, results, visibleLayers]);

  useEffect(() => {
    map?.setPaintProperty(RESULT_LAYER_IDS.warning, "fill-color", warningFillColour(bandIds) as ExpressionSpecification);
  }, [map, bandIds]);

  useEffect(() => {
    if (!map) return;
    for (const layerSwitch of LAYER_SWITCHES) {
      for (const layerId of layerSwitch.layers) map.setLayoutProperty(layerId, "visibility", visibleLayers[layerSwitch.id] ? "visible" : "none");
    }
  }, [map, visibleLayers]);

  useEffect(() => {
    if (!map) return;
    const { handles, line } = editable ? editHandles(draft) : { handles: NONE, line: NONE };
    setData(map, RESULT_SOURCE_IDS.handles, handles);
    setData(map, RESULT_SOURCE_IDS.ruptureLine, line);
  }, [map, draft, editable]);

  useEffect(() => {
    if (map) setData(map, RESULT_SOURCE_IDS.population, population ?? NONE);
  }, [map, population]);
  useEffect(() => {
    if (map) setData(map, RESULT_SOURCE_IDS.facilities, facilities ?? NONE);
  }, [map, facilities]);
  useEffect(() => {
    if (!map) return;
    setData(map, RESULT_SOURCE_IDS.fronts, replay?.fronts ?? NONE);
    setData(map, RESULT_SOURCE_IDS.replayStations, replay?.triggered ?? NONE);
  }, [map, replay]);
  useEffect(() => {
    if (map) setData(map, RESULT_SOURCE_IDS.site, site ? { type: "FeatureCollection", features: [point(site.lon, site.lat, {})] } : NONE);
  }, [map, site]);

  useEffect(() => {
    if (!map) return;
    let drag: DragTarget | null = null;
    let moved = false;
    let frame = 0;
    let pending: LonLat | null = null;
    const grabbable = [RESULT_LAYER_IDS.handles, MAP_LAYER_IDS.stations];

    const targetAt = (event: MapMouseEvent): DragTarget | null => {
      if (!latest.current.editable) return null;
      const [hit] = map.queryRenderedFeatures(event.point, { layers: grabbable });
      if (!hit) return null;
      if (hit.layer.id === RESULT_LAYER_IDS.handles) {
        const role = hit.properties.role as string;
        if (role === "source") return { kind: "source" };
        const { source } = latest.current.draft;
        const rupture = source.rupture;
        if (!rupture?.lengthKm) return null;
        const ends = ruptureTraceEnds(source, { strikeDeg: rupture.strikeDeg, lengthKm: rupture.lengthKm, mode: rupture.mode ?? "unilateral" });
        return role === "rupture-start" ? { kind: "rupture", which: "start", fixed: ends.end } : { kind: "rupture", which: "end", fixed: ends.start };
      }
      const index = latest.current.draft.stations.findIndex((s) => s.id === hit.properties.id);
      return index >= 0 ? { kind: "station", index } : null;
    };

    const apply = (target: DragTarget, to: LonLat) => {
      const { dispatch } = latest.current;
      if (target.kind === "source") dispatch({ type: "move-source", to });
      else if (target.kind === "rupture") dispatch({ type: "drag-rupture-end", which: target.which, fixed: target.fixed, to });
      else dispatch({ type: "move-station", index: target.index, to });
    };

    // One edit per animation frame at most: the worker and React see the newest position only.
    const flush = () => {
      frame = 0;
      if (drag && pending) apply(drag, pending);
      pending = null;
    };

    const onDown = (event: MapMouseEvent) => {
      const target = targetAt(event);
      if (!target) return;
      event.preventDefault();
      map.dragPan.disable();
      drag = target;
      moved = false;
      latest.current.onInteractionChange(true);
      map.getCanvas().style.cursor = "grabbing";
    };
    const onMove = (event: MapMouseEvent) => {
      if (!drag) {
        map.getCanvas().style.cursor = targetAt(event) ? "grab" : latest.current.addingStation ? "crosshair" : "";
        return;
      }
      moved = true;
      pending = { lon: event.lngLat.lng, lat: event.lngLat.lat };
      if (!frame) frame = requestAnimationFrame(flush);
    };
    const onUp = (event: MapMouseEvent) => {
      if (!drag) return;
      if (frame) cancelAnimationFrame(frame);
      frame = 0;
      if (moved) apply(drag, { lon: event.lngLat.lng, lat: event.lngLat.lat });
      // A drag is not a click; MapLibre may or may not send one after it, so forget the drag afterwards.
      setTimeout(() => {
        moved = false;
      }, 0);
      drag = null;
      pending = null;
      map.dragPan.enable();
      map.getCanvas().style.cursor = "";
      latest.current.onInteractionChange(false);
    };
    const onClick = (event: MapMouseEvent) => {
      if (moved) return;
      const at = { lon: event.lngLat.lng, lat: event.lngLat.lat };
      if (latest.current.editable && latest.current.addingStation) {
        latest.current.dispatch({ type: "add-station", at });
        latest.current.onStationAdded();
      } else {
        latest.current.onPickSite(at);
      }
    };
    const onMoveEnd = () => {
      const b = map.getBounds();
      latest.current.onViewChange([b.getWest(), b.getSouth(), b.getEast(), b.getNorth()]);
    };

    map.on("mousedown", onDown);
    map.on("mousemove", onMove);
    map.on("mouseup", onUp);
    map.on("click", onClick);
    map.on("moveend", onMoveEnd);
    onMoveEnd();
    return () => {
      map.off("mousedown", onDown);
      map.off("mousemove", onMove);
      map.off("mouseup", onUp);
      map.off("click", onClick);
      map.off("moveend", onMoveEnd);
      if (frame) cancelAnimationFrame(frame);
    };
  }, [map]);

  return (
    <div data-testid="workspace-map" data-result-kind={results?.kind ?? "none"} data-result-revision={results?.revision ?? -1}>
      <RegionMap stations={stations} sources={sources} provenance={props.provenance} extension={extension} onReady={setMap}>
        {props.children}
      </RegionMap>
    </div>
  );
}
