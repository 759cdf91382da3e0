import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser, TEST_PASSWORD } from "../support/factories";
import { call, signIn } from "../support/http";
import { authPost } from "../support/auth-requests";
import { waitForMail } from "../support/mail";
import { tableCounts } from "../support/counts";
import { pinAuthors, pinBy } from "../support/actors";

// A firm administrator disables and re-enables a colleague's account.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let firmId = "";
let adminCookie = "";
let adminId = "";
beforeAll(async () => {
  envHandle = await useTestEnvironment();
  firmId = makeFirm("Disable test firm (fictional)").id;
  const admin = await makeUser({ firmId, isFirmAdmin: true, name: "Ada Admin (fictional)" });
  adminId = admin.id;
  adminCookie = await signIn(admin.email);
});
afterAll(() => envHandle.cleanup());

const accountRoute = () => import("@/app/api/v1/firm/accounts/[userId]/route");
const setDisabled = async (userId: string, disabled: unknown, cookie = adminCookie) =>
  call((await accountRoute()).PATCH, { method: "PATCH", cookie, params: { userId }, body: { disabled } });
const me = async (cookie: string) => call((await import("@/app/api/v1/me/route")).GET, { cookie });

describe("disabling an account", () => {
  it("ends its sessions at once, keeps its pins under its name, and refuses sign-in with a clear message", async () => {
    const colleague = await makeUser({ firmId, name: "Cal Colleague (fictional)" });
    const project = makeProject(firmId);
    addMember(project.id, colleague.id, "consultant");
    const cookie = await signIn(colleague.email);
    const roomId = await pinBy(cookie, cookie, project.id, "Check the soffit line");

    const res = await setDisabled(colleague.id, true);
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ id: colleague.id, disabledAt: expect.any(String) });
    expect((await me(cookie)).status).toBe(401);

    // The right password now meets the message; a wrong one still just fails.
    const right = await authPost("/sign-in/email", { email: colleague.email, password: TEST_PASSWORD });
    expect(right.status).toBe(403);
    expect(right.json.code).toBe("ACCOUNT_DISABLED");
    expect(right.json.message).toMatch(/disabled by your firm administrator/);
    expect(right.cookie).not.toMatch(/session_token/);
    expect((await authPost("/sign-in/email", { email: colleague.email, password: "wrong-password-1" })).status).toBe(401);

    // Another consultant on the project still sees the pin under its author's name.
    const other = await makeUser({ firmId });
    addMember(project.id, other.id, "consultant");
    expect(await pinAuthors(await signIn(other.email), project.id, roomId)).toEqual([{ body: "Check the soffit line", author: "Cal Colleague (fictional)" }]);

    const [mail] = await waitForMail(envHandle.mail, colleague.email);
    expect(mail.subject).toBe("Your Disable test firm (fictional) account on Cavitas was disabled");
    expect(mail.text).toMatch(/Ada Admin \(fictional\) disabled your Cavitas account/);

    const list = await call((await import("@/app/api/v1/firm/accounts/route")).GET, { cookie: adminCookie });
    const listed = list.json.accounts.find((a: { id: string }) => a.id === colleague.id);
    expect(listed.disabledAt).toBeTruthy();
    // Another consultant joined, so the project no longer hangs on this account alone.
    expect(listed.soleConsultantOn).toEqual([]);
  });

  it("warns which projects would be left without a consultant", async () => {
    const colleague = await makeUser({ firmId });
    const project = makeProject(firmId, "Only-consultant project (fictional)");
    addMember(project.id, colleague.id, "consultant");
    const list = await call((await import("@/app/api/v1/firm/accounts/route")).GET, { cookie: adminCookie });
    expect(list.json.accounts.find((a: { id: string }) => a.id === colleague.id).soleConsultantOn).toEqual(["Only-consultant project (fictional)"]);
  });

  it("re-enables the account: sign-in works again and the holder is told", async () => {
    const colleague = await makeUser({ firmId });
    await setDisabled(colleague.id, true);
    const res = await setDisabled(colleague.id, false);
    expect(res.status).toBe(200);
    expect(res.json.disabledAt).toBeNull();
    expect((await authPost("/sign-in/email", { email: colleague.email, password: TEST_PASSWORD })).status).toBe(200);
    const mails = await waitForMail(envHandle.mail, colleague.email, 2);
    expect(mails[1].subject).toMatch(/is active again/);
  });

  it("changes nothing and sends nothing when the account is already in that state", async () => {
    const colleague = await makeUser({ firmId });
    const before = tableCounts();
    expect((await setDisabled(colleague.id, false)).status).toBe(200);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses the administrator's own account, another firm's, a non-administrator, and a bad body", async () => {
    const before = tableCounts();
    const self = await setDisabled(adminId, true);
    expect(self.status).toBe(409);
    expect(self.json.error.message).toBe("You cannot disable your own account.");

    const stranger = await makeUser({ firmId: makeFirm("Other firm (fictional)").id });
    const afterStranger = tableCounts();
    expect((await setDisabled(stranger.id, true)).status).toBe(404);

    const colleague = await makeUser({ firmId });
    const colleagueCookie = await signIn(colleague.email);
    const target = await makeUser({ firmId });
    const afterSetup = tableCounts();
    const notAdmin = await setDisabled(target.id, true, colleagueCookie);
    expect(notAdmin.status).toBe(403);
    expect(notAdmin.json.error.message).toMatch(/Only the firm administrator/);

    const bad = await setDisabled(target.id, "yes");
    expect(bad.status).toBe(422);
    expect(bad.json.error.issues[0].field).toBe("disabled");
    expect(tableCounts()).toEqual(afterSetup);
    expect(afterStranger.user).toBe(before.user + 1);
  });
});
