"use client";

import type { FeatureCollection } from "geojson";
import type { LayerSpecification, SourceSpecification } from "@maplibre/maplibre-gl-style-spec";
import type { GeoJSONSource, Map as MapLibreMap } from "maplibre-gl";
import "maplibre-gl/dist/maplibre-gl.css";
import { useEffect, useRef, useState } from "react";
import { CAUTION } from "@/lib/caution";
import { sourcesToGeoJson, stationsToGeoJson, type MapSource, type MapStation } from "@/lib/map/overlays";
import { extendBounds, type Bounds } from "@/lib/map/bounds";
import { BASEMAP_BOUNDS, buildMapStyle, LAND_BOUNDS } from "@/lib/map/style";
import { MAP_LAYER_IDS, OVERLAY_SOURCE_IDS, REGION_MAP_LAYERS } from "./layers";
import { MapLegend } from "./map-legend";
import { ZoomButtons } from "./zoom-buttons";

export type { MapSource, MapStation } from "@/lib/map/overlays";

declare global {
  interface Window {
    /** The most recently created Leeway map, for browser tests and debugging (see RegionMap). */
    __leewayMap?: MapLibreMap;
  }
}

/** Props of {@link RegionMap}. */
export interface RegionMapProps {
  stations: MapStation[];
  sources: MapSource[];
  /** [west, south, east, north] to fit on first load and on "All", degrees; defaults to the island and the sources. */
  bounds?: Bounds;
  /** The "how it was made" line shown under the map, after the basemap's own. */
  provenance?: string;
  /** An uploaded layer to draw over the basemap (polygons, lines, points), e.g. for checking an upload. */
  overlay?: FeatureCollection;
  /** Drawn over the map, top left (panels, extra legends). */
  children?: React.ReactNode;
  /** Further layers with their own sources (e.g. the workspace's results), fixed for the map's lifetime. */
  extension?: MapExtension;
  /** Called once the style has loaded, with the live map: the caller sets its sources' data and listens to events. */
  onReady?: (map: MapLibreMap) => void;
}

/** Layers a caller adds to the region map, and the sources they draw from. */
export interface MapExtension {
  sources: Record<string, SourceSpecification>;
  /** Drawn just above the land, under the basemap's lines, towns and labels. */
  below: LayerSpecification[];
  /** Drawn on top of everything. */
  above: LayerSpecification[];
}

/** The region map's layers with an extension's put in place. */
function extendLayers(extension: MapExtension | undefined): LayerSpecification[] {
  if (!extension) return REGION_MAP_LAYERS;
  const afterLand = REGION_MAP_LAYERS.findIndex((layer) => layer.id === MAP_LAYER_IDS.land) + 1;
  return [...REGION_MAP_LAYERS.slice(0, afterLand), ...extension.below, ...REGION_MAP_LAYERS.slice(afterLand), ...extension.above];
}

const NO_FEATURES: FeatureCollection = { type: "FeatureCollection", features: [] };

/** Puts the stations, sources and any layer overlay into the map's GeoJSON sources (a no-op until the style has loaded). */
function applyOverlays(map: MapLibreMap, overlay: { stations: MapStation[]; sources: MapSource[]; layer?: FeatureCollection }) {
  map.getSource<GeoJSONSource>(OVERLAY_SOURCE_IDS.stations)?.setData(stationsToGeoJson(overlay.stations));
  map.getSource<GeoJSONSource>(OVERLAY_SOURCE_IDS.sources)?.setData(sourcesToGeoJson(overlay.sources));
  map.getSource<GeoJSONSource>(OVERLAY_SOURCE_IDS.layer)?.setData(overlay.layer ?? NO_FEATURES);
}

/** How far the view may wander past the basemap, degrees, so the island cannot be lost off-screen. */
const PAN_MARGIN_DEG = 4;
/** Room left around the fitted region, px. */
const FIT_PADDING_PX = 32;

/**
 * The map of the demo region: Leeway's own vector basemap with stations and sources on top, a scale
 * bar, zoom buttons and a key. MapLibre is loaded in the browser only (it is ESM without a default
 * export, and needs WebGL); its worker and fonts are served by the app.
 *
 * The container carries `data-testid="region-map"` and, once the map's first `idle` event has fired,
 * `data-map-idle="true"`. The live map is also put on `window.__leewayMap` (always, not only in tests):
 * browser tests query rendered features through it.
 */
