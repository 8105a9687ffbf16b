import { expect, type Locator, type Page } from "@playwright/test";

/** The scenario map workspace, by intent: what a planner does and reads there. */
export class WorkspacePage {
  readonly map: Locator;
  readonly summary: Locator;

  constructor(readonly page: Page) {
    this.map = page.getByTestId("region-map");
    this.summary = page.getByTestId("results-summary");
  }

  async open(scenarioId: number, version?: number) {
    await this.page.goto(`/scenarios/${scenarioId}${version ? `?v=${version}` : ""}`);
    await this.waitForFullResults();
  }

  /** Waits until the map has drawn and the full grid (not a preview) of the current draft is shown. */
  async waitForFullResults() {
    await expect(this.map).toHaveAttribute("data-map-idle", "true", { timeout: 30_000 });
    await expect(this.summary).toHaveAttribute("data-kind", "full", { timeout: 30_000 });
    await expect(this.summary).toHaveAttribute("data-busy", "false", { timeout: 30_000 });
  }

  async tab(name: "source" | "stations" | "alert" | "site" | "replay") {
    await this.page.getByTestId(`tab-${name}`).click();
  }

  /** Screen position (CSS px, page coordinates) of a lon/lat on the map. */
  async screenPoint(lon: number, lat: number): Promise<{ x: number; y: number }> {
    const box = (await this.map.boundingBox())!;
    const p = await this.page.evaluate(([x, y]) => window.__leewayMap!.project([x, y]), [lon, lat] as const);
    return { x: box.x + p.x, y: box.y + p.y };
  }

  /** Drags the epicentre handle by (dx, dy) px in `steps` mouse moves, checking that a preview is drawn on the way. */
  async dragSource(from: { lon: number; lat: number }, dx: number, dy: number, steps = 24) {
    const start = await this.screenPoint(from.lon, from.lat);
    await this.page.mouse.move(start.x, start.y);
    await this.page.mouse.down();
    for (let i = 1; i <= steps; i++) {
      await this.page.mouse.move(start.x + (dx * i) / steps, start.y + (dy * i) / steps);
      if (i === Math.floor(steps / 2)) await expect(this.summary).toHaveAttribute("data-kind", "preview", { timeout: 10_000 });
    }
    await this.page.mouse.up();
    await this.waitForFullResults();
  }

  /** The GeoJSON the map holds for a result source (e.g. "result-warning"), as text. */
  async sourceData(sourceId: string): Promise<string> {
    return this.page.evaluate(async (id) => {
      const source = window.__leewayMap!.getSource(id) as unknown as { getData(): Promise<unknown> };
      return JSON.stringify(await source.getData());
    }, sourceId);
  }

  async blindZoneAreaKm2(): Promise<number> {
    return Number(await this.page.getByTestId("summary-blind-zone-km2").textContent());
  }

  async fieldValue(testId: string): Promise<number> {
    return Number(await this.page.getByTestId(testId).inputValue());
  }

  async fill(testId: string, value: number | string) {
    await this.page.getByTestId(testId).fill(String(value));
  }

  /** Starts recording long main-thread tasks (PerformanceObserver, "longtask"). */
  async startLongTaskRecording() {
    await this.page.evaluate(() => {
      const w = window as unknown as { __longTasksMs: number[] };
      w.__longTasksMs = [];
      new PerformanceObserver((list) => {
        for (const entry of list.getEntries()) w.__longTasksMs.push(entry.duration);
      }).observe({ type: "longtask" });
    });
  }

  /** Durations of the long main-thread tasks (≥ 50 ms) since recording started, ms. */
  async longTasksMs(): Promise<number[]> {
    return this.page.evaluate(() => (window as unknown as { __longTasksMs: number[] }).__longTasksMs);
  }
}
