import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { tableCounts } from "../support/counts";
import { designedRoom } from "../support/submittals";
import { getDb } from "@/db/client";
import { submittal } from "@/db/schema";

// A render that fails leaves the revision a draft with the error shown, nothing issued and no
// one told; the next attempt issues the same letter. The renderer is made to fail here (the
// only stand-in in these tests): a real failure cannot be provoked from valid input.
const failNext = vi.hoisted(() => ({ count: 0 }));
vi.mock("@/lib/documents", async (original) => {
  const real = await original<typeof import("@/lib/documents")>();
  return {
    ...real,
    renderSubmittalPdf: async (...args: Parameters<typeof real.renderSubmittalPdf>) => {
      if (failNext.count > 0) {
        failNext.count--;
        throw new Error("the font file could not be read");
      }
      return real.renderSubmittalPdf(...args);
    },
  };
});

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let roomId = "";
const cookie: Record<string, string> = {};
const mailsTo = (address: string) => envHandle.mail.messages.filter((m) => m.to.includes(address));
let clientEmail = "";

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id).id;
  const consultant = await makeUser({ firmId: firm.id });
  const client = await makeUser();
  addMember(projectId, consultant.id, "consultant");
  addMember(projectId, client.id, "client");
  clientEmail = client.email;
  cookie.consultant = await signIn(consultant.email);
  ({ roomId } = await designedRoom(cookie.consultant, projectId, { panels: 2 }));
});
afterAll(() => envHandle.cleanup());

async function issue() {
  const readiness = (await call((await import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/readiness/route")).GET, { cookie: cookie.consultant, params: { projectId, roomId } })).json;
  const route = await import("@/app/api/v1/projects/[projectId]/submittals/route");
  return call(route.POST, { method: "POST", cookie: cookie.consultant, params: { projectId }, body: { roomId, letter: readiness.letter, confirm: readiness.items.map((i: { key: string }) => i.key) } });
}

describe("a submittal PDF that fails to render", () => {
  it("leaves revision A a draft with the error, issues nothing and tells no one", async () => {
    failNext.count = 1;
    const before = tableCounts();
    const res = await issue();
    expect(res.status).toBe(500);
    expect(res.json.error.message).toBe(
      "The submittal PDF of revision A could not be made (the font file could not be read). Revision A stays a draft: nothing was issued and no one was told. Try again; if it fails again, send us this message.",
    );
    const rows = getDb().select().from(submittal).where(eq(submittal.roomId, roomId)).all();
    expect(rows.map((r) => ({ letter: r.letter, state: r.state, snapshot: r.snapshot, error: r.renderError }))).toEqual([{ letter: "A", state: "draft", snapshot: null, error: "the font file could not be read" }]);
    const after = tableCounts();
    expect(after.submittal_document).toBe(before.submittal_document);
    expect(after.notification).toBe(before.notification);
    expect(mailsTo(clientEmail)).toEqual([]);
    // The consultant sees the draft with its error; the client does not see it at all.
    const list = await import("@/app/api/v1/projects/[projectId]/submittals/route");
    const mine = (await call(list.GET, { cookie: cookie.consultant, params: { projectId } })).json;
    expect(mine.rooms[0].revisions).toEqual([expect.objectContaining({ letter: "A", state: "draft", renderError: "the font file could not be read" })]);
  });

  it("issues the same letter on the next attempt", async () => {
    const res = await issue();
    expect(res.status).toBe(201);
    expect(res.json.letter).toBe("A");
    const rows = getDb().select().from(submittal).where(eq(submittal.roomId, roomId)).all();
    expect(rows.map((r) => [r.letter, r.state, r.renderError])).toEqual([["A", "issued", null]]);
  });
});
