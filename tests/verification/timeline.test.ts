/**
 * The alert timeline, warning seconds and the blind-zone radius in a homogeneous model, against
 * the closed forms of METHODS.md §2 (t = r/V; Δ_bz = √((Vs·T)² − h²)).
 */
import { describe, expect, it } from "vitest";
import { computeSites } from "@/lib/geo/sites";
import { homogeneousBlindZoneRadiusKm } from "@/lib/geo/warning";
import { EPICENTRE, VP_KMS, VS_KMS, destination, homogeneousScenario } from "./scenario-fixtures";

const depthKm = 10;
const scenario = homogeneousScenario({ depthKm, stationKm: [8, 15, 30] });
// k = 2 operating stations (the one at 1 km is off): detection at the 15 km station.
const detectionS = Math.hypot(15, depthKm) / VP_KMS;
const alertIssuedS = detectionS + 1 + 0.5 + 1.5;

describe("alert timeline (METHODS §2)", () => {
  it("alert issued = t_P at the k-th nearest operating station + P window + telemetry + processing", () => {
    const [site] = computeSites(scenario, [{ id: "a", lon: EPICENTRE[0], lat: EPICENTRE[1] }]).sites;
    expect(site.alertIssuedS).toBeCloseTo(alertIssuedS, 6);
  });

  it("each channel adds its delivery; the first listed is the primary one", () => {
    const [x, y] = destination(...EPICENTRE, 100, 60);
    const [site] = computeSites(scenario, [{ id: "b", lon: x, lat: y }]).sites;
    expect(site.alertS).toBeCloseTo(alertIssuedS + 4, 6);
    expect(site.byChannel.map((c) => c.channel)).toEqual(["cell-broadcast", "sirens"]);
    expect(site.byChannel[0].alertS).toBe(site.alertS);
    expect(site.byChannel[1].alertS).toBeCloseTo(alertIssuedS + 9, 6);
    // Warning = S arrival − alert reach; S at the closed-form t = r/Vs.
    expect(site.sArrivalS).toBeCloseTo(Math.hypot(60, depthKm) / VS_KMS, 6);
    expect(site.warningS).toBeCloseTo(Math.hypot(60, depthKm) / VS_KMS - (alertIssuedS + 4), 6);
    expect(site.byChannel[1].warningS).toBeCloseTo(Math.hypot(60, depthKm) / VS_KMS - (alertIssuedS + 9), 6);
  });

  it("the blind zone ends at Δ_bz = √((Vs·T)² − h²) (closed form)", () => {
    const radiusKm = homogeneousBlindZoneRadiusKm(VS_KMS, depthKm, alertIssuedS + 4);
    expect(radiusKm).toBeCloseTo(Math.sqrt((VS_KMS * (alertIssuedS + 4)) ** 2 - depthKm ** 2), 10);
    const sites = [radiusKm - 0.05, radiusKm + 0.05].map((d, i) => {
      const [x, y] = destination(...EPICENTRE, 30, d);
      return { id: String(i), lon: x, lat: y };
    });
    const [inside, outside] = computeSites(scenario, sites).sites;
    expect(inside.warningS).toBeLessThan(0);
    expect(outside.warningS).toBeGreaterThan(0);
  });

  it("the radius is 0 when Vs·T does not reach the surface (closed form)", () => {
    expect(homogeneousBlindZoneRadiusKm(3.5, 50, 10)).toBe(0);
  });

  it("hypocentral distance from S − P: r = (S − P)·Vp·Vs/(Vp − Vs) (closed form)", () => {
    const [x, y] = destination(...EPICENTRE, 250, 40);
    const [site] = computeSites(scenario, [{ id: "c", lon: x, lat: y }]).sites;
    expect(site.hypocentralKm).toBeCloseTo(((site.sArrivalS - site.pArrivalS) * VP_KMS * VS_KMS) / (VP_KMS - VS_KMS), 6);
  });
});
