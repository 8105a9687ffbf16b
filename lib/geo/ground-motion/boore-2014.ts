/**
 * Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014), NGA-West2 equations for
 * predicting PGA, PGV, and 5 % damped PSA for shallow crustal earthquakes, Earthquake Spectra
 * 30(3), 1057–1085. Natural log; PGA in g (converted here to cm/s²), PGV in cm/s:
 *
 *     ln Y = F_E(M, mech) + F_P(R_JB, M) + F_S(Vs30, R_JB, M)          (eq. 1)
 *
 * Deviations from the paper:
 * - The basin-depth term F_δz1 is left out (Leeway has no basin depth); regional Δc3 is "global".
 * - Shallow crustal sources only; other fault types are refused by the registry.
 * - Its component (RotD50) differs from Si & Midorikawa's larger horizontal component; both feed
 *   the same intensity conversions.
 * - Data limits (R_JB ≤ 400 km, M 3.0–8.5) are from memory of the paper's stated range.
 */
import type { GroundMotionModel, Mechanism, ModelEarthquake, PreparedGroundMotion } from "./types";

/** One column of the coefficient table. */
export interface Boore2014Coefficients {
  /** e0 unspecified, e1 strike-slip, e2 normal, e3 reverse. */
  e: Record<Mechanism, number>;
  e4: number;
  e5: number;
  e6: number;
  mhMw: number;
  c1: number;
  c2: number;
  c3: number;
  hKm: number;
  deltaC3: number;
  c: number;
  vcMs: number;
  f4: number;
  f5: number;
  phi1: number;
  phi2: number;
  tau1: number;
  tau2: number;
  r1Km: number;
  r2Km: number;
  deltaPhiR: number;
  deltaPhiV: number;
}

/** Coefficients for PGA and PGV as published (table of the paper, global Δc3). */
export const BOORE_2014: { pga: Boore2014Coefficients; pgv: Boore2014Coefficients } = {
  pga: {
    e: { unspecified: 0.4473, "strike-slip": 0.4856, normal: 0.2459, reverse: 0.4539 },
    e4: 1.431, e5: 0.05053, e6: -0.1662, mhMw: 5.5,
    c1: -1.134, c2: 0.1917, c3: -0.008088, hKm: 4.5, deltaC3: 0,
    c: -0.6, vcMs: 1500, f4: -0.15, f5: -0.00701,
    phi1: 0.695, phi2: 0.495, tau1: 0.398, tau2: 0.348,
    r1Km: 110, r2Km: 270, deltaPhiR: 0.1, deltaPhiV: 0.07,
  },
  pgv: {
    e: { unspecified: 5.037, "strike-slip": 5.078, normal: 4.849, reverse: 5.033 },
    e4: 1.073, e5: -0.1536, e6: 0.2252, mhMw: 6.2,
    c1: -1.243, c2: 0.1489, c3: -0.00344, hKm: 5.3, deltaC3: 0,
    c: -0.84, vcMs: 1300, f4: -0.1, f5: -0.00844,
    phi1: 0.644, phi2: 0.552, tau1: 0.401, tau2: 0.346,
    r1Km: 105, r2Km: 272, deltaPhiR: 0.082, deltaPhiV: 0.08,
  },
};

/** Reference values shared by all periods (eqs. 3–8). */
const REFERENCE = { mrefMw: 4.5, rrefKm: 1, vrefMs: 760, f1: 0, f3G: 0.1, v1Ms: 225, v2Ms: 300 } as const;

const G_CMS2 = 980.665;
const LN10 = Math.LN10;

/** Source function F_E (eq. 2). */
function sourceTerm(k: Boore2014Coefficients, mw: number, mechanism: Mechanism): number {
  const dm = mw - k.mhMw;
  return dm <= 0 ? k.e[mechanism] + k.e4 * dm + k.e5 * dm * dm : k.e[mechanism] + k.e6 * dm;
}

/** Path function F_P (eq. 3) with R = √(R_JB² + h²) (eq. 4). */
function pathTerm(k: Boore2014Coefficients, mw: number, joynerBooreKm: number): number {
  const r = Math.sqrt(joynerBooreKm * joynerBooreKm + k.hKm * k.hKm);
  return (k.c1 + k.c2 * (mw - REFERENCE.mrefMw)) * Math.log(r / REFERENCE.rrefKm) + (k.c3 + k.deltaC3) * (r - REFERENCE.rrefKm);
}

