import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeBuildUp, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, readMail, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let roomId = "";
let buildUpId = "";
const cookie: Record<string, string> = {};
const email: Record<string, string> = {};

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id, "Board test project (fictional)").id;
  buildUpId = makeBuildUp(projectId, "Wall panel").id;
  for (const role of ["consultant", "architect", "client"] as const) {
    const u = await makeUser({ firmId: role === "consultant" ? firm.id : null, name: `${role} person (fictional)` });
    addMember(projectId, u.id, role);
    cookie[role] = await signIn(u.email);
    email[role] = u.email;
  }
  const { createRoom } = await import("@/lib/services/rooms");
  const { actorFromHeaders } = await import("@/lib/auth/session");
  roomId = createRoom(await actorFromHeaders(new Headers({ cookie: cookie.consultant })), projectId, { name: "Hall", use: "speech", shape: "shoebox", length: 12, width: 8, height: 4 }).id;
});
afterAll(() => envHandle.cleanup());

const boardRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
const pinsRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/pins/route");
const repliesRoute = () => import("@/app/api/v1/projects/[projectId]/pins/[pinId]/replies/route");
const resolveRoute = () => import("@/app/api/v1/projects/[projectId]/pins/[pinId]/resolve/route");
const roomRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route");

const params = (surfaceKey = "wall-a") => ({ projectId, roomId, surfaceKey });
const panel = (i: number, over: Record<string, unknown> = {}) => ({ id: `p-${i}`, buildUpId, code: `P-${String(i).padStart(3, "0")}`, x: 0.1 + i * 0.7, y: 0.5, width: 0.6, height: 1.2, ...over });

async function put(body: unknown, who = "consultant", surfaceKey = "wall-a") {
  return call((await boardRoute()).PUT, { method: "PUT", cookie: cookie[who], params: params(surfaceKey), body });
}

describe("saving a board", () => {
  it("saves panels with a version, and the room's check counts their area", async () => {
    const before = await call((await roomRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId } });
    const t125 = before.json.check.octaves.find((o: { f: number }) => o.f === 125).after.sabine;
    const res = await put({ version: 0, gridModule: 0.3, placements: [panel(0), panel(1), panel(2)] });
    expect(res.status).toBe(200);
    expect(res.json.version).toBe(1);
    expect(res.json.placements).toHaveLength(3);
    const after = await call((await roomRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId } });
    // three 0.6 × 1.2 m panels: 2.16 m² placed on wall A
    expect(after.json.placed).toEqual([{ surfaceKey: "wall-a", buildUpId, area: expect.closeTo(2.16, 9) }]);
    expect(after.json.check.octaves.find((o: { f: number }) => o.f === 125).after.sabine).toBeLessThan(t125);
  });

  it("refuses a save on a stale version with 409, keeping the first editor's panels", async () => {
    const current = await call((await boardRoute()).GET, { cookie: cookie.consultant, params: params() });
    const v = current.json.version;
    expect((await put({ version: v, placements: [panel(0)] })).status).toBe(200);
    const before = tableCounts();
    const stale = await put({ version: v, placements: [panel(0), panel(5), panel(6)] });
    expect(stale.status).toBe(409);
    expect(stale.json.error.message).toMatch(/changed by someone else/);
    expect(tableCounts()).toEqual(before);
    const now = await call((await boardRoute()).GET, { cookie: cookie.consultant, params: params() });
    expect(now.json.placements.map((p: { id: string }) => p.id)).toEqual(["p-0"]);
    expect(now.json.version).toBe(v + 1);
  });

  it.each([
    ["an unknown build-up", () => [panel(0, { buildUpId: "nope" })], "placements.0.buildUpId"],
    ["two panels with one code", () => [panel(0), panel(1, { code: "P-000" })], "placements.1.code"],
    ["a panel 10 mm wide", () => [panel(0, { width: 0.01 })], "placements.0.width"],
  ])("refuses %s with 422 naming the field", async (_what, placements, field) => {
    const v = (await call((await boardRoute()).GET, { cookie: cookie.consultant, params: params() })).json.version;
    const res = await put({ version: v, placements: placements() });
    expect(res.status).toBe(422);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toContain(field);
  });

  it("lets the architect see the board but not move panels", async () => {
    const v = (await call((await boardRoute()).GET, { cookie: cookie.architect, params: params() })).json.version;
    const res = await put({ version: v, placements: [] }, "architect");
    expect(res.status).toBe(403);
    expect((await call((await boardRoute()).GET, { cookie: cookie.client, params: params() })).status).toBe(403);
  });
});

