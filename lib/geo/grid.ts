/**
 * The scenario on a regular lon/lat grid (see grid-geometry.ts), held in typed arrays. Rows are
 * computed one at a time into small buffers, so `summarizeGrid` can cover up to 16 M cells with
 * flat memory while `computeGrid` keeps every field.
 */
import { MAX_GRID_CELLS, type Scenario } from "@/lib/scenario/schema";
import { havLongitude, lambertDistanceFromTermsKm, lambertLatitudeTerms } from "./distance";
import { prepareEngine, type Engine, type EngineOptions } from "./engine";
import { cellAreaKm2, cellKmWithin, columnLonDeg, gridGeometry, rowLatDeg, type Bbox, type GridGeometry } from "./grid-geometry";
import { jmaIntensityFromLog10Pgv } from "./intensity/jma";
import { mmiFromLog10Pgv } from "./intensity/mmi-worden-2012";
import type { IntensityScaleId } from "./intensity/scales";
import { createPlaceValues, evaluateAlert, evaluateShaking, pExceedTarget, type PlaceValues } from "./place";
import { CAUTION, type Provenance } from "./provenance";
import type { PlaceAlertEvaluator } from "./strategy/types";
import { reducedLatitudeRad } from "./wgs84";

const DEG = Math.PI / 180;

/** What `computeGridWith` may leave out. */
export interface GridFieldOptions {
  /** PGA and P(exceed target) per cell (default true). Map previews skip them: the site card asks for its point on its own. */
  detail?: boolean;
}

/** Options for `computeGrid` and `summarizeGrid`. */
export interface GridOptions extends EngineOptions, GridFieldOptions {
  /** Cell size, km (default the scenario's `area.cellKm`). */
  cellKm?: number;
  /** Area [west, south, east, north] (default the scenario's `area.bbox`). */
  bbox?: Bbox;
  /** Cells are enlarged until the grid has at most this many (default 16 M). */
  maxCells?: number;
}

/** A delivery channel on the grid: its warning is `warningS + offsetS` (offset = primary delivery − this delivery). */
export interface GridChannel {
  id: string;
  deliveryS: number;
  offsetS: number;
}

/** Row-major grid fields (index = row · width + column; row 0 is the north edge). */
export interface EngineGrid extends GridGeometry {
  /** Cell-centre longitudes (width) and latitudes (height), degrees. */
  lonDeg: Float64Array;
  latDeg: Float64Array;
  /** Cell area per row, km². */
  cellAreaKm2: Float64Array;
  pArrivalS: Float32Array;
  sArrivalS: Float32Array;
  peakShakingS: Float32Array;
  /** Primary channel: when the alert reaches the cell, s (NaN: no alert can reach it). */
  alertS: Float32Array;
  /** Primary channel warning seconds (computed whether or not the cell is alerted). */
  warningS: Float32Array;
  pgvCms: Float32Array;
  pgaCms2: Float32Array;
  /** Intensity on the scenario's scale. */
  intensity: Float32Array;
  /** Class index on that scale (see `intensityClasses`). */
  intensityClass: Uint8Array;
  /** 1 where the cell is alerted. */
  alerted: Uint8Array;
  /** 1 where the cell lies beyond the ground-motion model's data. */
  extrapolated: Uint8Array;
  /** P(intensity ≥ alert.target), ground-motion scatter only. */
  pExceedTarget: Float32Array;
  intensityScale: IntensityScaleId;
  intensityClasses: readonly string[];
  intensityClassLowerBounds: readonly number[];
  warningBreaksS: number[];
  /** Intensity value where the alert area starts (`alert.areaAt`). */
  areaAt: number;
  channels: GridChannel[];
}

/** Figures over the whole grid (areas in km², times in s). */
export interface GridSummary {
  cells: number;
  width: number;
  height: number;
  cellKm: number;
  bbox: Bbox;
  /** Primary channel, warning ≤ 0, alerted or not. */
  blindZoneAreaKm2: number;
  alertAreaKm2: number;
  /** Area alerted by the first message (smaller than alertAreaKm2 when the magnitude grows). */
  firstAlertAreaKm2: number;
  /** Alert messages (issue time, magnitude; NaN magnitude for the wavefield strategy). */
  alertUpdates: { issueS: number; mw: number | null }[];
  /** Cells no alert can reach (wavefield strategy far from stations). */
  noAlertAreaKm2: number;
  minWarningS: number | null;
  maxWarningS: number | null;
  /** Longest warning among alerted cells. */
  alertedMaxWarningS: number | null;
  /** Largest intensity on the scenario's scale, and on both scales from the largest PGV. */
  maxIntensity: number;
  maxJmaIntensity: number;
  maxMmi: number;
  maxPgvCms: number;
  alertIssued: boolean;
  /** First moment an alert is issued, s (null when none is). */
  alertIssuedS: number | null;
  /** P arrival at the k-th operating station, s. */
  detectionS: number;
  extrapolatedCells: number;
  byChannel: { channel: string; deliveryS: number; blindZoneAreaKm2: number }[];
}

