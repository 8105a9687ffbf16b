import { app, FIXTURE_PASSWORD } from "../support/app";
import { formData } from "../support/forms";
import { eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { acceptInvitationAction } from "@/app/(auth)/invite/actions";
import { changeRoleAction, invitePersonAction, setActiveAction } from "@/app/(workspace)/admin/people/actions";
import { GET as listScenarios } from "@/app/api/scenarios/route";
import { auditLog, outbox, users } from "@/db/schema";
import { authorizeCredentials, SIGN_IN_FAILED } from "@/lib/auth/authorize";
import { getCurrentUser } from "@/lib/auth/session";

const NO_ADDRESS = { "x-forwarded-for": "192.0.2.10" };

beforeAll(() => app.startMailServer());
beforeEach(() => app.reset());

/** The one link in an e-mail's text. */
function linkIn(text: string): URL {
  const match = text.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`no link in:\n${text}`);
  return new URL(match[0]);
}

describe("inviting someone", () => {
  it("e-mails a single-use link through SMTP; the invitee sets a password and can sign in as their role", async () => {
    app.signInAs("admin");
    const invited = await invitePersonAction(null, formData({ name: "Rowan Vale", email: "Rowan@Council.example", role: "council" }));
    expect(invited).toMatchObject({ ok: true, status: 200 });

    const [mail] = await app.db.select().from(outbox);
    expect(mail.to).toBe("rowan@council.example");
    expect(mail.subject).toBe("You are invited to Leeway");
    const link = linkIn(mail.text);
    expect(link.origin).toBe("http://leeway.test");
    const token = link.pathname.replace("/invite/", "");

    // Not signed in: the link is the only credential.
    app.signInAs("none");
    const accepted = await acceptInvitationAction(null, formData({ token, password: "a-long-password", confirm: "a-long-password" }));
    expect(accepted).toMatchObject({ ok: true, status: 200 });
    const user = await authorizeCredentials({ email: "rowan@council.example", password: "a-long-password" }, NO_ADDRESS);
    expect(user.role).toBe("council");

    const again = await acceptInvitationAction(null, formData({ token, password: "another-password", confirm: "another-password" }));
    expect(again).toMatchObject({ ok: false, status: 410 });
    expect(again.message).toContain("already been used");
  });

  it("refuses a password shorter than the minimum and leaves the link usable", async () => {
    app.signInAs("admin");
    await invitePersonAction(null, formData({ name: "Ash Morrow", email: "ash@council.example", role: "trainer" }));
    const [mail] = await app.db.select().from(outbox);
    const token = linkIn(mail.text).pathname.replace("/invite/", "");
    const short = await acceptInvitationAction(null, formData({ token, password: "short", confirm: "short" }));
    expect(short).toMatchObject({ status: 400, fieldErrors: { password: "Use at least 10 characters" } });
    const [person] = await app.db.select().from(users).where(eq(users.email, "ash@council.example"));
    expect(person.passwordHash).toBeNull();
    const ok = await acceptInvitationAction(null, formData({ token, password: "long-enough-now", confirm: "long-enough-now" }));
    expect(ok.status).toBe(200);
  });

  it("refuses bad fields with their names and writes nothing", async () => {
    app.signInAs("admin");
    const before = { users: await app.count("users"), tokens: await app.count("auth_tokens"), audit: await app.count("audit_log") };
    const result = await invitePersonAction(null, formData({ name: "", email: "not-an-address", role: "mayor" }));
    expect(result.status).toBe(400);
    expect(Object.keys(result.fieldErrors ?? {}).sort()).toEqual(["email", "name", "role"]);
    expect({ users: await app.count("users"), tokens: await app.count("auth_tokens"), audit: await app.count("audit_log") }).toEqual(before);
    expect(await app.count("outbox")).toBe(0);
  });

  it("refuses an address that already has an account (409) and writes nothing", async () => {
    app.signInAs("admin");
    const before = await app.count("users");
    const result = await invitePersonAction(null, formData({ name: "Copy", email: "planner@fixture.example", role: "council" }));
    expect(result).toMatchObject({ status: 409 });
    expect(await app.count("users")).toBe(before);
  });
});

