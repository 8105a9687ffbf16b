// Exposure tables computed on the server from a scenario version's layer versions, checked against a
// small example worked by hand from METHODS.md §2 (closed forms of a homogeneous model) and §3/§5
// (Si & Midorikawa 1999 PGV, the JMA conversion).
import { app } from "../support/app";
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { resultCache, scenarioVersions, settings } from "@/db/schema";
import { exposureCsv } from "@/lib/exposure/csv-tables";
import { exposureOf, loadVersion } from "@/lib/exposure/service";
import { homogeneousScenario, EPICENTRE, destination, VS_KMS } from "../../verification/scenario-fixtures";
import { cellsEast, insertFacilitiesVersion, insertPopulationVersion, insertScenario, setWorkspace } from "./fixture";

// The example (the same physics as tests/unit/geo/exposure.test.ts, here through the database):
// Homogeneous Vp 6, Vs 3.5 km/s; h = 10 km; operating stations at 8, 15, 30 km (k = 2 → 15 km).
// Alert issued = √(15² + 10²)/6 + 1 + 0.5 + 1.5 = 3.0046 + 3 = 6.0046 s; cell broadcast (4 s) reaches at 10.0046 s.
// Cells at 0, 40, 80, 150 km: S = r/3.5, r = √(Δ² + 100) → 2.857, 11.780, 23.035, 42.952 s;
// warnings −7.15, 1.78, 13.03, 32.95 s → bands blind, (0, 5], (10, 20], (30, 60].
// Si & Midorikawa (1999), Mw 6.5, D 10 km, crustal: log PGV600 = 2.518 − log(X + 4.979) − 0.002·X;
// amplification at Vs30 400 m/s: +0.1126 in log; JMA I = 2.68 + 1.72·log PGV:
//   X 10.00 → I 5.15 (5+), X 41.23 → 4.20 (4), X 80.62 → 3.60 (4), X 150.33 → 2.92 (3).
// The alert is issued (5.15 ≥ 4.5) and reaches places with I ≥ 3.5: the first three cells.
// People 100.4, 200.3, 300.2, 50.6 = 651.5 → total 652; floors 100 + 200 + 300 + 50 = 650, and the two
// missing people go to the largest remainders (.6 and .4): 101, 200, 300, 51.
const PEOPLE = [100.4, 200.3, 300.2, 50.6];
const DISTANCES_KM = [0, 40, 80, 150];
const T_ALERT_S = Math.sqrt(15 ** 2 + 10 ** 2) / 6 + 3 + 4;

/** Warning at epicentral `km` for h = 10 km (METHODS.md §2): S arrival − alert arrival. */
const warningAtKm = (km: number) => Math.sqrt(km ** 2 + 100) / VS_KMS - T_ALERT_S;

async function exampleVersion() {
  const population = await insertPopulationVersion({ ...cellsEast(DISTANCES_KM), people: PEOPLE, district: [0, 0, 1, -1], districtNames: ["Oster Vale", "Brannock"] });
  // A school 60 km north; a rail line from 20 to 45 km south.
  const school = destination(...EPICENTRE, 0, 60);
  const railStart = destination(...EPICENTRE, 180, 20);
  const railEnd = destination(...EPICENTRE, 180, 45);
  const facilitiesVersionId = await insertFacilitiesVersion([
    { name: "Brannock school", kind: "school", geometry: { type: "Point", coordinates: school } },
    { name: "South line", kind: "rail", geometry: { type: "LineString", coordinates: [railStart, railEnd] } },
  ]);
  await setWorkspace(2, [
    { name: "Drop, cover, hold", secondsNeeded: 5, facilityKinds: ["school", "hospital"] },
    { name: "Leave a ground-floor building", secondsNeeded: 15, facilityKinds: ["school", "hospital"] },
    { name: "Slow and stop trains", secondsNeeded: 30, facilityKinds: ["rail"] },
  ]);
  const { scenarioId } = await insertScenario("Hand-worked", [
    { params: homogeneousScenario(), layerVersions: { population: population.layerVersionId, facilities: facilitiesVersionId }, state: "published" },
  ]);
  return { scenarioId, population };
}

beforeEach(() => app.reset());

