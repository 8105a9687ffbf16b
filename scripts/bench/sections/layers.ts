/**
 * Benchmark section for layers (issue 6):
 *  - a 200,000-row population CSV decoded, checked and stored (districts placed by point-in-polygon), limit 10 s;
 *  - a million population cells read back into typed arrays, cold (a fresh Node process, as the first
 *    request after a server start) and warm (the same process again), limit "well under a second".
 * Runs on its own temporary database file. The file is also the fresh process of the cold read
 * (`node --import tsx scripts/bench/sections/layers.ts cold-read <db> <layerVersionId>`).
 */
import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { connect } from "@/db/connect";
import { readGridLayer, storeLayerVersion } from "@/db/queries/layers";
import { decodeLayerFile } from "@/lib/layers/decode";
import type { ParsedLayer } from "@/lib/layers/parsed-layer";
import { readLayerFile } from "@/lib/layers/read-layer-file";
import type { BenchFigure, BenchSection } from "../section";

const THIS_FILE = "scripts/bench/sections/layers.ts";
const CSV_ROWS = 200_000;
const READ_CELLS = 1_000_000;
const WARM_RUNS = 5;

/** A row-ordered grid of `cells` cells, 0.005° apart, 500 to a row, over the invented region. */
function gridCoordinates(cells: number) {
  const lon = new Float64Array(cells);
  const lat = new Float64Array(cells);
  for (let i = 0; i < cells; i++) {
    lon[i] = -127.5 + (i % 500) * 0.005;
    lat[i] = -48 + Math.floor(i / 500) * 0.005;
  }
  return { lon, lat };
}

function populationCsv(rows: number): Uint8Array {
  const { lon, lat } = gridCoordinates(rows);
  const lines = ["lon,lat,population"];
  for (let i = 0; i < rows; i++) lines.push(`${lon[i].toFixed(5)},${lat[i].toFixed(5)},${(i * 7) % 900}`);
  return Buffer.from(`${lines.join("\n")}\n`);
}

/** Twelve rectangular districts, 4 × 3, tiling the grid's extent: the point-in-polygon step runs as it would. */
function districtsGeojson(): Uint8Array {
  const features = [];
  for (let row = 0; row < 3; row++) {
    for (let column = 0; column < 4; column++) {
      const west = -127.6 + column * 0.7;
      const south = -48.1 + row * 0.8;
      const ring = [[west, south], [west + 0.7, south], [west + 0.7, south + 0.8], [west, south + 0.8], [west, south]];
      features.push({ type: "Feature", properties: { name: `Bench district ${row * 4 + column + 1}` }, geometry: { type: "Polygon", coordinates: [ring] } });
    }
  }
  return Buffer.from(JSON.stringify({ type: "FeatureCollection", features }));
}

async function timed<T>(work: () => Promise<T>): Promise<{ value: T; ms: number }> {
  const started = performance.now();
  const value = await work();
  return { value, ms: performance.now() - started };
}

/** Reads one grid layer version in a fresh process and prints the milliseconds from opening the database to typed arrays. */
async function coldRead(dbFile: string, layerVersionId: number) {
  const started = performance.now();
  const { db } = connect(`file:${dbFile}`);
  const grid = await readGridLayer({ db, layerVersionId });
  process.stdout.write(JSON.stringify({ ms: performance.now() - started, cells: grid.lon.length }));
}

/** Runs the layer benchmarks on a temporary database and returns the figures. */
async function runLayerBenchmarks(): Promise<BenchFigure[]> {
  const dbFile = path.join(tmpdir(), `leeway-bench-layers-${randomBytes(6).toString("hex")}.db`);
  const { db, client } = connect(`file:${dbFile}`);
  const results: BenchFigure[] = [];
  try {
    await migrate(db, { migrationsFolder: "db/migrations" });
    const districts = await readLayerFile("districts", "geojson", decodeLayerFile("districts", districtsGeojson()));
    await storeLayerVersion({ db, layer: districts, target: { name: "Bench districts" }, sourceFile: "bench.geojson", actorId: null });

    const csv = populationCsv(CSV_ROWS);
    const checked = await timed(async () => readLayerFile("population", "csv", decodeLayerFile("population", csv)));
    const stored = await timed(() => storeLayerVersion({ db, layer: checked.value, target: { name: "Bench CSV" }, sourceFile: "bench.csv", actorId: null }));
    results.push({
      label: `population CSV, ${CSV_ROWS.toLocaleString("en")} rows: checked and stored`,
      ms: checked.ms + stored.ms,
      targetMs: 10_000,
      note: `${(csv.byteLength / 1e6).toFixed(1)} MB; check ${checked.ms.toFixed(0)} ms, store with district placement ${stored.ms.toFixed(0)} ms`,
    });

    const { lon, lat } = gridCoordinates(READ_CELLS);
    const million: ParsedLayer = {
      kind: "population",
      rowCount: READ_CELLS,
      bbox: [-127.5, -48, -125.005, -44.005],
      lon,
      lat,
      people: Float64Array.from({ length: READ_CELLS }, (_, i) => i % 300),
      fileDistricts: null,
    };
    const big = await storeLayerVersion({ db, layer: million, target: { name: "Bench million" }, sourceFile: "generated", actorId: null });

    const child = spawnSync(process.execPath, ["--import", "tsx", THIS_FILE, "cold-read", dbFile, String(big.layerVersionId)], { encoding: "utf8" });
    if (child.status !== 0) throw new Error(`cold read failed: ${child.stderr}`);
    const cold = JSON.parse(child.stdout) as { ms: number; cells: number };
    results.push({ label: "1,000,000 population cells into typed arrays, cold", ms: cold.ms, targetMs: 1000, note: "fresh process: open the database, query, unpack" });

    await readGridLayer({ db, layerVersionId: big.layerVersionId });
    const warm: number[] = [];
    for (let run = 0; run < WARM_RUNS; run++) warm.push((await timed(() => readGridLayer({ db, layerVersionId: big.layerVersionId }))).ms);
    warm.sort((a, b) => a - b);
    results.push({
      label: "1,000,000 population cells into typed arrays, warm",
      ms: warm[Math.floor(WARM_RUNS / 2)],
      targetMs: 1000,
      note: `median of ${WARM_RUNS} (fastest ${warm[0].toFixed(0)} ms, slowest ${warm[WARM_RUNS - 1].toFixed(0)} ms)`,
    });
    return results;
  } finally {
    client.close();
    for (const suffix of ["", "-journal", "-wal", "-shm"]) rmSync(`${dbFile}${suffix}`, { force: true });
  }
}

/** Layer uploads and grid reads (issue 6). */
export const layersSection: BenchSection = {
  id: "layers",
  title: "Layers: population CSV upload, grid read-back",
  run: runLayerBenchmarks,
};

// Run as the cold read's fresh process.
if (process.argv[1]?.endsWith(THIS_FILE) && process.argv[2] === "cold-read") {
  coldRead(process.argv[3], Number(process.argv[4])).catch((error: unknown) => {
    console.error(error);
    process.exit(1);
  });
}
