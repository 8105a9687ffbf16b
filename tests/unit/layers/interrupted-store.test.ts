import { spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { connect } from "@/db/connect";

const CHILD = "tests/unit/layers/interrupted-store-child.ts";
let dbFile: string;

beforeEach(async () => {
  dbFile = path.join(tmpdir(), `leeway-interrupt-${randomBytes(6).toString("hex")}.db`);
  const { db, client } = connect(`file:${dbFile}`);
  await migrate(db, { migrationsFolder: "db/migrations" });
  client.close();
});

afterEach(() => {
  for (const suffix of ["", "-journal", "-wal", "-shm"]) rmSync(`${dbFile}${suffix}`, { force: true });
});

/** Runs the child store; in "interrupt" mode SIGKILLs it once it reports a chunk written inside its transaction. */
function runChild(mode: "interrupt" | "complete"): Promise<{ output: string; signal: NodeJS.Signals | null }> {
  return new Promise((resolve, reject) => {
    // `--import tsx` runs the script in this very process (the tsx CLI would put it in a grandchild that SIGKILL misses).
    const child = spawn(process.execPath, ["--import", "tsx", CHILD, dbFile, mode], { stdio: ["ignore", "pipe", "inherit"] });
    let output = "";
    child.stdout.on("data", (data: Buffer) => {
      output += data.toString();
      if (mode === "interrupt" && output.includes("chunk-written")) child.kill("SIGKILL");
    });
    child.on("error", reject);
    child.on("exit", (_code, signal) => resolve({ output, signal }));
  });
}

async function counts() {
  const { client } = connect(`file:${dbFile}`);
  const result: Record<string, number> = {};
  for (const table of ["layers", "layer_versions", "grid_chunks", "audit_log"]) {
    result[table] = Number((await client.execute(`select count(*) as n from ${table}`)).rows[0].n);
  }
  client.close();
  return result;
}

describe("an upload killed mid-store", () => {
  it("leaves no partial layer: the killed process's transaction is rolled back", async () => {
    const { output, signal } = await runChild("interrupt");
    expect(signal).toBe("SIGKILL");
    expect(output).toContain("chunk-written");
    expect(output).not.toContain("stored");
    // SQLite left a hot journal behind; the next connection rolls it back ("Atomic Commit In SQLite", sqlite.org, hot rollback journals; section from memory).
    expect(existsSync(`${dbFile}-journal`)).toBe(true);
    expect(await counts()).toEqual({ layers: 0, layer_versions: 0, grid_chunks: 0, audit_log: 0 });
  }, 60_000);

  it("stores the whole layer when not interrupted (the same child, so the test above is not vacuous)", async () => {
    const { output } = await runChild("complete");
    expect(output).toContain("stored");
    // 300,000 cells in chunks of 65,536: five chunks.
    expect(await counts()).toEqual({ layers: 1, layer_versions: 1, grid_chunks: 5, audit_log: 1 });
  }, 60_000);
});
