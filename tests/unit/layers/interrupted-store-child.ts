// Child process for interrupted-store.test.ts: stores a 300,000-cell population layer into the
// database file given as argv[2]. In "interrupt" mode it announces the first written chunk on
// stdout and then blocks inside the open transaction until the parent kills it.
import { connect } from "@/db/connect";
import { storeLayerVersion } from "@/db/queries/layers";
import type { ParsedLayer } from "@/lib/layers/parsed-layer";

const [dbFile, mode] = process.argv.slice(2);
const { db } = connect(`file:${dbFile}`);

const cells = 300_000;
const lon = Float64Array.from({ length: cells }, (_, i) => -126.5 + (i % 600) * 0.001);
const lat = Float64Array.from({ length: cells }, (_, i) => -47.2 + Math.floor(i / 600) * 0.001);
const layer: ParsedLayer = {
  kind: "population",
  rowCount: cells,
  bbox: [-126.5, -47.2, -125.9, -46.7],
  lon,
  lat,
  people: new Float64Array(cells).fill(2),
  fileDistricts: null,
};

async function main() {
  await storeLayerVersion({
    db,
    layer,
    target: { name: "Interrupted upload" },
    sourceFile: "interrupted.csv",
    actorId: null,
    onProgress: ({ table }) => {
      if (mode !== "interrupt" || table !== "grid_chunks") return;
      process.stdout.write("chunk-written\n");
      // Block the event loop: the transaction stays open, uncommitted, until SIGKILL arrives.
      Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 20_000);
    },
  });
  process.stdout.write("stored\n");
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
