import { describe, expect, it } from "vitest";
import { computeExposure, type PopulationCells } from "@/lib/geo/exposure";
import { roundLargestRemainder } from "@/lib/geo/rounding";
import { EPICENTRE, destination, homogeneousScenario } from "../../verification/scenario-fixtures";

/** Cells at exact epicentral distances (GeographicLib), due east. */
function cellsAt(distancesKm: number[], population: number[], district: number[], districtNames: string[]): PopulationCells {
  const points = distancesKm.map((d) => (d === 0 ? EPICENTRE : destination(...EPICENTRE, 90, d)));
  return {
    lon: Float64Array.from(points, (p) => p[0]),
    lat: Float64Array.from(points, (p) => p[1]),
    population: Float64Array.from(population),
    district: Int32Array.from(district),
    districtNames,
  };
}

describe("exposure: a four-cell example worked by hand", () => {
  // Homogeneous Vp 6, Vs 3.5 km/s; h = 10 km; stations at 8, 15, 30 km (k = 2 → 15 km).
  // Alert issued = √(15² + 10²)/6 + 1 + 0.5 + 1.5 = 3.0046 + 3 = 6.0046 s; primary (4 s) reaches at 10.0046 s.
  // Cells at 0, 40, 80, 150 km: S = r/3.5 with r = √(Δ² + 100) → 2.857, 11.780, 23.035, 42.952 s;
  // warnings −7.15, 1.78, 13.03, 32.95 s → bands blind, (0, 5], (10, 20], (30, 60].
  // Si & Midorikawa (1999), Mw 6.5, D 10, crustal: log PGV600 = 2.518 − log(X + 4.979) − 0.002·X;
  // ARV(400 m/s): log = 1.83 − 0.66·log 400 = 0.1126; JMA I = 2.68 + 1.72·log PGV:
  //   X 10.00 → I 5.15 (5+), X 41.23 → 4.20 (4), X 80.62 → 3.60 (4), X 150.33 → 2.92 (3).
  // Issued (peak 5.15 ≥ 4.5); alerted where I ≥ 3.5: the first three cells.
  // People 100.4 + 200.3 + 300.2 + 50.6 = 651.5 → total 652; floors 650, the two largest remainders
  // (.6, .4) take one each → 101, 200, 300, 51.
  const scenario = homogeneousScenario({ depthKm: 10, mw: 6.5, stationKm: [8, 15, 30] });
  const cells = cellsAt([0, 40, 80, 150], [100.4, 200.3, 300.2, 50.6], [0, 0, 1, -1], ["Oster Vale", "Brannock"]);
  const result = computeExposure(scenario, cells);

  it("totals", () => {
    expect(result.totalPopulation).toBe(652);
    expect(result.blindZonePopulation).toBe(101);
    expect(result.alertedPopulation).toBe(601);
    expect(result.notAlertedPopulation).toBe(51);
    expect(result.alertedWithWarningPopulation).toBe(500);
  });

  it("intensity class × warning band", () => {
    const nonZero = result.table.filter((r) => r.population > 0).map((r) => [r.intensityClass, r.warningBand, r.population, r.alertedPopulation]);
    expect(nonZero).toEqual([
      ["3", "30-60", 51, 0],
      ["4", "0-5", 200, 200],
      ["4", "10-20", 300, 300],
      ["5+", "blind", 101, 101],
    ]);
    expect(result.table).toHaveLength(10 * 7);
  });

  it("by district, with people outside every district in a 'no district' row", () => {
    expect(result.byDistrict.map((d) => [d.district, d.population, d.alertedPopulation, d.blindZonePopulation])).toEqual([
      ["Oster Vale", 301, 301, 101],
      ["Brannock", 300, 300, 0],
      [null, 51, 0, 0],
    ]);
  });

  it("by channel: sirens (9 s) push the 40 km cell into the blind zone", () => {
    // Sirens: warnings −12.15, −3.22, 8.03, 27.95 s; [band][alerted] shares 300.7, 300.2, 50.6 → 301, 300, 51.
    const [primary, sirens] = result.byChannel;
    expect(primary.blindZonePopulation).toBe(101);
    expect(sirens.blindZonePopulation).toBe(301);
    expect(sirens.bands.find((b) => b.warningBand === "5-10")?.population).toBe(300);
    expect(sirens.bands.find((b) => b.warningBand === "20-30")?.population).toBe(51);
  });
});

describe("exposure tables add up", () => {
  it("every table sums to totalPopulation = round(Σ population)", () => {
    const scenario = homogeneousScenario({ depthKm: 15, mw: 7, stationKm: [12, 20, 35] });
    const n = 2000;
    const lon = new Float64Array(n);
    const lat = new Float64Array(n);
    const population = new Float64Array(n);
    const district = new Int32Array(n);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      [lon[i], lat[i]] = destination(...EPICENTRE, (i * 37) % 360, (i * 0.13) % 110);
      population[i] = ((i * 7919) % 1000) / 7.3;
      district[i] = (i % 4) - 1;
      sum += population[i];
    }
    const r = computeExposure(scenario, { lon, lat, population, district, districtNames: ["A", "B", "C"] });
    expect(r.totalPopulation).toBe(Math.round(sum));
    const add = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
    expect(add(r.table.map((x) => x.population))).toBe(r.totalPopulation);
    expect(add(r.byDistrict.map((x) => x.population))).toBe(r.totalPopulation);
    for (const c of r.byChannel) expect(add(c.bands.map((x) => x.population))).toBe(r.totalPopulation);
    expect(add(r.table.map((x) => x.alertedPopulation))).toBe(r.alertedPopulation);
    expect(r.byDistrict[3].district).toBeNull();
  });
});

describe("largest-remainder rounding (Hamilton's method)", () => {
  it("gives the missing units to the largest fractions", () => {
    expect(Array.from(roundLargestRemainder([1.5, 2.5, 3.0], 7))).toEqual([2, 2, 3]);
    expect(Array.from(roundLargestRemainder([0.2, 0.2, 0.6], 1))).toEqual([0, 0, 1]);
  });
});
