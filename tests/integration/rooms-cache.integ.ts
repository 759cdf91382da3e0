import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeBuildUp, makeFirm, makeProject, makeUser, SPEC } from "../support/factories";
import { signIn } from "../support/http";
import type { Actor } from "@/lib/services/actor";

// Defect 9: the rooms list keeps each room's check by the versions it depends on. A second
// listing runs no check; each kind of change reruns exactly the checks it touches; and what
// the warm cache answers always equals a cold computation (a fresh module, an empty cache).

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let actor: Actor;
let projectId = "";
let buildUpId = "";
const roomIds: string[] = [];
let rooms: typeof import("@/lib/services/rooms");

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id).id;
  buildUpId = makeBuildUp(projectId).id;
  const u = await makeUser({ firmId: firm.id });
  addMember(projectId, u.id, "consultant");
  const { actorFromHeaders } = await import("@/lib/auth/session");
  actor = (await actorFromHeaders(new Headers({ cookie: await signIn(u.email) })))!;
  rooms = await import("@/lib/services/rooms");
  for (const name of ["Hall", "Studio"]) roomIds.push(rooms.createRoom(actor, projectId, { name, use: "speech", shape: "shoebox", length: 12, width: 8, height: 4 }).id);
});
afterAll(() => envHandle.cleanup());

// A listing from the warm cache, with how many checks it ran and how many it reused.
function listWarm() {
  const before = rooms.roomSummaryCacheStats();
  const list = rooms.listRooms(actor, projectId);
  const after = rooms.roomSummaryCacheStats();
  return { list, ran: after.misses - before.misses, reused: after.hits - before.hits };
}

async function listCold() {
  vi.resetModules();
  const fresh = await import("@/lib/services/rooms");
  return fresh.listRooms(actor, projectId);
}

describe("the rooms list's check cache (defect 9)", () => {
  it("runs each room's check once, then reuses it", async () => {
    const rooms0 = listWarm(); // makeProject's own room, Hall and Studio
    expect(rooms0.list).toHaveLength(3);
    const again = listWarm();
    expect([again.ran, again.reused]).toEqual([0, 3]);
    expect(again.list).toEqual(await listCold());
  });

  it("reruns only the room that was edited", async () => {
    const hall = rooms.getRoom(actor, projectId, roomIds[0]);
    rooms.updateRoom(actor, projectId, roomIds[0], { ...hall, name: "Main hall", treatments: [{ surfaceKey: "wall-a", buildUpId, area: 12 }], version: hall.version });
    const after = listWarm();
    expect([after.ran, after.reused]).toEqual([1, 2]);
    expect(after.list.find((r) => r.id === roomIds[0])).toMatchObject({ name: "Main hall", treatedArea: 12 });
    expect(after.list).toEqual(await listCold());
  });

  it("reruns only the room whose board was saved", async () => {
    const { saveBoard } = await import("@/lib/services/boards");
    saveBoard(actor, projectId, roomIds[1], "wall-b", { version: 0, placements: [{ id: "a", buildUpId, code: "P-001", x: 0.2, y: 0.2, width: 0.6, height: 1.2 }] });
    const after = listWarm();
    expect([after.ran, after.reused]).toEqual([1, 2]);
    expect(after.list.find((r) => r.id === roomIds[1])!.treatedArea).toBeCloseTo(0.72, 9);
    expect(after.list).toEqual(await listCold());
  });

  it("reruns every room when a build-up changes, and when a material is added", async () => {
    const { updateBuildUp } = await import("@/lib/services/build-ups");
    const before = listWarm().list.find((r) => r.id === roomIds[0])!;
    updateBuildUp(actor, projectId, buildUpId, { name: "Deeper", spec: { ...SPEC, cavity: { depth: 0.1, partitioned: true } }, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03, version: 1 });
    const changed = listWarm();
    expect([changed.ran, changed.reused]).toEqual([3, 0]);
    expect(changed.list.find((r) => r.id === roomIds[0])!.mean).not.toEqual(before.mean);
    expect(changed.list).toEqual(await listCold());
    const { createProjectMaterial } = await import("@/lib/services/materials");
    createProjectMaterial(actor, projectId, { name: "Felt", alpha: { "125": 0.1, "250": 0.2, "500": 0.3, "1000": 0.4, "2000": 0.5, "4000": 0.6 }, source: "Invented for the test" });
    expect(listWarm().ran).toBe(3);
  });

  it("reads open pins fresh while reusing the checks", async () => {
    const { createPin } = await import("@/lib/services/boards");
    await createPin(actor, projectId, roomIds[1], "wall-a", { x: 1, y: 1, body: "A question" });
    const after = listWarm();
    expect(after.ran).toBe(0);
    expect(after.list.find((r) => r.id === roomIds[1])!.openPins).toBe(1);
  });
});
