// The map sheet (issue 9): pages of the paper asked for, real text (title, legends with units,
// caution, how it was made), a north arrow and a scale bar whose length matches the ground
// distance at the sheet's centre — checked with GeographicLib from the positions of the printed
// labels, as a reader of the PDF would measure it.
import { app, type Fixture } from "../support/app";
import { Geodesic } from "geographiclib-geodesic";
import { beforeEach, describe, expect, it } from "vitest";
import { scenarioVersions } from "@/db/schema";
import { CAUTION } from "@/lib/caution";
import { kmPerDegreeLongitude, scaleBarFor } from "@/lib/exports/map-sheet/scale-bar";
import { MAP_SHEET_DPI, printMapSize, sheetLayout } from "@/lib/exports/map-sheet/sheet-layout";
import type { MapSheetView } from "@/lib/exports/map-sheet/sheet-request";
import { pngSize } from "@/lib/exports/map-sheet/png-size";
import { solidPng } from "./make-png";
import { readPdf, type PdfPageText } from "./read-pdf";
import { fixtureScenarioFile } from "../support/scenario-file";

describe("the scale bar's arithmetic", () => {
  it.each([0, 30, 45, 60])("a degree of longitude at %i° matches GeographicLib's distance along the parallel to 0.01 %", (lat) => {
    // GeographicLib: geodesic between two points 0.001° apart on the parallel (the chord of the
    // parallel arc and the geodesic differ by far less than 1e-6 at this separation).
    const km = Geodesic.WGS84.Inverse(lat, 10, lat, 10.001).s12! / 1000 / 0.001;
    expect(Math.abs(kmPerDegreeLongitude(lat) / km - 1)).toBeLessThan(1e-4);
  });

  it("picks the longest 1, 2 or 5 × 10ⁿ length that fits", () => {
    expect(scaleBarFor(0.25, 100)).toMatchObject({ km: 20, label: "20 km" });
    expect(scaleBarFor(0.25, 100).lengthPt).toBeCloseTo(80, 9);
    expect(scaleBarFor(0.25, 250)).toMatchObject({ km: 50 });
    expect(scaleBarFor(0.004, 140)).toMatchObject({ km: 0.5, label: "500 m" });
  });

  it("renders the print map at the sheet's resolution from the frame's size", () => {
    const layout = sheetLayout("a4", "landscape");
    const size = printMapSize(layout.map, MAP_SHEET_DPI);
    // 96 CSS px per inch keeps the screen's scale; the pixel ratio brings it to 200 dpi.
    expect(size.cssWidth).toBe(Math.round((layout.map.widthPt / 72) * 96));
    expect(size.pixelRatio * 96).toBeCloseTo(200, 9);
  });
});

const SCENARIO_FILE = fixtureScenarioFile("Sheet test", { depthKm: 15, mw: 7.0 });

/** A view like the browser's: centre, zoom and the bounds that zoom gives the frame in Web Mercator. */
function viewFor(paper: "a4" | "a3", orientation: "portrait" | "landscape", format: "pdf" | "png"): MapSheetView {
  const zoom = 8.6;
  const centre: [number, number] = [150.2, -30.1];
  const layout = sheetLayout(paper, orientation);
  const { cssWidth, cssHeight } = printMapSize(layout.map, MAP_SHEET_DPI);
  // MapLibre's tiles are 512 px: 360° of longitude span 512 · 2^zoom CSS px.
  const degPerPx = 360 / (512 * 2 ** zoom);
  const mercY = (lat: number) => Math.log(Math.tan(Math.PI / 4 + (lat * Math.PI) / 360));
  const latOf = (y: number) => (360 / Math.PI) * Math.atan(Math.exp(y)) - 90;
  const yC = mercY(centre[1]);
  const halfY = ((cssHeight / 2) * degPerPx * Math.PI) / 180;
  return {
    paper,
    orientation,
    format,
    centre,
    zoom,
    bounds: [centre[0] - (cssWidth / 2) * degPerPx, latOf(yC - halfY), centre[0] + (cssWidth / 2) * degPerPx, latOf(yC + halfY)],
    legend: [
      { layer: "warning", key: "blind", fill: "#5a3d6e", opacity: 0.6 },
      { layer: "warning", key: "0-5", fill: "#8a5f8f", opacity: 0.6 },
      { layer: "warning", key: "5-10", fill: "#b98eab", opacity: 0.6 },
      { layer: "intensity", key: "5-", fill: "#c77b3b", opacity: 0.5 },
      { layer: "blind-zone", key: "area", fill: "#2f2640", opacity: 0.3 },
      { layer: "alert-area", key: "area", fill: "#3f7d6e", opacity: 0.2 },
    ],
    overlays: { stations: true, sources: true },
  };
}

async function postSheet(scenarioId: number, view: MapSheetView, image?: Uint8Array): Promise<Response> {
  const { POST } = await import("@/app/api/scenarios/[scenarioId]/versions/[number]/exports/map-sheet/route");
  const form = new FormData();
  form.set("view", JSON.stringify(view));
  if (image) form.set("image", new Blob([image.slice().buffer as ArrayBuffer], { type: "image/png" }), "map.png");
  const request = new Request(`http://leeway.test/api/scenarios/${scenarioId}/versions/4/exports/map-sheet`, { method: "POST", body: form });
  return POST(request, { params: Promise.resolve({ scenarioId: String(scenarioId), number: "4" }) });
}

