// Scenario comparison: the transition matrix's sums, a denser network's smaller blind zone against
// the homogeneous closed form (METHODS.md §2), and the refusal across population layer versions.
import { app } from "../support/app";
import { beforeEach, describe, expect, it } from "vitest";
import { LeewayError } from "@/lib/errors";
import { comparisonOf, exposureOf, loadVersion } from "@/lib/exposure/service";
import { transitionMatrix } from "@/lib/exposure/transition-matrix";
import { EPICENTRE, destination, homogeneousScenario, VS_KMS } from "../../verification/scenario-fixtures";
import { cellsEast, insertPopulationVersion, insertScenario } from "./fixture";

describe("transition matrix, worked by hand", () => {
  // Breaks 0, 5, 10 s → bands blind, (0, 5], (5, 10], more than 10 s; NaN = no alert reaches.
  // Cell 1: A −2 s (blind) → B 1 s (0–5), 10 people; cell 2: 3 s (0–5) → 8 s (5–10), 20;
  // cell 3: 12 → 12 s (10+), 30; cell 4: no alert → 4 s (0–5), 5.5 people.
  // Total 65.5 → 66; floors 10 + 20 + 30 + 5 = 65, the one missing person goes to the .5.
  const result = transitionMatrix([-2, 3, 12, Number.NaN], [1, 8, 12, 4], [10, 20, 30, 5.5], [0, 5, 10]);

  it("cross-tabulates people by band in A (rows) and B (columns)", () => {
    expect(result.bands.map((b) => b.id)).toEqual(["blind", "0-5", "5-10", "10+", "no-alert"]);
    expect(result.matrix).toEqual([
      [0, 10, 0, 0, 0],
      [0, 0, 20, 0, 0],
      [0, 0, 0, 0, 0],
      [0, 0, 0, 30, 0],
      [0, 6, 0, 0, 0],
    ]);
  });

  it("row sums are A's people per band, column sums B's, and both add up to the total", () => {
    expect(result.rowTotals).toEqual([10, 20, 0, 30, 6]);
    expect(result.columnTotals).toEqual([0, 16, 20, 30, 0]);
    expect(result.totalPopulation).toBe(66);
    expect(result.rowTotals.reduce((a, b) => a + b, 0)).toBe(66);
    expect(result.columnTotals.reduce((a, b) => a + b, 0)).toBe(66);
    // Cells 1 and 2 move to a band with more warning; the no-alert row is not counted as a move.
    expect([result.movedToMoreWarning, result.movedToLessWarning]).toEqual([30, 0]);
  });
});

// Today's network: stations at 8, 15, 30 km (k = 2 → 15 km): T = √(15² + 10²)/6 + 3 + 4 = 10.0046 s,
// blind radius √((3.5·T)² − 10²) = 33.56 km. Two added stations at 3 and 5 km (k = 2 → 5 km):
// T = √(5² + 10²)/6 + 7 = 8.8634 s, radius √((3.5·8.8634)² − 100) = 29.37 km.
// People: 100 in each cell 0, 2, …, 100 km east: 17 cells (0–32 km) in A's blind zone, 15 (0–28 km) in B's.
const radiusKm = (tS: number) => Math.sqrt((VS_KMS * tS) ** 2 - 100);
const T_A_S = Math.sqrt(15 ** 2 + 10 ** 2) / 6 + 7;
const T_B_S = Math.sqrt(5 ** 2 + 10 ** 2) / 6 + 7;

function withAddedStations() {
  const base = homogeneousScenario();
  const added = [3, 5].map((km, i) => {
    const [lon, lat] = destination(...EPICENTRE, 300 + 20 * i, km);
    return { id: `NEW${i + 1}`, lon, lat };
  });
  return { ...base, stations: [...base.stations, ...added] };
}

