import { Worker } from "node:worker_threads";
import { benchScenario, squareArea } from "../scenarios";
import type { BenchFigure, BenchSection } from "../section";

/** Preview requests in one timed run: a drag of the epicentre in small steps, as the map sends them. */
const UPDATES = 40;
/** The map's preview grid: 200 × 200 cells (lib/workspace/preview-area.ts) over 300 km. */
const PREVIEW_SIDE = 200;
const PREVIEW_CELL_KM = 1.5;

/** A worker thread running worker-host.mts through tsx (see worker-bootstrap.mjs). */
function startWorker(): Promise<Worker> {
  const worker = new Worker(new URL("../worker-bootstrap.mjs", import.meta.url));
  return new Promise((resolve, reject) => {
    worker.once("error", reject);
    worker.once("message", () => resolve(worker));
  });
}

/** Sends one request and waits for its answer (the map keeps one in flight at a time). */
function ask(worker: Worker, message: { id: number }): Promise<{ ok: boolean }> {
  return new Promise((resolve) => {
    const onMessage = (response: { id: number; ok: boolean }) => {
      if (response.id !== message.id) return;
      worker.off("message", onMessage);
      resolve(response);
    };
    worker.on("message", onMessage);
    worker.postMessage(message);
  });
}

/** Median ms per preview update over `UPDATES` steps of 0.5 km, after one unmeasured drag. */
async function msPerUpdate(worker: Worker, velocity: "iasp91" | "homogeneous"): Promise<number> {
  const scenario = benchScenario({ side: PREVIEW_SIDE, cellKm: PREVIEW_CELL_KM, velocity });
  const area = squareArea(PREVIEW_SIDE, PREVIEW_CELL_KM);
  let id = 0;
  const drag = async () => {
    const start = performance.now();
    for (let step = 0; step < UPDATES; step++) {
      const source = { ...scenario.source, lon: scenario.source.lon + step * 0.006 };
      const response = await ask(worker, { id: ++id, kind: "grid", scenario: { ...scenario, source }, bbox: area.bbox, cellKm: area.cellKm, maxCells: PREVIEW_SIDE * PREVIEW_SIDE, contours: true, detail: false } as { id: number });
      if (!response.ok) throw new Error(`the worker refused the benchmark scenario: ${JSON.stringify(response)}`);
    }
    return (performance.now() - start) / UPDATES;
  };
  await drag();
  const runs = [await drag(), await drag(), await drag()].sort((a, b) => a - b);
  return runs[1];
}

export const workerSection: BenchSection = {
  id: "worker",
  title: "Map preview: the engine worker module under worker_threads, 200 × 200 cells with contours, one update after another",
  async run(): Promise<BenchFigure[]> {
    const worker = await startWorker();
    try {
      const figures: BenchFigure[] = [];
      for (const velocity of ["iasp91", "homogeneous"] as const) {
        const ms = await msPerUpdate(worker, velocity);
        figures.push({ label: `one preview update, ${velocity} (message in, grid and contours out)`, ms, targetMs: 50, note: `${(1000 / ms).toFixed(1)} updates per second (target ≥ 20)` });
      }
      return figures;
    } finally {
      await worker.terminate();
    }
  },
};
