/**
 * Ground-motion models against the verification rows of METHODS.md §3, §4 and §7 (published
 * test tables of the papers' equations). Tolerance: 1e-4 relative (the tables give 6–8 digits).
 */
import { describe, expect, it } from "vitest";
import { BOORE_2014, boore2014, boore2014SigmaLn } from "@/lib/geo/ground-motion/boore-2014";
import { log10AmplificationRatio } from "@/lib/geo/ground-motion/midorikawa-1994-amplification";
import { siMidorikawa1999, siMidorikawaLog10Pgv600, siMidorikawaDataLimitKm } from "@/lib/geo/ground-motion/si-midorikawa-1999";
import type { FaultType, ModelEarthquake } from "@/lib/geo/ground-motion/types";

const quake = (mw: number, depthKm: number, faultType: FaultType = "crustal"): ModelEarthquake => ({ mw, depthKm, faultType, mechanism: "unspecified" });
const relative = (value: number, reference: number) => Math.abs(value - reference) / reference;

describe("Si & Midorikawa (1999)", () => {
  // METHODS §3 verification rows: a hazard library's table at Vs30 = 400 divided by its factor 1.41.
  const rows: [number, number, number, FaultType, number][] = [
    [7, 10, 20, "crustal", 20.313665],
    [8, 50, 100, "crustal", 17.091888],
    [7, 10, 20, "intraslab", 26.778626],
  ];
  it.each(rows)("Mw %s, D %s km, X %s km, %s: PGV600 = %s cm/s (METHODS §3 table)", (mw, depthKm, distanceKm, faultType, pgv600) => {
    expect(relative(10 ** siMidorikawaLog10Pgv600(quake(mw, depthKm, faultType), distanceKm), pgv600)).toBeLessThan(1e-4);
  });

  it("surface PGV is PGV600 times ARV (METHODS §4)", () => {
    const q = quake(7, 10);
    const prepared = siMidorikawa1999.prepare(q);
    expect(prepared.log10PgvCms(20, 300)).toBeCloseTo(siMidorikawaLog10Pgv600(q, 20) + log10AmplificationRatio(300), 12);
  });

  it("caps Mw at 8.3 everywhere, including the near-source term (NIED 2009)", () => {
    expect(siMidorikawaLog10Pgv600(quake(9, 30), 50)).toBe(siMidorikawaLog10Pgv600(quake(8.3, 30), 50));
    expect(siMidorikawa1999.prepare(quake(9, 30)).magnitudeExtrapolated).toBe(true);
  });

  it("data limits: 300 km above Mw 7, 200 km for 6.6–7.0, 150 km for 6.3–6.5, 100 km below (METHODS §3)", () => {
    expect([siMidorikawaDataLimitKm(7.5), siMidorikawaDataLimitKm(6.8), siMidorikawaDataLimitKm(6.4), siMidorikawaDataLimitKm(5.5)]).toEqual([300, 200, 150, 100]);
  });
});

describe("Midorikawa et al. (1994) amplification", () => {
  it("ARV(600 m/s) = 0.992, used as printed (METHODS §4)", () => {
    expect(10 ** log10AmplificationRatio(600)).toBeCloseTo(0.992, 3);
  });
  it("reproduces the 1.31 factor between 600 and 400 m/s (METHODS §4, slope checked)", () => {
    expect(10 ** (log10AmplificationRatio(400) - log10AmplificationRatio(600))).toBeCloseTo(1.31, 2);
  });
});

describe("Boore et al. (2014)", () => {
  // METHODS §7 verification rows (published test table, unspecified mechanism).
  const rows: [number, number, number, number, number][] = [
    [3.0, 0, 760, 0.0880635, 0.00686845],
    [7.0, 20, 250, 25.092, 0.211924],
    [8.0, 50, 760, 11.5295, 0.113101],
  ];
  it.each(rows)("M %s, R_JB %s km, Vs30 %s m/s: PGV %s cm/s, PGA %s g (METHODS §7 table)", (mw, rjb, vs30, pgvCms, pgaG) => {
    const prepared = boore2014.prepare(quake(mw, 10));
    expect(relative(10 ** prepared.log10PgvCms(rjb, vs30), pgvCms)).toBeLessThan(1e-4);
    expect(relative(10 ** prepared.log10PgaCms2(rjb, vs30) / 980.665, pgaG)).toBeLessThan(1e-4);
  });

  it("total sigma for M ≥ 5.5, R_JB ≤ R1, Vs30 ≥ 300: 0.6051 (PGA) and 0.6515 (PGV) in ln units (METHODS §7)", () => {
    expect(boore2014SigmaLn(BOORE_2014.pga, 6.5, 50, 400)).toBeCloseTo(0.6051, 4);
    expect(boore2014SigmaLn(BOORE_2014.pgv, 6.5, 50, 400)).toBeCloseTo(0.6515, 4);
    expect(boore2014.prepare(quake(6.5, 10)).sigmaLog10Pgv(50, 400)).toBeCloseTo(0.6515 / Math.LN10, 4);
  });

  it("is for shallow crustal sources only", () => {
    expect(boore2014.faultTypes).toEqual(["crustal"]);
  });
});