/** Reads the scale bar off a page: its ends from the "0" and "N km" labels, the frame's edges from the edge longitudes. */
function measureScaleBar(page: PdfPageText, centreLat: number) {
  const edge = page.items.filter((i) => /^\d+\.\d{4}° [EW]$/.test(i.text));
  expect(edge, "two edge longitudes").toHaveLength(2);
  const [left, right] = [...edge].sort((a, b) => a.xPt - b.xPt);
  const lonOf = (text: string) => Number(text.split("°")[0]) * (text.endsWith("W") ? -1 : 1);
  const frameLeft = left.xPt;
  const frameRight = right.xPt + right.widthPt;
  const zero = page.items.find((i) => i.text === "0");
  const length = page.items.find((i) => /^\d+(\.\d+)? k?m$/.test(i.text));
  expect(zero && length).toBeTruthy();
  const barStart = zero!.xPt;
  const barEnd = length!.xPt + length!.widthPt;
  const lonAt = (x: number) => lonOf(left.text) + ((x - frameLeft) / (frameRight - frameLeft)) * (lonOf(right.text) - lonOf(left.text));
  const groundKm = Geodesic.WGS84.Inverse(centreLat, lonAt(barStart), centreLat, lonAt(barEnd)).s12! / 1000;
  const [value, unit] = length!.text.split(" ");
  return { labelKm: unit === "km" ? Number(value) : Number(value) / 1000, groundKm };
}

describe("the map sheet PDF", () => {
  let fixture: Fixture;
  beforeEach(async () => {
    fixture = await app.reset();
    await app.db.insert(scenarioVersions).values({ scenarioId: fixture.scenarioId, number: 4, params: SCENARIO_FILE, state: "shared", authorId: fixture.people.planner.id });
  });

  it.each([
    ["a4", "landscape", 841.89, 595.28],
    ["a4", "portrait", 595.28, 841.89],
    ["a3", "landscape", 1190.55, 841.89],
    ["a3", "portrait", 841.89, 1190.55],
  ] as const)("%s %s: one page of the paper's size with the text, the legends and a true scale bar", async (paper, orientation, widthPt, heightPt) => {
    app.signInAs("trainer");
    const view = viewFor(paper, orientation, "pdf");
    const frame = sheetLayout(paper, orientation).map;
    const { cssWidth, cssHeight, pixelRatio } = printMapSize(frame, MAP_SHEET_DPI);
    const response = await postSheet(fixture.scenarioId, view, solidPng(Math.round(cssWidth * pixelRatio), Math.round(cssHeight * pixelRatio), [220, 232, 234]));
    expect(response.status).toBe(200);
    const pages = await readPdf(new Uint8Array(await response.arrayBuffer()));
    expect(pages).toHaveLength(1);
    // ISO 216: A4 210 × 297 mm, A3 297 × 420 mm; 1 pt = 1/72 in.
    expect(pages[0].widthPt).toBeCloseTo(widthPt, 1);
    expect(pages[0].heightPt).toBeCloseTo(heightPt, 1);
    const text = pages[0].text.replace(/\s+/g, " ");
    for (const words of ["Harbour test: warning seconds and shaking", "Warning seconds before strong shaking (s)", "Expected intensity, JMA seismic intensity", "What this map shows", "How it was made: Leeway", "Scenario version 4 (shared)", "N"]) {
      expect(text).toContain(words);
    }
    expect(text).toContain(CAUTION.slice(0, 50));
    const { labelKm, groundKm } = measureScaleBar(pages[0], view.centre[1]);
    expect(Math.abs(groundKm / labelKm - 1)).toBeLessThan(0.02);
  });

  it("refuses a map image below 150 dpi and one that is not a PNG, writing nothing", async () => {
    app.signInAs("planner");
    const view = viewFor("a4", "landscape", "pdf");
    const small = await postSheet(fixture.scenarioId, view, solidPng(400, 300, [0, 0, 0]));
    expect(small.status).toBe(400);
    expect((await small.json()).error.message).toMatch(/400 × 300 px; A4 landscape needs at least \d+ × \d+ px for 150 dpi/);
    const notPng = await postSheet(fixture.scenarioId, view, new TextEncoder().encode("not a picture"));
    expect(notPng.status).toBe(400);
    expect(await app.count("export_log")).toBe(0);
  });

  it("answers a PNG request with the composed marks and logs it", async () => {
    app.signInAs("trainer");
    const response = await postSheet(fixture.scenarioId, viewFor("a4", "portrait", "png"));
    expect(response.status).toBe(200);
    const { drawing, filename } = await response.json();
    expect(filename).toBe("leeway-harbour-test-v4-map-sheet-a4-portrait.png");
    expect(drawing.widthPt).toBeCloseTo(595.28, 1);
    expect(drawing.primitives.filter((p: { type: string }) => p.type === "map-image")).toHaveLength(1);
    expect(await app.count("export_log")).toBe(1);
  });

  it("reads PNG sizes from the IHDR chunk", () => {
    expect(pngSize(solidPng(31, 17, [1, 2, 3]))).toEqual({ widthPx: 31, heightPx: 17 });
    expect(pngSize(new Uint8Array(30))).toBeNull();
  });
});
