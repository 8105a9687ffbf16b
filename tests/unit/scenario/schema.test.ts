import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { DEFAULT_DELAYS_NOTE, defaultsUsedBy } from "@/lib/scenario/defaults";
import { resolveScenario } from "@/lib/scenario/resolve";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";
import { edited } from "./edit-json";

const base: unknown = JSON.parse(readFileSync("tests/fixtures/engine/crustal-inland.json", "utf8"));

function issuesOf(input: unknown) {
  const result = parseScenario(input);
  if (result.ok) throw new Error("expected the scenario to be refused");
  return result.issues;
}

function accepted(input: unknown): Scenario {
  const result = parseScenario(input);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.scenario;
}

describe("parseScenario", () => {
  it("accepts the fixture and keeps optional settings absent", () => {
    expect(accepted(base).velocityModel).toBeUndefined();
  });

  it("refuses unknown fields with their JSON path", () => {
    const issues = issuesOf(edited(base, ["source.rupture", { strikeDeg: 10, dipDeg: 45, dipDirection: 3 }]));
    expect(issues).toContainEqual({ path: "source.rupture.dipDirection", message: "unknown field" });
    expect(issuesOf(edited(base, ["stations[3].elevation", 1]))[0].path).toBe("stations[3].elevation");
  });

  const badInputs: [string, ([string, unknown] | [string])[], string, RegExp][] = [
    ["missing field", [["source.mw"]], "source.mw", /required/],
    ["NaN", [["source.lat", Number.NaN]], "source.lat", /number/],
    ["text where a number belongs", [["stations[1].lon", "east"]], "stations[1].lon", /number/],
    ["latitude 95", [["source.lat", 95]], "source.lat", /between −90 and 90/],
    ["depth −5", [["source.depthKm", -5]], "source.depthKm", /between 0 and 200/],
    ["Mw 12", [["source.mw", 12]], "source.mw", /between 4.0 and 9.5/],
    ["zero stations", [["stations", []]], "stations", /at least one station/],
    ["more trigger stations than operating", [["timing.triggerStations", 5]], "timing.triggerStations", /only 4 operating/],
    ["duplicate station ids", [["stations[2].id", "HRW1"]], "stations[2].id", /duplicate station id/],
    ["negative delay", [["channels[1].deliveryS", -1]], "channels[1].deliveryS", /negative/],
    ["Vs ≥ Vp", [["velocityModel", { kind: "homogeneous", vpKms: 3, vsKms: 3.5 }]], "velocityModel.vsKms", /smaller than Vp/],
    ["unknown model", [["groundMotionModel", "nope-2000"]], "groundMotionModel", /unknown/],
    ["Boore et al. for a slab event", [["groundMotionModel", "bssa-2014"], ["source.faultType", "intraslab"]], "groundMotionModel", /crustal/],
    ["too many cells", [["area", { bbox: [-136, -44, -124, -36], cellKm: 0.2 }]], "area.cellKm", /16,000,000/],
    ["falling warning breaks", [["warningBreaksS", [0, 10, 5]]], "warningBreaksS[2]", /increase/],
  ];
  it.each(badInputs)("refuses %s naming the field", (_label, edits, path, message) => {
    const issues = issuesOf(edited(base, ...edits));
    const issue = issues.find((i) => i.path === path);
    expect(issue, JSON.stringify(issues)).toBeDefined();
    expect(issue?.message).toMatch(message);
  });

  it("refuses a default trigger count above the operating stations", () => {
    const one = edited(base, ["timing"]) as { stations: unknown[] };
    const issues = issuesOf({ ...one, stations: one.stations.slice(0, 1) });
    expect(issues[0]).toEqual({ path: "timing.triggerStations", message: "2 trigger stations (the default) but only 1 operating station" });
  });
});

describe("defaults", () => {
  it("reports the defaults a scenario relies on", () => {
    const used = defaultsUsedBy(accepted(edited(base, ["timing.telemetryS"], ["channels"])));
    expect(used.delays).toEqual(["timing.telemetryS", "channels"]);
    expect(used.usesDefaultDelays).toBe(true);
    expect(used.models).toEqual(["velocityModel", "groundMotionModel", "intensityScale"]);
    expect(DEFAULT_DELAYS_NOTE).toBe("default delays — enter your operator's figures");
  });

  it("resolves METHODS.md §2 defaults: k = 2, 1 s window, 0.5 s telemetry, 1.5 s processing, JMA 4.5 / 3.5", () => {
    const resolved = resolveScenario(accepted(edited(base, ["timing"])));
    expect(resolved.timing).toEqual({ triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 });
    expect([resolved.alert.issueAt, resolved.alert.areaAt]).toEqual([4.5, 3.5]);
    expect(resolved.warningBreaksS).toEqual([0, 5, 10, 20, 30, 60]);
    expect(resolved.defaultsUsed.usesDefaultDelays).toBe(true);
  });
});
