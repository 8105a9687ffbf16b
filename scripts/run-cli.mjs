// Runs the bundled CLI (dist/cli/leeway.mjs), rebuilding it first when it is missing or older
// than any engine or CLI source, so `npm run leeway` works right after `npm ci` or an edit.
import { existsSync, readdirSync, statSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const bundle = join(root, "dist/cli/leeway.mjs");
const sources = ["lib/geo", "lib/scenario", "lib/caution.ts", "scripts/cli", "package.json"].map((p) => join(root, p));

function newestMtimeMs(path) {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtimeMs(join(path, entry)));
  return newest;
}

const bundleMtimeMs = existsSync(bundle) ? statSync(bundle).mtimeMs : 0;
if (bundleMtimeMs < Math.max(...sources.map(newestMtimeMs))) {
  await import(pathToFileURL(join(root, "scripts/bundle-cli.mjs")).href);
}
await import(pathToFileURL(bundle).href);
