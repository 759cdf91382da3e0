import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { makeUser, TEST_PASSWORD, uniqueEmail } from "../support/factories";
import { call, signIn } from "../support/http";
import { authPost, clearThrottle } from "../support/auth-requests";
import { tokenIn, waitForMail } from "../support/mail";
import { tableCounts } from "../support/counts";
import { LIMITS } from "@/lib/auth/limits";

// Password reset by e-mail and change of password, through the route handlers, with the
// messages read back from the local mail catcher.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
beforeAll(async () => {
  envHandle = await useTestEnvironment();
});
afterAll(() => envHandle.cleanup());
beforeEach(() => clearThrottle());

const NEW_PASSWORD = "quiet-room-2026";
const resetRoute = () => import("@/app/api/v1/password-reset/route");
const completeRoute = () => import("@/app/api/v1/password-reset/[token]/route");
const changeRoute = () => import("@/app/api/v1/me/password/route");
const meRoute = () => import("@/app/api/v1/me/route");

const requestReset = async (email: string) => call((await resetRoute()).POST, { method: "POST", body: { email } });
const completeReset = async (token: string, password = NEW_PASSWORD, confirm = password) =>
  call((await completeRoute()).POST, { method: "POST", params: { token }, body: { password, confirm } });
const mailsTo = (email: string) => envHandle.mail.messages.filter((m) => m.to.includes(email));

async function resetToken(email: string): Promise<string> {
  const before = mailsTo(email).length;
  expect((await requestReset(email)).status).toBe(200);
  const mails = await waitForMail(envHandle.mail, email, before + 1);
  expect(mails.at(-1)!.subject).toBe("Set a new Cavitas password");
  return tokenIn(mails.at(-1)!.text, "/reset-password");
}

describe("password reset by e-mail", () => {
  it("answers alike whether or not the address has an account, and mails only the account", async () => {
    const u = await makeUser();
    const ghost = uniqueEmail("ghost");
    const known = await requestReset(u.email);
    const unknown = await requestReset(ghost);
    expect(known.status).toBe(200);
    expect([unknown.status, unknown.json]).toEqual([known.status, known.json]);
    expect(known.json.message).toMatch(/If an account uses that address/);
    const [mail] = await waitForMail(envHandle.mail, u.email);
    expect(mail.text).toMatch(/works once and until/);
    expect(mailsTo(ghost)).toHaveLength(0);
  });

  it("sets the new password with the e-mailed token once, ends every session, and sends a notice", async () => {
    const u = await makeUser();
    const oldCookie = await signIn(u.email);
    const token = await resetToken(u.email);
    // The token is kept only as a hash.
    const { getDb } = await import("@/db/client");
    const { verification } = await import("@/db/schema");
    expect(JSON.stringify(getDb().select().from(verification).all())).not.toContain(token);

    const { resetLinkIsOpen } = await import("@/lib/services/password");
    expect(await resetLinkIsOpen(null, token)).toBe(true);
    const done = await completeReset(token);
    expect(done.status).toBe(200);
    expect(await resetLinkIsOpen(null, token)).toBe(false);
    expect(await resetLinkIsOpen(null, "made-up-token")).toBe(false);
    expect((await call((await meRoute()).GET, { cookie: oldCookie })).status).toBe(401);
    expect((await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await authPost("/sign-in/email", { email: u.email, password: NEW_PASSWORD })).status).toBe(200);
    const [notice] = (await waitForMail(envHandle.mail, u.email, 2)).slice(1);
    expect(notice.subject).toBe("Your Cavitas password was changed");
    expect(notice.text).toMatch(/set through a reset link/);

    const again = await completeReset(token, "another-password-9");
    expect(again.status).toBe(410);
    expect(again.json.error.message).toMatch(/expired or has been used/);
  });

  it("refuses an expired link with 410 and keeps the old password", async () => {
    const u = await makeUser();
    const token = await resetToken(u.email);
    const { getDb } = await import("@/db/client");
    const { verification } = await import("@/db/schema");
    getDb().update(verification).set({ expiresAt: new Date(Date.now() - 1000) }).run();
    expect((await completeReset(token)).status).toBe(410);
    expect((await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD })).status).toBe(200);
  });

  it("names the field of a bad new password and writes nothing", async () => {
    const u = await makeUser();
    const token = await resetToken(u.email);
    const before = tableCounts();
    const short = await completeReset(token, "short");
    expect(short.status).toBe(422);
    expect(short.json.error.issues).toContainEqual({ field: "password", message: "Use at least 10 characters for the password." });
    const differ = await completeReset(token, NEW_PASSWORD, "something-else-1");
    expect(differ.json.error.issues).toEqual([{ field: "confirm", message: "The two passwords differ." }]);
    expect(tableCounts()).toEqual(before);
    // The token is still good after refusals.
    expect((await completeReset(token)).status).toBe(200);
  });

  it("lifts a sign-in lock once the mailbox owner has set a new password", async () => {
    const u = await makeUser();
    for (let i = 0; i < LIMITS.signInPerAccount.max; i++) await authPost("/sign-in/email", { email: u.email, password: "wrong-password-1" });
    expect((await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD })).status).toBe(429);
    expect((await completeReset(await resetToken(u.email))).status).toBe(200);
    expect((await authPost("/sign-in/email", { email: u.email, password: NEW_PASSWORD })).status).toBe(200);
  });

  it("limits requests per client address with a message, and mails one address at most three times an hour", async () => {
    const u = await makeUser();
    const answers = [];
    for (let i = 0; i < LIMITS.resetPerAddress.max; i++) answers.push((await requestReset(u.email)).status);
    expect(answers).toEqual(Array(LIMITS.resetPerAddress.max).fill(200));
    const over = await requestReset(u.email);
    expect(over.status).toBe(429);
    expect(over.json.error.message).toMatch(/Too many reset requests from your network\. Try again in 60 minutes/);
    await waitForMail(envHandle.mail, u.email, LIMITS.resetMailsPerAccount.max);
    await new Promise((r) => setTimeout(r, 300));
    expect(mailsTo(u.email)).toHaveLength(LIMITS.resetMailsPerAccount.max);
  });

  it("sends nothing to a disabled account, with the same answer", async () => {
    const u = await makeUser();
    const { getDb } = await import("@/db/client");
    const { user } = await import("@/db/schema");
    getDb().update(user).set({ disabledAt: new Date() }).where(eq(user.id, u.id)).run();
    const res = await requestReset(u.email);
    expect(res.status).toBe(200);
    await new Promise((r) => setTimeout(r, 300));
    expect(mailsTo(u.email)).toHaveLength(0);
  });
});