describe("exposure of a hand-worked four-cell version", () => {
  it("totals, blind zone and the people alerted with at least 10 s", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(exposure.totals.totalPopulation).toBe(652);
    expect(exposure.totals.blindZonePopulation).toBe(101);
    expect(exposure.totals.alertedPopulation).toBe(601);
    expect(exposure.totals.notAlertedPopulation).toBe(51);
    // Alerted with warning > 0: 200 + 300; with ≥ 10 s: only the 80 km cell (13.03 s), 300.2 people → 300.
    expect(exposure.totals.alertedWithWarningPopulation).toBe(500);
    expect(exposure.totals.alertedWithTenSecondsPopulation).toBe(300);
  });

  it("the class × band table: alerted people by band, a 'not alerted' column, sums that close", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    const bands = exposure.warningBands.map((b) => b.id);
    expect(bands).toEqual(["blind", "0-5", "5-10", "10-20", "20-30", "30-60", "60+"]);
    const row = (c: string) => exposure.classByBand.rows.find((r) => r.intensityClass === c)!;
    expect(row("5+")).toEqual({ intensityClass: "5+", alertedByBand: [101, 0, 0, 0, 0, 0, 0], notAlerted: 0, total: 101 });
    expect(row("4")).toEqual({ intensityClass: "4", alertedByBand: [0, 200, 0, 300, 0, 0, 0], notAlerted: 0, total: 500 });
    // The 150 km cell is in the (30, 60] band but outside the alert area: it counts as not alerted.
    expect(row("3")).toEqual({ intensityClass: "3", alertedByBand: [0, 0, 0, 0, 0, 0, 0], notAlerted: 51, total: 51 });
    expect(exposure.classByBand.bandTotals).toEqual([101, 200, 0, 300, 0, 0, 0]);
    expect(exposure.classByBand.notAlertedTotal).toBe(51);
    expect(exposure.classByBand.total).toBe(652);
    // Every row adds up to its total, and the totals to the layer's rounded population.
    for (const r of exposure.classByBand.rows) expect(r.alertedByBand.reduce((a, b) => a + b, 0) + r.notAlerted).toBe(r.total);
  });

  it("by district, with a 'no district' row", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(exposure.byDistrict.map((d) => [d.district, d.population, d.alertedPopulation, d.blindZonePopulation])).toEqual([
      ["Oster Vale", 301, 301, 101],
      ["Brannock", 300, 300, 0],
      [null, 51, 0, 0],
    ]);
  });

  it("protective actions: alerted people with warning ≥ reaction (2 s) + the action's seconds", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    // Drop (5 s) needs ≥ 7 s: the 80 km cell (13.03 s); the 150 km cell has 32.95 s but is not alerted.
    // Leaving (15 s) needs ≥ 17 s and stopping trains (30 s) ≥ 32 s: no alerted cell has that long.
    expect(exposure.actions.map((a) => [a.name, a.population])).toEqual([
      ["Drop, cover, hold", 300],
      ["Leave a ground-floor building", 0],
      ["Slow and stop trains", 0],
    ]);
  });

  it("facilities: a school by its point, a rail line by its worst sample every ≤ 0.5 km", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    const [school, rail] = exposure.facilities;
    // School at 60 km: r = √(3600 + 100) = 60.83 km, warning = 60.83/3.5 − 10.0046 = 7.375 s;
    // drop fits (7.375 ≥ 2 + 5), leaving does not (< 2 + 15); stopping trains is not for a school.
    expect(school.warningS).toBeCloseTo(warningAtKm(60), 2);
    expect(school.actionFits).toEqual([true, false, null]);
    // Rail 20–45 km: shortest warning at the 20 km end, r = 22.36 km → 6.389 − 10.0046 = −3.616 s (blind);
    // strongest shaking there: log PGV600 = 2.518 − log(27.34) − 0.0447 = 1.0365, + 0.1126 → I = 2.68 + 1.72·1.1491 = 4.656 (5-).
    expect(rail.geometry).toBe("line");
    expect(rail.lengthKm).toBeCloseTo(25, 3);
    expect(rail.warningS).toBeCloseTo(warningAtKm(20), 2);
    expect(rail.intensity).toBeCloseTo(4.656, 1);
    expect(rail.intensityClass).toBe("5-");
    expect(rail.actionFits).toEqual([null, null, false]);
    // Headline: both facilities have an action meant for them that does not fit.
    expect(exposure.headline.map((f) => f.value)).toEqual([101, 300, 2]);
  });

  it("facilities: an action meant for other kinds is not counted as one that does not fit", async () => {
    const { scenarioId } = await exampleVersion();
    // Only the drop (fits at the school, 7.375 s ≥ 7 s) and the trains (blind on the line) remain.
    await setWorkspace(2, [
      { name: "Drop, cover, hold", secondsNeeded: 5, facilityKinds: ["school"] },
      { name: "Slow and stop trains", secondsNeeded: 30, facilityKinds: ["rail"] },
    ]);
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(exposure.facilities.map((f) => f.actionFits)).toEqual([
      [true, null],
      [null, false],
    ]);
    expect(exposure.headline.find((f) => f.key === "facilitiesActionMisfit")?.value).toBe(1);
    const { rows } = exposureCsv(exposure, "facilities");
    expect(rows.map((row) => row.slice(-2))).toEqual([
      [true, "not for this kind"],
      ["not for this kind", false],
    ]);
  });

  it("the blind-zone area is within 2 % of the closed form π·Δ² (METHODS.md §2)", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    // Δ = √((Vs·T)² − h²) = √((3.5 · 10.0046)² − 100) = 33.56 km → π·Δ² = 3538 km².
    const radiusKm = Math.sqrt((VS_KMS * T_ALERT_S) ** 2 - 100);
    const closedFormKm2 = Math.PI * radiusKm ** 2;
    expect(Math.abs(exposure.totals.blindZoneAreaKm2 / closedFormKm2 - 1)).toBeLessThan(0.02);
  });

  it("carries the caution, the 'how it was made' line with the layer versions, and no default-delay note when delays are given", async () => {
    const { scenarioId } = await exampleVersion();
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(exposure.caution).toMatch(/planning estimates/);
    expect(exposure.provenance).toMatch(/scenario: Verification: homogeneous half-space v1/);
    expect(exposure.provenance).toMatch(/population v1, facilities v1|facilities v1, population v1/);
    expect(exposure.usesDefaultDelays).toBe(false);
  });
});