/** Result of `computeGrid`. */
export interface GridResult {
  grid: EngineGrid;
  summary: GridSummary;
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/** Result of `summarizeGrid` (no arrays kept). */
export interface GridSummaryResult {
  summary: GridSummary;
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/** The grid's geometry after applying options and the cell limit. */
export function resolveGridGeometry(scenario: Pick<Scenario, "area">, options: Pick<GridOptions, "bbox" | "cellKm" | "maxCells"> = {}): GridGeometry {
  const bbox = options.bbox ?? scenario.area.bbox;
  const maxCells = Math.min(options.maxCells ?? MAX_GRID_CELLS, MAX_GRID_CELLS);
  let geometry = gridGeometry(bbox, options.cellKm ?? scenario.area.cellKm);
  while (geometry.width * geometry.height > maxCells) geometry = gridGeometry(bbox, cellKmWithin(geometry, maxCells) * 1.002);
  return geometry;
}

/** Per-row outputs of the kernel. */
interface RowBuffers {
  pArrivalS: Float64Array;
  sArrivalS: Float64Array;
  peakShakingS: Float64Array;
  issueS: Float64Array;
  warningS: Float64Array;
  log10Pgv: Float64Array;
  log10Pga: Float64Array;
  intensity: Float64Array;
  pExceed: Float64Array;
  alerted: Uint8Array;
  extrapolated: Uint8Array;
  /** The strategy update that alerts the cell (−1: none). */
  updateIndex: Int16Array;
}

function rowBuffers(width: number): RowBuffers {
  const f = () => new Float64Array(width);
  return {
    pArrivalS: f(), sArrivalS: f(), peakShakingS: f(), issueS: f(), warningS: f(), log10Pgv: f(), log10Pga: f(),
    intensity: f(), pExceed: f(), alerted: new Uint8Array(width), extrapolated: new Uint8Array(width), updateIndex: new Int16Array(width),
  };
}

/** Walks the grid row by row, calling `onRow` after each row's buffers are filled. */
function sweepGrid(engine: Engine, geometry: GridGeometry, withDetail: boolean, onRow: (row: number, b: RowBuffers) => void): void {
  const { width, height } = geometry;
  const { lon: lon0, lat: lat0 } = engine.scenario.source;
  const evaluator: PlaceAlertEvaluator = engine.strategy.forGrid(geometry);
  const originBeta = reducedLatitudeRad(lat0);
  const sinB1 = Math.sin(originBeta);
  const cosB1 = Math.cos(originBeta);
  const havLon = new Float64Array(width);
  const sinDLon = new Float64Array(width);
  const cosDLon = new Float64Array(width);
  const lons = new Float64Array(width);
  for (let c = 0; c < width; c++) {
    lons[c] = columnLonDeg(geometry, c);
    havLon[c] = havLongitude(lons[c] - lon0);
    sinDLon[c] = Math.sin((lons[c] - lon0) * DEG);
    cosDLon[c] = Math.cos((lons[c] - lon0) * DEG);
  }
  const needsFrame = engine.source.needsLocalFrame;
  const uniformVs30 = engine.vs30.uniform;
  const b = rowBuffers(width);
  const v: PlaceValues = createPlaceValues();
  for (let row = 0; row < height; row++) {
    const lat = rowLatDeg(geometry, row);
    const terms = lambertLatitudeTerms(originBeta, lat);
    const beta = reducedLatitudeRad(lat);
    const sinB2 = Math.sin(beta);
    const cosB2 = Math.cos(beta);
    for (let c = 0; c < width; c++) {
      const epicentralKm = lambertDistanceFromTermsKm(terms, havLon[c]);
      let eastKm = 0;
      let northKm = 0;
      if (needsFrame && epicentralKm > 0) {
        // Azimuth on the auxiliary sphere of reduced latitudes: (sin α, cos α) ∝ (e, n).
        const e = sinDLon[c] * cosB2;
        const n = cosB1 * sinB2 - sinB1 * cosB2 * cosDLon[c];
        const norm = Math.hypot(e, n);
        eastKm = (epicentralKm * e) / norm;
        northKm = (epicentralKm * n) / norm;
      }
      const vs30Ms = uniformVs30 ? engine.vs30.fallbackVs30Ms : engine.vs30.vs30At(lons[c], lat);
      evaluateShaking(engine, epicentralKm, eastKm, northKm, vs30Ms, v);
      evaluateAlert(engine, evaluator, row * width + c, lons[c], lat, v);
      b.pArrivalS[c] = v.pArrivalS;
      b.sArrivalS[c] = v.sArrivalS;
      b.peakShakingS[c] = v.peakShakingS;
      b.issueS[c] = v.alert.issueS;
      b.warningS[c] = v.warningS;
      b.log10Pgv[c] = v.log10PgvCms;
      b.intensity[c] = v.intensity;
      b.alerted[c] = v.alert.alerted ? 1 : 0;
      b.extrapolated[c] = v.extrapolated ? 1 : 0;
      b.updateIndex[c] = v.alert.updateIndex;
      if (withDetail) {
        b.log10Pga[c] = engine.motion.log10PgaCms2(v.modelDistanceKm, vs30Ms);
        b.pExceed[c] = pExceedTarget(engine, v);
      }
    }
    onRow(row, b);
  }
}

/**
 * Accumulates the summary from row buffers. Running totals are fields of a class rather than
 * variables captured by a closure: V8 updates double fields in place but boxes every new value
 * written to a captured variable, which cost a fresh allocation per cell.
 */
class SummaryAccumulator {
  private readonly channelLimits: number[];
  private readonly channelBlind: Float64Array;
  private readonly firstUpdate: number;
  private blind = 0;
  private alertArea = 0;
  private firstAlertArea = 0;
  private noAlert = 0;
  private minWarning = Infinity;
  private maxWarning = -Infinity;
  private alertedMaxWarning = -Infinity;
  private maxIntensity = -Infinity;
  private maxLog10Pgv = -Infinity;
  private extrapolatedCells = 0;

