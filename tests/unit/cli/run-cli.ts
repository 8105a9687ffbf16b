/** Runs Leeway's CLI as a child process (the bundled entry point, as `npm run leeway` does). */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

/** Builds the bundle once so test timings do not include it. */
export function bundleCli(): void {
  execFileSync(process.execPath, ["scripts/bundle-cli.mjs"], { stdio: "inherit" });
}

/** Runs `leeway <args>` and returns its exit status and output. */
export function runCli(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, ["scripts/run-cli.mjs", ...args], { encoding: "utf8" });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Writes `content` to a new temporary file and returns its path. */
export function tempFile(name: string, content: string): string {
  const dir = mkdtempSync(join(tmpdir(), "leeway-cli-"));
  const path = join(dir, name);
  writeFileSync(path, content);
  return path;
}