describe("what the room's check counts of a board", () => {
  it("counts only what can exist: overlaps once, nothing over the door", async () => {
    const { createRoom } = await import("@/lib/services/rooms");
    const { actorFromHeaders } = await import("@/lib/auth/session");
    const door = { kind: "door" as const, name: "Door", x: 2, y: 0, width: 1, height: 2.1, material: "timber-door" };
    const studio = createRoom(await actorFromHeaders(new Headers({ cookie: cookie.consultant })), projectId, {
      name: "Studio",
      use: "speech",
      shape: "shoebox",
      length: 10,
      width: 6,
      height: 3,
      surfaces: [{ key: "wall-a", name: "Wall A", kind: "wall", width: 10, height: 3, finish: "plaster-on-masonry", openings: [door] }],
    }).id;
    const boardParams = { projectId, roomId: studio, surfaceKey: "wall-a" };
    // 0.6 × 1.2 panels: P-000 at x = 0.1 and P-001 at x = 0.4 share 0.3 × 1.2 = 0.36 m² (one
    // layer counts: 0.9 × 1.2 = 1.08 m²); P-002 at x = 1.7, y = 0.5 reaches x = 2.3, so 0.3 ×
    // 1.2 = 0.36 m² of it lies over the door (x 2–3, up to 2.1 m): 0.36 m² of it counts.
    // Counted: 1.08 + 0.36 = 1.44 m² of the 2.16 m² placed.
    const placements = [panel(0, { id: "s-0" }), panel(1, { id: "s-1", x: 0.4 }), panel(2, { id: "s-2", x: 1.7 })];
    const saved = await call((await boardRoute()).PUT, { method: "PUT", cookie: cookie.consultant, params: boardParams, body: { version: 0, placements } });
    expect(saved.status).toBe(200);
    const after = await call((await roomRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId: studio } });
    expect(after.json.placed).toEqual([{ surfaceKey: "wall-a", buildUpId, area: expect.closeTo(1.44, 9) }]);
    expect(after.json.check.ok).toBe(true);
  });
});

describe("the project's edge clearance", () => {
  it("is set by the consultant, reaches every board, and refuses a length out of range", async () => {
    const projectRoute = await import("@/app/api/v1/projects/[projectId]/route");
    const bad = await call(projectRoute.PATCH, { method: "PATCH", cookie: cookie.consultant, params: { projectId }, body: { edgeClearance: 5 } });
    expect(bad.status).toBe(422);
    expect(bad.json.error.issues[0].field).toBe("edgeClearance");
    const ok = await call(projectRoute.PATCH, { method: "PATCH", cookie: cookie.consultant, params: { projectId }, body: { edgeClearance: 0.1 } });
    expect(ok.status).toBe(200);
    const b = await call((await boardRoute()).GET, { cookie: cookie.architect, params: params("wall-c") });
    expect(b.json.clearance).toBe(0.1);
    expect((await call(projectRoute.PATCH, { method: "PATCH", cookie: cookie.architect, params: { projectId }, body: { edgeClearance: 0 } })).status).toBe(403);
  });
});

describe("review pins", () => {
  it("an architect's pin e-mails the consultant; the consultant's reply e-mails the architect; the consultant resolves", async () => {
    const made = await call((await pinsRoute()).POST, { method: "POST", cookie: cookie.architect, params: params("wall-b"), body: { x: 2, y: 2.5, body: "Clash with the sprinkler head" } });
    expect(made.status).toBe(201);
    expect(made.json.number).toBe(1);
    const toConsultant = await readMail(envHandle.mail.httpPort, email.consultant);
    expect(toConsultant.at(-1)!.subject).toMatch(/Pin 1 on Hall, Wall B/);
    expect(toConsultant.at(-1)!.text).toContain("Clash with the sprinkler head");
    expect(toConsultant.at(-1)!.text).toMatch(/\/rooms\/.+\/board\/wall-b\?pin=1/);

    const reply = await call((await repliesRoute()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId, pinId: made.json.id }, body: { body: "Moved the panel 300 mm left." } });
    expect(reply.status).toBe(201);
    const toArchitect = await readMail(envHandle.mail.httpPort, email.architect);
    expect(toArchitect.at(-1)!.text).toContain("Moved the panel 300 mm left.");

    const rooms = await call((await import("@/app/api/v1/projects/[projectId]/rooms/route")).GET, { cookie: cookie.consultant, params: { projectId } });
    expect(rooms.json.rooms.find((r: { id: string }) => r.id === roomId).openPins).toBe(1);

    expect((await call((await resolveRoute()).POST, { method: "POST", cookie: cookie.architect, params: { projectId, pinId: made.json.id }, body: { resolved: true } })).status).toBe(403);
    const resolved = await call((await resolveRoute()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId, pinId: made.json.id }, body: { resolved: true } });
    expect(resolved.status).toBe(200);
    const board = await call((await boardRoute()).GET, { cookie: cookie.architect, params: params("wall-b") });
    expect(board.json.pins[0].resolved.by).toBe("consultant person (fictional)");
    expect(board.json.pins[0].replies).toHaveLength(1);
    const roomsAfter = await call((await import("@/app/api/v1/projects/[projectId]/rooms/route")).GET, { cookie: cookie.consultant, params: { projectId } });
    expect(roomsAfter.json.rooms.find((r: { id: string }) => r.id === roomId).openPins).toBe(0);
  });

  it("refuses an empty comment and a client's pin", async () => {
    const empty = await call((await pinsRoute()).POST, { method: "POST", cookie: cookie.architect, params: params(), body: { x: 1, y: 1, body: "  " } });
    expect(empty.status).toBe(422);
    expect(empty.json.error.issues[0].field).toBe("body");
    const client = await call((await pinsRoute()).POST, { method: "POST", cookie: cookie.client, params: params(), body: { x: 1, y: 1, body: "Hello" } });
    expect(client.status).toBe(403);
  });
});
