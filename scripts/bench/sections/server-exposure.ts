/**
 * Benchmark section for exposure on the server (issue 7): a scenario version over a million
 * population cells, from its stored layer versions to the tables — the read (database → typed
 * arrays), the computation (engine over the cells, the scenario grid for the blind-zone area,
 * facilities) and the whole request path with the result stored in the cache. Cold is a fresh
 * Node process (the first request after a server start); warm is the same process again; a cache
 * hit is the answer once the result is stored. Runs on its own temporary database file; the file
 * is also the cold run's process (`node --import tsx scripts/bench/sections/server-exposure.ts cold <db> <scenarioId>`).
 */
import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { connect, type Database } from "@/db/connect";
import { readWorkspaceExposureSettings, storeCachedResult } from "@/db/queries/exposure";
import { storeLayerVersion } from "@/db/queries/layers";
import { facilities, layers, layerVersions, scenarios, scenarioVersions } from "@/db/schema";
import { computeExposureResult } from "@/lib/exposure/compute-exposure";
import { exposureOf, loadInputs, loadVersion, versionCacheKey } from "@/lib/exposure/service";
import { columnLonDeg, gridGeometry, rowLatDeg } from "@/lib/geo";
import { benchScenario } from "../scenarios";
import type { BenchFigure, BenchSection } from "../section";

const THIS_FILE = "scripts/bench/sections/server-exposure.ts";
const SIDE = 1000;
const WARM_RUNS = 3;

interface Timings {
  readMs: number;
  computeMs: number;
  storeMs: number;
}

/** One uncached request path: read the version's layers, compute, store in the cache. */
async function requestPath(db: Database, scenarioId: number): Promise<Timings> {
  const t0 = performance.now();
  const version = await loadVersion({ scenarioId, number: 1, db });
  const settings = await readWorkspaceExposureSettings({ db });
  const inputs = await loadInputs(version, settings, { db, now: new Date() });
  const t1 = performance.now();
  const result = computeExposureResult(inputs);
  const t2 = performance.now();
  await storeCachedResult({ key: versionCacheKey("exposure:", version, settings), replaces: "exposure:", scenarioVersionId: version.row.id, result, db });
  return { readMs: t1 - t0, computeMs: t2 - t1, storeMs: performance.now() - t2 };
}

/** Writes the benchmark's scenario version: a million people on a 1,000 × 1,000 lattice, ten districts, fifty schools and a rail line. */
async function seed(db: Database): Promise<number> {
  // The scenario grid (blind-zone area) at 2 km cells over 300 km; population cells every 0.3 km.
  const scenario = benchScenario({ side: 150, cellKm: 2 });
  const lattice = gridGeometry(scenario.area.bbox, (150 * 2) / SIDE);
  const cells = lattice.width * lattice.height;
  const lon = new Float64Array(cells);
  const lat = new Float64Array(cells);
  const people = new Float64Array(cells);
  const index = new Int32Array(cells);
  for (let r = 0; r < lattice.height; r++) {
    for (let c = 0; c < lattice.width; c++) {
      const i = r * lattice.width + c;
      lon[i] = columnLonDeg(lattice, c);
      lat[i] = rowLatDeg(lattice, r);
      people[i] = (i * 7919) % 3;
      index[i] = Math.floor((c * 10) / lattice.width);
    }
  }
  const names = Array.from({ length: 10 }, (_, k) => `Bench district ${k + 1}`);
  const stored = await storeLayerVersion({
    db,
    layer: { kind: "population", rowCount: cells, bbox: scenario.area.bbox, lon, lat, people, fileDistricts: { index, names } },
    target: { name: "Bench population" },
    sourceFile: "generated",
    actorId: null,
  });
  const [layer] = await db.insert(layers).values({ kind: "facilities", name: "Bench facilities" }).returning({ id: layers.id });
  const [version] = await db.insert(layerVersions).values({ layerId: layer.id, number: 1, rowCount: 51 }).returning({ id: layerVersions.id });
  const [w, s, e, n] = scenario.area.bbox;
  await db.insert(facilities).values([
    ...Array.from({ length: 50 }, (_, k) => ({
      layerVersionId: version.id,
      name: `Bench school ${k + 1}`,
      kind: "school" as const,
      geometry: { type: "Point", coordinates: [w + ((e - w) * ((k * 37) % 50)) / 50, s + ((n - s) * ((k * 11) % 50)) / 50] },
    })),
    { layerVersionId: version.id, name: "Bench line", kind: "rail" as const, geometry: { type: "LineString", coordinates: [[w + 0.1, s + 0.1], [e - 0.1, n - 0.1]] } },
  ]);
  const [row] = await db.insert(scenarios).values({ name: "Bench coast" }).returning({ id: scenarios.id });
  await db.insert(scenarioVersions).values({ scenarioId: row.id, number: 1, params: scenario, layerVersions: { population: stored.layerVersionId, facilities: version.id } });
  return row.id;
}

