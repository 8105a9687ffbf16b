// The app harness for route-level unit tests: a real libSQL database file with the committed
// migrations, a fixture of one person per role and a scenario in every state, and next-auth's
// session replaced by whoever the test signs in as. Import it before any app module:
//
//   import { app } from "../support/app";
//   beforeEach(() => app.reset());
//   app.signInAs("planner");
import "./test-env";
import { rmSync } from "node:fs";
import bcrypt from "bcryptjs";
import { sql } from "drizzle-orm";
import { migrate } from "drizzle-orm/libsql/migrator";
import { afterAll, vi } from "vitest";
import type { SMTPServer } from "smtp-server";
import { client, db } from "@/db/client";
import { layers, layerVersions, outbox, scenarios, scenarioVersions, users, type Role, type User } from "@/db/schema";
import { createFakeSmtpServer } from "@/lib/mail/fake-smtp-server";
import { TEST_DATABASE_FILE } from "./test-env";

/** Who a call is made as: one of the fixture's people by role, a given person, or no session. */
export type Caller = Role | "none" | { user: User };

interface SessionHolder {
  session: { user: { id: number; role: Role; tokenVersion: number; name: string; email: string }; expires: string } | null;
}
const holder: SessionHolder = { session: null };

vi.mock("next-auth", async (importOriginal) => ({
  ...(await importOriginal<typeof import("next-auth")>()),
  getServerSession: async () => holder.session,
}));
// Outside a Next request there is no cache to revalidate.
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn(), updateTag: vi.fn(), refresh: vi.fn() }));

/** The fixture's password for every person, so tests can sign in through the credentials check. */
export const FIXTURE_PASSWORD = "fixture-password-1";
let fixtureHash: string | undefined;

/** The scenario the fixture holds: version 1 draft, 2 shared for exercises, 3 published. */
export const FIXTURE_SCENARIO_PARAMS = {
  version: 1,
  name: "Harbour test",
  source: { lon: 150.2, lat: -30.1, depthKm: 20, mw: 7.1, faultType: "crustal" },
  stations: [
    { id: "S1", lon: 150.0, lat: -30.0 },
    { id: "S2", lon: 150.4, lat: -30.2 },
    { id: "S3", lon: 150.3, lat: -29.9, operating: false },
  ],
};

export interface Fixture {
  people: Record<Role, User>;
  scenarioId: number;
  versions: { draft: number; shared: number; published: number };
  populationLayerVersionId: number;
}

let migrated = false;
let current: Fixture | undefined;
let mailServer: SMTPServer | undefined;

async function wipe() {
  const tables = await client.execute(
    "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%'",
  );
  await client.execute("pragma foreign_keys = off");
  await client.batch(
    [...tables.rows.map((row) => `delete from "${String(row.name)}"`), "delete from sqlite_sequence"],
    "write",
  );
  await client.execute("pragma foreign_keys = on");
}

async function insertFixture(): Promise<Fixture> {
  fixtureHash ??= await bcrypt.hash(FIXTURE_PASSWORD, 4);
  const rows = await db
    .insert(users)
    .values((["admin", "planner", "trainer", "council"] as const).map((role) => ({
      email: `${role}@fixture.example`,
      name: `Fixture ${role}`,
      role,
      passwordHash: fixtureHash,
    })))
    .returning();
  const people = Object.fromEntries(rows.map((row) => [row.role, row])) as Record<Role, User>;

  const [layer] = await db.insert(layers).values({ kind: "population", name: "Fixture population", createdBy: people.planner.id }).returning();
  const [layerVersion] = await db
    .insert(layerVersions)
    .values({ layerId: layer.id, number: 1, rowCount: 3, summary: { totalPopulation: 12_345 }, createdBy: people.planner.id })
    .returning();

  const [scenario] = await db.insert(scenarios).values({ name: "Harbour test", createdBy: people.planner.id }).returning();
  const states = ["draft", "shared", "published"] as const;
  await db.insert(scenarioVersions).values(
    states.map((state, index) => ({
      scenarioId: scenario.id,
      number: index + 1,
      params: FIXTURE_SCENARIO_PARAMS,
      layerVersions: { population: layerVersion.id },
      state,
      authorId: people.planner.id,
      ...(state === "published" ? { publishedAt: new Date("2024-05-01T08:00:00Z"), publishedBy: people.planner.id, note: "Fixture" } : {}),
    })),
  );
  return { people, scenarioId: scenario.id, versions: { draft: 1, shared: 2, published: 3 }, populationLayerVersionId: layerVersion.id };
}

export const app = {
  db,
  client,

  /** Empties every table and writes the fixture again; signs out. */
  async reset(): Promise<Fixture> {
    if (!migrated) {
      await migrate(db, { migrationsFolder: "db/migrations" });
      migrated = true;
    }
    await wipe();
    holder.session = null;
    current = await insertFixture();
    return current;
  },

  get fixture(): Fixture {
    if (!current) throw new Error("Call app.reset() (in beforeEach) before using the fixture.");
    return current;
  },

  /**
   * Makes the next calls as this caller. The session holds the person's id and token version as
   * they are now, like the JWT signed at sign-in: later changes in the database make it stale.
   */
  signInAs(caller: Caller): void {
    if (caller === "none") {
      holder.session = null;
      return;
    }
    const user = typeof caller === "string" ? app.fixture.people[caller] : caller.user;
    holder.session = {
      user: { id: user.id, role: user.role, tokenVersion: user.tokenVersion, name: user.name, email: user.email },
      expires: new Date(Date.now() + 3_600_000).toISOString(),
    };
  },

  /** Starts Leeway's local SMTP server on this file's SMTP_PORT, so sent mail lands in the outbox table. */
  async startMailServer(): Promise<void> {
    const server = createFakeSmtpServer({ db });
    await new Promise<void>((resolve, reject) => {
      server.once("error", reject);
      server.listen(Number(process.env.SMTP_PORT), "127.0.0.1", resolve);
    });
    mailServer = server;
  },

  /** Waits until the outbox holds `count` messages (mail sent after an action has answered), then returns them. */
  async waitForMail(count: number, timeoutMs = 5_000) {
    // performance.now, not Date: tests may freeze Date with fake timers.
    const started = performance.now();
    while (performance.now() - started < timeoutMs) {
      const rows = await db.select().from(outbox).orderBy(outbox.id);
      if (rows.length >= count) return rows;
      await new Promise((resolve) => setTimeout(resolve, 25));
    }
    throw new Error(`The outbox did not reach ${count} message(s) within ${timeoutMs} ms.`);
  },

  /** Row count of a table, for "nothing was written" checks. */
  async count(table: string): Promise<number> {
    const result = await db.run(sql.raw(`select count(*) as n from "${table}"`));
    return Number(result.rows[0].n);
  },
};

afterAll(async () => {
  if (mailServer) await new Promise<void>((resolve) => mailServer!.close(() => resolve()));
  client.close();
  rmSync(TEST_DATABASE_FILE, { force: true });
  rmSync(`${TEST_DATABASE_FILE}-journal`, { force: true });
  rmSync(`${TEST_DATABASE_FILE}-wal`, { force: true });
});
