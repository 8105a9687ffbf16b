import { describe, expect, it } from "vitest";
import { computeSites, listGroundMotionModels, listRelationStatuses, registerGroundMotionModel } from "@/lib/geo";
import { model } from "../../fixtures/ground-motion/simple-decay.mjs";
import { homogeneousScenario, scenarioFrom } from "../../verification/scenario-fixtures";

describe("ground-motion registry", () => {
  it("a model file from tests/fixtures registers with one call and scenarios can name it", () => {
    registerGroundMotionModel(model);
    expect(listGroundMotionModels().map((m) => m.id)).toContain("fixture-simple-decay");
    const base = homogeneousScenario({ mw: 6 });
    const scenario = scenarioFrom({ ...base, groundMotionModel: "fixture-simple-decay" });
    const [site] = computeSites(scenario, [{ id: "a", lon: -129.5, lat: -40.2 }]).sites;
    // The fixture's closed form: log10 PGV = 0.5·Mw + 0.2 − log10(R + 10).
    expect(site.pgvCms).toBeCloseTo(10 ** (0.5 * 6 + 0.2 - Math.log10(site.ruptureKm + 10)), 10);
  });

  it("refuses a second model under a taken id", () => {
    expect(() => registerGroundMotionModel({ ...model })).toThrow(/already registered/);
  });

  it("lists every relation with its status for the product to show", () => {
    const statuses = listRelationStatuses();
    expect(statuses.find((s) => s.id === "si-midorikawa-1999")?.status).toBe("checked");
    expect(statuses.find((s) => s.id === "midorikawa-1994")?.status).toBe("from memory");
    expect(statuses.find((s) => s.id === "midorikawa-fujimoto-muramatsu-1999")?.status).toBe("open");
    expect(statuses.find((s) => s.id === "worden-2012")?.status).toBe("checked");
  });
});
