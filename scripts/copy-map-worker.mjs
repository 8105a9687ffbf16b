// Files the map needs served by the app itself, copied into public/ before build or dev (both are
// gitignored): MapLibre's worker, which fails to load from the bundle under Next, and the label fonts
// the map style's `font-faces` points at (lib/map/fonts.ts), from fonts/.
import { copyFileSync, mkdirSync, readdirSync } from "node:fs";

copyFileSync("node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs", "public/maplibre-gl-worker.mjs");

mkdirSync("public/map-fonts", { recursive: true });
for (const file of readdirSync("fonts").filter((name) => name.endsWith(".woff2"))) {
  copyFileSync(`fonts/${file}`, `public/map-fonts/${file}`);
}
