import { app, FIXTURE_PASSWORD } from "../support/app";
import { formData } from "../support/forms";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { requestPasswordResetAction, resetPasswordAction } from "@/app/(auth)/reset-password/actions";
import { sendResetLinkAction } from "@/app/(workspace)/admin/people/actions";
import { authorizeCredentials, SIGN_IN_FAILED } from "@/lib/auth/authorize";
import { getCurrentUser } from "@/lib/auth/session";

const ADDRESS = { "x-forwarded-for": "192.0.2.20" };

beforeAll(() => app.startMailServer());
beforeEach(() => app.reset());

function tokenIn(text: string): string {
  const match = text.match(/\/reset-password\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no reset link in:\n${text}`);
  return match[1];
}

describe("password reset", () => {
  it("sets a new password through the e-mailed link, ends older sessions, and works once", async () => {
    const { planner } = app.fixture.people;
    app.signInAs("planner");
    expect(await getCurrentUser()).not.toBeNull();

    await requestPasswordResetAction(null, formData({ email: planner.email }));
    const [mail] = await app.waitForMail(1);
    expect(mail.text).toContain("expires at");
    const token = tokenIn(mail.text);

    const reset = await resetPasswordAction(null, formData({ token, password: "brand-new-password", confirm: "brand-new-password" }));
    expect(reset).toMatchObject({ ok: true, status: 200 });

    // The session signed before the reset is over; only the new password signs in.
    expect(await getCurrentUser()).toBeNull();
    await expect(authorizeCredentials({ email: planner.email, password: FIXTURE_PASSWORD }, ADDRESS)).rejects.toThrow(SIGN_IN_FAILED);
    await expect(authorizeCredentials({ email: planner.email, password: "brand-new-password" }, ADDRESS)).resolves.toMatchObject({ role: "planner" });

    const again = await resetPasswordAction(null, formData({ token, password: "third-password-x", confirm: "third-password-x" }));
    expect(again).toMatchObject({ status: 410, message: expect.stringContaining("already been used") });
  });

  it("refuses mismatched passwords by field and keeps the old password", async () => {
    const { council } = app.fixture.people;
    await requestPasswordResetAction(null, formData({ email: council.email }));
    const [mail] = await app.waitForMail(1);
    const result = await resetPasswordAction(null, formData({ token: tokenIn(mail.text), password: "first-version-1", confirm: "second-version-2" }));
    expect(result).toMatchObject({ status: 400, fieldErrors: { confirm: "The two passwords are not the same" } });
    await expect(authorizeCredentials({ email: council.email, password: FIXTURE_PASSWORD }, ADDRESS)).resolves.toBeTruthy();
  });

  it("refuses a tampered link with a clear message", async () => {
    const result = await resetPasswordAction(null, formData({ token: "A".repeat(43), password: "whatever-long", confirm: "whatever-long" }));
    expect(result).toMatchObject({ status: 400, message: expect.stringContaining("This reset link is not valid") });
  });

  it("can be sent by an administrator on someone's behalf", async () => {
    app.signInAs("admin");
    const result = await sendResetLinkAction(null, formData({ userId: app.fixture.people.trainer.id }));
    expect(result.status).toBe(200);
    const [mail] = await app.waitForMail(1);
    expect(mail.to).toBe(app.fixture.people.trainer.email);
  });
});