describe("the last active administrator", () => {
  it("cannot lose the admin role; nothing changes", async () => {
    const { admin } = app.fixture.people;
    app.signInAs("admin");
    const demoted = await changeRoleAction(null, formData({ userId: admin.id, role: "planner" }));
    expect(demoted).toMatchObject({ ok: false, status: 409 });
    expect(demoted.message).toContain("last active administrator");
    const [after] = await app.db.select().from(users).where(eq(users.id, admin.id));
    expect(after).toMatchObject({ role: "admin", active: true, tokenVersion: admin.tokenVersion });
    expect(await app.count("audit_log")).toBe(0);
  });

  it("can step down once another administrator is active", async () => {
    const { admin, planner } = app.fixture.people;
    app.signInAs("admin");
    expect((await changeRoleAction(null, formData({ userId: planner.id, role: "admin" }))).status).toBe(200);
    expect((await changeRoleAction(null, formData({ userId: admin.id, role: "planner" }))).status).toBe(200);
    // Now the former planner is the only admin, and the rule protects them in turn.
    app.signInAs({ user: (await app.db.select().from(users).where(eq(users.id, planner.id)))[0] });
    const stepDown = await changeRoleAction(null, formData({ userId: planner.id, role: "council" }));
    expect(stepDown).toMatchObject({ status: 409, message: expect.stringContaining("last active administrator") });
  });

  it("an inactive admin does not count as the other administrator", async () => {
    const { admin } = app.fixture.people;
    await app.db.insert(users).values({ email: "old-admin@fixture.example", name: "Old admin", role: "admin", active: false });
    app.signInAs("admin");
    expect((await changeRoleAction(null, formData({ userId: admin.id, role: "council" }))).status).toBe(409);
  });
});

describe("role changes and deactivation take effect on the next request", () => {
  it("deactivation ends a live session: the same session gets 401 on its next request", async () => {
    const { planner } = app.fixture.people;
    app.signInAs("planner");
    expect((await listScenarios(new Request("http://leeway.test/api/scenarios"), {})).status).toBe(200);

    app.signInAs("admin");
    expect((await setActiveAction(null, formData({ userId: planner.id, active: "false" }))).status).toBe(200);

    // The planner's session as it was signed before the change.
    app.signInAs({ user: planner });
    expect(await getCurrentUser()).toBeNull();
    const response = await listScenarios(new Request("http://leeway.test/api/scenarios"), {});
    expect(response.status).toBe(401);
    await expect(authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, NO_ADDRESS)).rejects.toThrow(SIGN_IN_FAILED);
  });

  it("a role change ends the session holding the old role; signing in again gives the new role", async () => {
    const { trainer } = app.fixture.people;
    app.signInAs("admin");
    expect((await changeRoleAction(null, formData({ userId: trainer.id, role: "council" }))).status).toBe(200);
    app.signInAs({ user: trainer });
    expect(await getCurrentUser()).toBeNull();
    const fresh = await authorizeCredentials({ email: trainer.email, password: FIXTURE_PASSWORD }, NO_ADDRESS);
    expect(fresh.role).toBe("council");
  });

  it("records who changed what, with before and after", async () => {
    const { trainer, admin } = app.fixture.people;
    app.signInAs("admin");
    await changeRoleAction(null, formData({ userId: trainer.id, role: "planner" }));
    const [row] = await app.db.select().from(auditLog);
    expect(row).toMatchObject({
      actorId: admin.id,
      action: "change-role",
      targetType: "person",
      targetId: String(trainer.id),
      detail: { before: { email: trainer.email, role: "trainer" }, after: { email: trainer.email, role: "planner" } },
    });
  });

  it("an administrator cannot deactivate their own account", async () => {
    app.signInAs("admin");
    await app.db.insert(users).values({ email: "second-admin@fixture.example", name: "Second admin", role: "admin" });
    const result = await setActiveAction(null, formData({ userId: app.fixture.people.admin.id, active: "false" }));
    expect(result).toMatchObject({ status: 409, message: expect.stringContaining("your own account") });
  });
});
