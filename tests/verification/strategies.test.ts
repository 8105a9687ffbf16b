/**
 * Alert strategies: the wavefield strategy against the homogeneous closed form, and a growing
 * magnitude for a great rupture.
 */
import { describe, expect, it } from "vitest";
import { compareStrategies, computeGrid, computeSites, type PopulationCells } from "@/lib/geo";
import { EPICENTRE, VS_KMS, destination, scenarioFrom } from "./scenario-fixtures";

const h = 10;
const timing = { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 };

/** Homogeneous scenario with stations due east at the given distances (km). */
function wavefieldScenario(stationKm: number[], alert: Record<string, unknown> = {}) {
  return scenarioFrom({
    version: 1,
    source: { lon: EPICENTRE[0], lat: EPICENTRE[1], depthKm: h, mw: 6.8, faultType: "crustal" },
    stations: stationKm.map((d, i) => {
      const [lon, lat] = destination(...EPICENTRE, 90, d);
      return { id: `W${i}`, lon, lat };
    }),
    velocityModel: { kind: "homogeneous", vpKms: 6, vsKms: VS_KMS },
    timing,
    channels: [{ id: "cell-broadcast", deliveryS: 4 }],
    alert: { strategy: "wavefield", ...alert },
    vs30: 400,
    area: { bbox: [EPICENTRE[0] - 1.5, EPICENTRE[1] - 1, EPICENTRE[0] + 1.5, EPICENTRE[1] + 1], cellKm: 2 },
  });
}

describe("wavefield strategy (after PLUM)", () => {
  it("a place whose triggering station lies d km closer to the source gets the closed-form warning", () => {
    // Station 20 km east; place 45 km east (25 km from the station, inside the 30 km radius).
    // Warning = (r_place − r_station)/Vs − (telemetry + processing + delivery), r = √(Δ² + h²).
    const scenario = wavefieldScenario([20, 200]);
    const [lon, lat] = destination(...EPICENTRE, 90, 45);
    const [site] = computeSites(scenario, [{ id: "p", lon, lat }]).sites;
    const closedForm = (Math.hypot(45, h) - Math.hypot(20, h)) / VS_KMS - (0.5 + 1.5 + 4);
    expect(site.alerted).toBe(true);
    expect(site.warningS).toBeCloseTo(closedForm, 6);
  });

  it("a place beyond the radius of every triggering station gets no alert", () => {
    const scenario = wavefieldScenario([20, 200], { wavefieldRadiusKm: 10 });
    const [lon, lat] = destination(...EPICENTRE, 90, 45);
    const [site] = computeSites(scenario, [{ id: "p", lon, lat }]).sites;
    expect(site.alerted).toBe(false);
    expect(site.warningS).toBeNull();
  });

  it("grid and site evaluation agree", () => {
    const scenario = wavefieldScenario([20, 40, 60]);
    const { grid } = computeGrid(scenario);
    const row = Math.floor(grid.height / 2);
    const column = Math.floor(grid.width * 0.62);
    const [site] = computeSites(scenario, [{ id: "c", lon: grid.lonDeg[column], lat: grid.latDeg[row] }]).sites;
    expect(grid.alerted[row * grid.width + column]).toBe(site.alerted ? 1 : 0);
    if (site.warningS !== null) expect(grid.warningS[row * grid.width + column]).toBeCloseTo(site.warningS, 3);
  });

  it("exposure compares the strategies side by side", () => {
    const population: PopulationCells = { lon: new Float64Array(50), lat: new Float64Array(50), population: new Float64Array(50).fill(10) };
    for (let i = 0; i < 50; i++) [population.lon[i], population.lat[i]] = destination(...EPICENTRE, 90, 2 * i);
    const rows = compareStrategies(wavefieldScenario([20, 40, 60, 80]), population);
    expect(rows.map((r) => r.strategy)).toEqual(["source", "wavefield"]);
    const [source, wavefield] = rows;
    // Wavefield alerts come later: they wait for strong shaking at a station.
    expect(wavefield.alertedWithWarningPopulation).toBeLessThanOrEqual(source.alertedWithWarningPopulation);
  });
});

describe("growing magnitude for a great rupture", () => {
  const scenario = scenarioFrom({
    version: 1,
    name: "Verification: great interface rupture",
    source: {
      lon: EPICENTRE[0],
      lat: EPICENTRE[1],
      depthKm: 20,
      mw: 8.6,
      faultType: "interplate",
      rupture: { strikeDeg: 0, dipDeg: 15, lengthKm: 400, widthKm: 120, mode: "unilateral", ruptureVelocityKms: 2.8 },
    },
    stations: [
      { id: "G1", lon: EPICENTRE[0] + 0.1, lat: EPICENTRE[1] },
      { id: "G2", lon: EPICENTRE[0] + 0.3, lat: EPICENTRE[1] + 0.1 },
    ],
    timing,
    channels: [{ id: "cell-broadcast", deliveryS: 4 }],
    alert: { magnitude: "growing" },
    vs30: 400,
    area: { bbox: [EPICENTRE[0] - 2, EPICENTRE[1] - 1, EPICENTRE[0] + 4, EPICENTRE[1] + 5], cellKm: 5 },
  });
  const { summary } = computeGrid(scenario);

  it("the first alert area is smaller than the final one", () => {
    expect(summary.alertIssued).toBe(true);
    expect(summary.firstAlertAreaKm2).toBeGreaterThan(0);
    expect(summary.firstAlertAreaKm2).toBeLessThan(summary.alertAreaKm2);
  });

  it("the magnitude grows from the broken length to Mw: M(t) = Mw + log10(L(t)/L)/0.59", () => {
    const [first] = summary.alertUpdates;
    const last = summary.alertUpdates[summary.alertUpdates.length - 1];
    const brokenKm = 2.8 * first.issueS;
    expect(first.mw).toBeCloseTo(8.6 + Math.log10(brokenKm / 400) / 0.59, 6);
    expect(last.mw).toBe(8.6);
    expect(last.issueS).toBeCloseTo(400 / 2.8, 6);
  });

  it("a site at the far end is alerted by a later, larger message", () => {
    const [lon, lat] = destination(...EPICENTRE, 0, 380);
    const [site] = computeSites(scenario, [{ id: "far", lon, lat }]).sites;
    expect(site.alerted).toBe(true);
    expect(site.alertMw).toBeGreaterThan(summary.alertUpdates[0].mw ?? Infinity);
    expect(site.alertIssuedS).toBeGreaterThan(summary.alertUpdates[0].issueS);
  });
});