async function runServerExposure(): Promise<BenchFigure[]> {
  const dbFile = path.join(tmpdir(), `leeway-bench-exposure-${randomBytes(6).toString("hex")}.db`);
  const { db, client } = connect(`file:${dbFile}`);
  try {
    await migrate(db, { migrationsFolder: "db/migrations" });
    const scenarioId = await seed(db);

    const child = spawnSync(process.execPath, ["--import", "tsx", THIS_FILE, "cold", dbFile, String(scenarioId)], { encoding: "utf8" });
    if (child.status !== 0) throw new Error(`cold run failed: ${child.stderr}`);
    const cold = JSON.parse(child.stdout) as Timings;

    let warm: Timings = { readMs: Infinity, computeMs: Infinity, storeMs: Infinity };
    for (let run = 0; run < WARM_RUNS; run++) {
      const t = await requestPath(db, scenarioId);
      if (t.readMs + t.computeMs < warm.readMs + warm.computeMs) warm = t;
    }
    const hitStarted = performance.now();
    const hit = await exposureOf(await loadVersion({ scenarioId, number: 1, db }), { db });
    const hitMs = performance.now() - hitStarted;
    if (!hit.cached) throw new Error("the stored result was not found in the cache");

    const cells = `${(SIDE * SIDE).toLocaleString("en")} population cells`;
    const split = (t: Timings) => `read ${t.readMs.toFixed(0)} ms + compute ${t.computeMs.toFixed(0)} ms + cache write ${t.storeMs.toFixed(0)} ms`;
    return [
      { label: `exposure of ${cells}, cold (fresh process)`, ms: cold.readMs + cold.computeMs + cold.storeMs, targetMs: 1000, note: split(cold) },
      { label: `exposure of ${cells}, warm`, ms: warm.readMs + warm.computeMs + warm.storeMs, targetMs: 1000, note: `fastest of ${WARM_RUNS}: ${split(warm)}` },
      { label: `exposure of ${cells}, served from the result cache`, ms: hitMs, note: "key check, JSON parse and schema check" },
    ];
  } finally {
    client.close();
    for (const suffix of ["", "-journal", "-wal", "-shm"]) rmSync(`${dbFile}${suffix}`, { force: true });
  }
}

/** Exposure tables on the server from stored layers (issue 7). */
export const serverExposureSection: BenchSection = {
  id: "server-exposure",
  title: "Exposure on the server: 1 M stored population cells to tables, cold, warm and cached",
  run: runServerExposure,
};

// Run as the cold run's fresh process.
if (process.argv[1]?.endsWith(THIS_FILE) && process.argv[2] === "cold") {
  const { db } = connect(`file:${process.argv[3]}`);
  requestPath(db, Number(process.argv[4]))
    .then((timings) => process.stdout.write(JSON.stringify(timings)))
    .catch((error: unknown) => {
      console.error(error);
      process.exit(1);
    });
}
