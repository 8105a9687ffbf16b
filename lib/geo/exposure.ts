/**
 * Exposure (BRIEF item 9): population cells, each assigned intensity, warning seconds and
 * alerted or not, summed into tables by intensity class × warning band, by district and by
 * channel. Fractional people are rounded by largest remainder on the finest table (district ×
 * class × band × alerted), so every table — a sum of that one — adds up exactly to
 * `totalPopulation` = round(Σ population). "Who can act" columns count alerted people only.
 */
import type { Scenario } from "@/lib/scenario/schema";
import { walkCells } from "./cell-walk";
import { prepareEngine, type Engine, type EngineOptions } from "./engine";
import type { IntensityScaleId } from "./intensity/scales";
import { pExceedTarget, type PlaceValues } from "./place";
import { CAUTION, type Provenance } from "./provenance";
import { roundLargestRemainder } from "./rounding";
import { ALERT_STRATEGY_IDS, type AlertStrategyId } from "./strategy/ids";
import { probabilityOfExceedance } from "./uncertainty";
import { NO_ALERT_BAND, warningBandIndex, warningBands, type WarningBand } from "./warning";

/** Population cells as parallel arrays: centres in degrees, people ≥ 0, optional district index (−1: none). */
export interface PopulationCells {
  lon: Float64Array;
  lat: Float64Array;
  population: Float64Array;
  district?: Int32Array;
  districtNames?: string[];
}

/** A protective action and the seconds it takes once started. */
export interface ProtectiveAction {
  id: string;
  seconds: number;
}

/** Options for `computeExposure`. */
export interface ExposureOptions extends EngineOptions {
  /** Actions to count people for: an action fits when warning ≥ reactionS + its seconds. */
  actions?: readonly ProtectiveAction[];
  /** Seconds before an action starts (a workspace setting; default 0). */
  reactionS?: number;
}

/** One row of the intensity class × warning band table. */
export interface ExposureTableRow {
  intensityClass: string;
  warningBand: string;
  population: number;
  /** Of `population`, the people who are alerted. */
  alertedPopulation: number;
}

/** People in one district (`district` null: the "no district" row). */
export interface DistrictExposure {
  district: string | null;
  population: number;
  alertedPopulation: number;
  /** Warning ≤ 0 on the primary channel, alerted or not. */
  blindZonePopulation: number;
  /** Alerted people with warning > 0: those who can act. */
  alertedWithWarningPopulation: number;
}

/** People per warning band through one channel. */
export interface ChannelExposure {
  channel: string;
  deliveryS: number;
  primary: boolean;
  blindZonePopulation: number;
  alertedPopulation: number;
  alertedWithWarningPopulation: number;
  bands: { warningBand: string; population: number; alertedPopulation: number }[];
}

/** Expected people at the current alert setting, from the ground-motion sigma (METHODS.md §9). */
export interface ExpectedOutcomes {
  /** Alerted, but shaking stays below the target. */
  needless: number;
  /** Alerted with warning ≤ 0 and shaking at or above the target. */
  late: number;
  /** Not alerted, and shaking at or above the target. */
  missed: number;
  target: number;
  note: string;
}

/**
 * The expected share of alerted people whose shaking falls within one class of the class the
 * alert predicted for them (ground-motion scatter only). Given only when the alert-time magnitude
 * differs from Mw: otherwise it depends on sigma and the class widths alone (METHODS.md §9).
 */
export interface WithinOneClass {
  share: number;
  /** Alert-time magnitude minus Mw (the first message's, for a growing magnitude). */
  alertMagnitudeErrorMw: number;
  label: string;
}

