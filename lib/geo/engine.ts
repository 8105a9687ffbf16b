/**
 * Binds a scenario to everything the per-place calculation needs: velocity model and travel-time
 * tables, source geometry, ground-motion model, intensity scale, site conditions, the alert
 * timeline and the alert strategy. Built once per computation; pure and deterministic.
 */
import type { Scenario } from "@/lib/scenario/schema";
import { resolveScenario, type ResolvedScenario } from "@/lib/scenario/resolve";
import { lambertDistanceKm } from "./distance";
import { buildAlertStrategy } from "./engine-alert";
import { buildProvenance, describeNotes } from "./engine-notes";
import { ruptureOf } from "./engine-source";
import { getGroundMotionModel } from "./ground-motion/registry";
import type { GroundMotionModel, ModelEarthquake, PreparedGroundMotion } from "./ground-motion/types";
import { getIntensityScale, type IntensityScale } from "./intensity/scales";
import type { Provenance, ProvenanceContext } from "./provenance";
import type { FiniteRupture } from "./source/finite-rupture";
import { pointSource } from "./source/point-source";
import type { SourceGeometry } from "./source/types";
import type { AlertStrategy } from "./strategy/types";
import { computeAlertTimeline, type AlertTimeline } from "./timeline";
import { homogeneousModel, layeredModel, type VelocityModel } from "./velocity/models";
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
  const strategy = buildAlertStrategy(shaking, timeline);
  const parts = { ...shaking, timeline, strategy, log10PgvTarget: scale.log10PgvFor(scenario.alert.target) };
  return { ...parts, notes: describeNotes(parts), provenance: buildProvenance(parts, options) };
}
