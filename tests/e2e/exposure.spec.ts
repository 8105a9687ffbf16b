import { readFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { openE2eDatabase } from "./support/outbox";
import { signIn } from "./support/session";

/**
 * Issue 7: exposure tables with CSV export, the council summary of the published demo scenario,
 * and a comparison of today's network with one of five added stations. The comparison uses a
 * scenario of its own, made through the API and removed afterwards, so the demo stays as seeded.
 */
const COMPARISON_NAME = "Five more stations (browser test)";
const DEMO_PEOPLE = 1_000_000;
const db = openE2eDatabase();

test.afterAll(async () => {
  await db.execute({ sql: "delete from scenarios where name = ?", args: [COMPARISON_NAME] });
  db.close();
});

/** The demo scenario whose name contains `text`, as the API lists it. */
async function demoScenario(page: Page, text: string): Promise<{ id: number; name: string; latest: { number: number } }> {
  const list = (await (await page.request.get("/api/scenarios")).json()) as { scenarios: { id: number; name: string; latest: { number: number } }[] };
  const found = list.scenarios.find((s) => s.name.includes(text));
  if (!found) throw new Error(`no demo scenario named like "${text}" in ${list.scenarios.map((s) => s.name).join(", ")}`);
  return found;
}

/** The figure a table cell shows, as a number ("1,000,000" → 1000000). */
const number = (text: string | null) => Number((text ?? "").replace(/[^\d.-]/g, ""));

test("a planner opens the exposure tables of a demo scenario and exports one as CSV", async ({ page }) => {
  await signIn(page, "planner");
  const scenario = await demoScenario(page, "Mw 6.9");
  await page.goto(`/scenarios/${scenario.id}/exposure?v=${scenario.latest.number}`);
  await expect(page.getByTestId("headline-figures")).toBeVisible();
  const table = page.getByTestId("class-band-table");
  await expect(table.getByRole("table")).toBeVisible();
  // The totals row: its last cell is everyone in the layer.
  await expect(table.locator("tfoot td").last()).toHaveText("1,000,000");
  await expect(table.getByTestId("provenance")).toContainText("How it was made: Leeway");

  // Sorting by the total puts the class with most people first.
  await table.getByRole("button", { name: /^Total/ }).click();
  const totals = await table.locator("tbody tr td:last-child").allTextContents();
  expect(totals.map(number)).toEqual([...totals.map(number)].sort((a, b) => b - a));

  const downloading = page.waitForEvent("download");
  await table.getByRole("link", { name: "Download CSV" }).click();
  const download = await downloading;
  expect(download.suggestedFilename()).toMatch(/^leeway-exposure-\d+-v\d+-class-band\.csv$/);
  const lines = readFileSync((await download.path())!, "utf8").split("\r\n");
  expect(lines[0]).toMatch(/^# Scenario results are planning estimates/);
  expect(lines[1]).toMatch(/^# How it was made: Leeway/);
  const totalRow = lines.find((line) => line.startsWith("total,"))!;
  expect(Number(totalRow.split(",").at(-1))).toBe(DEMO_PEOPLE);
  await page.screenshot({ path: "tests/artifacts/exposure-tables.png", fullPage: true });
});

test("a council member opens the council summary of the published scenario and sees the headline figures and the chart", async ({ page }) => {
  await signIn(page, "council");
  const scenario = await demoScenario(page, "Mw 8.4");
  await page.goto(`/scenarios/${scenario.id}/council?v=${scenario.latest.number}`);
  const headline = page.getByTestId("headline-figures");
  await expect(headline.locator("dd")).toHaveCount(3);
  await expect(headline).toContainText("People in the blind zone");
  await expect(headline).toContainText("People alerted 10 s or more before the shaking");
  await expect(headline).toContainText("Facilities where a protective action does not fit");
  const chart = page.getByTestId("class-band-chart");
  await expect(chart.locator("svg rect").first()).toBeVisible();
  expect(await chart.locator("svg g[data-category] rect").count()).toBeGreaterThan(2);
  await expect(page.getByTestId("council-map").locator("path").first()).toBeVisible();
  await expect(page.getByTestId("glossary")).toContainText("Blind zone");
  await expect(page.getByTestId("caution").first()).toBeVisible();
  await page.screenshot({ path: "tests/artifacts/council-summary.png", fullPage: true });
  // On paper: A4, the navigation and buttons left out.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("button", { name: "Print (A4)" })).toBeHidden();
  const pdf = await page.pdf({ format: "A4", preferCSSPageSize: true, path: "tests/artifacts/council-summary.pdf" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});

test("today's network against one with five added stations shows a smaller blind zone", async ({ page }) => {
  await signIn(page, "planner");
  // The offshore trench source: today's nearest stations are on the coast, so stations at sea gain seconds.
  const demo = await demoScenario(page, "Mw 8.4");
  const version = (await (await page.request.get(`/api/scenarios/${demo.id}/versions/${demo.latest.number}`)).json()) as {
    version: { params: { source: { lon: number; lat: number }; stations: { id: string; lon: number; lat: number }[] } };
  };
  const today = version.version.params;
  const created = await page.request.post("/api/scenarios", { data: { name: COMPARISON_NAME, scenario: today } });
  expect(created.status()).toBe(201);
  const { scenario } = (await created.json()) as { scenario: { id: number } };

  // Five stations 4–12 km around the epicentre (about 0.04–0.11° of latitude), on the sea floor.
  const added = Array.from({ length: 5 }, (_, k) => {
    const angle = (2 * Math.PI * k) / 5;
    const deg = 0.04 + 0.017 * k;
    return { id: `ADD${k + 1}`, lon: today.source.lon + (deg * Math.cos(angle)) / Math.cos((today.source.lat * Math.PI) / 180), lat: today.source.lat + deg * Math.sin(angle) };
  });
  const saved = await page.request.post(`/api/scenarios/${scenario.id}/versions`, {
    data: { scenario: { ...today, stations: [...today.stations, ...added] }, note: "five added stations", basedOn: 1 },
  });
  expect(saved.status()).toBe(201);
  const { version: second } = (await saved.json()) as { version: { number: number } };

  await page.goto(`/compare?a=${scenario.id}:1&b=${scenario.id}:${second.number}`);
  const area = page.getByTestId("compare-area");
  await expect(area).toBeVisible();
  const valueOf = async (row: string, side: "a" | "b") => Number(await page.getByTestId(row).locator(`td[data-side="${side}"]`).getAttribute("data-value"));
  expect(await valueOf("compare-area", "b")).toBeLessThan(await valueOf("compare-area", "a"));
  expect(await valueOf("compare-blind", "b")).toBeLessThanOrEqual(await valueOf("compare-blind", "a"));
  // The matrix's totals close on everyone in the layer.
  await expect(page.getByTestId("transition-matrix").locator("tfoot td").last()).toHaveText("1,000,000");
  // Everyone's alert comes sooner, so the map shows gains and no losses.
  const bands = await page.getByTestId("seconds-gained-map").locator("path[data-band]").evaluateAll((paths) => paths.map((p) => p.getAttribute("data-band")));
  expect(bands.length).toBeGreaterThan(0);
  expect(bands.every((band) => band?.startsWith("gains"))).toBe(true);
  await page.screenshot({ path: "tests/artifacts/compare-added-stations.png", fullPage: true });
});
