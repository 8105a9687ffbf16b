/**
 * Finite ruptures against flat-geometry closed forms (issue 4) and Wells & Coppersmith (1994).
 */
import { describe, expect, it } from "vitest";
import { computeSites, prepareEngine, ruptureAreaKm2 } from "@/lib/geo";
import { parseScenario } from "@/lib/scenario/schema";
import { EPICENTRE, VS_KMS, destination, homogeneousScenario, scenarioFrom } from "./scenario-fixtures";

const h = 10;
const vrKms = 2.8;

function withRupture(rupture: Record<string, unknown>, mw = 7.2) {
  const base = homogeneousScenario({ depthKm: h, mw });
  return scenarioFrom({ ...base, source: { ...base.source, rupture } });
}

describe("finite rupture geometry", () => {
  // Unilateral, vertical, 100 km long along strike 90°, from the surface to 2h; hypocentre at depth h at its near end.
  const scenario = withRupture({ strikeDeg: 90, dipDeg: 90, lengthKm: 100, widthKm: 2 * h, mode: "unilateral", ruptureVelocityKms: vrKms });
  const [beyond] = computeSites(scenario, [{ id: "beyond", lon: destination(...EPICENTRE, 90, 105)[0], lat: destination(...EPICENTRE, 90, 105)[1] }]).sites;

  it("a site on the strike line 5 km beyond the far end: ruptureKm 5 ± 0.05 (flat geometry)", () => {
    expect(Math.abs(beyond.ruptureKm - 5)).toBeLessThan(0.05);
    expect(Math.abs(beyond.joynerBooreKm - 5)).toBeLessThan(0.05);
  });

  it("peakShakingS = √(100² + h²)/Vr + 5/Vs (homogeneous, flat geometry)", () => {
    const closedForm = Math.hypot(100, h) / vrKms + 5 / VS_KMS;
    expect(Math.abs(beyond.peakShakingS - closedForm)).toBeLessThan(0.05);
    // The first S still comes from the hypocentre: √(105² + h²)/Vs.
    expect(beyond.sArrivalS).toBeCloseTo(Math.hypot(105, h) / VS_KMS, 2);
  });

  it("a site above the fault trace has Joyner–Boore distance 0 and rupture distance 0", () => {
    const [above] = computeSites(scenario, [{ id: "above", lon: destination(...EPICENTRE, 90, 50)[0], lat: destination(...EPICENTRE, 90, 50)[1] }]).sites;
    expect(above.joynerBooreKm).toBeLessThan(0.01);
    expect(above.ruptureKm).toBeLessThan(0.01);
  });

  it("bilateral: the hypocentre in the middle, both ends reached at the same time", () => {
    const bilateral = withRupture({ strikeDeg: 90, dipDeg: 90, lengthKm: 100, widthKm: 2 * h, mode: "bilateral", ruptureVelocityKms: vrKms });
    const sites = [90, 270].map((azimuth) => {
      const [lon, lat] = destination(...EPICENTRE, azimuth, 55);
      return { id: String(azimuth), lon, lat };
    });
    const [east, west] = computeSites(bilateral, sites).sites;
    expect(east.peakShakingS).toBeCloseTo(west.peakShakingS, 2);
    expect(east.peakShakingS).toBeCloseTo(Math.hypot(50, h) / vrKms + 5 / VS_KMS, 1);
  });

  it("dips to the right of the strike and is clipped at the surface", () => {
    // Strike 0° (north), dip 30°: down dip is east. W 50 km around h = 10 km would reach 10 − 25·sin 30° = −2.5 km: clipped at 0.
    const rupture = prepareEngine(withRupture({ strikeDeg: 0, dipDeg: 30, lengthKm: 40, widthKm: 50 })).rupture;
    expect(rupture?.topDepthKm).toBe(0);
    expect(rupture?.bottomDepthKm).toBeCloseTo(h + 25 * 0.5, 10);
    expect(rupture?.widthKm).toBeCloseTo((h + 12.5) / 0.5, 10);
    const [, , bottomEnd] = rupture?.cornersKm ?? [];
    expect(bottomEnd[0]).toBeGreaterThan(0);
  });

  it("default rupture velocity is 0.8 × Vs at the hypocentre (common practice, no source)", () => {
    const rupture = prepareEngine(withRupture({ strikeDeg: 0, dipDeg: 60, lengthKm: 40, widthKm: 15 })).rupture;
    expect(rupture?.spec.ruptureVelocityKms).toBeCloseTo(0.8 * VS_KMS, 12);
  });
});

describe("rupture size, Wells & Coppersmith (1994)", () => {
  it("a missing length at M 7.0 gives 49.0 km, width 17.0 km (METHODS §8 check)", () => {
    const rupture = prepareEngine(withRupture({ strikeDeg: 30, dipDeg: 60 }, 7.0)).rupture;
    expect(rupture?.spec.lengthKm).toBeCloseTo(49.0, 1);
    expect(rupture?.spec.widthKm).toBeCloseTo(17.0, 1);
    expect(ruptureAreaKm2(7)).toBeCloseTo(759, -1);
  });

  it("above M 8.1 length and width are required, and the message names them", () => {
    const base = homogeneousScenario({ depthKm: 20 });
    const result = parseScenario({ ...base, source: { ...base.source, mw: 8.6, faultType: "interplate", rupture: { strikeDeg: 10, dipDeg: 15 } } });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((i) => i.path)).toEqual(["source.rupture.lengthKm", "source.rupture.widthKm"]);
  });
});

describe("point-source label", () => {
  it("Mw ≥ 7 without a rupture says the point source underestimates shaking along the fault", () => {
    const label = "point-source approximation: shaking along the fault is underestimated";
    expect(computeSites(homogeneousScenario({ mw: 7.1 }), []).notes).toContain(label);
    expect(computeSites(homogeneousScenario({ mw: 6.9 }), []).notes).not.toContain(label);
    expect(computeSites(withRupture({ strikeDeg: 0, dipDeg: 80 }, 7.1), []).notes).not.toContain(label);
  });
});
