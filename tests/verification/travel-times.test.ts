/**
 * Travel times against closed forms (flat layers) and the exact ray calculation.
 */
import { describe, expect, it } from "vitest";
import { ak135, homogeneousModel, iasp91, type VelocityModel } from "@/lib/geo/velocity/models";
import { firstArrival, firstArrivalS } from "@/lib/geo/velocity/ray-travel-time";
import { buildTravelTimeTable } from "@/lib/geo/velocity/travel-time-table";

/** A deterministic pseudo-random sequence (Park & Miller 1988 minimal standard). */
function random(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 16807) % 2147483647;
    return state / 2147483647;
  };
}

describe("first arrivals", () => {
  it("two-layer head wave: t = x/V2 + 2h·√(1/V1² − 1/V2²) (closed form, surface source) to 0.01 s", () => {
    const h = 30;
    const [v1, v2] = [6, 8];
    const model: VelocityModel = { ...homogeneousModel(v1, 3.5), layers: [{ topKm: 0, vpKms: v1, vsKms: 3.5 }, { topKm: h, vpKms: v2, vsKms: 4.6 }] };
    for (const x of [200, 300, 500]) {
      const closedForm = x / v2 + 2 * h * Math.sqrt(1 / v1 ** 2 - 1 / v2 ** 2);
      expect(Math.abs(firstArrivalS(model, "P", x, 0) - closedForm)).toBeLessThan(0.01);
    }
  });

  it("IASP91 P crossover to the Moho head wave for a 10 km source is near 135 km (issue 3; closed form from METHODS §1 velocities)", () => {
    let crossoverKm = Number.NaN;
    for (let x = 50; x <= 250; x += 0.1) {
      if (firstArrival(iasp91, "P", x, 10).headInterfaceKm === 35) {
        crossoverKm = x;
        break;
      }
    }
    // Intercept times of the head waves along 20 km (6.5 km/s) and 35 km (8.04 km/s) for a source at 10 km:
    // τ = Σ crossings·√(1/v² − 1/V²); the two lines cross where x/6.5 + τ₂₀ = x/8.04 + τ₃₅.
    const slowness = (v: number, V: number) => Math.sqrt(1 / v ** 2 - 1 / V ** 2);
    const tau20 = 30 * slowness(5.8, 6.5);
    const tau35 = 30 * slowness(5.8, 8.04) + 30 * slowness(6.5, 8.04);
    const closedFormKm = (tau35 - tau20) / (1 / 6.5 - 1 / 8.04);
    expect(crossoverKm).toBeGreaterThan(130);
    expect(crossoverKm).toBeLessThan(140);
    expect(Math.abs(crossoverKm - closedFormKm)).toBeLessThan(0.2);
  });

  it("homogeneous model: t = r / V exactly (closed form)", () => {
    const model = homogeneousModel(6, 3.5);
    expect(firstArrivalS(model, "S", 30, 40)).toBeCloseTo(50 / 3.5, 12);
  });

  it("hypocentral distance ≈ 8 × (S − P) for crustal velocities (common practice, no source)", () => {
    for (const x of [20, 40, 60]) {
      const r = Math.hypot(x, 10);
      const ratio = r / (firstArrivalS(iasp91, "S", x, 10) - firstArrivalS(iasp91, "P", x, 10));
      expect(ratio).toBeGreaterThan(7.5);
      expect(ratio).toBeLessThan(8.5);
    }
  });
});

describe("travel-time tables", () => {
  it.each([
    ["iasp91", iasp91],
    ["ak135", ak135],
  ])("%s tables agree with the exact ray calculation to 0.05 s at 1,000 random points", (_name, model) => {
    const next = random(20240601);
    const options = { depthMinKm: 0, depthMaxKm: 200, maxDistanceKm: 1000 };
    const tables = { P: buildTravelTimeTable(model, "P", options), S: buildTravelTimeTable(model, "S", options) };
    let worst = 0;
    for (let k = 0; k < 1000; k++) {
      const x = next() * 950;
      const h = next() * 200;
      for (const phase of ["P", "S"] as const) {
        worst = Math.max(worst, Math.abs(tables[phase].timeS(x, h) - firstArrivalS(model, phase, x, h)));
      }
    }
    console.log(`${model.id}: largest table error ${worst.toFixed(4)} s`);
    expect(worst).toBeLessThan(0.05);
  });

  it("falls back to the exact calculation beyond the table", () => {
    const table = buildTravelTimeTable(iasp91, "P", { depthMinKm: 10, depthMaxKm: 10, maxDistanceKm: 100 });
    expect(table.timeS(400, 10)).toBe(firstArrivalS(iasp91, "P", 400, 10));
  });
});
