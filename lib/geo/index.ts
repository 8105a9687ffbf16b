/**
 * Leeway's scenario engine: pure functions on plain data and typed arrays, the same in the
 * browser, a Web Worker, route handlers and the CLI.
 */
export { computeSites, evaluateSites, type SiteInput, type SiteResult, type SiteChannelResult, type SitesResult } from "./sites";
export {
  computeGrid,
  computeGridWith,
  summarizeGrid,
  summarizeGridWith,
  resolveGridGeometry,
  type EngineGrid,
  type GridChannel,
  type GridOptions,
  type GridResult,
  type GridSummary,
  type GridSummaryResult,
} from "./grid";
export {
  traceContours,
  mergeContours,
  type ContourSet,
  type ContourOptions,
  type ContourCollection,
  type ContourFeature,
  type WarningBandProperties,
  type IntensityBandProperties,
  type BlindZoneProperties,
  type AlertAreaProperties,
} from "./contours";
export {
  computeExposure,
  computeExposureWith,
  compareStrategies,
  type StrategyComparison,
  type WithinOneClass,
  type PopulationCells,
  type ProtectiveAction,
  type ExposureOptions,
  type ExposureResult,
  type ExposureTableRow,
  type DistrictExposure,
  type ChannelExposure,
  type ExpectedOutcomes,
} from "./exposure";
export { finiteRupture, type FiniteRupture, type FiniteRuptureSpec } from "./source/finite-rupture";
export { subsurfaceRuptureLengthKm, downDipWidthKm, ruptureAreaKm2, wellsCoppersmithCovers } from "./source/wells-coppersmith-1994";
export { growingMagnitudeAt, growingMagnitudeUpdates } from "./strategy/growing-magnitude";
export { evaluateFacilities, type LineFacility, type LineResult, type FacilitiesResult } from "./facilities";
export { actionFits, actionsThatFit } from "./actions";
export { prepareEngine, type Engine, type EngineOptions } from "./engine";
export type { StationPick } from "./timeline";
export { CAUTION, LEEWAY_VERSION, describeProvenance, type Provenance, type ProvenanceContext } from "./provenance";
export { gridGeometry, cellAreaKm2, columnLonDeg, rowLatDeg, type Bbox, type GridGeometry } from "./grid-geometry";
export { geodesicDistanceKm, geodesicInverse, lambertDistanceKm, lambertDistancesKm } from "./distance";
export { localOffsetKm, pointAtOffset } from "./local-frame";
export {
  BLIND_BAND,
  NO_ALERT_BAND,
  warningBands,
  warningBandIndex,
  homogeneousBlindZoneRadiusKm,
  displayedWarningS,
  type WarningBand,
} from "./warning";
export { JMA_CLASSES, JMA_CLASS_LOWER_BOUNDS, jmaClassOf, jmaIntensityFromLog10Pgv, type JmaClass } from "./intensity/jma";
export { MMI_CLASSES, MMI_CLASS_LOWER_BOUNDS, mmiClassOf, mmiFromLog10Pgv, mmiFromLog10Pga, type MmiClass } from "./intensity/mmi-worden-2012";
export { getIntensityScale, jmaScale, mmiScale, INTENSITY_SCALE_IDS, type IntensityScale, type IntensityScaleId } from "./intensity/scales";
export {
  registerGroundMotionModel,
  findGroundMotionModel,
  getGroundMotionModel,
  listGroundMotionModels,
  DEFAULT_GROUND_MOTION_MODEL_ID,
} from "./ground-motion/registry";
export type { GroundMotionModel, PreparedGroundMotion, ModelEarthquake, ModelStatus, PublishedRelation, FaultType, Mechanism } from "./ground-motion/types";
export { listRelationStatuses, type RelationStatus } from "./models-status";
export { normalCdf, probabilityOfExceedance } from "./uncertainty";
export { ALERT_STRATEGY_IDS, type AlertStrategyId } from "./strategy/ids";
export { LAYERED_MODEL_NAMES, iasp91, ak135, homogeneousModel, type VelocityModel, type VelocityLayer } from "./velocity/models";
export { firstArrival, firstArrivalS, type Phase } from "./velocity/ray-travel-time";
export { buildVs30Lookup, MODEL_VS30_RANGE_MS, type Vs30Cells } from "./vs30";
