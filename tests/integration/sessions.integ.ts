import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { waitForMail } from "../support/mail";
import { tableCounts } from "../support/counts";

// The list of one's own sessions, signing one out, and signing out everywhere.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
beforeAll(async () => {
  envHandle = await useTestEnvironment();
});
afterAll(() => envHandle.cleanup());

const sessionsRoute = () => import("@/app/api/v1/me/sessions/route");
const oneRoute = () => import("@/app/api/v1/me/sessions/[sessionId]/route");
const list = async (cookie: string) => call((await sessionsRoute()).GET, { cookie });
const me = async (cookie: string) => call((await import("@/app/api/v1/me/route")).GET, { cookie });

describe("sessions", () => {
  it("lists the holder's own sessions, this one first, without their tokens", async () => {
    const u = await makeUser();
    const other = await makeUser();
    await signIn(other.email);
    const first = await signIn(u.email);
    const here = await signIn(u.email);
    const res = await list(here);
    expect(res.status).toBe(200);
    expect(res.json.sessions).toHaveLength(2);
    expect(res.json.sessions.map((s: { current: boolean }) => s.current)).toEqual([true, false]);
    expect(Object.keys(res.json.sessions[0]).sort()).toEqual(["address", "current", "device", "expiresAt", "id", "renewedAt", "signedInAt"]);
    const token = decodeURIComponent(first.split("=")[1]).split(".")[0];
    expect(JSON.stringify(res.json)).not.toContain(token);
  });

  it("signs one other session out; someone else's session id is not found and stays", async () => {
    const u = await makeUser();
    const elsewhere = await signIn(u.email);
    const here = await signIn(u.email);
    const otherId = (await list(here)).json.sessions.find((s: { current: boolean }) => !s.current).id;

    const stranger = await makeUser();
    const strangerCookie = await signIn(stranger.email);
    const before = tableCounts();
    expect((await call((await oneRoute()).DELETE, { method: "DELETE", cookie: strangerCookie, params: { sessionId: otherId } })).status).toBe(404);
    expect(tableCounts()).toEqual(before);

    const res = await call((await oneRoute()).DELETE, { method: "DELETE", cookie: here, params: { sessionId: otherId } });
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ ended: 1, current: false });
    expect((await me(elsewhere)).status).toBe(401);
    expect((await me(here)).status).toBe(200);
  });

  it("signs out everywhere, this device included, and tells the holder by e-mail", async () => {
    const u = await makeUser();
    const a = await signIn(u.email);
    const b = await signIn(u.email);
    const res = await call((await sessionsRoute()).DELETE, { method: "DELETE", cookie: a });
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ ended: 2 });
    expect((await me(a)).status).toBe(401);
    expect((await me(b)).status).toBe(401);
    const [mail] = await waitForMail(envHandle.mail, u.email);
    expect(mail.subject).toBe("You were signed out of Cavitas everywhere");
    expect(mail.text).toMatch(/\(2 sessions ended\)/);
  });
});
