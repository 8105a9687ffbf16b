import { readFileSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { CAUTION, computeSites } from "@/lib/geo";
import { handleEngineMessage } from "@/lib/geo/worker/handle-message";
import { parseScenario } from "@/lib/scenario/schema";
import { edited } from "../scenario/edit-json";
import { bundleCli, runCli, tempFile } from "./run-cli";

const SCENARIO = "tests/fixtures/engine/crustal-inland.json";
const SITES = "tests/fixtures/engine/sites.csv";
const POPULATION = "tests/fixtures/engine/population.csv";
const AT = ["--computed-at", "2030-05-01T09:00:00Z"];
const scenarioJson: unknown = JSON.parse(readFileSync(SCENARIO, "utf8"));

beforeAll(() => bundleCli());

describe("leeway sites", () => {
  it("prints one object per CSV row with the documented fields; the caution goes to stderr", () => {
    const { status, stdout, stderr } = runCli(["sites", "--scenario", SCENARIO, "--sites", SITES, ...AT]);
    expect(status).toBe(0);
    expect(stderr).toContain(CAUTION);
    const sites = JSON.parse(stdout);
    expect(sites).toHaveLength(3);
    for (const key of ["id", "lon", "lat", "hypocentralKm", "ruptureKm", "pArrivalS", "sArrivalS", "alertIssuedS", "alertS", "warningS", "alerted", "pgvCms", "pgaCms2", "jmaIntensity", "jmaClass", "mmi"]) {
      expect(sites[0]).toHaveProperty(key);
    }
    expect(sites[1].vs30Ms).toBe(320);
  });

  it("gives the values of the worker module and of a direct call, to the last digit", () => {
    const { stdout } = runCli(["sites", "--scenario", SCENARIO, "--sites", SITES, ...AT]);
    const fromCli = JSON.parse(stdout)[1];
    const site = { id: "pellin-bay-clinic", lon: -129.7, lat: -39.9, vs30: 320 };
    const parsed = parseScenario(scenarioJson);
    if (!parsed.ok) throw new Error("fixture refused");
    const direct = JSON.parse(JSON.stringify(computeSites(parsed.scenario, [site]).sites[0]));
    const { response } = handleEngineMessage({ id: 1, kind: "sites", scenario: scenarioJson, sites: [site] });
    if (response.kind !== "sites") throw new Error(JSON.stringify(response));
    const fromWorker = JSON.parse(JSON.stringify(response.sites[0]));
    expect(fromCli).toEqual(direct);
    expect(fromWorker).toEqual(direct);
  });

  it("gives byte-identical output for the same scenario twice", () => {
    const a = runCli(["grid", "--scenario", SCENARIO, "--cell-km", "5", ...AT]);
    const b = runCli(["grid", "--scenario", SCENARIO, "--cell-km", "5", ...AT]);
    expect(a.status).toBe(0);
    expect(a.stdout).toBe(b.stdout);
  });
});

describe("leeway grid, exposure, batch", () => {
  it("grid: summary, contours (FeatureCollection), caution and provenance", () => {
    const { status, stdout } = runCli(["grid", "--scenario", SCENARIO, "--cell-km", "4", ...AT]);
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    for (const key of ["cells", "blindZoneAreaKm2", "minWarningS", "maxWarningS", "maxJmaIntensity", "maxMmi", "alertIssued"]) expect(out.summary).toHaveProperty(key);
    expect(out.contours.type).toBe("FeatureCollection");
    expect(new Set(out.contours.features.map((f: { properties: { layer: string } }) => f.properties.layer))).toEqual(new Set(["warning", "intensity", "blind-zone", "alert-area"]));
    expect(out.caution).toBe(CAUTION);
    expect(out.provenance.computedAt).toBe("2030-05-01T09:00:00.000Z");
    expect(out.provenance.groundMotionModel.id).toBe("si-midorikawa-1999");
  });

  it("exposure: totals and tables; 'no district' for cells without one", () => {
    const { status, stdout } = runCli(["exposure", "--scenario", SCENARIO, "--population", POPULATION, ...AT]);
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    // 1200.5 + 800.2 + 650.4 + 420.1 + 90.6 + 15.3 = 3177.1 → 3177
    expect(out.totalPopulation).toBe(3177);
    expect(out.byDistrict.map((d: { district: string | null }) => d.district)).toEqual(["Harrowmere", "Pellin Bay", null]);
    for (const key of ["blindZonePopulation", "alertedPopulation", "table", "byChannel", "caution", "provenance"]) expect(out).toHaveProperty(key);
  });

  it("batch: one result per scenario file, keyed by file name", () => {
    const { status, stdout } = runCli(["batch", "--scenarios", "tests/fixtures/engine/batch", "--cell-km", "5", ...AT]);
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    expect(Object.keys(out)).toEqual(["a-inland.json", "b-homogeneous.json"]);
    expect(out["b-homogeneous.json"].provenance.velocityModel.id).toBe("homogeneous");
  });

  it("uses a ground-motion model registered from a module file, by name", () => {
    const file = tempFile("s.json", JSON.stringify(edited(scenarioJson, ["groundMotionModel", "fixture-simple-decay"])));
    const { status, stdout } = runCli(["sites", "--scenario", file, "--sites", SITES, "--ground-motion-module", "tests/fixtures/ground-motion/simple-decay.mjs", ...AT]);
    expect(status).toBe(0);
    const [site] = JSON.parse(stdout);
    // The fixture's closed form: log10 PGV = 0.5·6.8 + 0.2 − log10(R + 10).
    expect(site.pgvCms).toBeCloseTo(10 ** (0.5 * 6.8 + 0.2 - Math.log10(site.ruptureKm + 10)), 10);
  });
});

describe("bad input through the CLI: a message naming the field, non-zero exit, nothing on stdout", () => {
  const scenarioCases: [string, unknown, RegExp][] = [
    ["missing field", edited(scenarioJson, ["source.mw"]), /source\.mw: magnitude is required/],
    ["text where a number belongs", edited(scenarioJson, ["stations[1].lon", "east"]), /stations\[1\]\.lon: longitude must be a number/],
    ["latitude 95", edited(scenarioJson, ["source.lat", 95]), /source\.lat: latitude must be between −90 and 90°/],
    ["depth −5", edited(scenarioJson, ["source.depthKm", -5]), /source\.depthKm: depth must be between 0 and 200 km/],
    ["Mw 12", edited(scenarioJson, ["source.mw", 12]), /source\.mw: Mw must be between 4.0 and 9.5/],
    ["zero stations", edited(scenarioJson, ["stations", []]), /stations: at least one station is needed/],
    ["more trigger stations than operating ones", edited(scenarioJson, ["timing.triggerStations", 5]), /timing\.triggerStations: 5 trigger stations but only 4 operating stations/],
    ["duplicate station ids", edited(scenarioJson, ["stations[2].id", "HRW1"]), /stations\[2\]\.id: duplicate station id "HRW1"/],
    ["an unknown field", edited(scenarioJson, ["source.rupture", { strikeDeg: 20, dipDeg: 40, dipDegs: 3 }]), /source\.rupture\.dipDegs: unknown field/],
    ["Boore et al. (2014) for a slab source", edited(scenarioJson, ["groundMotionModel", "bssa-2014"], ["source.faultType", "intraslab"]), /groundMotionModel: bssa-2014 is for crustal sources only/],
  ];
  it.each(scenarioCases)("%s", (_label, scenario, message) => {
    const file = tempFile("scenario.json", JSON.stringify(scenario));
    const { status, stdout, stderr } = runCli(["sites", "--scenario", file, "--sites", SITES]);
    expect(status).not.toBe(0);
    expect(stdout).toBe("");
    expect(stderr).toMatch(message);
  });

  it("NaN in the scenario file (not JSON): names the line and column", () => {
    const file = tempFile("nan.json", JSON.stringify(scenarioJson, null, 2).replace('"depthKm": 10', '"depthKm": NaN'));
    const { status, stdout, stderr } = runCli(["grid", "--scenario", file]);
    expect([status, stdout]).toEqual([2, ""]);
    expect(stderr).toMatch(/nan\.json: not valid JSON \(line 7, column \d+\)/);
  });

  it("a file that is not JSON", () => {
    const file = tempFile("notes.json", "source: somewhere offshore\n");
    const { status, stdout, stderr } = runCli(["grid", "--scenario", file]);
    expect([status, stdout]).toEqual([2, ""]);
    expect(stderr).toMatch(/notes\.json: not valid JSON \(line 1, column 1\)/);
  });

  it.each([
    ["text in a number column", "id,lon,lat\nA,-130.1,-40.0\nB,east,-40.1\n", /sites\.csv row 2 \(line 3\), column "lon": "east" is not a number/],
    ["NaN in a number column", "id,lon,lat\nA,-130.1,NaN\n", /sites\.csv row 1 \(line 2\), column "lat": "NaN" is not a number/],
    ["latitude 95", "id,lon,lat\nA,-130.1,95\n", /sites\.csv row 1 \(line 2\), column "lat": 95 is outside −?-?90–90°/],
    ["a missing column", "id,lon\nA,-130.1\n", /sites\.csv line 1: missing column "lat"/],
  ])("sites CSV: %s", (_label, csv, message) => {
    const file = tempFile("sites.csv", csv);
    const { status, stdout, stderr } = runCli(["sites", "--scenario", SCENARIO, "--sites", file]);
    expect([status, stdout]).toEqual([2, ""]);
    expect(stderr).toMatch(message);
  });

  it("population CSV: negative people, named by row and column", () => {
    const file = tempFile("pop.csv", "lon,lat,population\n-130.1,-40.0,12\n-130.2,-40.1,-3\n");
    const { status, stdout, stderr } = runCli(["exposure", "--scenario", SCENARIO, "--population", file]);
    expect([status, stdout]).toEqual([2, ""]);
    expect(stderr).toMatch(/pop\.csv row 2 \(line 3\), column "population": -3 is outside 0–1000000000 people/);
  });

  it("batch with one bad file prints nothing", () => {
    const dir = dirname(tempFile("a.json", JSON.stringify(scenarioJson)));
    writeFileSync(join(dir, "b.json"), JSON.stringify(edited(scenarioJson, ["source.depthKm", -5])));
    const { status, stdout, stderr } = runCli(["batch", "--scenarios", dir]);
    expect([status, stdout]).toEqual([2, ""]);
    expect(stderr).toMatch(/b\.json source\.depthKm/);
  });

  it("an unknown option or command", () => {
    expect(runCli(["grid", "--scenario", SCENARIO, "--cellsize", "3"]).stderr).toMatch(/unknown option --cellsize/);
    expect(runCli(["draw"]).status).toBe(2);
  });
});
