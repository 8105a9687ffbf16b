/** Fault types a scenario source can have (BRIEF "What it computes", item 1). */
export const FAULT_TYPES = ["crustal", "interplate", "intraslab"] as const;
export type FaultType = (typeof FAULT_TYPES)[number];

/** Focal mechanisms some ground-motion models distinguish. */
export const MECHANISMS = ["unspecified", "strike-slip", "normal", "reverse"] as const;
export type Mechanism = (typeof MECHANISMS)[number];

/**
 * How sure Leeway is of a transcribed model (METHODS.md status words):
 * `checked` — two transcriptions agree or a published table was reproduced;
 * `from memory` — widely quoted, not checked against the paper; `open` — a known disagreement.
 */
export type ModelStatus = "checked" | "from memory" | "open";

/** The distance a model's equations take. */
export type DistanceKind = "rupture" | "joyner-boore";

/** A published relation as shown to users: what it is, where it comes from, how sure we are. */
export interface PublishedRelation {
  id: string;
  title: string;
  citation: string;
  status: ModelStatus;
}

/** The earthquake as a ground-motion model sees it. */
export interface ModelEarthquake {
  mw: number;
  /** Focal (hypocentral) depth, km. */
  depthKm: number;
  faultType: FaultType;
  mechanism: Mechanism;
}

/**
 * A model bound to one earthquake. Methods take plain numbers so grid loops call them
 * without allocating; every value is a median in log10 units.
 */
export interface PreparedGroundMotion {
  /** log10 of the median surface PGV (cm/s) at `distanceKm` (of the model's `distanceKind`) on a site of `vs30Ms`. */
  log10PgvCms(distanceKm: number, vs30Ms: number): number;
  /** log10 of the median PGA (cm/s²). */
  log10PgaCms2(distanceKm: number, vs30Ms: number): number;
  /** Standard deviation of log10 PGV (total sigma). */
  sigmaLog10Pgv(distanceKm: number, vs30Ms: number): number;
  /** Distance beyond which the model is extrapolated for this magnitude, km. */
  dataLimitKm: number;
  /** Magnitudes outside the model's data are also extrapolation. */
  magnitudeExtrapolated: boolean;
}

/**
 * A published ground-motion model (one file per paper under lib/geo/ground-motion/).
 * Register new ones with `registerGroundMotionModel`.
 */
export interface GroundMotionModel extends PublishedRelation {
  /** Differences between Leeway's implementation and the paper. */
  deviations: readonly string[];
  distanceKind: DistanceKind;
  faultTypes: readonly FaultType[];
  /** Site amplification applied on top of the model; `null` when the model carries its own site term. */
  amplification: PublishedRelation | null;
  /** How PGA should be read (component, site). */
  pgaNote: string;
  prepare(earthquake: ModelEarthquake): PreparedGroundMotion;
}
