import { describe, expect, it } from "vitest";
import { decodeLayerFile } from "@/lib/layers/decode";
import { readPopulationCsv, readSiteConditionCsv } from "@/lib/layers/grid-csv";
import { LayerFileError } from "@/lib/layers/layer-file-error";
import { MAX_LISTED_ISSUES } from "@/lib/layers/limits";
import { readFacilitiesCsv, readStationsCsv } from "@/lib/layers/point-csv";
import { fixtureBytes, fixtureText, refusal } from "./fixtures";


describe("population CSV", () => {
  it("reads lon, lat, population and district names; totals match the file (1200 + 850 + 0 + 2300 + 410 = 4760, summed by hand)", async () => {
    const layer = await readPopulationCsv(fixtureText("population-ok.csv"));
    expect(layer.rowCount).toBe(5);
    expect([...layer.people].reduce((a, b) => a + b, 0)).toBe(4760);
    expect([...layer.lon]).toEqual([-126.22, -126.21, -126.2, -126.12, -126.11]);
    expect(layer.fileDistricts?.names).toEqual(["Orvanne", "Quillmoor"]);
    // Row 6 leaves the district blank: no district (−1), not the previous row's.
    expect([...(layer.fileDistricts?.index ?? [])]).toEqual([0, 0, 0, 1, -1]);
    expect(layer.bbox).toEqual([-126.22, -46.9, -126.11, -46.9]);
  });

  it("accepts UTF-8 with a byte-order mark and CRLF line ends (100 + 250.5 + 49.5 = 400)", async () => {
    const bytes = fixtureBytes("population-bom-crlf.csv");
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(Buffer.from(bytes).includes("\r\n")).toBe(true);
    const fromBytes = await readPopulationCsv(decodeLayerFile("population", bytes));
    const fromText = await readPopulationCsv(fixtureText("population-bom-crlf.csv"));
    for (const layer of [fromBytes, fromText]) {
      expect(layer.rowCount).toBe(3);
      expect([...layer.people]).toEqual([100, 250.5, 49.5]);
      expect(layer.fileDistricts).toBeNull();
    }
  });

  it("refuses wrong columns, naming the missing and the unknown ones", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-wrong-columns.csv")));
    expect(error.message).toContain('missing "lon", "population"');
    expect(error.message).toContain('unknown "longitude", "people"');
    expect(error.message).toContain("Expected lon, lat, population (optional: district)");
    expect(error.status).toBe(400);
  });

  it("refuses text in a number column by row and column", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-text-in-number.csv")));
    expect(error.issues).toEqual([{ path: "row 3, column population", message: '"many" is not a number' }]);
    expect(error.message).toBe('The file was refused: row 3, column population: "many" is not a number. Nothing was saved.');
  });

  it("refuses a latitude beyond ±90", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-lat-out-of-range.csv")));
    expect(error.issues).toEqual([{ path: "row 4, column lat", message: "must be between -90 and 90 degrees" }]);
  });

  it("suspects swapped columns when lat is beyond ±90 but lon would be a latitude", async () => {
    const error = await refusal(readPopulationCsv("lon,lat,population\n-46.9,-126.2,10\n"));
    expect(error.issues[0].message).toContain("are the lon and lat columns swapped?");
  });

  it("refuses semicolon separators with a message that says so", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-semicolons.csv")));
    expect(error.message).toMatch(/^The file separates its columns with semicolons \(;\)\./);
    expect(error.message).toContain("decimal points");
  });

  it("refuses decimal commas, quoted or splitting a row, with a message that says so", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-decimal-comma.csv")));
    expect(error.issues).toEqual([
      { path: "row 2, column population", message: '"1200,5" uses a decimal comma; write it with a decimal point (1200.5)' },
      { path: "row 3", message: "has 5 values but the header has 3 columns; a decimal comma (12,5) splits a number in two: use decimal points (12.5)" },
    ]);
  });

  it("refuses an empty file, and a file with only a header", async () => {
    expect((await refusal(readPopulationCsv(fixtureText("empty.csv")))).message).toMatch(/^The file is empty\./);
    expect((await refusal(readPopulationCsv("\uFEFF \r\n"))).message).toMatch(/^The file is empty\./);
    expect((await refusal(readPopulationCsv("lon,lat,population\r\n"))).message).toContain("no data rows");
  });

  it("refuses the same cell twice, pointing at the first", async () => {
    const error = await refusal(readPopulationCsv(fixtureText("population-duplicate-cell.csv")));
    expect(error.issues[0]).toEqual({ path: "row 4", message: "is the same cell as row 2 (-126.22, -46.9); each cell may appear once" });
  });

  it("lists the first 50 bad rows and counts them all", async () => {
    const rows = Array.from({ length: 120 }, (_, i) => `-126.${String(i).padStart(3, "0")},-46.9,lots`);
    const error = await refusal(readPopulationCsv(["lon,lat,population", ...rows].join("\n")));
    expect(error.issueCount).toBe(120);
    expect(error.issues).toHaveLength(MAX_LISTED_ISSUES);
    expect(error.issues[0].path).toBe("row 2, column population");
    expect(error.issues[49].path).toBe("row 51, column population");
    expect(error.message).toContain("120 problems in its rows, the first at row 2, column population");
    expect(error.message).toContain("(the first 50 are listed)");
  });

  it("refuses more rows than the limit with 413", async () => {
    const rows = Array.from({ length: 6 }, (_, i) => `-126.${i},-46.9,1`);
    const error = await refusal(readPopulationCsv(["lon,lat,population", ...rows].join("\n"), { limits: { maxBytes: 1e6, maxRows: 5 } }));
    expect(error.status).toBe(413);
    expect(error.message).toContain("more than 5 data rows");
  });

  it("reports progress up to the whole file", async () => {
    const fractions: number[] = [];
    await readPopulationCsv(fixtureText("population-ok.csv"), { onProgress: (f) => fractions.push(f) });
    expect(fractions.at(-1)).toBe(1);
  });
});

