// Bundles the command-line entry point into one ES module so `npm run leeway` starts fast
// (no TypeScript compilation at run time). Runs on `npm ci` through the `prepare` script, and
// from scripts/run-cli.mjs when the bundle is older than its sources.
import { build } from "esbuild";
import { existsSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const entry = join(root, "scripts/cli/main.ts");
if (!existsSync(entry)) {
  console.error(`bundle-cli: ${entry} not found; nothing to bundle`);
  process.exit(0);
}
await build({
  absWorkingDir: root,
  entryPoints: [entry],
  outfile: join(root, "dist/cli/leeway.mjs"),
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  logLevel: "warning",
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
});