/** Result of `computeExposure`. */
export interface ExposureResult {
  totalPopulation: number;
  blindZonePopulation: number;
  alertedPopulation: number;
  notAlertedPopulation: number;
  /** Alerted people with warning > 0 on the primary channel. */
  alertedWithWarningPopulation: number;
  /** People no alert can reach (wavefield strategy far from stations). */
  noAlertPopulation: number;
  intensityScale: IntensityScaleId;
  intensityClasses: readonly string[];
  warningBands: WarningBand[];
  table: ExposureTableRow[];
  byDistrict: DistrictExposure[];
  byChannel: ChannelExposure[];
  /** Alerted people who can complete each action (warning ≥ reaction + action seconds). */
  actions: { id: string; seconds: number; population: number }[];
  expected: ExpectedOutcomes;
  withinOneClass: WithinOneClass | null;
  alertIssued: boolean;
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/**
 * Float accumulators for one computation: fields of one object, not variables captured by the
 * per-cell callback (V8 boxes every value written to a captured variable).
 */
interface Tallies {
  /** People counted. */
  people: number;
  /** [district + 1][class][band][alerted] for the primary channel; band index bands.length = "no alert". */
  joint: Float64Array;
  /** [channel][band][alerted]. */
  channels: Float64Array;
  actions: Float64Array;
  needless: number;
  late: number;
  missed: number;
  /** Alerted people weighted by P(actual class within one of the predicted one), and the alerted people counted. */
  withinOneClass: number;
  withinOneClassOf: number;
}

/** Computes exposure with an engine already prepared for the scenario. */
export function computeExposureWith(engine: Engine, cells: PopulationCells, options: ExposureOptions = {}): Omit<ExposureResult, "notes" | "caution" | "provenance"> {
  const breaks = engine.scenario.warningBreaksS;
  const bands = warningBands(breaks);
  const bandSlots = bands.length + 1;
  const classes = engine.scale.classes;
  const districtNames = cells.districtNames ?? [];
  const districtSlots = districtNames.length + 1;
  const channels = engine.timeline.channels;
  const offsets = channels.map((c) => channels[0].deliveryS - c.deliveryS);
  const actions = options.actions ?? [];
  const reactionS = options.reactionS ?? 0;
  const t: Tallies = {
    joint: new Float64Array(districtSlots * classes.length * bandSlots * 2),
    channels: new Float64Array(channels.length * bandSlots * 2),
    actions: new Float64Array(actions.length),
    people: 0,
    needless: 0,
    late: 0,
    missed: 0,
    withinOneClass: 0,
    withinOneClassOf: 0,
  };
  const mw = engine.scenario.source.mw;
  const magnitudeDiffers = engine.strategy.id === "source" && engine.strategy.updates.some((u) => u.mw !== mw);
  const bounds = engine.scale.classLowerBounds;
  // Cells without people are skipped: they add nothing to any table.
  walkCells(
    engine,
    cells.lon,
    cells.lat,
    (i, v) => {
      const people = cells.population[i];
      t.people += people;
      const alerted = v.alert.alerted ? 1 : 0;
      const district = cells.district ? cells.district[i] : -1;
      const districtSlot = district >= 0 && district < districtNames.length ? district + 1 : 0;
      const classIndex = engine.scale.classIndex(v.intensity);
      for (let k = 0; k < channels.length; k++) {
        const band = warningBandIndex(v.warningS + offsets[k], breaks);
        const slot = band < 0 ? bands.length : band;
        if (k === 0) t.joint[((districtSlot * classes.length + classIndex) * bandSlots + slot) * 2 + alerted] += people;
        t.channels[(k * bandSlots + slot) * 2 + alerted] += people;
      }
      if (alerted) for (let a = 0; a < actions.length; a++) if (v.warningS >= reactionS + actions[a].seconds) t.actions[a] += people;
      const p = pExceedTarget(engine, v);
      if (alerted) {
        t.needless += people * (1 - p);
        if (v.warningS <= 0) t.late += people * p;
        if (magnitudeDiffers) {
          const predictedClass = engine.scale.classIndex(v.alert.predictedIntensity);
          const lower = predictedClass >= 2 ? bounds[predictedClass - 2] : -Infinity;
          const upper = predictedClass + 1 < bounds.length ? bounds[predictedClass + 1] : Infinity;
          t.withinOneClass += people * (exceedance(engine, v, lower) - exceedance(engine, v, upper));
          t.withinOneClassOf += people;
        }
      } else t.missed += people * p;
    },
    (i) => cells.population[i] > 0,
  );
  return summarize(engine, t, Math.round(t.people), { bands, classes, districtNames, actions });
}

/** P(intensity ≥ `intensity`) at a place; 1 below every value, 0 above. */
function exceedance(engine: Engine, v: PlaceValues, intensity: number): number {
  if (intensity === -Infinity) return 1;
  if (intensity === Infinity) return 0;
  return probabilityOfExceedance(v.log10PgvCms, engine.scale.log10PgvFor(intensity), engine.motion.sigmaLog10Pgv(v.modelDistanceKm, v.vs30Ms));
}

/** The within-one-class figure, when the alert-time magnitude differs from Mw. */
function withinOneClassOf(engine: Engine, t: Tallies): WithinOneClass | null {
  if (t.withinOneClassOf === 0) return null;
  const first = engine.strategy.updates[Math.max(0, engine.strategy.firstUpdateIndex)];
  const error = first.mw - engine.scenario.source.mw;
  return {
    share: t.withinOneClass / t.withinOneClassOf,
    alertMagnitudeErrorMw: error,
    label: `share of alerted people whose shaking is within one class of the alert's prediction, with the alert magnitude ${error >= 0 ? "+" : "−"}${Math.abs(error).toFixed(1)} from Mw (ground-motion scatter only)`,
  };
}

function summarize(
  engine: Engine,
  t: Tallies,
  totalPopulation: number,
  labels: { bands: WarningBand[]; classes: readonly string[]; districtNames: string[]; actions: readonly ProtectiveAction[] },
): Omit<ExposureResult, "notes" | "caution" | "provenance"> {
  const { bands, classes, districtNames } = labels;
  const bandSlots = bands.length + 1;
  const allBands = [...bands, NO_ALERT_BAND];
  const joint = roundLargestRemainder(t.joint, totalPopulation);
  const at = (d: number, c: number, b: number, a: number) => joint[((d * classes.length + c) * bandSlots + b) * 2 + a];
  const districtSlots = districtNames.length + 1;

  const table: ExposureTableRow[] = [];
  for (let c = 0; c < classes.length; c++) {
    for (let b = 0; b < bandSlots; b++) {
      let population = 0;
      let alertedPopulation = 0;
      for (let d = 0; d < districtSlots; d++) {
        population += at(d, c, b, 0) + at(d, c, b, 1);
        alertedPopulation += at(d, c, b, 1);
      }
      // The "no alert" band only appears when some cell has no alert at all.
      if (b === bands.length && population === 0) continue;
      table.push({ intensityClass: classes[c], warningBand: allBands[b].id, population, alertedPopulation });
    }
  }

  const districtRow = (d: number): DistrictExposure => {
    let population = 0;
    let alertedPopulation = 0;
    let blindZonePopulation = 0;
    let alertedWithWarningPopulation = 0;
    for (let c = 0; c < classes.length; c++) {
      for (let b = 0; b < bandSlots; b++) {
        const [no, yes] = [at(d, c, b, 0), at(d, c, b, 1)];
        population += no + yes;
        alertedPopulation += yes;
        if (b === 0) blindZonePopulation += no + yes;
        else if (b < bands.length) alertedWithWarningPopulation += yes;
      }
    }
    return { district: d === 0 ? null : districtNames[d - 1], population, alertedPopulation, blindZonePopulation, alertedWithWarningPopulation };
  };
  const byDistrict = [...districtNames.map((_, k) => districtRow(k + 1)), districtRow(0)];
  const totals = byDistrict.reduce(
    (sum, r) => ({
      alerted: sum.alerted + r.alertedPopulation,
      blind: sum.blind + r.blindZonePopulation,
      withWarning: sum.withWarning + r.alertedWithWarningPopulation,
    }),
    { alerted: 0, blind: 0, withWarning: 0 },
  );
  let noAlertPopulation = 0;
  for (let d = 0; d < districtSlots; d++) for (let c = 0; c < classes.length; c++) noAlertPopulation += at(d, c, bands.length, 0) + at(d, c, bands.length, 1);

  const channels = engine.timeline.channels;
  const byChannel = channels.map((channel, k): ChannelExposure => {
    const slice = t.channels.subarray(k * bandSlots * 2, (k + 1) * bandSlots * 2);
    // The primary channel's figures are sums of the main table, so they agree with it exactly.
    const rounded = k === 0 ? primaryChannelCounts(at, classes.length, bandSlots, districtSlots) : roundLargestRemainder(slice, totalPopulation);
    const rows = allBands.map((band, b) => ({ warningBand: band.id, population: rounded[b * 2] + rounded[b * 2 + 1], alertedPopulation: rounded[b * 2 + 1] }));
    const alertedPopulation = rows.reduce((s, r) => s + r.alertedPopulation, 0);
    return {
      channel: channel.id,
      deliveryS: channel.deliveryS,
      primary: k === 0,
      blindZonePopulation: rows[0].population,
      alertedPopulation,
      alertedWithWarningPopulation: rows.slice(1, bands.length).reduce((s, r) => s + r.alertedPopulation, 0),
      bands: rows.filter((r, b) => b < bands.length || r.population > 0),
    };
  });

  return {
    totalPopulation,
    blindZonePopulation: totals.blind,
    alertedPopulation: totals.alerted,
    notAlertedPopulation: totalPopulation - totals.alerted,
    alertedWithWarningPopulation: totals.withWarning,
    noAlertPopulation,
    intensityScale: engine.scale.id,
    intensityClasses: classes,
    warningBands: bands,
    table,
    byDistrict,
    byChannel,
    actions: labels.actions.map((a, k) => ({ id: a.id, seconds: a.seconds, population: Math.round(t.actions[k]) })),
    expected: {
      needless: t.needless,
      late: t.late,
      missed: t.missed,
      target: engine.scenario.alert.target,
      note: "expected counts from ground-motion scatter only (conversion scatter left out); residuals are correlated between places, so no ranges are given",
    },
    withinOneClass: withinOneClassOf(engine, t),
    alertIssued: engine.strategy.issued,
  };
}

/** [band][alerted] counts of the primary channel, summed from the rounded main table. */
function primaryChannelCounts(at: (d: number, c: number, b: number, a: number) => number, classCount: number, bandSlots: number, districtSlots: number): Float64Array {
  const out = new Float64Array(bandSlots * 2);
  for (let d = 0; d < districtSlots; d++)
    for (let c = 0; c < classCount; c++)
      for (let b = 0; b < bandSlots; b++) {
        out[b * 2] += at(d, c, b, 0);
        out[b * 2 + 1] += at(d, c, b, 1);
      }
  return out;
}

/** Exposure of population cells to a parsed scenario. */
export function computeExposure(scenario: Scenario, population: PopulationCells, options: ExposureOptions = {}): ExposureResult {
  const engine = prepareEngine(scenario, options, samplePoints(population));
  return { ...computeExposureWith(engine, population, options), notes: engine.notes, caution: CAUTION, provenance: engine.provenance };
}

/** The corners of the cells' bounding box, so travel-time tables reach every cell. */
function samplePoints(cells: PopulationCells): [number, number][] {
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < cells.lon.length; i++) {
    w = Math.min(w, cells.lon[i]);
    e = Math.max(e, cells.lon[i]);
    s = Math.min(s, cells.lat[i]);
    n = Math.max(n, cells.lat[i]);
  }
  return cells.lon.length ? [[w, s], [w, n], [e, s], [e, n]] : [];
}

