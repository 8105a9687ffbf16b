import bcrypt from "bcryptjs";
import { asc, eq } from "drizzle-orm";
import { migrate } from "drizzle-orm/libsql/migrator";
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import { connect, type Database } from "@/db/connect";
import { unpackGridChunks } from "@/db/grid-codec";
import * as schema from "@/db/schema";
import { buildRegion, type Region } from "@/db/seed/region";
import { seedDemo } from "@/db/seed/seed-demo";
import { parseScenario } from "@/lib/scenario/schema";

let region: Region;
let open: { client: { close(): void } }[] = [];

beforeAll(() => {
  region = buildRegion();
});
afterEach(() => {
  open.forEach((o) => o.client.close());
  open = [];
});

async function freshDatabase(): Promise<Database> {
  const handle = connect(":memory:");
  open.push(handle);
  await migrate(handle.db, { migrationsFolder: "db/migrations" });
  return handle.db;
}

/** Every row of the tables the seed writes, ids included, so two snapshots differ on any change. */
async function snapshot(db: Database) {
  return {
    users: await db.select().from(schema.users).orderBy(asc(schema.users.id)),
    layers: await db.select().from(schema.layers).orderBy(asc(schema.layers.id)),
    layerVersions: await db.select().from(schema.layerVersions).orderBy(asc(schema.layerVersions.id)),
    gridChunks: await db.select().from(schema.gridChunks),
    districts: await db.select().from(schema.districts).orderBy(asc(schema.districts.id)),
    facilities: await db.select().from(schema.facilities).orderBy(asc(schema.facilities.id)),
    stations: await db.select().from(schema.stations).orderBy(asc(schema.stations.id)),
    scenarios: await db.select().from(schema.scenarios).orderBy(asc(schema.scenarios.id)),
    scenarioVersions: await db.select().from(schema.scenarioVersions).orderBy(asc(schema.scenarioVersions.id)),
    protectiveActions: await db.select().from(schema.protectiveActions).orderBy(asc(schema.protectiveActions.id)),
    settings: await db.select().from(schema.settings).orderBy(asc(schema.settings.key)),
  };
}

describe("demo seed", () => {
  it("writes the same content when run twice, with no duplicates", async () => {
    const db = await freshDatabase();
    const first = await seedDemo(db, region);
    const afterFirst = await snapshot(db);
    const second = await seedDemo(db, region);
    expect(await snapshot(db)).toEqual(afterFirst);
    expect(first.lines.every((l) => l.created)).toBe(true);
    expect(second.lines.some((l) => l.created)).toBe(false);
    expect(afterFirst.users).toHaveLength(4);
    expect(afterFirst.scenarios).toHaveLength(3);
    expect(afterFirst.layers.map((l) => l.kind).sort()).toEqual(["districts", "facilities", "population", "site-condition", "stations"]);
    // Each default action names the facilities it is for: trains are stopped on rail, not at schools.
    const kindsOf = (name: string) => afterFirst.protectiveActions.find((a) => a.name === name)?.facilityKinds;
    expect(kindsOf("Slow and stop trains")).toEqual(["rail"]);
    expect(kindsOf("Stop surgery and secure patients")).toEqual(["hospital"]);
    expect(kindsOf("Drop, cover, hold")).not.toContain("rail");
  }, 60_000);

  it("creates one demo account per role whose password checks with bcrypt (cost 10)", async () => {
    const db = await freshDatabase();
    await seedDemo(db, region);
    const people = await db.select().from(schema.users);
    const roles = ["admin", "planner", "trainer", "council"] as const;
    for (const role of roles) {
      const person = people.find((p) => p.role === role);
      expect(person?.email).toBe(`${role}@leeway.example`);
      expect(person?.isDemo).toBe(true);
      expect(person?.passwordHash?.startsWith("$2b$10$")).toBe(true);
      expect(await bcrypt.compare(`leeway-${role}`, person?.passwordHash ?? "")).toBe(true);
    }
  }, 60_000);

  it("stores the population grid so it decodes to the region's million people with valid district indices", async () => {
    const db = await freshDatabase();
    await seedDemo(db, region);
    const [population] = await db.select().from(schema.layers).where(eq(schema.layers.kind, "population"));
    const [version] = await db.select().from(schema.layerVersions).where(eq(schema.layerVersions.layerId, population.id));
    const chunks = await db.select().from(schema.gridChunks).where(eq(schema.gridChunks.layerVersionId, version.id));
    const grid = unpackGridChunks(chunks);
    expect(grid.value.reduce((a, b) => a + b, 0)).toBe(1_000_000);
    expect(version.rowCount).toBe(grid.lon.length);
    const districtCount = (await db.select().from(schema.districts)).length;
    expect(grid.district?.every((d) => d >= 0 && d < districtCount)).toBe(true);
  }, 60_000);

  it("seeds three valid scenarios, published / shared / draft, recording the layer versions and the station layer", async () => {
    const db = await freshDatabase();
    await seedDemo(db, region);
    const versions = await db.select().from(schema.scenarioVersions);
    const layerVersionIds = new Set((await db.select().from(schema.layerVersions)).map((v) => v.id));
    const stationRows = await db.select().from(schema.stations).orderBy(asc(schema.stations.id));
    expect(versions.map((v) => v.state).sort()).toEqual(["draft", "published", "shared"]);
    for (const v of versions) {
      const parsed = parseScenario(v.params);
      expect(parsed.ok, JSON.stringify(parsed)).toBe(true);
      if (!parsed.ok) continue;
      expect(parsed.scenario.stations.map((s) => [s.id, s.lon, s.lat, s.operating])).toEqual(stationRows.map((s) => [s.code, s.lon, s.lat, s.operating]));
      const recorded = Object.values(v.layerVersions as Record<string, number>);
      expect(recorded.length).toBe(5);
      expect(recorded.every((id) => layerVersionIds.has(id))).toBe(true);
      expect(v.publishedAt !== null).toBe(v.state === "published");
      expect(v.publishedBy !== null).toBe(v.state === "published");
    }
  }, 60_000);

  it("fails on an invalid scenario file, naming the field, and writes nothing", async () => {
    const db = await freshDatabase();
    const broken: Region = { ...region, sources: region.sources.map((s) => (s.key === "crustal" ? { ...s, mw: 12 } : s)) };
    await expect(seedDemo(db, broken)).rejects.toThrow(/source\.mw: Mw must be between 4\.0 and 9\.5/);
    const after = await snapshot(db);
    expect(Object.values(after).every((rows) => rows.length === 0)).toBe(true);
  }, 60_000);
});
