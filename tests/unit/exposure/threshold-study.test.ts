// The alert-threshold study (METHODS.md §9): expected needless, late and missed people as the
// alert-area threshold steps through the JMA class edges.
import { describe, expect, it } from "vitest";
import { computeThresholdStudy } from "@/lib/exposure/threshold-study";
import { JMA_CLASS_LOWER_BOUNDS } from "@/lib/geo";
import { homogeneousScenario } from "../../verification/scenario-fixtures";
import { cellsEast } from "./fixture";

// Thirty cells 0–290 km east, 1,000 people each: Mw 6.5 shakes the epicentre at JMA 5.15 and the
// 290 km cell at about 1.96 (Si & Midorikawa 1999 with the METHODS.md §5 conversion, worked as in
// exposure-tables.test.ts), so the sweep runs from "everyone alerted" to "nobody alerted".
const distancesKm = Array.from({ length: 30 }, (_, i) => i * 10);
const population = { ...cellsEast(distancesKm), population: new Float64Array(30).fill(1000) };
const study = computeThresholdStudy({
  scenario: homogeneousScenario(),
  population,
  context: { computedAt: "2026-01-01T00:00:00.000Z", scenarioVersion: 1, layerVersions: { population: 1 } },
});

describe("alert-threshold study", () => {
  it("has one row per class edge of the scale, in rising order", () => {
    expect(study.rows.map((r) => r.areaAt)).toEqual([...JMA_CLASS_LOWER_BOUNDS]);
    expect(study.rows.map((r) => r.intensityClass)).toEqual(["1", "2", "3", "4", "5-", "5+", "6-", "6+", "7"]);
  });

  it("as the threshold rises, expected missed people never fall and needlessly alerted ones never rise", () => {
    for (let k = 1; k < study.rows.length; k++) {
      const [lower, higher] = [study.rows[k - 1], study.rows[k]];
      expect(higher.missed, `missed at ${higher.areaAt}`).toBeGreaterThanOrEqual(lower.missed);
      expect(higher.needless, `needless at ${higher.areaAt}`).toBeLessThanOrEqual(lower.needless);
      // A higher threshold alerts a subset of the places: alerted and late people cannot grow either.
      expect(higher.alertedPopulation).toBeLessThanOrEqual(lower.alertedPopulation);
      expect(higher.late).toBeLessThanOrEqual(lower.late);
    }
  });

  it("ends where the definitions say: nobody missed when all are alerted, nobody needless when none is", () => {
    // At 0.5 every cell (I ≥ 1.96) is in the alert area: missed = Σ over no place = 0.
    expect(study.rows[0].alertedPopulation).toBe(30_000);
    expect(study.rows[0].missed).toBe(0);
    // At 6.5 (class 7) no cell reaches the threshold (the strongest is 5.15): needless = late = 0.
    const top = study.rows.at(-1)!;
    expect(top.alertedPopulation).toBe(0);
    expect(top.needless).toBe(0);
    expect(top.late).toBe(0);
    expect(top.missed).toBeGreaterThan(0);
  });

  it("keeps the scenario's own threshold and the target for the page to mark", () => {
    // Defaults for JMA (lib/scenario/defaults.ts): area at 3.5, target 4.5, issue at 4.5.
    expect([study.currentAreaAt, study.target, study.issueAt]).toEqual([3.5, 4.5, 4.5]);
    expect(study.caution).toMatch(/planning estimates/);
  });
});