/** Site function F_S = F_lin + F_nl (eqs. 5–8), with PGAr the rock (760 m/s) PGA in g. */
function siteTerm(k: Boore2014Coefficients, vs30Ms: number, pgaRockG: number): number {
  const linear = k.c * Math.log(Math.min(vs30Ms, k.vcMs) / REFERENCE.vrefMs);
  const f2 = k.f4 * (Math.exp(k.f5 * (Math.min(vs30Ms, REFERENCE.vrefMs) - 360)) - Math.exp(k.f5 * (REFERENCE.vrefMs - 360)));
  return linear + REFERENCE.f1 + f2 * Math.log((pgaRockG + REFERENCE.f3G) / REFERENCE.f3G);
}

/** Aleatory sigma in ln units from φ(M, R_JB, Vs30) and τ(M) (eqs. 9–11). */
export function boore2014SigmaLn(k: Boore2014Coefficients, mw: number, joynerBooreKm: number, vs30Ms: number): number {
  const weight = Math.min(1, Math.max(0, mw - 4.5));
  let phi = k.phi1 + (k.phi2 - k.phi1) * weight;
  const tau = k.tau1 + (k.tau2 - k.tau1) * weight;
  if (joynerBooreKm > k.r2Km) phi += k.deltaPhiR;
  else if (joynerBooreKm > k.r1Km) phi += (k.deltaPhiR * Math.log(joynerBooreKm / k.r1Km)) / Math.log(k.r2Km / k.r1Km);
  if (vs30Ms <= REFERENCE.v1Ms) phi -= k.deltaPhiV;
  else if (vs30Ms < REFERENCE.v2Ms) phi -= (k.deltaPhiV * Math.log(REFERENCE.v2Ms / vs30Ms)) / Math.log(REFERENCE.v2Ms / REFERENCE.v1Ms);
  return Math.sqrt(phi * phi + tau * tau);
}

function prepare(earthquake: ModelEarthquake): PreparedGroundMotion {
  const { mw, mechanism } = earthquake;
  const { pga, pgv } = BOORE_2014;
  const pgaSource = sourceTerm(pga, mw, mechanism);
  const pgvSource = sourceTerm(pgv, mw, mechanism);
  const pgaRockG = (joynerBooreKm: number) => Math.exp(pgaSource + pathTerm(pga, mw, joynerBooreKm));
  return {
    log10PgvCms: (joynerBooreKm, vs30Ms) =>
      (pgvSource + pathTerm(pgv, mw, joynerBooreKm) + siteTerm(pgv, vs30Ms, pgaRockG(joynerBooreKm))) / LN10,
    log10PgaCms2: (joynerBooreKm, vs30Ms) => {
      const lnRock = pgaSource + pathTerm(pga, mw, joynerBooreKm);
      return (lnRock + siteTerm(pga, vs30Ms, Math.exp(lnRock))) / LN10 + Math.log10(G_CMS2);
    },
    sigmaLog10Pgv: (joynerBooreKm, vs30Ms) => boore2014SigmaLn(pgv, mw, joynerBooreKm, vs30Ms) / LN10,
    dataLimitKm: 400,
    magnitudeExtrapolated: mw < 3 || mw > 8.5,
  };
}

/** Boore et al. (2014), shallow crustal sources only. */
export const boore2014: GroundMotionModel = {
  id: "bssa-2014",
  title: "Boore, Stewart, Seyhan & Atkinson (2014) PGV and PGA",
  citation: "Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014), Earthquake Spectra 30(3), 1057–1085",
  status: "checked",
  deviations: [
    "basin-depth term left out; regional Δc3 global",
    "RotD50 component, fed to the same conversions as the larger-component model",
    "data limits (R_JB ≤ 400 km, M 3.0–8.5) from memory",
  ],
  distanceKind: "joyner-boore",
  faultTypes: ["crustal"],
  amplification: null,
  pgaNote: "PGA (RotD50) at the site's Vs30, from the model's own site term",
  prepare,
};
