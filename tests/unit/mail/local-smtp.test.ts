import { app } from "../support/app";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { outbox } from "@/db/schema";
import { sendEach, sendMail } from "@/lib/mail/transport";

beforeAll(() => app.startMailServer());
beforeEach(() => app.reset());

describe("nodemailer to Leeway's local SMTP server", () => {
  it("keeps every message in the outbox with its envelope, subject and decoded text", async () => {
    // Non-ASCII and a line over 76 characters make nodemailer use quoted-printable and an
    // encoded-word subject (RFC 2045 §6.7, RFC 2047), so the stored text shows real decoding.
    const text = `Warning seconds ≥ 10 s for 41 % of people · ${"a long line ".repeat(12)}\nSecond line`;
    await sendMail({ to: "ruth@council.example", subject: "Leeway · published — Mw 7.1", text });
    const [row] = await app.db.select().from(outbox);
    expect(row.to).toBe("ruth@council.example");
    expect(row.from).toBe('"Leeway" <leeway@leeway.example>');
    expect(row.subject).toBe("Leeway · published — Mw 7.1");
    expect(row.text.trimEnd()).toBe(text);
    expect(row.raw).toMatch(/Content-Transfer-Encoding: quoted-printable/i);
  });

  it("sends one message per recipient and reports each", async () => {
    const report = await sendEach([
      { to: "a@council.example", subject: "one", text: "1" },
      { to: "b@council.example", subject: "two", text: "2" },
    ]);
    expect(report).toEqual({ sent: ["a@council.example", "b@council.example"], failed: [] });
    const rows = await app.db.select({ to: outbox.to }).from(outbox).orderBy(outbox.id);
    expect(rows.map((row) => row.to)).toEqual(["a@council.example", "b@council.example"]);
  });

  it("reports a refused recipient instead of throwing", async () => {
    const report = await sendEach([{ to: "not an address", subject: "x", text: "x" }]);
    expect(report.sent).toEqual([]);
    expect(report.failed).toHaveLength(1);
    expect(await app.count("outbox")).toBe(0);
  });
});
