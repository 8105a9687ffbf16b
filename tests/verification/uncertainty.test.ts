/**
 * Uncertainty (METHODS.md §9): lognormal ground-motion scatter, expected needless / late / missed
 * people at an alert setting.
 */
import { describe, expect, it } from "vitest";
import { computeExposure, computeSites, probabilityOfExceedance, type PopulationCells } from "@/lib/geo";
import { normalCdf } from "@/lib/geo/uncertainty";
import { EPICENTRE, destination, homogeneousScenario, scenarioFrom } from "./scenario-fixtures";

/** People on rings around the epicentre out to 150 km. */
function rings(): PopulationCells {
  const lon: number[] = [];
  const lat: number[] = [];
  const population: number[] = [];
  for (let d = 0; d <= 150; d += 2) {
    for (let azimuth = 0; azimuth < 360; azimuth += 30) {
      const [x, y] = destination(...EPICENTRE, azimuth, d);
      lon.push(x);
      lat.push(y);
      population.push(100);
    }
  }
  return { lon: Float64Array.from(lon), lat: Float64Array.from(lat), population: Float64Array.from(population) };
}

const base = homogeneousScenario({ depthKm: 10, mw: 6.8 });
const withAlert = (alert: Record<string, unknown>) => scenarioFrom({ ...base, alert });

describe("probability of exceedance (standard normal table)", () => {
  it("median at the threshold → 0.5; one σ above → 0.841", () => {
    expect(probabilityOfExceedance(1.2, 1.2, 0.23)).toBeCloseTo(0.5, 7);
    expect(probabilityOfExceedance(1.2 + 0.23, 1.2, 0.23)).toBeCloseTo(0.841, 3);
    expect(normalCdf(-1.96)).toBeCloseTo(0.025, 3);
  });

  it("a site reports P(intensity ≥ target) from the model's sigma", () => {
    const [site] = computeSites(base, [{ id: "a", lon: EPICENTRE[0], lat: EPICENTRE[1] }]).sites;
    expect(site.pExceedTarget).toBeGreaterThan(0.5);
    expect(site.pExceedTarget).toBeLessThan(1);
  });
});

describe("expected needless, late and missed people", () => {
  const population = rings();

  it("raising the alert-area threshold never lowers expected missed nor raises expected needless", () => {
    const results = [2.5, 3.0, 3.5, 4.0, 4.5, 5.0].map((areaAt) => computeExposure(withAlert({ areaAt, issueAt: 4.5 }), population).expected);
    for (let k = 1; k < results.length; k++) {
      expect(results[k].missed).toBeGreaterThanOrEqual(results[k - 1].missed);
      expect(results[k].needless).toBeLessThanOrEqual(results[k - 1].needless);
    }
    expect(results[results.length - 1].missed).toBeGreaterThan(results[0].missed);
  });

  it("an alert magnitude of Mw − 1 shrinks the alert area and raises expected missed people", () => {
    const exact = computeExposure(base, population);
    const low = computeExposure(withAlert({ magnitude: 5.8, issueAt: 3.5 }), population);
    expect(low.alertedPopulation).toBeLessThan(exact.alertedPopulation);
    expect(low.expected.missed).toBeGreaterThan(exact.expected.missed);
  });

  it("the within-one-class share appears only when the alert magnitude differs from Mw", () => {
    expect(computeExposure(base, population).withinOneClass).toBeNull();
    const low = computeExposure(withAlert({ magnitude: 5.8, issueAt: 3.5 }), population).withinOneClass;
    expect(low?.alertMagnitudeErrorMw).toBeCloseTo(-1, 10);
    expect(low?.share).toBeGreaterThan(0);
    expect(low?.share).toBeLessThan(1);
  });

  it("expected late people sit in the blind zone of the alert area", () => {
    const r = computeExposure(base, population);
    expect(r.expected.late).toBeGreaterThan(0);
    expect(r.expected.late).toBeLessThanOrEqual(r.blindZonePopulation);
  });
});
