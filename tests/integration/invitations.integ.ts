import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser, TEST_PASSWORD, uniqueEmail } from "../support/factories";
import { APP_URL, call, readMail, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let consultantCookie = "";
let architectCookie = "";

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id, "Invitation test project (fictional)").id;
  const consultant = await makeUser({ firmId: firm.id, name: "Cass Consultant (fictional)" });
  addMember(projectId, consultant.id, "consultant");
  consultantCookie = await signIn(consultant.email);
  const architect = await makeUser();
  addMember(projectId, architect.id, "architect");
  architectCookie = await signIn(architect.email);
});
afterAll(() => envHandle.cleanup());

const invitationsRoute = () => import("@/app/api/v1/projects/[projectId]/invitations/route");
const acceptRoute = () => import("@/app/api/v1/invitations/[token]/accept/route");
const describeRoute = () => import("@/app/api/v1/invitations/[token]/route");

async function invite(email: string, role = "architect", cookie = consultantCookie) {
  return call((await invitationsRoute()).POST, { method: "POST", cookie, params: { projectId }, body: { email, role } });
}

async function tokenFromMail(email: string): Promise<string> {
  const messages = await readMail(envHandle.mail.httpPort, email);
  expect(messages.length).toBeGreaterThan(0);
  const link = /(http\S+\/invite\/[A-Za-z0-9_-]+)/.exec(messages.at(-1)!.text)![1];
  expect(link.startsWith(`${APP_URL}/invite/`)).toBe(true);
  return link.split("/invite/")[1];
}

const accountRoute = () => import("@/app/api/v1/invitations/[token]/account/route");

// The only way to make an account: the invitation's token, for the invitation's address.
async function signUp(token: string, name: string, extra: Record<string, unknown> = {}) {
  return call((await accountRoute()).POST, { method: "POST", params: { token }, body: { name, password: TEST_PASSWORD, confirm: TEST_PASSWORD, ...extra } });
}