  constructor(
    private readonly engine: Engine,
    private readonly geometry: GridGeometry,
  ) {
    const channels = engine.timeline.channels;
    this.channelLimits = channels.map((c) => c.deliveryS - channels[0].deliveryS);
    this.channelBlind = new Float64Array(channels.length);
    this.firstUpdate = engine.strategy.firstUpdateIndex;
  }

  add(row: number, b: RowBuffers): void {
    const area = cellAreaKm2(this.geometry, row);
    const limits = this.channelLimits;
    for (let c = 0; c < this.geometry.width; c++) {
      const w = b.warningS[c];
      if (Number.isNaN(w)) this.noAlert += area;
      else {
        if (w <= 0) this.blind += area;
        if (w < this.minWarning) this.minWarning = w;
        if (w > this.maxWarning) this.maxWarning = w;
        for (let k = 0; k < limits.length; k++) if (w <= limits[k]) this.channelBlind[k] += area;
      }
      if (b.alerted[c]) {
        this.alertArea += area;
        if (b.updateIndex[c] === this.firstUpdate) this.firstAlertArea += area;
        if (w > this.alertedMaxWarning) this.alertedMaxWarning = w;
      }
      if (b.intensity[c] > this.maxIntensity) this.maxIntensity = b.intensity[c];
      if (b.log10Pgv[c] > this.maxLog10Pgv) this.maxLog10Pgv = b.log10Pgv[c];
      this.extrapolatedCells += b.extrapolated[c];
    }
  }

