import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeBuildUp, makeFirm, makeProject, makeUser, SPEC } from "../support/factories";
import { call, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

// Defect 6: ids sent by a client. An empty one is a field error, never a foreign-key failure;
// a panel id that exists on another project's board neither fails nor tells that it exists.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
const mine = { projectId: "", roomId: "", buildUpId: "", cookie: "" };
const theirs = { projectId: "", roomId: "", buildUpId: "", cookie: "" };

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  const { createRoom } = await import("@/lib/services/rooms");
  const { actorFromHeaders } = await import("@/lib/auth/session");
  for (const side of [mine, theirs]) {
    side.projectId = makeProject(firm.id).id;
    side.buildUpId = makeBuildUp(side.projectId).id;
    const u = await makeUser({ firmId: firm.id });
    addMember(side.projectId, u.id, "consultant");
    side.cookie = await signIn(u.email);
    side.roomId = createRoom(await actorFromHeaders(new Headers({ cookie: side.cookie })), side.projectId, { name: "Hall", use: "speech", shape: "shoebox", length: 12, width: 8, height: 4 }).id;
  }
});
afterAll(() => envHandle.cleanup());

describe("empty ids (defect 6)", () => {
  it("answers fireReportId \"\" on a build-up with a field error and writes nothing", async () => {
    const { POST } = await import("@/app/api/v1/projects/[projectId]/build-ups/route");
    const before = tableCounts();
    const res = await call(POST, { method: "POST", cookie: mine.cookie, params: { projectId: mine.projectId }, body: { name: "Panel", spec: SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03, fireReportId: "" } });
    expect(res.status).toBe(422);
    expect(res.json.error.issues).toEqual([{ field: "fireReportId", message: expect.stringMatching(/Choose a file/) }]);
    expect(tableCounts()).toEqual(before);
  });

  it("answers fireReportId \"\" on a build-up update with a field error", async () => {
    const { PUT } = await import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route");
    const res = await call(PUT, {
      method: "PUT",
      cookie: mine.cookie,
      params: { projectId: mine.projectId, buildUpId: mine.buildUpId },
      body: { name: "Panel", spec: SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03, fireReportId: "", version: 1 },
    });
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0].field).toBe("fireReportId");
  });

  it("answers reportId \"\" on a material with a field error and writes nothing", async () => {
    const { POST } = await import("@/app/api/v1/projects/[projectId]/materials/route");
    const before = tableCounts();
    const alpha = { "125": 0.1, "250": 0.2, "500": 0.3, "1000": 0.4, "2000": 0.5, "4000": 0.6 };
    const res = await call(POST, { method: "POST", cookie: mine.cookie, params: { projectId: mine.projectId }, body: { name: "Felt", alpha, source: "Invented for the test", reportId: "" } });
    expect(res.status).toBe(422);
    expect(res.json.error.issues).toEqual([{ field: "reportId", message: expect.stringMatching(/Choose a file/) }]);
    expect(tableCounts()).toEqual(before);
  });
});

describe("panel ids (defect 6)", () => {
  const panel = (id: string, buildUpId: string) => ({ id, buildUpId, code: "P-001", x: 0.2, y: 0.5, width: 0.6, height: 1.2 });
  async function save(side: typeof mine, placements: unknown[], version: number) {
    const { PUT } = await import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
    return call(PUT, { method: "PUT", cookie: side.cookie, params: { projectId: side.projectId, roomId: side.roomId, surfaceKey: "wall-a" }, body: { version, placements } });
  }

  it("saves a panel whose id another project's board already uses, and leaves that board alone", async () => {
    const shared = "panel-taken-elsewhere";
    expect((await save(theirs, [panel(shared, theirs.buildUpId)], 0)).status).toBe(200);
    const res = await save(mine, [panel(shared, mine.buildUpId)], 0);
    expect(res.status).toBe(200);
    expect(res.json.placements.map((p: { id: string }) => p.id)).toEqual([shared]);
    const { GET } = await import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
    const other = await call(GET, { cookie: theirs.cookie, params: { projectId: theirs.projectId, roomId: theirs.roomId, surfaceKey: "wall-a" } });
    expect(other.json.placements).toEqual([expect.objectContaining({ id: shared, buildUpId: theirs.buildUpId })]);
  });

  it("answers a taken id exactly as a fresh one, so nothing is learnt about other projects", async () => {
    const { GET } = await import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
    const current = await call(GET, { cookie: mine.cookie, params: { projectId: mine.projectId, roomId: mine.roomId, surfaceKey: "wall-a" } });
    const taken = await save(mine, [panel("panel-taken-elsewhere", mine.buildUpId)], current.json.version);
    const fresh = await save(mine, [panel("never-used-anywhere", mine.buildUpId)], taken.json.version);
    expect([taken.status, fresh.status]).toEqual([200, 200]);
    const shape = (b: { placements: { id: string }[] }) => b.placements.map(({ id: _id, ...rest }) => rest);
    expect(shape(taken.json)).toEqual(shape(fresh.json));
  });

  it("keeps ids stable across saves, so the editor's selection survives", async () => {
    const { GET } = await import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
    const current = await call(GET, { cookie: mine.cookie, params: { projectId: mine.projectId, roomId: mine.roomId, surfaceKey: "wall-a" } });
    const saved = await save(mine, [panel("a", mine.buildUpId), { ...panel("b", mine.buildUpId), code: "P-002", x: 1 }], current.json.version);
    const again = await save(mine, saved.json.placements, saved.json.version);
    expect(again.json.placements.map((p: { id: string }) => p.id)).toEqual(["a", "b"]);
  });
});
