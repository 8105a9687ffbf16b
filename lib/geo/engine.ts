/**
 * Binds a scenario to everything the per-place calculation needs: velocity model and travel-time
 * tables, source geometry, ground-motion model, intensity scale, site conditions, the alert
 * timeline and the alert strategy. Built once per computation; pure and deterministic.
 */
import type { Scenario } from "@/lib/scenario/schema";
import { DEFAULT_DELAYS_NOTE } from "@/lib/scenario/defaults";
import { resolveScenario, type ResolvedScenario } from "@/lib/scenario/resolve";
import { nearestPointInBbox } from "./area-nearest";
import { lambertDistanceKm } from "./distance";
import { getGroundMotionModel } from "./ground-motion/registry";
import type { GroundMotionModel, ModelEarthquake, PreparedGroundMotion } from "./ground-motion/types";
import { getIntensityScale, type IntensityScale } from "./intensity/scales";
import { localOffsetKm, pointAtOffset } from "./local-frame";
import { createPlaceValues, evaluateShaking } from "./place";
import { LEEWAY_VERSION, type Provenance, type ProvenanceContext } from "./provenance";
import { finiteRupture, type FiniteRupture } from "./source/finite-rupture";
import { pointSource } from "./source/point-source";
import { createSourceDistances, type SourceGeometry } from "./source/types";
import { downDipWidthKm, subsurfaceRuptureLengthKm } from "./source/wells-coppersmith-1994";
import { DEFAULT_RUPTURE_VELOCITY_FRACTION_OF_VS } from "@/lib/scenario/defaults";
import { growingMagnitudeUpdates } from "./strategy/growing-magnitude";
import { sourceStrategy } from "./strategy/source-strategy";
import type { AlertStrategy, AlertUpdate } from "./strategy/types";
import { wavefieldStrategy, type StationRecord } from "./strategy/wavefield-strategy";
import { computeAlertTimeline, type AlertTimeline } from "./timeline";
import { homogeneousModel, layerAt, layeredModel, type VelocityModel } from "./velocity/models";
import { firstArrival } from "./velocity/ray-travel-time";
import { buildTravelTimeTable, type TravelTimeTable } from "./velocity/travel-time-table";
import { buildVs30Lookup, type Vs30Cells, type Vs30Lookup } from "./vs30";

/** Options every engine entry point accepts besides the scenario. */
export interface EngineOptions extends ProvenanceContext {
  /** Vs30 grid as typed arrays (e.g. a site-condition layer); takes the place of the scenario's `vs30Grid`. */
  vs30Cells?: Vs30Cells;
}

/** Everything bound to one scenario. */
export interface Engine {
  scenario: ResolvedScenario;
  velocityModel: VelocityModel;
  /** P and S first-arrival tables for the hypocentre depth. */
  pTable: TravelTimeTable;
  sTable: TravelTimeTable;
  /** S table over the rupture's depth range, for peak shaking from finite ruptures (absent for a point source). */
  peakSTable: TravelTimeTable | undefined;
  /** Epicentral distance beyond which the first S is a head wave, km (Infinity for a homogeneous model). */
  sHeadWaveFromKm: number;
  source: SourceGeometry;
  /** The finite rupture, when the scenario has one. */
  rupture: FiniteRupture | null;
  model: GroundMotionModel;
  earthquake: ModelEarthquake;
  motion: PreparedGroundMotion;
  scale: IntensityScale;
  vs30: Vs30Lookup;
  timeline: AlertTimeline;
  strategy: AlertStrategy;
  /** log10 PGV (cm/s) that the scale maps to the `target` intensity. */
  log10PgvTarget: number;
  /** Statements every output using this engine carries (defaults used, approximations, statuses). */
  notes: string[];
  provenance: Provenance;
}

const TABLE_MARGIN_KM = 50;
// Flat layers hold to about 500 km; beyond the table, times come from the exact ray calculation.
const TABLE_MAX_KM = 3000;

function velocityModelOf(scenario: ResolvedScenario): VelocityModel {
  const vm = scenario.velocityModel;
  return vm.kind === "homogeneous" ? homogeneousModel(vm.vpKms, vm.vsKms) : layeredModel(vm.name);
}