  finish(): GridSummary {
    const { engine, geometry } = this;
    const channels = engine.timeline.channels;
    const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);
    return {
      cells: geometry.width * geometry.height,
      width: geometry.width,
      height: geometry.height,
      cellKm: geometry.cellKm,
      bbox: geometry.bbox,
      blindZoneAreaKm2: this.blind,
      alertAreaKm2: this.alertArea,
      firstAlertAreaKm2: this.firstAlertArea,
      alertUpdates: engine.strategy.updates.map((u) => ({ issueS: u.issueS, mw: Number.isNaN(u.mw) ? null : u.mw })),
      noAlertAreaKm2: this.noAlert,
      minWarningS: finiteOrNull(this.minWarning),
      maxWarningS: finiteOrNull(this.maxWarning),
      alertedMaxWarningS: finiteOrNull(this.alertedMaxWarning),
      maxIntensity: this.maxIntensity,
      maxJmaIntensity: jmaIntensityFromLog10Pgv(this.maxLog10Pgv),
      maxMmi: mmiFromLog10Pgv(this.maxLog10Pgv),
      maxPgvCms: 10 ** this.maxLog10Pgv,
      alertIssued: engine.strategy.issued,
      alertIssuedS: engine.strategy.issued ? engine.strategy.firstIssueS : null,
      detectionS: engine.timeline.detectionS,
      extrapolatedCells: this.extrapolatedCells,
      byChannel: channels.map((c, k) => ({ channel: c.id, deliveryS: c.deliveryS, blindZoneAreaKm2: this.channelBlind[k] })),
    };
  }
}

/** Computes the fields of the grid with an engine already prepared for the scenario (without detail, PGA and P(exceed) are NaN). */
export function computeGridWith(engine: Engine, geometry: GridGeometry, { detail = true }: GridFieldOptions = {}): { grid: EngineGrid; summary: GridSummary } {
  const { width, height } = geometry;
  const cells = width * height;
  const f32 = () => new Float32Array(cells);
  const primaryDeliveryS = engine.timeline.channels[0].deliveryS;
  const grid: EngineGrid = {
    ...geometry,
    lonDeg: Float64Array.from({ length: width }, (_, c) => columnLonDeg(geometry, c)),
    latDeg: Float64Array.from({ length: height }, (_, r) => rowLatDeg(geometry, r)),
    cellAreaKm2: Float64Array.from({ length: height }, (_, r) => cellAreaKm2(geometry, r)),
    pArrivalS: f32(), sArrivalS: f32(), peakShakingS: f32(), alertS: f32(), warningS: f32(),
    pgvCms: f32(), pgaCms2: f32(), intensity: f32(), pExceedTarget: f32(),
    intensityClass: new Uint8Array(cells), alerted: new Uint8Array(cells), extrapolated: new Uint8Array(cells),
    intensityScale: engine.scale.id,
    intensityClasses: engine.scale.classes,
    intensityClassLowerBounds: engine.scale.classLowerBounds,
    warningBreaksS: engine.scenario.warningBreaksS,
    areaAt: engine.scenario.alert.areaAt,
    channels: engine.timeline.channels.map((c) => ({ id: c.id, deliveryS: c.deliveryS, offsetS: primaryDeliveryS - c.deliveryS })),
  };
  const summary = new SummaryAccumulator(engine, geometry);
  const classIndex = engine.scale.classIndex;
  if (!detail) {
    grid.pgaCms2.fill(Number.NaN);
    grid.pExceedTarget.fill(Number.NaN);
  }
  sweepGrid(engine, geometry, detail, (row, b) => {
    summary.add(row, b);
    const offset = row * width;
    for (let c = 0; c < width; c++) {
      const i = offset + c;
      grid.pArrivalS[i] = b.pArrivalS[c];
      grid.sArrivalS[i] = b.sArrivalS[c];
      grid.peakShakingS[i] = b.peakShakingS[c];
      grid.alertS[i] = b.issueS[c] + primaryDeliveryS;
      grid.warningS[i] = b.warningS[c];
      grid.pgvCms[i] = 10 ** b.log10Pgv[c];
      grid.intensity[i] = b.intensity[c];
      grid.intensityClass[i] = classIndex(b.intensity[c]);
      grid.alerted[i] = b.alerted[c];
      grid.extrapolated[i] = b.extrapolated[c];
    }
    if (detail) {
      for (let c = 0; c < width; c++) {
        grid.pgaCms2[offset + c] = 10 ** b.log10Pga[c];
        grid.pExceedTarget[offset + c] = b.pExceed[c];
      }
    }
  });
  return { grid, summary: summary.finish() };
}

/** The scenario on a grid: every field in typed arrays, with the summary, notes, caution and provenance. */
export function computeGrid(scenario: Scenario, options: GridOptions = {}): GridResult {
  const engine = prepareEngine(scenario, options);
  const { grid, summary } = computeGridWith(engine, resolveGridGeometry(scenario, options), options);
  return { grid, summary, notes: engine.notes, caution: CAUTION, provenance: engine.provenance };
}

/** The summary alone, computed row by row (flat memory; for grids too large to keep). */
export function summarizeGridWith(engine: Engine, geometry: GridGeometry): GridSummary {
  const summary = new SummaryAccumulator(engine, geometry);
  sweepGrid(engine, geometry, false, (row, b) => summary.add(row, b));
  return summary.finish();
}

/** The grid summary without keeping arrays. */
export function summarizeGrid(scenario: Scenario, options: GridOptions = {}): GridSummaryResult {
  const engine = prepareEngine(scenario, options);
  return { summary: summarizeGridWith(engine, resolveGridGeometry(scenario, options)), notes: engine.notes, caution: CAUTION, provenance: engine.provenance };
}
