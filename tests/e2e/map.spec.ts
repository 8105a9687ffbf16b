import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./support/session";

/**
 * The map of the invented demo region (issue 2): it renders from the app's own tiles and fonts,
 * places the town labels at every zoom the region needs, and asks nothing of another host.
 * The map is reached through `window.__leewayMap`, which RegionMap always sets.
 */

/** Waits for the map to settle after moving it to `zoom` around `center`. */
async function jumpAndSettle(page: Page, center: [number, number], zoom: number) {
  await page.evaluate(
    ([lon, lat, z]) =>
      new Promise<void>((resolve) => {
        const map = window.__leewayMap!;
        map.once("idle", () => resolve());
        map.jumpTo({ center: [lon, lat], zoom: z });
      }),
    [center[0], center[1], zoom] as const,
  );
}

const placedTownLabels = (page: Page) =>
  page.evaluate(() => [...new Set(window.__leewayMap!.queryRenderedFeatures({ layers: ["town-labels"] }).map((f) => String(f.properties.name)))]);

test("the demo region's map renders from the app's own tiles, with town labels placed at every zoom", async ({ page, baseURL }) => {
  const appOrigin = new URL(baseURL!).origin;
  const outside: string[] = [];
  page.on("request", (request) => {
    const url = request.url();
    if (!url.startsWith("data:") && !url.startsWith("blob:") && new URL(url).origin !== appOrigin) outside.push(url);
  });
  const mapErrors: string[] = [];
  page.on("console", (message) => {
    if (message.type() === "error" && message.text().startsWith("map:")) mapErrors.push(message.text());
  });

  // Council members see the published demo scenario, so every role can open this map.
  await signIn(page, "council");
  const { scenarios } = await (await page.request.get("/api/scenarios")).json();
  expect(scenarios.length, "the demo seed publishes one scenario").toBeGreaterThan(0);
  await page.goto(`/scenarios/${scenarios[0].id}`);

  const map = page.getByTestId("region-map");
  await expect(map).toHaveAttribute("data-map-idle", "true", { timeout: 30_000 });
  await expect(page.getByTestId("map-legend")).toBeVisible();
  await expect(page.getByTestId("map-caution")).toContainText("planning estimates");
  await expect(page.locator(".maplibregl-ctrl-scale")).toHaveText(/\d+\s*km/);

  // Non-blank canvas: copy the WebGL canvas (preserveDrawingBuffer) to a 2D one and look at its pixels.
  const pixels = await page.evaluate(() => {
    const source = window.__leewayMap!.getCanvas();
    const copy = document.createElement("canvas");
    copy.width = source.width;
    copy.height = source.height;
    const context = copy.getContext("2d")!;
    context.drawImage(source, 0, 0);
    const data = context.getImageData(0, 0, copy.width, copy.height).data;
    const colours = new Set<number>();
    let opaque = 0;
    for (let i = 0; i < data.length; i += 4 * 7) {
      colours.add((data[i] << 16) | (data[i + 1] << 8) | data[i + 2]);
      if (data[i + 3] > 0) opaque++;
    }
    return { colours: colours.size, opaqueShare: opaque / (data.length / (4 * 7)) };
  });
  expect(pixels.opaqueShare).toBeGreaterThan(0.99);
  expect(pixels.colours).toBeGreaterThan(50);

  // The whole island in view: the three largest towns labelled, stations and the source drawn.
  const labels = await placedTownLabels(page);
  expect(labels).toEqual(expect.arrayContaining(["Marisvell", "Eskerhaven", "Vantorel"]));
  expect(labels.length).toBeGreaterThanOrEqual(6);
  const stationCount = await page.evaluate(() => window.__leewayMap!.queryRenderedFeatures({ layers: ["stations"] }).length);
  expect(stationCount).toBeGreaterThanOrEqual(30);
  await page.screenshot({ path: "tests/artifacts/map-region.png", fullPage: true });

  // Zoomed out to the island as a whole, and in to street scale on the largest town.
  const marisvell = await page.evaluate(() => {
    const feature = window.__leewayMap!.queryRenderedFeatures({ layers: ["town-labels"] }).find((f) => f.properties.name === "Marisvell")!;
    return (feature.geometry as GeoJSON.Point).coordinates as [number, number];
  });
  await jumpAndSettle(page, marisvell, 5.5);
  expect(await placedTownLabels(page)).toEqual(expect.arrayContaining(["Marisvell", "Eskerhaven", "Vantorel"]));
  await map.screenshot({ path: "tests/artifacts/map-zoom-5.5.png" });
  await jumpAndSettle(page, marisvell, 8.5);
  expect(await placedTownLabels(page)).toContain("Marisvell");
  const districtLabels = await page.evaluate(() => window.__leewayMap!.queryRenderedFeatures({ layers: ["district-labels"] }).length);
  expect(districtLabels).toBeGreaterThan(0);
  await map.screenshot({ path: "tests/artifacts/map-zoom-8.5.png" });
  await jumpAndSettle(page, marisvell, 12);
  expect(await placedTownLabels(page)).toContain("Marisvell");
  await map.screenshot({ path: "tests/artifacts/map-zoom-12.png" });

  // Leeway's own zoom buttons (MapLibre's use data: icons, which the CSP refuses).
  const zoomBefore = await page.evaluate(() => window.__leewayMap!.getZoom());
  await page.getByRole("button", { name: "Zoom out" }).click();
  await expect.poll(() => page.evaluate(() => window.__leewayMap!.getZoom())).toBeLessThan(zoomBefore - 0.5);

  expect(mapErrors).toEqual([]);
  expect(outside).toEqual([]);
});