describe("project invitations", () => {
  it("delivers the invitation by SMTP, and its link signs the person up and adds the membership", async () => {
    const email = uniqueEmail("new-architect");
    const sent = await invite(email, "architect");
    expect(sent.status).toBe(201);
    expect(sent.json.delivery.status).toBe("sent");
    const [message] = await readMail(envHandle.mail.httpPort, email);
    expect(message.subject).toContain("Invitation test project (fictional)");
    expect(message.text).toContain("as architect");
    const token = await tokenFromMail(email);

    const view = await call((await describeRoute()).GET, { params: { token } });
    expect(view.json).toMatchObject({ state: "open", email, role: "architect", projectId, accountExists: false });

    const signUpRes = await signUp(token, "Nia Newcomer (fictional)");
    expect(signUpRes.status).toBe(201);
    expect(signUpRes.json).toEqual({ email, projectId });
    const cookie = await signIn(email);

    const projects = await call((await import("@/app/api/v1/projects/route")).GET, { cookie });
    expect(projects.json.projects).toEqual([expect.objectContaining({ id: projectId, role: "architect" })]);

    // The same link a second time: refused, nothing added.
    const before = tableCounts();
    const again = await call((await acceptRoute()).POST, { method: "POST", cookie, params: { token } });
    expect(again.status).toBe(409);
    expect(again.json.error.message).toMatch(/already been used/);
    expect(tableCounts()).toEqual(before);
  });

  it("binds the new account to the invited address, whatever address the body names", async () => {
    const email = uniqueEmail("bound");
    await invite(email, "client");
    const token = await tokenFromMail(email);
    const res = await signUp(token, "Bo Bound (fictional)", { email: "someone-else@example.test" });
    expect(res.status).toBe(201);
    expect(res.json.email).toBe(email);
    const { getDb } = await import("@/db/client");
    const { user } = await import("@/db/schema");
    expect(getDb().select().from(user).where(eq(user.email, "someone-else@example.test")).all()).toHaveLength(0);
    expect(getDb().select().from(user).where(eq(user.email, email)).get()?.emailVerified).toBe(true);
  });

  it("makes no account from a wrong token (404), a spent link (409) or for an address that has one (409)", async () => {
    const existing = await makeUser();
    const before = tableCounts();
    expect((await signUp("not-a-real-token", "Nobody (fictional)")).status).toBe(404);
    await invite(existing.email, "client");
    const token = await tokenFromMail(existing.email);
    const taken = await signUp(token, "Twin (fictional)");
    expect(taken.status).toBe(409);
    expect(taken.json.error.message).toMatch(/already exists\. Sign in/);
    const spent = uniqueEmail("spent");
    await invite(spent, "client");
    const spentToken = await tokenFromMail(spent);
    expect((await signUp(spentToken, "First (fictional)")).status).toBe(201);
    const after = tableCounts();
    expect((await signUp(spentToken, "Second (fictional)")).status).toBe(409);
    expect(tableCounts()).toEqual(after);
    expect(after.user).toBe(before.user + 1);
  });

  it("refuses a sign-up form with bad fields at each field, and writes nothing", async () => {
    const email = uniqueEmail("fields");
    await invite(email, "client");
    const token = await tokenFromMail(email);
    const before = tableCounts();
    const res = await call((await accountRoute()).POST, { method: "POST", params: { token }, body: { name: "", password: "short", confirm: "other" } });
    expect(res.status).toBe(422);
    expect(res.json.error.issues.map((i: { field: string }) => i.field).sort()).toEqual(["confirm", "name", "password"]);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses an invitation for someone already on the project with 409 naming the field", async () => {
    const team = await call((await import("@/app/api/v1/projects/[projectId]/members/route")).GET, { cookie: consultantCookie, params: { projectId } });
    const architect = team.json.members.find((m: { role: string }) => m.role === "architect");
    const res = await invite(architect.email, "client");
    expect(res.status).toBe(409);
    expect(res.json.error.issues[0].field).toBe("email");
    expect(res.json.error.message).toMatch(/already on this project as architect/);
  });

  it("refuses a second open invitation to the same address", async () => {
    const email = uniqueEmail("twice");
    expect((await invite(email)).status).toBe(201);
    const second = await invite(email, "client");
    expect(second.status).toBe(409);
  });

  it("refuses bad input with 422 and the field named, and writes nothing", async () => {
    const before = tableCounts();
    const res = await invite("not-an-address", "foreman");
    expect(res.status).toBe(422);
    const fields = res.json.error.issues.map((i: { field: string }) => i.field).sort();
    expect(fields).toEqual(["email", "role"]);
    expect(tableCounts()).toEqual(before);
  });

  it("answers 400 to a body that is not JSON", async () => {
    const res = await call((await invitationsRoute()).POST, { method: "POST", cookie: consultantCookie, params: { projectId }, rawBody: "{email:" });
    expect(res.status).toBe(400);
  });

  it("answers 404 for an unknown project id", async () => {
    const res = await call((await invitationsRoute()).POST, {
      method: "POST",
      cookie: consultantCookie,
      params: { projectId: "no-such-project" },
      body: { email: uniqueEmail(), role: "client" },
    });
    expect(res.status).toBe(404);
  });

  it("refuses an architect who tries to invite (403) and writes nothing", async () => {
    const before = tableCounts();
    const res = await invite(uniqueEmail(), "client", architectCookie);
    expect(res.status).toBe(403);
    expect(res.json.error.message).toMatch(/architect.*may not invite/i);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses an expired invitation with 410", async () => {
    const email = uniqueEmail("late");
    await invite(email, "client");
    const token = await tokenFromMail(email);
    const { getDb } = await import("@/db/client");
    const { invitation } = await import("@/db/schema");
    getDb().update(invitation).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitation.email, email)).run();
    const view = await call((await describeRoute()).GET, { params: { token } });
    expect(view.json.state).toBe("expired");
    // The link cannot make an account either.
    expect((await signUp(token, "Lou Late (fictional)")).status).toBe(410);
    const existing = await makeUser({ email: uniqueEmail("late-existing") });
    const cookie = await signIn(existing.email);
    const res = await call((await acceptRoute()).POST, { method: "POST", cookie, params: { token } });
    expect(res.status).toBe(410);
  });

  it("refuses a withdrawn invitation with 410", async () => {
    const email = uniqueEmail("withdrawn");
    const sent = await invite(email, "client");
    const token = await tokenFromMail(email);
    const del = await call((await import("@/app/api/v1/projects/[projectId]/invitations/[invitationId]/route")).DELETE, {
      method: "DELETE",
      cookie: consultantCookie,
      params: { projectId, invitationId: sent.json.invitation.id },
    });
    expect(del.status).toBe(200);
    const u = await makeUser({ email });
    const res = await call((await acceptRoute()).POST, { method: "POST", cookie: await signIn(u.email), params: { token } });
    expect(res.status).toBe(410);
  });

  it("refuses acceptance by a different signed-in address with 403", async () => {
    const email = uniqueEmail("meant-for");
    await invite(email, "client");
    const token = await tokenFromMail(email);
    const other = await makeUser();
    const res = await call((await acceptRoute()).POST, { method: "POST", cookie: await signIn(other.email), params: { token } });
    expect(res.status).toBe(403);
    expect(res.json.error.message).toContain(email);
  });

  it("answers 404 for a token that does not exist", async () => {
    const res = await call((await describeRoute()).GET, { params: { token: "nope" } });
    expect(res.status).toBe(404);
  });
});

describe("settings", () => {
  it("saves the unit preference and refuses an unknown one with the field named", async () => {
    const me = await import("@/app/api/v1/me/route");
    const bad = await call(me.PATCH, { method: "PATCH", cookie: architectCookie, body: { unitPreference: "cubits" } });
    expect(bad.status).toBe(422);
    expect(bad.json.error.issues[0].field).toBe("unitPreference");
    const good = await call(me.PATCH, { method: "PATCH", cookie: architectCookie, body: { unitPreference: "imperial" } });
    expect(good.status).toBe(200);
    expect((await call(me.GET, { cookie: architectCookie })).json.unitPreference).toBe("imperial");
  });
});
