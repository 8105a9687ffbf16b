import { app } from "../support/app";
import { beforeEach, describe, expect, it } from "vitest";
import { listAuditEntries } from "@/db/queries/audit";
import { auditLog } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";

beforeEach(() => app.reset());

async function entryAt(iso: string, values: { actorId: number; action: string; targetType: string }) {
  await app.db.insert(auditLog).values({ ...values, at: new Date(iso), targetId: "1" });
}

describe("recordAudit", () => {
  it("writes who, what and a short before/after, inside the caller's transaction", async () => {
    const { planner } = app.fixture.people;
    await app.db.transaction(async (tx) => {
      await recordAudit(tx, { actorId: planner.id, action: "rename", targetType: "layer", targetId: 7, detail: { before: { name: "A" }, after: { name: "x".repeat(500) } } });
    });
    const [row] = await app.db.select().from(auditLog);
    expect(row).toMatchObject({ actorId: planner.id, action: "rename", targetType: "layer", targetId: "7" });
    const after = (row.detail as { after: { name: string } }).after.name;
    expect(after).toHaveLength(200);
    expect(after.endsWith("…")).toBe(true);
  });

  it("is rolled back with a change that fails", async () => {
    await expect(
      app.db.transaction(async (tx) => {
        await recordAudit(tx, { actorId: null, action: "save", targetType: "scenario", targetId: 1 });
        throw new Error("the change itself failed");
      }),
    ).rejects.toThrow("the change itself failed");
    expect(await app.count("audit_log")).toBe(0);
  });

  it("refuses an action that is not a kebab-case verb", async () => {
    await expect(recordAudit(app.db, { actorId: null, action: "Published!", targetType: "scenario", targetId: 1 })).rejects.toThrow(/kebab-case/);
    expect(await app.count("audit_log")).toBe(0);
  });
});

describe("listAuditEntries", () => {
  it("filters by subject, action, person and an inclusive day range, newest first", async () => {
    const { admin, planner } = app.fixture.people;
    await entryAt("2025-04-01T23:59:00Z", { actorId: planner.id, action: "publish", targetType: "scenario-version" });
    await entryAt("2025-04-02T08:00:00Z", { actorId: planner.id, action: "share", targetType: "scenario-version" });
    await entryAt("2025-04-02T09:00:00Z", { actorId: admin.id, action: "invite", targetType: "person" });
    await entryAt("2025-04-03T00:00:00Z", { actorId: planner.id, action: "upload", targetType: "layer" });

    const april2 = { from: new Date("2025-04-02T00:00:00Z"), to: new Date("2025-04-03T00:00:00Z") };
    expect((await listAuditEntries({ filter: april2 })).entries.map((e) => e.action)).toEqual(["invite", "share"]);
    expect((await listAuditEntries({ filter: { actorId: planner.id } })).entries.map((e) => e.action)).toEqual(["upload", "share", "publish"]);
    expect((await listAuditEntries({ filter: { targetType: "person" } })).entries.map((e) => e.actorName)).toEqual([admin.name]);
    expect((await listAuditEntries({ filter: { action: "publish" } })).entries).toHaveLength(1);
  });

  it("pages older entries with a cursor and says when there are more", async () => {
    for (let day = 1; day <= 5; day += 1) await entryAt(`2025-05-0${day}T12:00:00Z`, { actorId: app.fixture.people.admin.id, action: "save", targetType: "scenario" });
    const first = await listAuditEntries({ filter: {}, limit: 2 });
    expect(first.hasOlder).toBe(true);
    const second = await listAuditEntries({ filter: { beforeId: first.entries.at(-1)!.id }, limit: 2 });
    const third = await listAuditEntries({ filter: { beforeId: second.entries.at(-1)!.id }, limit: 2 });
    const days = [...first.entries, ...second.entries, ...third.entries].map((e) => e.at.toISOString().slice(8, 10));
    expect(days).toEqual(["05", "04", "03", "02", "01"]);
    expect(third.hasOlder).toBe(false);
  });
});
