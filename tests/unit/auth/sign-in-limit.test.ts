import { app, FIXTURE_PASSWORD } from "../support/app";
import { formData } from "../support/forms";
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { requestPasswordResetAction } from "@/app/(auth)/reset-password/actions";
import { authorizeCredentials, SIGN_IN_FAILED } from "@/lib/auth/authorize";
import { clientAddress, SIGN_IN_RULES } from "@/lib/auth/sign-in-limit";

const MINUTE_MS = 60_000;
const from = (address: string) => ({ "x-forwarded-for": address });

beforeAll(() => app.startMailServer());
beforeEach(async () => {
  await app.reset();
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(new Date("2025-06-02T10:00:00Z"));
});
afterEach(() => vi.useRealTimers());

async function failTimes(count: number, email: string, address: string) {
  for (let i = 0; i < count; i += 1) {
    await expect(authorizeCredentials({ email, password: "wrong-password" }, from(address))).rejects.toThrow(SIGN_IN_FAILED);
  }
}

describe("sign-in rate limit (docs/people.md: 5 per account, 20 per address, 15-minute windows)", () => {
  it("pauses an account after 5 failures, even for the right password, with a clear message", async () => {
    expect(SIGN_IN_RULES.account).toEqual({ maxAttempts: 5, windowMs: 15 * MINUTE_MS });
    const { planner } = app.fixture.people;
    await failTimes(5, planner.email, "192.0.2.1");
    // From another address too: the pause belongs to the account.
    await expect(authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, from("198.51.100.7"))).rejects.toThrow(
      /Too many failed sign-ins for this account\. Try again in 15 minutes/,
    );
  });

  it("lets the account in again once the window has run out", async () => {
    const { planner } = app.fixture.people;
    await failTimes(5, planner.email, "192.0.2.1");
    vi.setSystemTime(new Date(Date.now() + 15 * MINUTE_MS));
    await expect(authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, from("192.0.2.1"))).resolves.toMatchObject({
      role: "planner",
    });
  });

  it("forgets an account's failures after a successful sign-in", async () => {
    const { planner } = app.fixture.people;
    await failTimes(4, planner.email, "192.0.2.1");
    await authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, from("192.0.2.1"));
    await failTimes(4, planner.email, "192.0.2.1");
    await expect(authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, from("192.0.2.1"))).resolves.toBeTruthy();
  });

  it("counts unknown e-mails like real ones, so the pause does not reveal which accounts exist", async () => {
    await failTimes(5, "nobody@fixture.example", "192.0.2.1");
    await expect(authorizeCredentials({ email: "Nobody@Fixture.example", password: "x" }, from("192.0.2.2"))).rejects.toThrow(/for this account/);
  });

  it("pauses an address after 20 failures across accounts; other addresses are unaffected", async () => {
    for (let i = 0; i < 4; i += 1) await failTimes(5, `guess${i}@fixture.example`, "203.0.113.9");
    const { council } = app.fixture.people;
    await expect(authorizeCredentials({ email: council.email, password: FIXTURE_PASSWORD }, from("203.0.113.9"))).rejects.toThrow(
      /Too many failed sign-ins from your network address/,
    );
    await expect(authorizeCredentials({ email: council.email, password: FIXTURE_PASSWORD }, from("203.0.113.10"))).resolves.toMatchObject({
      role: "council",
    });
  });

  it("keeps its counters in the database, where every app instance sees them", async () => {
    await failTimes(3, app.fixture.people.trainer.email, "192.0.2.1");
    const rows = await app.client.execute("select key, failures from sign_in_attempts order by key");
    expect(rows.rows.map((row) => [row.key, row.failures])).toEqual([
      ["sign-in:account:trainer@fixture.example", 3],
      ["sign-in:address:192.0.2.1", 3],
    ]);
  });
});

describe("client address", () => {
  it("takes the right-most X-Forwarded-For entry, the one the nearest proxy added", () => {
    expect(clientAddress({ "x-forwarded-for": "10.9.9.9, 192.0.2.44" })).toBe("192.0.2.44");
    expect(clientAddress({ "x-forwarded-for": "192.0.2.44" })).toBe("192.0.2.44");
    expect(clientAddress({})).toBe("unknown");
  });
});

describe("password reset requests", () => {
  it("answer the same for known and unknown addresses, and pause after 3 an hour", async () => {
    const known = await requestPasswordResetAction(null, formData({ email: app.fixture.people.planner.email }));
    const unknown = await requestPasswordResetAction(null, formData({ email: "nobody@fixture.example" }));
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(unknown.message.replace("nobody@fixture.example", "X")).toBe(known.message.replace(app.fixture.people.planner.email, "X"));
    // Only the real account gets a message.
    const [mail] = await app.waitForMail(1);
    expect(mail).toMatchObject({ to: app.fixture.people.planner.email, subject: "Reset your Leeway password" });
    await requestPasswordResetAction(null, formData({ email: "nobody@fixture.example" }));
    await requestPasswordResetAction(null, formData({ email: "nobody@fixture.example" }));
    const fourth = await requestPasswordResetAction(null, formData({ email: "nobody@fixture.example" }));
    expect(fourth.status).toBe(429);
    expect(await app.count("outbox")).toBe(1);
  });
});
