import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { waitForMail } from "../support/mail";
import { tableCounts } from "../support/counts";
import { pinAuthors, pinBy } from "../support/actors";

// A consultant removes a member from a project; the last consultant stays.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let firmId = "";
beforeAll(async () => {
  envHandle = await useTestEnvironment();
  firmId = makeFirm().id;
});
afterAll(() => envHandle.cleanup());

const memberRoute = () => import("@/app/api/v1/projects/[projectId]/members/[userId]/route");
const remove = async (projectId: string, userId: string, cookie: string) =>
  call((await memberRoute()).DELETE, { method: "DELETE", cookie, params: { projectId, userId } });

async function team() {
  const project = makeProject(firmId, "Removal test project (fictional)");
  const consultant = await makeUser({ firmId, name: "Cora Consultant (fictional)" });
  const architect = await makeUser({ name: "Ari Architect (fictional)" });
  addMember(project.id, consultant.id, "consultant");
  addMember(project.id, architect.id, "architect");
  return { projectId: project.id, consultant, architect, consultantCookie: await signIn(consultant.email), architectCookie: await signIn(architect.email) };
}

describe("removing a project member", () => {
  it("takes the member off the project, keeps their pins under their name, and tells them", async () => {
    const t = await team();
    const roomId = await pinBy(t.consultantCookie, t.architectCookie, t.projectId, "Align with the window head");
    const res = await remove(t.projectId, t.architect.id, t.consultantCookie);
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ removed: t.architect.id, self: false });

    const project = await call((await import("@/app/api/v1/projects/[projectId]/route")).GET, { cookie: t.architectCookie, params: { projectId: t.projectId } });
    expect(project.status).toBe(404);
    expect(await pinAuthors(t.consultantCookie, t.projectId, roomId)).toEqual([{ body: "Align with the window head", author: "Ari Architect (fictional)" }]);

    const [mail] = await waitForMail(envHandle.mail, t.architect.email);
    expect(mail.subject).toBe("You were removed from Removal test project (fictional) on Cavitas");
    expect(mail.text).toMatch(/Cora Consultant \(fictional\) removed you .* where you were architect/);
  });

  it("refuses to remove the last consultant, even themselves, and changes nothing", async () => {
    const t = await team();
    const before = tableCounts();
    const res = await remove(t.projectId, t.consultant.id, t.consultantCookie);
    expect(res.status).toBe(409);
    expect(res.json.error.message).toBe("Cora Consultant (fictional) is the only consultant on this project. Invite another consultant before removing them.");
    expect(tableCounts()).toEqual(before);
  });

  it("lets a consultant leave when another consultant stays", async () => {
    const t = await team();
    const second = await makeUser({ firmId });
    addMember(t.projectId, second.id, "consultant");
    const res = await remove(t.projectId, t.consultant.id, t.consultantCookie);
    expect(res.status).toBe(200);
    expect(res.json.self).toBe(true);
  });

  it("refuses an architect (403) and an unknown member (404), writing nothing", async () => {
    const t = await team();
    const before = tableCounts();
    const res = await remove(t.projectId, t.consultant.id, t.architectCookie);
    expect(res.status).toBe(403);
    expect(res.json.error.message).toMatch(/architect on this project you may not remove people/i);
    expect((await remove(t.projectId, "no-such-user", t.consultantCookie)).status).toBe(404);
    expect(tableCounts()).toEqual(before);
  });
});
