import { app } from "../support/app";
import { createHash } from "node:crypto";
import { beforeEach, describe, expect, it } from "vitest";
import { consumeAuthToken, inspectAuthToken, issueAuthToken, TOKEN_LIFETIME_MS } from "@/db/queries/tokens";
import { authTokens } from "@/db/schema";

const DAY_MS = 24 * 60 * 60 * 1000;

beforeEach(() => app.reset());

describe("invitation and reset tokens", () => {
  it("stores only the SHA-256 of the token, never the token itself", async () => {
    const { token } = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id });
    const rows = await app.db.select().from(authTokens);
    expect(rows).toHaveLength(1);
    // SHA-256 as defined by FIPS 180-4, computed here by Node's crypto, not by the code under test.
    expect(rows[0].tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(JSON.stringify(rows)).not.toContain(token);
  });

  it("gives 256 random bits per token: no two of many tokens are equal", async () => {
    const seen = new Set<string>();
    for (let i = 0; i < 50; i += 1) seen.add((await issueAuthToken(app.db, { kind: "reset", userId: app.fixture.people.planner.id })).token);
    expect(seen.size).toBe(50);
  });

  it("works once: the second use is reported as used", async () => {
    const { token } = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id });
    expect((await consumeAuthToken(app.db, { kind: "invite", token })).status).toBe("valid");
    expect((await consumeAuthToken(app.db, { kind: "invite", token })).status).toBe("used");
    expect((await inspectAuthToken({ kind: "invite", token })).status).toBe("used");
  });

  it("expires after the documented lifetime (invitation 7 days, reset 1 hour; docs/people.md)", async () => {
    expect(TOKEN_LIFETIME_MS.invite).toBe(7 * DAY_MS);
    expect(TOKEN_LIFETIME_MS.reset).toBe(60 * 60 * 1000);
    const issuedAt = new Date("2025-03-01T09:00:00Z");
    const invite = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id, now: issuedAt });
    const reset = await issueAuthToken(app.db, { kind: "reset", userId: app.fixture.people.planner.id, now: issuedAt });
    const at = (ms: number) => new Date(issuedAt.getTime() + ms);

    expect((await inspectAuthToken({ kind: "invite", token: invite.token, now: at(7 * DAY_MS - 60_000) })).status).toBe("valid");
    expect((await inspectAuthToken({ kind: "invite", token: invite.token, now: at(7 * DAY_MS) })).status).toBe("expired");
    expect((await inspectAuthToken({ kind: "reset", token: reset.token, now: at(59 * 60_000) })).status).toBe("valid");
    expect((await consumeAuthToken(app.db, { kind: "reset", token: reset.token, now: at(61 * 60_000) })).status).toBe("expired");
  });

  it("refuses a tampered token, a token of another kind and text that is no token", async () => {
    const { token } = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id });
    const flipped = `${token.slice(0, 10)}${token[10] === "A" ? "B" : "A"}${token.slice(11)}`;
    expect((await inspectAuthToken({ kind: "invite", token: flipped })).status).toBe("invalid");
    expect((await inspectAuthToken({ kind: "invite", token: token.slice(0, -1) })).status).toBe("invalid");
    expect((await inspectAuthToken({ kind: "reset", token })).status).toBe("invalid");
    expect((await inspectAuthToken({ kind: "invite", token: "../../etc/passwd" })).status).toBe("invalid");
    // The genuine token still works after the failed attempts.
    expect((await inspectAuthToken({ kind: "invite", token })).status).toBe("valid");
  });

  it("withdraws the older link when a new one of the same kind is issued", async () => {
    const first = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id });
    const second = await issueAuthToken(app.db, { kind: "invite", userId: app.fixture.people.council.id });
    expect((await inspectAuthToken({ kind: "invite", token: first.token })).status).toBe("invalid");
    expect((await inspectAuthToken({ kind: "invite", token: second.token })).status).toBe("valid");
  });
});