describe("the result cache never serves a stale table", () => {
  it("serves the cached result while nothing changed", async () => {
    const { scenarioId } = await exampleVersion();
    const first = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    const second = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect([first.cached, second.cached]).toEqual([false, true]);
    expect(second.exposure).toEqual(first.exposure);
    expect(await app.count("result_cache")).toBe(1);
  });

  it("recomputes when the version records another population layer version", async () => {
    const { scenarioId, population } = await exampleVersion();
    await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    // Version 2 of the same layer: one more person in the 0 km cell.
    const next = await insertPopulationVersion({ ...cellsEast(DISTANCES_KM), people: [101.4, 200.3, 300.2, 50.6], layerId: population.layerId, number: 2 });
    const [row] = await app.db.select().from(scenarioVersions).where(eq(scenarioVersions.scenarioId, scenarioId));
    await app.db
      .update(scenarioVersions)
      .set({ layerVersions: { ...(row.layerVersions as Record<string, number>), population: next.layerVersionId } })
      .where(eq(scenarioVersions.id, row.id));
    const after = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(after.cached).toBe(false);
    expect(after.exposure.totals.totalPopulation).toBe(653);
    expect(after.exposure.provenance).toMatch(/population v2/);
    // The stale row is gone, not merely shadowed.
    expect(await app.count("result_cache")).toBe(1);
  });

  it("recomputes when the scenario file of the version changes, and keeps versions apart", async () => {
    const { scenarioId } = await exampleVersion();
    const before = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    const [row] = await app.db.select().from(scenarioVersions).where(eq(scenarioVersions.scenarioId, scenarioId));
    // Cell broadcast 4 s → 10 s: the 40 km cell (1.78 s) falls into the blind zone (1.78 − 6 < 0).
    const params = { ...(row.params as Record<string, unknown>), channels: [{ id: "cell-broadcast", deliveryS: 10 }] };
    await app.db.update(scenarioVersions).set({ params }).where(eq(scenarioVersions.id, row.id));
    const after = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(after.cached).toBe(false);
    expect(before.exposure.totals.blindZonePopulation).toBe(101);
    expect(after.exposure.totals.blindZonePopulation).toBe(301);

    const other = await insertScenario("Another", [{ params: row.params as Record<string, unknown>, layerVersions: row.layerVersions as Record<string, number> }]);
    const separate = await exposureOf(await loadVersion({ scenarioId: other.scenarioId, number: 1 }));
    expect(separate.cached).toBe(false);
    expect(separate.exposure.totals.blindZonePopulation).toBe(101);
  });

  it("recomputes when a workspace setting changes (reaction time)", async () => {
    const { scenarioId } = await exampleVersion();
    await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    await app.db.update(settings).set({ value: 9 }).where(eq(settings.key, "reactionTimeS"));
    const after = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(after.cached).toBe(false);
    // Drop now needs ≥ 14 s: the 80 km cell's 13.03 s is not enough.
    expect(after.exposure.actions[0].population).toBe(0);
  });

  it("recomputes a cached row of an older format instead of trusting it", async () => {
    const { scenarioId } = await exampleVersion();
    await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    await app.db.update(resultCache).set({ result: { format: 0 } });
    const after = await exposureOf(await loadVersion({ scenarioId, number: 1 }));
    expect(after.cached).toBe(false);
    expect(after.exposure.totals.totalPopulation).toBe(652);
  });
});
