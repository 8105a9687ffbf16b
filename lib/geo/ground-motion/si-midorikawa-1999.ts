/**
 * Si, H. & Midorikawa, S. (1999), New attenuation relationships for peak ground acceleration and
 * velocity considering effects of fault type and site condition, Journal of Structural and
 * Construction Engineering (Transactions of AIJ) 523, 63–70; English version 12WCEE (2000),
 * paper 0532. Form as used for Japan's national seismic hazard maps (NIED 2009):
 *
 *     log PGV600 = 0.58·Mw + 0.0038·D + d_v − 1.29 − log(X + 0.0028·10^(0.50·Mw)) − 0.002·X
 *     log PGA    = 0.50·Mw + 0.0043·D + d_a + 0.61 − log(X + 0.0055·10^(0.50·Mw)) − 0.003·X
 *
 * X: shortest distance to the rupture (hypocentral distance for a point source), km; D: focal
 * depth, km. PGV600 is on engineering bedrock (Vs ≈ 600 m/s), larger horizontal component;
 * surface PGV = PGV600 · ARV (Midorikawa et al. 1994).
 *
 * Deviations from the paper:
 * - Mw is capped at 8.3 everywhere in the equations, including the near-source term (NIED 2009).
 * - Sigma is the original paper's (log10 0.23 for PGV), not the smaller NIED 2009 values.
 * - PGA is the paper's average-site value: it takes no Vs30 term.
 * - One compendium pairs the PGA coefficient sets with the distance types the other way round
 *   (open); the form above is used.
 */
import { log10AmplificationRatio, midorikawa1994Amplification } from "./midorikawa-1994-amplification";
import type { FaultType, GroundMotionModel, ModelEarthquake, PreparedGroundMotion } from "./types";

/** Coefficients as printed (NIED 2009 form of the 1999 paper). */
export const SI_MIDORIKAWA_1999 = {
  pgv: { magnitude: 0.58, depth: 0.0038, constant: -1.29, nearSource: 0.0028, anelastic: 0.002 },
  pga: { magnitude: 0.5, depth: 0.0043, constant: 0.61, nearSource: 0.0055, anelastic: 0.003 },
  nearSourceMagnitudeScale: 0.5,
  faultTerms: {
    crustal: { pgv: 0, pga: 0 },
    interplate: { pgv: -0.02, pga: 0.01 },
    intraslab: { pgv: 0.12, pga: 0.22 },
  } satisfies Record<FaultType, { pgv: number; pga: number }>,
  mwCap: 8.3,
  sigmaLog10: { pgv: 0.23, pga: 0.27 },
} as const;

/**
 * Distance limits of the data behind the paper, as summarised in a GMPE compendium: 300 km for
 * Mw > 7, 200 km for 6.6–7.0, 150 km for 6.3–6.5, 100 km below.
 */
export function siMidorikawaDataLimitKm(mw: number): number {
  if (mw > 7) return 300;
  if (mw > 6.5) return 200;
  if (mw >= 6.3) return 150;
  return 100;
}

/** The magnitude-dependent terms of both equations for one earthquake. */
function constants(earthquake: ModelEarthquake) {
  const c = SI_MIDORIKAWA_1999;
  const mw = Math.min(earthquake.mw, c.mwCap);
  const fault = c.faultTerms[earthquake.faultType];
  const nearSourceScale = 10 ** (c.nearSourceMagnitudeScale * mw);
  return {
    pgv: c.pgv.magnitude * mw + c.pgv.depth * earthquake.depthKm + fault.pgv + c.pgv.constant,
    pgvNear: c.pgv.nearSource * nearSourceScale,
    pga: c.pga.magnitude * mw + c.pga.depth * earthquake.depthKm + fault.pga + c.pga.constant,
    pgaNear: c.pga.nearSource * nearSourceScale,
  };
}

/** log10 PGV600 (cm/s) on engineering bedrock at rupture distance `distanceKm` (the PGV equation above). */
export function siMidorikawaLog10Pgv600(earthquake: ModelEarthquake, distanceKm: number): number {
  const k = constants(earthquake);
  return k.pgv - Math.log10(distanceKm + k.pgvNear) - SI_MIDORIKAWA_1999.pgv.anelastic * distanceKm;
}

function prepare(earthquake: ModelEarthquake): PreparedGroundMotion {
  const c = SI_MIDORIKAWA_1999;
  const k = constants(earthquake);
  // Neighbouring places mostly share a Vs30: keep the last amplification.
  let lastVs30Ms = Number.NaN;
  let lastLog10Arv = 0;
  const log10Arv = (vs30Ms: number) => {
    if (vs30Ms !== lastVs30Ms) {
      lastVs30Ms = vs30Ms;
      lastLog10Arv = log10AmplificationRatio(vs30Ms);
    }
    return lastLog10Arv;
  };
  return {
    log10PgvCms: (distanceKm, vs30Ms) => k.pgv - Math.log10(distanceKm + k.pgvNear) - c.pgv.anelastic * distanceKm + log10Arv(vs30Ms),
    log10PgaCms2: (distanceKm) => k.pga - Math.log10(distanceKm + k.pgaNear) - c.pga.anelastic * distanceKm,
    sigmaLog10Pgv: () => c.sigmaLog10.pgv,
    dataLimitKm: siMidorikawaDataLimitKm(earthquake.mw),
    magnitudeExtrapolated: earthquake.mw > c.mwCap,
  };
}

/** Si & Midorikawa (1999) with Midorikawa et al. (1994) amplification: Leeway's default model. */
export const siMidorikawa1999: GroundMotionModel = {
  id: "si-midorikawa-1999",
  title: "Si & Midorikawa (1999) PGV and PGA",
  citation:
    "Si, H. & Midorikawa, S. (1999), J. Struct. Constr. Eng. (Trans. AIJ) 523, 63–70; English version 12WCEE (2000) paper 0532",
  status: "checked",
  deviations: [
    "Mw capped at 8.3 everywhere in the equations (NIED 2009 form)",
    "sigma from the original paper (log10 0.23 for PGV)",
    "PGA is for the paper's average site and takes no Vs30 term",
  ],
  distanceKind: "rupture",
  faultTypes: ["crustal", "interplate", "intraslab"],
  amplification: midorikawa1994Amplification,
  pgaNote: "PGA for the paper's average site (no Vs30 term), larger horizontal component",
  prepare,
};