describe("change of password", () => {
  it("needs the current password, keeps this device signed in, signs the others out, and sends a notice", async () => {
    const u = await makeUser();
    const here = await signIn(u.email);
    const elsewhere = await signIn(u.email);
    const change = async (currentPassword: string) =>
      call((await changeRoute()).POST, { method: "POST", cookie: here, body: { currentPassword, password: NEW_PASSWORD, confirm: NEW_PASSWORD } });

    const before = tableCounts();
    const wrong = await change("not-my-password");
    expect(wrong.status).toBe(422);
    expect(wrong.json.error.issues).toEqual([{ field: "currentPassword", message: "That is not your current password." }]);
    // Nothing changed but the attempt counter.
    expect({ ...tableCounts(), throttle: 0 }).toEqual({ ...before, throttle: 0 });

    const ok = await change(TEST_PASSWORD);
    expect(ok.status).toBe(200);
    expect(ok.json).toEqual({ changed: true, otherSessionsEnded: 1 });
    expect((await call((await meRoute()).GET, { cookie: here })).status).toBe(200);
    expect((await call((await meRoute()).GET, { cookie: elsewhere })).status).toBe(401);
    expect((await authPost("/sign-in/email", { email: u.email, password: NEW_PASSWORD })).status).toBe(200);
    const [notice] = await waitForMail(envHandle.mail, u.email);
    expect(notice.subject).toBe("Your Cavitas password was changed");
    expect(notice.text).toMatch(/changed from the settings page/);
  });

  it("refuses the same password again, and a mistyped confirmation, at their fields", async () => {
    const u = await makeUser();
    const cookie = await signIn(u.email);
    const same = await call((await changeRoute()).POST, { method: "POST", cookie, body: { currentPassword: TEST_PASSWORD, password: TEST_PASSWORD, confirm: TEST_PASSWORD } });
    expect(same.json.error.issues).toEqual([{ field: "password", message: "Choose a password different from the current one." }]);
    const differ = await call((await changeRoute()).POST, { method: "POST", cookie, body: { currentPassword: TEST_PASSWORD, password: NEW_PASSWORD, confirm: "x" } });
    expect(differ.json.error.issues).toEqual([{ field: "confirm", message: "The two passwords differ." }]);
  });

  it("pauses after five wrong current passwords, so a borrowed session cannot guess it", async () => {
    const u = await makeUser();
    const cookie = await signIn(u.email);
    const statuses = [];
    for (let i = 0; i < LIMITS.passwordChecksPerAccount.max + 1; i++) {
      const res = await call((await changeRoute()).POST, { method: "POST", cookie, body: { currentPassword: `guess-${i}-password`, password: NEW_PASSWORD, confirm: NEW_PASSWORD } });
      statuses.push(res.status);
      if (res.status === 429) expect(res.json.error.message).toMatch(/Too many wrong current passwords\. Try again in 15 minutes/);
    }
    expect(statuses).toEqual([422, 422, 422, 422, 429, 429]);
    const right = await call((await changeRoute()).POST, { method: "POST", cookie, body: { currentPassword: TEST_PASSWORD, password: NEW_PASSWORD, confirm: NEW_PASSWORD } });
    expect(right.status).toBe(429);
  });
});
