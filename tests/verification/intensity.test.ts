/**
 * Intensity conversions and classes against METHODS.md §2, §5 and §6.
 */
import { describe, expect, it } from "vitest";
import { jmaClassOf, jmaIntensityFromLog10Pgv, log10PgvForJmaIntensity } from "@/lib/geo/intensity/jma";
import { log10PgvForMmi, mmiClassOf, mmiFromLog10Pga, mmiFromLog10Pgv } from "@/lib/geo/intensity/mmi-worden-2012";

describe("JMA intensity", () => {
  it("classes follow the official boundaries with ≥ at each one (METHODS §5, checked)", () => {
    const cases: [number, string][] = [
      [0.49, "0"], [0.5, "1"], [2.5, "3"], [3.49, "3"], [3.5, "4"], [4.4999, "4"], [4.5, "5-"],
      [5.0, "5+"], [5.5, "6-"], [6.0, "6+"], [6.4999, "6+"], [6.5, "7"], [7.3, "7"],
    ];
    for (const [intensity, label] of cases) expect(jmaClassOf(intensity), String(intensity)).toBe(label);
  });

  it("5-lower ≈ PGV 11.4 cm/s and 4 ≈ PGV 3.0 cm/s (METHODS §2, through the §5 conversion, status open)", () => {
    expect(jmaIntensityFromLog10Pgv(Math.log10(11.4))).toBeCloseTo(4.5, 1);
    expect(jmaIntensityFromLog10Pgv(Math.log10(3.0))).toBeCloseTo(3.5, 1);
  });

  it("the inverse conversion returns the PGV", () => {
    expect(jmaIntensityFromLog10Pgv(log10PgvForJmaIntensity(5.2))).toBeCloseTo(5.2, 12);
  });
});

describe("MMI, Worden et al. (2012)", () => {
  it("check values: PGA 100 cm/s² → 5.80, PGV 10 cm/s → 6.05 (METHODS §6)", () => {
    expect(mmiFromLog10Pga(2)).toBeCloseTo(5.8, 2);
    expect(mmiFromLog10Pgv(1)).toBeCloseTo(6.05, 2);
  });

  it("PGV 11.4 cm/s ≈ MMI 6.2 and 3.0 cm/s ≈ 4.5 (METHODS §2)", () => {
    expect(mmiFromLog10Pgv(Math.log10(11.4))).toBeCloseTo(6.2, 1);
    expect(mmiFromLog10Pgv(Math.log10(3.0))).toBeCloseTo(4.5, 1);
  });

  it("classes are MMI rounded to the nearest integer, clipped to I–X (common practice, no source)", () => {
    expect([0.2, 1.49, 1.5, 5.5, 6.49, 9.6, 11].map(mmiClassOf)).toEqual(["I", "I", "II", "VI", "VI", "X", "X"]);
  });

  it("the inverse conversion returns the PGV on both branches", () => {
    for (const mmi of [3, 4.4, 5, 7, 9]) expect(mmiFromLog10Pgv(log10PgvForMmi(mmi))).toBeCloseTo(mmi, 10);
  });
});