/** Largest epicentral distance the scenario's area and stations reach, km. */
function reachKm(scenario: ResolvedScenario): number {
  const { lon, lat } = scenario.source;
  const [w, s, e, n] = scenario.area.bbox;
  let reach = 0;
  for (const x of [w, (w + e) / 2, e]) for (const y of [s, (s + n) / 2, n]) reach = Math.max(reach, lambertDistanceKm(lon, lat, x, y));
  for (const station of scenario.stations) reach = Math.max(reach, lambertDistanceKm(lon, lat, station.lon, station.lat));
  return reach;
}

/** Distance at which the first S wave turns into a head wave, km, to 0.01 km. */
function sHeadWaveFromKm(model: VelocityModel, depthKm: number): number {
  if (model.layers.length === 1) return Infinity;
  const isHead = (x: number) => firstArrival(model, "S", x, depthKm).headInterfaceKm !== null;
  let x = 0;
  while (x <= 1000 && !isHead(x)) x += 5;
  if (x > 1000) return Infinity;
  let lo = Math.max(0, x - 5);
  let hi = x;
  while (hi - lo > 0.01) {
    const mid = (lo + hi) / 2;
    if (isHead(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** What the per-place shaking calculation needs (everything but the alert decision). */
export type ShakingEngine = Pick<
  Engine,
  "scenario" | "velocityModel" | "pTable" | "sTable" | "peakSTable" | "sHeadWaveFromKm" | "source" | "rupture" | "model" | "earthquake" | "motion" | "scale" | "vs30"
>;

/** The rupture rectangle with lengths from Wells & Coppersmith (1994) and the default rupture velocity where the file gives none. */
function ruptureOf(scenario: ResolvedScenario, velocityModel: VelocityModel): FiniteRupture | null {
  const { source } = scenario;
  const r = source.rupture;
  if (!r) return null;
  return finiteRupture({
    hypocentreDepthKm: source.depthKm,
    strikeDeg: r.strikeDeg,
    dipDeg: r.dipDeg,
    lengthKm: r.lengthKm ?? subsurfaceRuptureLengthKm(source.mw),
    widthKm: r.widthKm ?? downDipWidthKm(source.mw),
    mode: r.mode ?? "unilateral",
    ruptureVelocityKms: r.ruptureVelocityKms ?? DEFAULT_RUPTURE_VELOCITY_FRACTION_OF_VS.value * layerAt(velocityModel, source.depthKm).vsKms,
  });
}

/** Points of the source's surface projection (the epicentre, and a lattice over a rupture's projection). */
function sourceSurfacePoints(scenario: ResolvedScenario, rupture: Pick<FiniteRupture, "cornersKm"> | null): [number, number][] {
  const { lon, lat } = scenario.source;
  const points: [number, number][] = [[lon, lat]];
  if (!rupture) return points;
  const [p0, p1, , p3] = rupture.cornersKm;
  for (let i = 0; i <= 20; i++) {
    for (let j = 0; j <= 4; j++) {
      const x = p0[0] + ((p1[0] - p0[0]) * i) / 20 + ((p3[0] - p0[0]) * j) / 4;
      const y = p0[1] + ((p1[1] - p0[1]) * i) / 20 + ((p3[1] - p0[1]) * j) / 4;
      points.push(pointAtOffset(lon, lat, x, y));
    }
  }
  return points;
}

/** Each operating station's predicted record for the wavefield strategy. */
function stationRecords(engine: ShakingEngine): StationRecord[] {
  const { lon: lon0, lat: lat0 } = engine.scenario.source;
  const { telemetryS, processingS } = engine.scenario.timing;
  const values = createPlaceValues();
  return engine.scenario.stations
    .filter((s) => s.operating)
    .map((station) => {
      const offset = localOffsetKm(lon0, lat0, station.lon, station.lat);
      evaluateShaking(engine, offset.distanceKm, offset.eastKm, offset.northKm, engine.vs30.vs30At(station.lon, station.lat), values);
      return { id: station.id, lon: station.lon, lat: station.lat, intensity: values.intensity, triggerS: values.peakShakingS + telemetryS + processingS };
    });
}

/** The smallest model distance from the source to any point of the area, km. */
function nearestModelDistanceKm(scenario: ResolvedScenario, source: SourceGeometry, model: GroundMotionModel, candidates: [number, number][]): number {
  const out = createSourceDistances();
  let best = Infinity;
  for (const [lon, lat] of candidates) {
    const [x, y] = nearestPointInBbox(lon, lat, scenario.area.bbox);
    const offset = localOffsetKm(scenario.source.lon, scenario.source.lat, x, y);
    source.measure(offset.distanceKm, offset.eastKm, offset.northKm, out);
    best = Math.min(best, model.distanceKind === "rupture" ? out.ruptureKm : out.joynerBooreKm);
  }
  return best;
}

function describeNotes(engine: Omit<Engine, "notes" | "provenance">): string[] {
  const { scenario, model, scale, motion, vs30 } = engine;
  const notes: string[] = [];
  if (scenario.defaultsUsed.usesDefaultDelays) notes.push(`${DEFAULT_DELAYS_NOTE} (${scenario.defaultsUsed.delays.join(", ")})`);
  if (scenario.defaultsUsed.alert.length) notes.push(`default alert thresholds (${scenario.defaultsUsed.alert.join(", ")})`);
  if (engine.source.kind === "point" && scenario.source.mw >= 7) {
    notes.push("point-source approximation: shaking along the fault is underestimated");
  }
  const rupture = engine.rupture;
  const given = scenario.source.rupture;
  if (rupture && given) {
    const sized = given.lengthKm === undefined || given.widthKm === undefined ? " (sizes from Wells & Coppersmith 1994, subsurface length and down-dip width)" : "";
    notes.push(
      `finite rupture ${rupture.spec.lengthKm.toFixed(1)} km × ${rupture.widthKm.toFixed(1)} km, ${rupture.spec.mode}, top ${rupture.topDepthKm.toFixed(1)} km, bottom ${rupture.bottomDepthKm.toFixed(1)} km${sized}`,
    );
    if (given.ruptureVelocityKms === undefined) {
      notes.push(`rupture velocity ${rupture.spec.ruptureVelocityKms.toFixed(2)} km/s: 0.8 × Vs at the hypocentre (common practice, no source)`);
    }
  }
  if (scenario.velocityModel.kind === "homogeneous" && scenario.source.depthKm > 35) {
    notes.push("homogeneous velocity model for a source deeper than 35 km: travel times ignore the crust and mantle layers");
  }
  if (Number.isFinite(engine.sHeadWaveFromKm)) {
    notes.push(
      `beyond ${engine.sHeadWaveFromKm.toFixed(0)} km the first S is a head wave (Sn), weaker and earlier than the strong S: warning seconds there err on the short (safe) side`,
    );
  }
  if (scale.conversion.status !== "checked") {
    notes.push(`${scale.conversion.title}: status ${scale.conversion.status}; intensities below ${scale.publishedMinIntensity} are outside its published range`);
  }
  if (motion.magnitudeExtrapolated) notes.push(`Mw ${scenario.source.mw} is outside the data of ${model.title}`);
  if (vs30.clipped) notes.push("some Vs30 values were clipped to 100–1500 m/s, the range the models were fitted on");
  notes.push(`PGA: ${model.pgaNote}`);
  notes.push(...engine.strategy.notes);
  return notes;
}

function buildProvenance(engine: Omit<Engine, "notes" | "provenance">, context: ProvenanceContext): Provenance {
  const { model, scale, velocityModel, scenario, strategy } = engine;
  return {
    leewayVersion: LEEWAY_VERSION,
    groundMotionModel: { id: model.id, title: model.title, citation: model.citation, status: model.status },
    amplification: model.amplification ?? { id: "model-site-term", title: `the site term of ${model.title}` },
    conversion: scale.conversion,
    velocityModel: { id: velocityModel.id, title: velocityModel.title, citation: velocityModel.citation, status: velocityModel.status },
    alertStrategy: strategy.label,
    scenario: { name: scenario.name ?? null, version: context.scenarioVersion ?? null },
    layerVersions: { ...(context.layerVersions ?? {}) },
    computedAt: context.computedAt ?? null,
  };
}

/**
 * Prepares a parsed scenario for computation. `extraPoints` (lon/lat pairs, e.g. sites outside
 * the area) widen the travel-time tables so they stay interpolated there.
 */
export function prepareEngine(input: Scenario, options: EngineOptions = {}, extraPoints: readonly [number, number][] = []): Engine {
  const scenario = resolveScenario(input);
  const { source: src } = scenario;
  const velocityModel = velocityModelOf(scenario);
  let reach = reachKm(scenario);
  for (const [lon, lat] of extraPoints) reach = Math.max(reach, lambertDistanceKm(src.lon, src.lat, lon, lat));
  const maxDistanceKm = Math.min(TABLE_MAX_KM, Math.hypot(reach + TABLE_MARGIN_KM, src.depthKm));
  const tableOptions = { depthMinKm: src.depthKm, depthMaxKm: src.depthKm, maxDistanceKm, distanceStepKm: 0.5 };
  const pTable = buildTravelTimeTable(velocityModel, "P", tableOptions);
  const sTable = buildTravelTimeTable(velocityModel, "S", tableOptions);
  const rupture = ruptureOf(scenario, velocityModel);
  const source = rupture ?? pointSource(src.depthKm);
  const peakSTable = rupture
    ? buildTravelTimeTable(velocityModel, "S", {
        depthMinKm: rupture.topDepthKm,
        depthMaxKm: rupture.bottomDepthKm,
        maxDistanceKm: Math.min(TABLE_MAX_KM, reach + rupture.spec.lengthKm + rupture.widthKm + TABLE_MARGIN_KM),
      })
    : undefined;
  const model = getGroundMotionModel(scenario.groundMotionModel);
  const earthquake: ModelEarthquake = { mw: src.mw, depthKm: src.depthKm, faultType: src.faultType, mechanism: src.mechanism };
  const motion = model.prepare(earthquake);
  const scale = getIntensityScale(scenario.intensityScale);
  const grid = options.vs30Cells ?? (scenario.vs30Grid && {
    lon: scenario.vs30Grid.map((c) => c.lon),
    lat: scenario.vs30Grid.map((c) => c.lat),
    vs30Ms: scenario.vs30Grid.map((c) => c.vs30),
  });
  const vs30 = buildVs30Lookup(scenario.vs30, grid || undefined);
  const timeline = computeAlertTimeline(scenario, pTable);
  const shaking: ShakingEngine = {
    scenario,
    velocityModel,
    pTable,
    sTable,
    peakSTable,
    sHeadWaveFromKm: sHeadWaveFromKm(velocityModel, src.depthKm),
    source,
    rupture,
    model,
    earthquake,
    motion,
    scale,
    vs30,
  };
  const { alert } = scenario;
  let strategy: AlertStrategy;
  if (alert.strategy === "wavefield") {
    strategy = wavefieldStrategy({ stations: stationRecords(shaking), issueAt: alert.issueAt, areaAt: alert.areaAt, radiusKm: alert.wavefieldRadiusKm });
  } else {
    const growing = alert.magnitude === "growing" && rupture !== null;
    const updates: AlertUpdate[] = growing
      ? growingMagnitudeUpdates(rupture, src.mw, timeline.alertIssuedS)
      : [{ issueS: timeline.alertIssuedS, mw: alert.magnitude === "growing" ? src.mw : alert.magnitude }];
    // A growing rupture's messages predict from the part broken so far; the last one is the whole rupture.
    const updateSources = updates.map((u) =>
      growing && rupture && u.brokenLengthKm !== undefined && u.brokenLengthKm < rupture.spec.lengthKm ? finiteRupture({ ...rupture.spec, lengthKm: Math.max(0.1, u.brokenLengthKm) }) : null,
    );
    strategy = sourceStrategy({
      earthquake,
      model,
      scale,
      issueAt: alert.issueAt,
      areaAt: alert.areaAt,
      updates,
      updateSources,
      nearestModelDistanceKm: updateSources.map((partial) => {
        const s = partial ?? source;
        return nearestModelDistanceKm(scenario, s, model, sourceSurfacePoints(scenario, partial ?? rupture));
      }),
      softestVs30Ms: vs30.minVs30Ms,
    });
  }
  const parts = { ...shaking, timeline, strategy, log10PgvTarget: scale.log10PgvFor(alert.target) };
  return { ...parts, notes: describeNotes(parts), provenance: buildProvenance(parts, options) };
}
