// The exposure, CSV and comparison routes: what a caller gets, and clear refusals for bad input.
import { app } from "../support/app";
import { beforeEach, describe, expect, it } from "vitest";
import { GET as exposureCsv } from "@/app/api/scenarios/[scenarioId]/versions/[number]/exposure/csv/route";
import { GET as exposureJson } from "@/app/api/scenarios/[scenarioId]/versions/[number]/exposure/route";
import { GET as compare } from "@/app/api/compare/route";
import { CAUTION } from "@/lib/caution";
import { comparableVersions, computableVersion } from "./fixture";

const params = (scenarioId: number, number: number) => ({ params: Promise.resolve({ scenarioId: String(scenarioId), number: String(number) }) });

beforeEach(() => app.reset());

describe("exposure routes", () => {
  it("answers JSON with the caution at the top level and in the result", async () => {
    const { scenarioId, number } = await computableVersion("published");
    app.signInAs("council");
    const response = await exposureJson(new Request("http://leeway.test/x"), params(scenarioId, number));
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.caution).toBe(CAUTION);
    expect(body.exposure.caution).toBe(CAUTION);
    // The fixture's two cells hold 1,200 and 800 people.
    expect(body.exposure.totals.totalPopulation).toBe(2000);
  });

  it("writes CSV with the caution first, then how it was made, then the header and a total row", async () => {
    const { scenarioId, number } = await computableVersion("published");
    app.signInAs("trainer");
    const response = await exposureCsv(new Request("http://leeway.test/x?table=class-band"), params(scenarioId, number));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(response.headers.get("content-disposition")).toBe(`attachment; filename="leeway-exposure-${scenarioId}-v1-class-band.csv"`);
    const lines = (await response.text()).split("\r\n");
    expect(lines[0]).toBe(`# ${CAUTION}`);
    expect(lines[1]).toMatch(/^# How it was made: Leeway .*scenario: Verification: homogeneous half-space v1/);
    expect(lines.find((line) => line.startsWith("intensity class (JMA),"))).toBeDefined();
    expect(lines.find((line) => line.startsWith("total,"))?.split(",").at(-1)).toBe("2000");
  });

  it("refuses an unknown table by name with 400", async () => {
    const { scenarioId, number } = await computableVersion("published");
    app.signInAs("planner");
    const response = await exposureCsv(new Request("http://leeway.test/x?table=everything"), params(scenarioId, number));
    expect(response.status).toBe(400);
    expect((await response.json()).error.message).toMatch(/table: must be one of class-band, districts, channels, actions, facilities/);
  });

  it("says 404 for a version that does not exist and 409 with the reason for a version with no population layer", async () => {
    app.signInAs("planner");
    expect((await exposureJson(new Request("http://leeway.test/x"), params(999, 1))).status).toBe(404);
    // The harness's own scenario file has no area and no Vs30: Leeway cannot compute it.
    const unreadable = await exposureJson(new Request("http://leeway.test/x"), params(app.fixture.scenarioId, 1));
    expect(unreadable.status).toBe(409);
    expect((await unreadable.json()).error.message).toMatch(/scenario file Leeway cannot compute \(vs30: /);
  });
});

describe("comparison route", () => {
  it("names the malformed parameter", async () => {
    app.signInAs("planner");
    const response = await compare(new Request("http://leeway.test/api/compare?a=3&b=3:2"), {});
    expect(response.status).toBe(400);
    expect((await response.json()).error.message).toMatch(/^Comparison request: a: must be scenarioId:version, e\.g\. 3:1/);
  });

  it("compares two versions the caller may see", async () => {
    const { a, b } = await comparableVersions("published");
    app.signInAs("council");
    const response = await compare(new Request(`http://leeway.test/api/compare?a=${a}&b=${b}`), {});
    expect(response.status).toBe(200);
    const { comparison } = await response.json();
    expect(comparison.totalPopulation).toBe(2000);
    expect(comparison.rowTotals.reduce((x: number, y: number) => x + y, 0)).toBe(2000);
  });
});
