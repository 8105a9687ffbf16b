import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { benchScenario } from "../scenarios";
import type { BenchFigure, BenchSection } from "../section";

/** Wall time (ms) of a child process, fastest of `runs` (see `fastestMs`). */
function wallMs(command: string, args: string[], runs = 5): number {
  let fastest = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    const result = spawnSync(command, args, { encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
    if (result.status !== 0) throw new Error(`${command} ${args.join(" ")} failed: ${result.stderr}`);
    fastest = Math.min(fastest, performance.now() - start);
  }
  return fastest;
}

export const cliSection: BenchSection = {
  id: "cli",
  title: "Command line as a child process",
  run(): BenchFigure[] {
    const dir = mkdtempSync(join(tmpdir(), "leeway-bench-"));
    const files = (["iasp91", "homogeneous"] as const).map((velocity) => {
      const path = join(dir, `${velocity}.json`);
      writeFileSync(path, JSON.stringify(benchScenario({ side: 2000, cellKm: 0.25, velocity })));
      return [velocity, path] as const;
    });
    const sites = join(dir, "sites.csv");
    writeFileSync(sites, "id,lon,lat\nA,-129.8,-40.1\n");
    spawnSync(process.execPath, ["scripts/bundle-cli.mjs"]);
    const node = (args: string[]) => wallMs(process.execPath, ["scripts/run-cli.mjs", ...args]);
    const npm = (args: string[]) => wallMs("npm", ["run", "--silent", "leeway", "--", ...args]);
    return [
      { label: "node scripts/run-cli.mjs sites (1 site): start to exit", ms: node(["sites", "--scenario", files[0][1], "--sites", sites]), targetMs: 300 },
      { label: "npm run --silent leeway -- sites (1 site)", ms: npm(["sites", "--scenario", files[0][1], "--sites", sites]), note: "includes npm's own start" },
      { label: "npm itself (npm --version)", ms: wallMs("npm", ["--version"]), note: "for scale: npm's own start" },
      ...files.map(([velocity, path]) => ({
        label: `npm run --silent leeway -- grid, 2,000 × 2,000 cells, ${velocity}`,
        ms: wallMs("npm", ["run", "--silent", "leeway", "--", "grid", "--scenario", path], 3),
        note: "summary on 4 M cells, contours on ≤ 1 M",
      })),
    ];
  },
};