async function twoVersions(options: { samePopulation: boolean }) {
  const distances = Array.from({ length: 51 }, (_, i) => 2 * i);
  const people = distances.map(() => 100);
  const population = await insertPopulationVersion({ ...cellsEast(distances), people });
  const other = options.samePopulation ? population : await insertPopulationVersion({ ...cellsEast(distances), people, layerId: population.layerId, number: 2 });
  const { scenarioId } = await insertScenario("Network study", [
    { params: homogeneousScenario(), layerVersions: { population: population.layerVersionId }, state: "published" },
    { params: withAddedStations(), layerVersions: { population: other.layerVersionId }, state: "published" },
  ]);
  return { a: await loadVersion({ scenarioId, number: 1 }), b: await loadVersion({ scenarioId, number: 2 }) };
}

beforeEach(() => app.reset());

describe("comparing today's network with one with added stations", () => {
  it("shows the smaller blind zone, by area (closed form, ≤ 2 %) and by people (hand count)", async () => {
    const { a, b } = await twoVersions({ samePopulation: true });
    const { comparison } = await comparisonOf(a, b);
    expect(Math.abs(comparison.a.blindZoneAreaKm2 / (Math.PI * radiusKm(T_A_S) ** 2) - 1)).toBeLessThan(0.02);
    expect(Math.abs(comparison.b.blindZoneAreaKm2 / (Math.PI * radiusKm(T_B_S) ** 2) - 1)).toBeLessThan(0.02);
    expect(comparison.a.blindZonePopulation).toBe(1700);
    expect(comparison.b.blindZonePopulation).toBe(1500);
    // The 30 and 32 km cells leave the blind zone: B gives them 0.17 and 0.72 s (band 0–5 s).
    const blind = comparison.bands.findIndex((band) => band.id === "blind");
    const short = comparison.bands.findIndex((band) => band.id === "0-5");
    expect(comparison.matrix[blind][blind]).toBe(1500);
    expect(comparison.matrix[blind][short]).toBe(200);
  });

  it("row sums equal A's people per band and column sums B's, as each version's own exposure counts them", async () => {
    const { a, b } = await twoVersions({ samePopulation: true });
    const { comparison } = await comparisonOf(a, b);
    const [exposureA, exposureB] = [(await exposureOf(a)).exposure, (await exposureOf(b)).exposure];
    const perBand = (e: typeof exposureA) =>
      e.warningBands.map((band) => e.byChannel[0].bands.find((row) => row.warningBand === band.id)?.population ?? 0);
    expect(comparison.rowTotals).toEqual(perBand(exposureA));
    expect(comparison.columnTotals).toEqual(perBand(exposureB));
    expect(comparison.totalPopulation).toBe(5100);
    expect(comparison.a.blindZonePopulation).toBe(exposureA.totals.blindZonePopulation);
    expect(comparison.b.blindZonePopulation).toBe(exposureB.totals.blindZonePopulation);
  });

  it("draws where seconds are gained: everywhere the added stations speed the alert up by T_A − T_B = 1.14 s", async () => {
    const { a, b } = await twoVersions({ samePopulation: true });
    const { comparison } = await comparisonOf(a, b);
    // The alert reaches everyone 1.14 s sooner, so the whole grid falls in the "gains 1–5 s" band.
    expect(comparison.secondsGained.features.map((f) => f.properties.label)).toEqual(["gains 1–5 s"]);
  });

  it("is cached, and refused across population layer versions with the reason", async () => {
    const same = await twoVersions({ samePopulation: true });
    expect((await comparisonOf(same.a, same.b)).cached).toBe(false);
    expect((await comparisonOf(same.a, same.b)).cached).toBe(true);

    await app.reset();
    const differ = await twoVersions({ samePopulation: false });
    const refusal = await comparisonOf(differ.a, differ.b).catch((error: unknown) => error);
    expect(refusal).toBeInstanceOf(LeewayError);
    expect((refusal as LeewayError).status).toBe(409);
    expect((refusal as LeewayError).message).toMatch(/population layer "Test population" version 1 .* version 2/);
  });
});