export function RegionMap({ stations, sources, bounds, provenance, overlay, children, extension, onReady }: RegionMapProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const mapRef = useRef<MapLibreMap | null>(null);
  // The latest overlay data: the map is created asynchronously (after the import) and reads it then.
  const overlayRef = useRef({ stations, sources, layer: overlay });
  // Read once when the map is created, like `bounds`.
  const extensionRef = useRef({ extension, onReady });
  const fitBounds = useRef<Bounds>(bounds ?? extendBounds(LAND_BOUNDS, sources));
  const [idle, setIdle] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);

  useEffect(() => {
    let disposed = false;
    let created: MapLibreMap | null = null;
    (async () => {
      const maplibregl = await import("maplibre-gl");
      const container = containerRef.current;
      if (disposed || !container) return;
      maplibregl.setWorkerUrl("/maplibre-gl-worker.mjs");
      const [w, s, e, n] = BASEMAP_BOUNDS;
      const map = new maplibregl.Map({
        container,
        style: buildMapStyle({
          origin: window.location.origin,
          layers: extendLayers(extensionRef.current.extension),
          sources: {
            ...extensionRef.current.extension?.sources,
            [OVERLAY_SOURCE_IDS.stations]: { type: "geojson", data: stationsToGeoJson(overlayRef.current.stations) },
            [OVERLAY_SOURCE_IDS.sources]: { type: "geojson", data: sourcesToGeoJson(overlayRef.current.sources) },
            [OVERLAY_SOURCE_IDS.layer]: { type: "geojson", data: overlayRef.current.layer ?? NO_FEATURES },
          },
        }),
        bounds: fitBounds.current,
        fitBoundsOptions: { padding: FIT_PADDING_PX },
        maxBounds: [w - PAN_MARGIN_DEG, s - PAN_MARGIN_DEG, e + PAN_MARGIN_DEG, n + PAN_MARGIN_DEG],
        minZoom: 4,
        maxZoom: 14,
        // Tests and the map-sheet export read the canvas back.
        canvasContextAttributes: { preserveDrawingBuffer: true },
        // North stays up (a map sheet's north arrow can then be fixed); the basemap's credit is in the caption.
        dragRotate: false,
        touchPitch: false,
        attributionControl: false,
      });
      map.touchZoomRotate.disableRotation();
      created = map;
      mapRef.current = map;
      window.__leewayMap = map;
      map.addControl(new maplibregl.ScaleControl({ maxWidth: 140, unit: "metric" }), "bottom-left");
      // Props that changed while the style was loading have no source to go to yet: apply them now.
      map.once("load", () => {
        applyOverlays(map, overlayRef.current);
        extensionRef.current.onReady?.(map);
      });
      map.once("idle", () => setIdle(true));
      map.on("error", (event) => console.error("map:", event.error?.message ?? event));
    })().catch((error: unknown) => setFailure(error instanceof Error ? error.message : String(error)));

    return () => {
      disposed = true;
      created?.remove();
      if (window.__leewayMap === created) delete window.__leewayMap;
      mapRef.current = null;
    };
  }, []);

  useEffect(() => {
    overlayRef.current = { stations, sources, layer: overlay };
    if (mapRef.current) applyOverlays(mapRef.current, overlayRef.current);
  }, [stations, sources, overlay]);

  return (
    <figure className="space-y-2">
      <div className="relative h-[min(44rem,72vh)] overflow-hidden rounded-card border border-line bg-tide-soft">
        <div
          ref={containerRef}
          // Sized by its parent: MapLibre gives the container `position: relative` of its own.
          className="h-full w-full"
          data-testid="region-map"
          data-map-idle={idle ? "true" : "false"}
          role="region"
          aria-label="Map of the demo region with stations and sources"
        />
        {failure && (
          <p role="alert" className="absolute inset-x-4 top-4 rounded-card bg-error-bg p-3 text-sm text-error-ink">
            The map could not start in this browser: {failure}
          </p>
        )}
        {children && <div className="pointer-events-none absolute left-3 top-3 [&>*]:pointer-events-auto">{children}</div>}
        <div className="absolute right-3 top-3">
          <ZoomButtons
            onZoomIn={() => mapRef.current?.zoomIn()}
            onZoomOut={() => mapRef.current?.zoomOut()}
            onFit={() => mapRef.current?.fitBounds(fitBounds.current, { padding: FIT_PADDING_PX })}
          />
        </div>
        <div className="absolute bottom-3 right-3">
          <MapLegend />
        </div>
      </div>
      <figcaption className="space-y-1 text-xs text-ink-muted">
        <p data-testid="map-caution">{CAUTION}</p>
        <p>
          Basemap: Leeway&apos;s own vector tiles of an invented island; no real place is shown.
          {provenance ? ` ${provenance}` : ""}
        </p>
      </figcaption>
    </figure>
  );
}