/** One alert strategy's key figures, for side-by-side comparison. */
export interface StrategyComparison {
  strategy: AlertStrategyId;
  label: string;
  alertIssued: boolean;
  alertedPopulation: number;
  alertedWithWarningPopulation: number;
  blindZonePopulation: number;
  noAlertPopulation: number;
  expected: ExpectedOutcomes;
  /** Primary channel: people per warning band. */
  bands: ChannelExposure["bands"];
}

/** The same population under every alert strategy (the scenario's other settings unchanged). */
export function compareStrategies(scenario: Scenario, population: PopulationCells, options: ExposureOptions = {}): StrategyComparison[] {
  return ALERT_STRATEGY_IDS.map((strategy) => {
    const variant: Scenario = { ...scenario, alert: { ...scenario.alert, strategy } };
    const engine = prepareEngine(variant, options, samplePoints(population));
    const r = computeExposureWith(engine, population, options);
    return {
      strategy,
      label: engine.strategy.label,
      alertIssued: r.alertIssued,
      alertedPopulation: r.alertedPopulation,
      alertedWithWarningPopulation: r.alertedWithWarningPopulation,
      blindZonePopulation: r.blindZonePopulation,
      noAlertPopulation: r.noAlertPopulation,
      expected: r.expected,
      bands: r.byChannel[0].bands,
    };
  });
}