describe("file decoding", () => {
  it("refuses a file over the kind's size limit before reading it, with 413", () => {
    const error = (() => {
      try {
        decodeLayerFile("stations", new Uint8Array(2 * 1024 * 1024 + 1));
      } catch (e) {
        return e as LayerFileError;
      }
    })();
    expect(error?.status).toBe(413);
    expect(error?.message).toBe("The file is 2,097,153 bytes; Leeway accepts at most 2 MB for a stations layer. Nothing was saved.");
  });

  it("refuses bytes that are not UTF-8 (Latin-1 é is the single byte 0xE9)", () => {
    const latin1 = new Uint8Array([...Buffer.from("name,kind,lon,lat\nCaf"), 0xe9, ...Buffer.from(",school,-126.2,-46.9\n")]);
    expect(() => decodeLayerFile("facilities", latin1)).toThrow("The file is not UTF-8 text.");
  });
});

describe("site condition, stations and facilities CSV", () => {
  it("reads Vs30 in m/s and refuses values that look like km/s", async () => {
    const layer = await readSiteConditionCsv(fixtureText("site-condition-ok.csv"));
    expect([...layer.vs30Ms]).toEqual([310, 760, 185]);
    const error = await refusal(readSiteConditionCsv(fixtureText("site-condition-km-per-s.csv")));
    expect(error.issues[0]).toEqual({ path: "row 2, column vs30", message: "must be at least 50 m/s (Vs30 is in metres per second)" });
  });

  it("reads stations with the operating column (blank means operating) and refuses a repeated id", async () => {
    const layer = await readStationsCsv(fixtureText("stations-ok.csv"));
    expect(layer.stations.map((s) => [s.code, s.operating])).toEqual([
      ["TS01", true],
      ["TS02", true],
      ["TS03", false],
      ["TS04", true],
    ]);
    const error = await refusal(readStationsCsv(fixtureText("stations-duplicate-id.csv")));
    expect(error.issues[0]).toEqual({ path: "row 3, column id", message: '"TS01" is already used by row 2; station ids must be unique' });
  });

  it("reads facility points, spelling care home either way, and sends rail to GeoJSON", async () => {
    const layer = await readFacilitiesCsv(fixtureText("facilities-ok.csv"));
    expect(layer.facilities.map((f) => f.kind)).toEqual(["school", "hospital", "care-home", "utility"]);
    const error = await refusal(readFacilitiesCsv(fixtureText("facilities-rail-in-csv.csv")));
    expect(error.issues).toEqual([
      { path: "row 3, column kind", message: "is rail: rail segments are lines, so upload them as GeoJSON LineStrings" },
      { path: "row 4, column kind", message: '"clinic" is not a facility kind; use one of school, hospital, care-home, utility, other' },
    ]);
  });
});
