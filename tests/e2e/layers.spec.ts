import { expect, test } from "@playwright/test";
import { signIn } from "./support/session";

/**
 * Layers (issue 6): a planner uploads a population grid, watches it being checked, sees the preview
 * and commits it, then sees it on the map; a trainer may look but not upload.
 */

/** A population grid of `rows` cells, 0.002° apart, around the invented island's centre. */
function populationCsv(rows: number): string {
  const lines = ["lon,lat,population"];
  for (let i = 0; i < rows; i++) {
    const lon = -126.4 + (i % 250) * 0.002;
    const lat = -47.1 + Math.floor(i / 250) * 0.002;
    lines.push(`${lon.toFixed(4)},${lat.toFixed(4)},${(i % 40) + 1}`);
  }
  return `${lines.join("\r\n")}\r\n`;
}

test("a planner uploads a population CSV, sees progress and the preview, saves it and sees it on the map", async ({ page }) => {
  const rows = 120_000;
  await signIn(page, "planner");
  await page.getByRole("link", { name: "Layers" }).click();
  await expect(page.getByRole("heading", { name: "Layers", level: 1 })).toBeVisible();

  await page.getByLabel("Kind of layer").selectOption("population");
  await page.getByLabel("File").setInputFiles({ name: "harbour-cells.csv", mimeType: "text/csv", buffer: Buffer.from(populationCsv(rows)) });
  await expect(page.getByLabel("Layer name")).toHaveValue("harbour cells");
  await page.getByLabel("Layer name").fill("Harbour cells (browser test)");

  // Progress bars come and go quickly on one machine: record every state they pass through.
  await page.evaluate(() => {
    const seen: string[] = [];
    (window as unknown as { __progressSeen: string[] }).__progressSeen = seen;
    new MutationObserver(() => {
      for (const bar of document.querySelectorAll("[role=progressbar]")) seen.push(`${bar.getAttribute("aria-label")} ${bar.getAttribute("aria-valuenow") ?? "…"}`);
    }).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ["aria-valuenow", "aria-label"] });
  });
  await page.getByRole("button", { name: "Check file" }).click();

  const preview = page.getByTestId("upload-preview");
  await expect(preview).toBeVisible({ timeout: 30_000 });
  const seen = await page.evaluate(() => (window as unknown as { __progressSeen: string[] }).__progressSeen);
  expect(seen.some((state) => state.startsWith("Checking rows")), seen.join(" | ")).toBe(true);
  expect(seen.some((state) => /^Checking rows \d+$/.test(state) && Number(state.split(" ")[2]) > 0), seen.join(" | ")).toBe(true);

  await expect(page.getByTestId("preview-row-count")).toHaveText(rows.toLocaleString("en"));
  await expect(preview).toContainText(`All ${rows.toLocaleString("en")} rows passed the checks`);
  await expect(page.getByTestId("preview-rows").locator("tbody tr")).toHaveCount(10);
  await expect(page.getByTestId("preview-rows").locator("tbody tr").first()).toContainText("-126.4");
  await expect(preview.getByTestId("region-map")).toHaveAttribute("data-map-idle", "true", { timeout: 30_000 });
  await page.screenshot({ path: "tests/artifacts/layers-preview.png", fullPage: true });

  await page.getByRole("button", { name: "Save as a new layer" }).click();
  await expect(page).toHaveURL(/\/layers\/\d+\?v=1$/, { timeout: 30_000 });
  await expect(page.getByTestId("layer-name")).toHaveText("Harbour cells (browser test)");
  await expect(page.getByTestId("layer-versions").locator("tbody tr")).toHaveCount(1);
  await expect(page.getByTestId("layer-versions")).toContainText("harbour-cells.csv");

  const map = page.getByTestId("region-map");
  await expect(map).toHaveAttribute("data-map-idle", "true", { timeout: 30_000 });
  const drawn = await page.evaluate(() => window.__leewayMap!.queryRenderedFeatures({ layers: ["layer-points"] }).length);
  expect(drawn, "cells of the uploaded layer drawn on the map").toBeGreaterThan(100);
  await expect(page.getByText(/Layer "Harbour cells \(browser test\)" version 1 from harbour-cells\.csv/)).toBeVisible();
  await page.screenshot({ path: "tests/artifacts/layers-saved.png", fullPage: true });

  const list = await (await page.request.get("/api/layers")).json();
  const saved = list.layers.find((l: { name: string }) => l.name === "Harbour cells (browser test)");
  expect(saved.latest.rowCount).toBe(rows);

  // Leave the shared e2e database as the seed made it, for the tests that run after this one.
  await page.getByRole("button", { name: "Delete layer" }).click();
  await page.getByRole("button", { name: "Yes, delete" }).click();
  await expect(page).toHaveURL(/\/layers$/);
  await expect(page.getByTestId("layer-list")).not.toContainText("Harbour cells (browser test)");
});

test("a refused file shows its bad rows by number and saves nothing", async ({ page }) => {
  await signIn(page, "planner");
  const before = (await (await page.request.get("/api/layers")).json()).layers.length;
  await page.goto("/layers");
  await page.getByLabel("Kind of layer").selectOption("population");
  await page.getByLabel("File").setInputFiles({ name: "bad.csv", mimeType: "text/csv", buffer: Buffer.from("lon,lat,population\n-126.2,-46.9,10\n-126.1,-96.9,5\n") });
  await page.getByRole("button", { name: "Check file" }).click();
  const refused = page.getByTestId("upload-refused");
  await expect(refused).toContainText("row 3, column lat");
  await expect(refused).toContainText("must be between -90 and 90 degrees");
  await expect(page.getByRole("button", { name: "Save as a new layer" })).toHaveCount(0);
  expect((await (await page.request.get("/api/layers")).json()).layers.length).toBe(before);
});

test("a trainer sees the layers but cannot upload: the API answers 403 and nothing is written", async ({ page }) => {
  await signIn(page, "trainer");
  await page.goto("/layers");
  await expect(page.getByTestId("layer-list")).toBeVisible();
  await expect(page.getByRole("heading", { name: "Upload a layer" })).toHaveCount(0);

  const before = (await (await page.request.get("/api/layers")).json()).layers.length;
  const csv = "lon,lat,population\n-126.2,-46.9,10\n";
  const upload = await page.request.post("/api/layers?kind=population&format=csv&name=Trainer%20try&fileName=t.csv", { data: csv, headers: { "content-type": "text/csv" } });
  expect(upload.status()).toBe(403);
  expect((await upload.json()).error.message).toContain("trainer");
  const preview = await page.request.post("/api/layers/preview?kind=population&format=csv", { data: csv, headers: { "content-type": "text/csv" } });
  expect(preview.status()).toBe(403);
  expect((await (await page.request.get("/api/layers")).json()).layers.length).toBe(before);
});
