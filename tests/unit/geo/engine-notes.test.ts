import { describe, expect, it } from "vitest";
import { buildVs30Lookup, computeSites, evaluateFacilities } from "@/lib/geo";
import { handleEngineMessage } from "@/lib/geo/worker/handle-message";
import { EPICENTRE, destination, homogeneousScenario, scenarioFrom } from "../../verification/scenario-fixtures";

const at = (azimuth: number, km: number) => {
  const [lon, lat] = destination(...EPICENTRE, azimuth, km);
  return { id: `${azimuth}-${km}`, lon, lat };
};

describe("notes and flags outputs carry", () => {
  it("warns when a homogeneous model is used for a source deeper than 35 km", () => {
    expect(computeSites(homogeneousScenario({ depthKm: 50 }), []).notes.some((n) => n.startsWith("homogeneous velocity model for a source deeper than 35 km"))).toBe(true);
    expect(computeSites(homogeneousScenario({ depthKm: 30 }), []).notes.some((n) => n.startsWith("homogeneous velocity model"))).toBe(false);
  });

  it("flags sites beyond Si & Midorikawa's data limit (200 km for Mw 6.6–7.0, METHODS §3)", () => {
    const [near, far] = computeSites(homogeneousScenario({ mw: 6.8 }), [at(0, 150), at(0, 250)]).sites;
    expect([near.extrapolated, far.extrapolated]).toEqual([false, true]);
  });

  it("flags a head-wave first S beyond the crossover in a layered model", () => {
    const layered = scenarioFrom({ ...homogeneousScenario(), velocityModel: { kind: "layered", name: "iasp91" } });
    const result = computeSites(layered, [at(90, 60), at(90, 300)]);
    expect(result.sites.map((s) => s.sIsHeadWave)).toEqual([false, true]);
    expect(result.notes.some((n) => n.includes("head wave (Sn)"))).toBe(true);
  });

  it("says when default delays are used and shows the JMA conversion's status", () => {
    const base = homogeneousScenario();
    const defaults = scenarioFrom({ ...base, timing: undefined, channels: undefined });
    const notes = computeSites(defaults, []).notes;
    expect(notes[0]).toMatch(/^default delays — enter your operator's figures/);
    expect(notes.some((n) => n.includes("status open"))).toBe(true);
    expect(computeSites(base, []).notes.some((n) => n.startsWith("default delays"))).toBe(false);
  });
});

describe("Vs30 lookup", () => {
  const cells = { lon: [10, 10.1, 10, 10.1], lat: [5, 5, 5.1, 5.1], vs30Ms: [200, 300, 400, 3000] };
  const lookup = buildVs30Lookup(500, cells);

  it("takes the nearest cell, the fallback outside the lattice, and clips to 100–1500 m/s", () => {
    expect(lookup.vs30At(10.04, 5.03)).toBe(200);
    expect(lookup.vs30At(10.07, 5.03)).toBe(300);
    expect(lookup.vs30At(10.09, 5.12)).toBe(1500);
    expect(lookup.vs30At(10.2, 5)).toBe(500);
    expect(lookup.vs30At(9.9, 5)).toBe(500);
    expect(lookup.minVs30Ms).toBe(200);
    expect(lookup.clipped).toBe(true);
  });

  it("finds cells across the antimeridian (longitudes past 180)", () => {
    const crossing = buildVs30Lookup(500, { lon: [179.7, 179.9, -179.9, -179.7], lat: [0, 0, 0, 0], vs30Ms: [150, 250, 350, 450] });
    expect(crossing.vs30At(180.1, 0)).toBe(350);
    expect(crossing.vs30At(-180.1, 0)).toBe(250);
  });
});

describe("facilities", () => {
  it("a line reports its shortest warning and strongest shaking, sampled along the geodesic", () => {
    const scenario = homogeneousScenario({ mw: 6.9 });
    const line = [at(90, 10), at(90, 90)].map((p) => [p.lon, p.lat] as [number, number]);
    const { lines } = evaluateFacilities(scenario, { lines: [{ id: "rail", coordinates: line }] }, { stepKm: 1 });
    const [rail] = lines;
    expect(rail.lengthKm).toBeCloseTo(80, 0);
    expect(rail.samples).toBe(81);
    const [near] = computeSites(scenario, [at(90, 10)]).sites;
    expect(rail.minWarningS).toBeCloseTo(near.warningS ?? Number.NaN, 6);
    expect(rail.maxIntensity).toBeCloseTo(near.intensity, 6);
  });
});

describe("worker message handler", () => {
  it("answers a preview grid within 200 × 200 cells, with buffers to transfer", () => {
    const { response, transfer } = handleEngineMessage({ id: 7, kind: "grid", scenario: homogeneousScenario(), cellKm: 0.5 });
    if (response.kind !== "grid") throw new Error(JSON.stringify(response));
    expect(response.grid.width * response.grid.height).toBeLessThanOrEqual(40_000);
    expect(response.contours?.blindZone.features).toHaveLength(1);
    expect(transfer).toContain(response.grid.warningS.buffer);
  });

  it("a preview may leave out PGA and P(exceed), changing nothing else", () => {
    const scenario = homogeneousScenario();
    const full = handleEngineMessage({ id: 1, kind: "grid", scenario, cellKm: 1 }).response;
    const preview = handleEngineMessage({ id: 2, kind: "grid", scenario, cellKm: 1, detail: false }).response;
    if (full.kind !== "grid" || preview.kind !== "grid") throw new Error("grid responses expected");
    expect(preview.contours).toEqual(full.contours);
    expect(preview.grid.warningS).toEqual(full.grid.warningS);
    expect(preview.grid.intensity).toEqual(full.grid.intensity);
    expect(preview.summary).toEqual(full.summary);
    expect(Number.isNaN(preview.grid.pgaCms2[0]) && Number.isNaN(preview.grid.pExceedTarget[0])).toBe(true);
    expect(full.grid.pgaCms2[0]).toBeGreaterThan(0);
    expect(handleEngineMessage({ id: 3, kind: "grid", scenario, detail: "no" }).response.ok).toBe(false);
  });

  it("returns the scenario's issues instead of throwing", () => {
    const { response } = handleEngineMessage({ id: 8, kind: "sites", scenario: { version: 1 }, sites: [] });
    expect(response.ok).toBe(false);
    if (!response.ok) expect(response.issues.map((i) => i.path)).toContain("source");
    expect(handleEngineMessage({ kind: "nope" }).response.ok).toBe(false);
  });
});
