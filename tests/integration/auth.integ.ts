import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser, TEST_PASSWORD, uniqueEmail } from "../support/factories";
import { tableCounts } from "../support/counts";
import { APP_URL, call, signIn } from "../support/http";

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
beforeAll(async () => {
  envHandle = await useTestEnvironment();
});
afterAll(() => envHandle.cleanup());

async function authPost(path: string, body: unknown) {
  const { auth } = await import("@/lib/auth/server");
  const res = await auth().handler(
    new Request(`${APP_URL}/api/auth${path}`, { method: "POST", headers: { "content-type": "application/json", origin: APP_URL }, body: JSON.stringify(body) }),
  );
  return { status: res.status, json: await res.json().catch(() => null) };
}

describe("sign-in", () => {
  it("signs in with the right password and the session reaches /api/v1/me", async () => {
    const f = makeFirm();
    const u = await makeUser({ firmId: f.id });
    const cookie = await signIn(u.email);
    const me = await import("@/app/api/v1/me/route");
    const res = await call(me.GET, { cookie });
    expect(res.status).toBe(200);
    expect(res.json.email).toBe(u.email);
    expect(res.json.firm.id).toBe(f.id);
  });

  it("refuses a wrong password with 401 and creates no session", async () => {
    const u = await makeUser();
    const res = await authPost("/sign-in/email", { email: u.email, password: "not-the-password" });
    expect(res.status).toBe(401);
    const { getDb } = await import("@/db/client");
    const { session } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    expect(getDb().select().from(session).where(eq(session.userId, u.id)).all()).toHaveLength(0);
  });

  it("answers 401 with a message to a request without a session", async () => {
    const me = await import("@/app/api/v1/me/route");
    const res = await call(me.GET);
    expect(res.status).toBe(401);
    expect(res.json.error.message).toMatch(/sign in/i);
  });

  it("refuses sign-up through better-auth for every address alike, invited or not, and makes no account", async () => {
    const f = makeFirm();
    const consultant = await makeUser({ firmId: f.id });
    const p = makeProject(f.id);
    addMember(p.id, consultant.id, "consultant");
    const { inviteToProject } = await import("@/lib/services/invitations");
    const { actorFromHeaders } = await import("@/lib/auth/session");
    const invited = uniqueEmail("invited");
    await inviteToProject(await actorFromHeaders(new Headers({ cookie: await signIn(consultant.email) })), p.id, { email: invited, role: "architect" });

    const before = tableCounts();
    const squat = await authPost("/sign-up/email", { email: invited, password: TEST_PASSWORD, name: "Squatter (fictional)" });
    const stranger = await authPost("/sign-up/email", { email: uniqueEmail("stranger"), password: TEST_PASSWORD, name: "Stranger (fictional)" });
    expect(squat.status).toBeGreaterThanOrEqual(400);
    // The same answer for both: nothing tells an attacker which addresses are invited.
    expect([squat.status, squat.json]).toEqual([stranger.status, stranger.json]);
    expect(tableCounts()).toEqual(before);
  });
});
