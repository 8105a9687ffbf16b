import { readFileSync, writeFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { Geodesic } from "geographiclib-geodesic";
import { CAUTION } from "../../lib/caution";
import { readPdf, type PdfPageText } from "../unit/exports/read-pdf";
import { signIn } from "./support/session";

/**
 * Exports (issue 9): a trainer makes a PNG and a PDF map sheet of the scenario shared for
 * exercises; the PNG has the sheet's size and is not blank; the PDF is one A4 landscape page
 * whose title and caution are text, and whose scale bar matches the ground distance at the
 * sheet's centre within 2 % (measured with GeographicLib between the longitudes the bar's ends
 * fall on). A council member is refused the CAP and data-file exports (403) but prints the
 * council summary. The sheets are saved beside the test's results for a look.
 */

const SHARED = "Vantorel valley fault, Mw 6.9";
const PUBLISHED = "Western trench, Mw 8.4";
/** A4 landscape at the sheet's 200 dpi: 297 × 210 mm → 841.89 × 595.28 pt × 200/72. */
const A4_LANDSCAPE_PX = { width: Math.round((841.89 * 200) / 72), height: Math.round((595.28 * 200) / 72) };

async function scenarioId(page: Page, name: string): Promise<number> {
  const { scenarios } = (await (await page.request.get("/api/scenarios")).json()) as { scenarios: { id: number; name: string; latest: { number: number } }[] };
  const found = scenarios.find((s) => s.name === name);
  expect(found, `the demo seed has "${name}"`).toBeTruthy();
  return found!.id;
}

/** Opens a scenario and waits until the map has drawn the full-grid results. */
async function openScenario(page: Page, id: number) {
  await page.goto(`/scenarios/${id}`);
  await expect(page.getByTestId("region-map")).toHaveAttribute("data-map-idle", "true", { timeout: 30_000 });
  await expect(page.getByTestId("workspace-map")).toHaveAttribute("data-result-kind", "full", { timeout: 60_000 });
  await page.evaluate(() => new Promise<void>((resolve) => (window.__leewayMap!.loaded() ? resolve() : window.__leewayMap!.once("idle", () => resolve()))));
}

/** Clicks an export button and reads the downloaded file; fails at once with the page's message if the export is refused. */
async function download(page: Page, testId: string): Promise<Buffer> {
  const downloaded = page.waitForEvent("download", { timeout: 150_000 });
  await page.getByTestId(testId).click();
  const refused = page
    .getByTestId("export-error")
    .waitFor({ timeout: 150_000 })
    .then(async () => {
      throw new Error(`the export failed: ${await page.getByTestId("export-error").textContent()}`);
    });
  const file = await Promise.race([downloaded, refused]);
  refused.catch(() => undefined);
  return readFileSync((await file.path())!);
}

/** The scale bar's ends from its "0" and length labels, the frame's edges from the edge longitudes. */
function scaleBarOnPage(page: PdfPageText) {
  const edges = page.items.filter((i) => /^\d+\.\d{4}° [EW]$/.test(i.text)).sort((a, b) => a.xPt - b.xPt);
  expect(edges).toHaveLength(2);
  const lonOf = (text: string) => Number(text.split("°")[0]) * (text.endsWith("W") ? -1 : 1);
  const frame = { left: edges[0].xPt, right: edges[1].xPt + edges[1].widthPt, west: lonOf(edges[0].text), east: lonOf(edges[1].text) };
  const zero = page.items.find((i) => i.text === "0")!;
  const length = page.items.find((i) => /^\d+(\.\d+)? k?m$/.test(i.text))!;
  const lonAt = (x: number) => frame.west + ((x - frame.left) / (frame.right - frame.left)) * (frame.east - frame.west);
  const [value, unit] = length.text.split(" ");
  return { frame, startLon: lonAt(zero.xPt), endLon: lonAt(length.xPt + length.widthPt), labelKm: unit === "km" ? Number(value) : Number(value) / 1000 };
}

test("a trainer exports the shared scenario's map sheet as PNG and PDF", async ({ page }) => {
  test.setTimeout(240_000);
  await signIn(page, "trainer");
  await openScenario(page, await scenarioId(page, SHARED));
  const screen = await page.evaluate(() => ({ zoom: window.__leewayMap!.getZoom(), centre: window.__leewayMap!.getCenter().toArray() as [number, number] }));

  // PNG: the sheet's pixel size, and a map that is drawn (many colours, mostly not white).
  const png = await download(page, "export-sheet-png");
  writeFileSync(test.info().outputPath("map-sheet-a4-landscape.png"), png);
  expect(png.subarray(1, 4).toString("ascii")).toBe("PNG");
  expect({ width: png.readUInt32BE(16), height: png.readUInt32BE(20) }).toEqual(A4_LANDSCAPE_PX);
  const look = await page.evaluate(async (base64) => {
    // createImageBitmap, not an <img>: the app's Content-Security-Policy allows no data: images.
    const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
    const image = await createImageBitmap(new Blob([bytes], { type: "image/png" }));
    const canvas = document.createElement("canvas");
    canvas.width = image.width;
    canvas.height = image.height;
    const context = canvas.getContext("2d")!;
    context.drawImage(image, 0, 0);
    // The map frame's middle (left 60 % of the page, below the header).
    const data = context.getImageData(Math.round(image.width * 0.1), Math.round(image.height * 0.3), Math.round(image.width * 0.5), Math.round(image.height * 0.4)).data;
    const colours = new Set<number>();
    let white = 0;
    for (let i = 0; i < data.length; i += 4) {
      colours.add((data[i] << 16) | (data[i + 1] << 8) | data[i + 2]);
      if (data[i] > 250 && data[i + 1] > 250 && data[i + 2] > 250) white++;
    }
    return { colours: colours.size, whiteShare: white / (data.length / 4) };
  }, png.toString("base64"));
  expect(look.colours).toBeGreaterThan(50);
  expect(look.whiteShare).toBeLessThan(0.5);

  // PDF: one A4 landscape page, title and caution as text, a scale bar true to the ground.
  const pdf = await download(page, "export-sheet-pdf");
  writeFileSync(test.info().outputPath("map-sheet-a4-landscape.pdf"), pdf);
  const pages = await readPdf(new Uint8Array(pdf));
  expect(pages).toHaveLength(1);
  expect(pages[0].widthPt).toBeCloseTo(841.89, 1);
  expect(pages[0].heightPt).toBeCloseTo(595.28, 1);
  const text = pages[0].text.replace(/\s+/g, " ");
  expect(text).toContain(`${SHARED}: warning seconds and shaking`);
  expect(text).toContain(CAUTION.slice(0, 60));

  const bar = scaleBarOnPage(pages[0]);
  const groundKm = Geodesic.WGS84.Inverse(screen.centre[1], bar.startLon, screen.centre[1], bar.endLon).s12! / 1000;
  expect(Math.abs(groundKm / bar.labelKm - 1), `bar ${bar.labelKm} km, ground ${groundKm.toFixed(3)} km`).toBeLessThan(0.02);

  // Same scale as the screen: at 96 CSS px per inch, the frame spans frameWidth × 96/72 CSS px of a
  // map whose 360° are 512 · 2^zoom CSS px wide (MapLibre's 512-px tiles).
  const frameCssPx = ((bar.frame.right - bar.frame.left) * 96) / 72;
  const expectedSpanDeg = (frameCssPx * 360) / (512 * 2 ** screen.zoom);
  expect(Math.abs((bar.frame.east - bar.frame.west) / expectedSpanDeg - 1)).toBeLessThan(0.01);

  await expect(page.getByTestId("export-log")).toContainText("Map sheet (PDF)");
  await expect(page.getByTestId("export-log")).toContainText("Map sheet (PNG)");
});

test("a council member gets no CAP or data-file exports but prints the council summary", async ({ page }) => {
  await signIn(page, "council");
  const id = await scenarioId(page, PUBLISHED);
  const version = (await (await page.request.get(`/api/scenarios/${id}`)).json()) as { versions?: { number: number }[] };
  const number = version.versions?.[0]?.number ?? 1;
  const base = `/api/scenarios/${id}/versions/${number}/exports`;
  for (const path of ["cap", "contours", "sites", "scenario-file", "handout?lon=0&lat=0", "facilities"]) {
    const response = await page.request.get(`${base}/${path}`);
    expect(response.status(), path).toBe(403);
  }
  expect((await page.request.post(`${base}/map-sheet`, { data: { view: {} } })).status()).toBe(403);
  // Exposure CSV is for every role that may see the version.
  const csv = await page.request.get(`${base}/exposure?table=districts`);
  expect(csv.status()).toBe(200);
  expect((await csv.text()).startsWith(`# ${CAUTION}`)).toBe(true);

  await page.goto(`/scenarios/${id}/council`);
  await expect(page.getByTestId("council-summary")).toBeVisible();
  await expect(page.getByRole("button", { name: "Print (A4)" })).toBeVisible();
  // The scenario page offers the council no file exports, only the exposure tables.
  await page.goto(`/scenarios/${id}`);
  await expect(page.getByTestId("scenario-exports")).toBeVisible();
  await expect(page.getByTestId("export-cap")).toHaveCount(0);
  await expect(page.getByTestId("export-sheet-pdf")).toHaveCount(0);
  await expect(page.getByTestId("export-exposure-districts")).toBeVisible();
});
