import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { SPEC, addMember, makeBuildUp, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

// Issue 8, defects 6 and 8: sizes no practitioner would accept are refused at the route, in
// the one schema per input, with the reason; the message names the field and speaks the
// person's units; a refusal writes nothing.
let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let roomId = "";
let buildUpId = "";
const cookie: Record<string, string> = {};

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id, "Plausibility project (fictional)").id;
  buildUpId = makeBuildUp(projectId, "Wall panel").id;
  for (const [who, unitPreference] of [["metric", "metric"], ["imperial", "imperial"]] as const) {
    const u = await makeUser({ firmId: firm.id, unitPreference });
    addMember(projectId, u.id, "consultant");
    cookie[who] = await signIn(u.email);
  }
  const made = await create({ name: "Hall", use: "speech", shape: "shoebox", length: 12, width: 8, height: 3 });
  expect(made.status).toBe(201);
  roomId = made.json.id;
});
afterAll(() => envHandle.cleanup());

const roomsRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/route");
const boardRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
const pinsRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/pins/route");
const buildUpRoute = () => import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route");

async function create(body: Record<string, unknown>, who = "metric") {
  return call((await roomsRoute()).POST, { method: "POST", cookie: cookie[who], params: { projectId }, body });
}

type Issue = { field: string; message: string };
const issueAt = (res: { json: { error: { issues: Issue[] } } }, field: string) => res.json.error.issues.find((i) => i.field === field)?.message;

// The refusal must name the field with the reason, and the database must not change.
async function refused(run: () => Promise<{ status: number; json: { error: { issues: Issue[] } } }>, field: string, message: RegExp) {
  const before = tableCounts();
  const res = await run();
  expect(res.status).toBe(422);
  expect(issueAt(res, field), JSON.stringify(res.json.error.issues)).toMatch(message);
  expect(tableCounts()).toEqual(before);
}

const shoebox = { name: "Room", use: "speech", shape: "shoebox" };

describe("rooms: plausible sizes", () => {
  it.each([
    ["a 999,999 m long room", { ...shoebox, length: 999_999, width: 8, height: 3 }, "length", /at most 300 m \(999999 m was given\): Cavitas models rooms from a vocal booth to a covered arena/],
    ["a room 3 mm high", { ...shoebox, length: 10, width: 8, height: 0.003 }, "height", /at least 1 m \(0.003 m was given\)/],
    ["a negative width", { ...shoebox, length: 10, width: -3, height: 3 }, "width", /cannot be negative \(−3 m\)/],
    ["a shoebox of 9 million m³", { ...shoebox, length: 300, width: 300, height: 100 }, "length", /would hold 9000000 m³, more than 1000000 m³/],
    ["a free room of 32 million m³", { name: "Room", use: "speech", shape: "free", volume: 32e6, surfaces: [] }, "volume", /between 1 m³ and 1000000 m³ \(32000000 m³ was given\)/],
  ])("refuses %s with the reason, at the field", async (_what, body, field, message) => {
    await refused(() => create(body), field, message);
  });

  it("refuses an opening 500 m left of its wall", async () => {
    const surfaces = [{ key: "wall-a", name: "Wall A (length)", kind: "wall", width: 10, height: 3, finish: "plaster-on-masonry", openings: [{ kind: "door", name: "", x: -500, y: 0, width: 0.9, height: 2.1, material: "timber-door" }] }];
    await refused(() => create({ ...shoebox, length: 10, width: 8, height: 3, surfaces }), "surfaces.0.openings.0.x", /The distance from the left cannot be negative \(−500 m\)/);
  });

  it("speaks feet and inches to a person who works in imperial units", async () => {
    // 300 m = 11811.02 in = 984 ft 3 in to the nearest 1/16 in.
    await refused(() => create({ ...shoebox, length: 999_999, width: 8, height: 3 }, "imperial"), "length", /at most 984 ft 3 in \(3280836 ft 7 3\/8 in was given\)/);
  });

  it("accepts the ends of the ranges: a 1 m booth and a 300 m hall", async () => {
    expect((await create({ ...shoebox, length: 1, width: 1, height: 2 })).status).toBe(201);
    expect((await create({ ...shoebox, length: 300, width: 100, height: 30 })).status).toBe(201);
  });
});

describe("boards: panels inside a sensible extent of their surface", () => {
  const panel = (over: Record<string, unknown> = {}) => ({ id: "p-1", buildUpId, code: "P-001", x: 1, y: 0.5, width: 0.6, height: 1.2, ...over });
  const put = async (placements: unknown[], who = "metric") => {
    const route = await boardRoute();
    const params = { projectId, roomId, surfaceKey: "wall-b" };
    const version = (await call(route.GET, { cookie: cookie[who], params })).json.version;
    return call(route.PUT, { method: "PUT", cookie: cookie[who], params, body: { version, placements } });
  };

  it.each([
    // Wall B of a 12 × 8 × 3 m room is 8 m × 3 m.
    ["a 100 m × 100 m panel on an 8 m × 3 m wall", { width: 100, height: 100 }, "placements.0.width", /^A panel 100 m wide is larger than Wall B \(width\) \(8 m × 3 m\): it can be at most 8 m\.$/],
    ["a panel at x = −500 m", { x: -500 }, "placements.0.x", /^P-001 at x = −500 m lies too far from Wall B \(width\) \(8 m × 3 m\): a panel may be parked to the left or right of the surface, but no farther than 8 m from it\.$/],
    ["a panel of no width", { width: 0 }, "placements.0.width", /at least 20 mm \(0 mm was given\)/],
    ["a negative height", { height: -1.2 }, "placements.0.height", /cannot be negative \(−1200 mm\)/],
  ])("refuses %s with the reason, at the field", async (_what, over, field, message) => {
    await refused(() => put([panel(over)]), field, message);
  });

  it("keeps a panel parked beside the wall while the layout is worked out", async () => {
    const res = await put([panel({ x: -1 })]);
    expect(res.status).toBe(200);
  });

  it("says the surface's size in feet and inches to an imperial user", async () => {
    await refused(() => put([panel({ height: 20 })], "imperial"), "placements.0.height", /A panel 65 ft 7 3\/8 in high is larger than Wall B \(width\) \(26 ft 2 15\/16 in × 9 ft 10 1\/8 in\)/);
  });
});

describe("pins: comments with a length limit", () => {
  const pin = async (body: Record<string, unknown>) => call((await pinsRoute()).POST, { method: "POST", cookie: cookie.metric, params: { projectId, roomId, surfaceKey: "wall-b" }, body });
  it.each([
    ["an empty comment", { x: 1, y: 1, body: "   " }, "body", /Write the comment/],
    ["a 2,500-character comment", { x: 1, y: 1, body: "a".repeat(2500) }, "body", /Keep the comment to 2000 characters/],
    ["a pin off the wall", { x: 50, y: 1, body: "Here" }, "x", /Place the pin on Wall B \(width\) \(8 m × 3 m\): x = 50 m is off it/],
  ])("refuses %s with a message", async (_what, body, field, message) => {
    await refused(() => pin(body), field, message);
  });
});

describe("build-ups: messages in the person's units", () => {
  const save = async (spec: Record<string, unknown>, who: string) => {
    const route = await buildUpRoute();
    const params = { projectId, buildUpId };
    const current = (await call(route.GET, { cookie: cookie[who], params })).json;
    const { id: _i, projectId: _p, updatedAt: _u, fireReport: _f, result: _r, ...fields } = current;
    return call(route.PUT, { method: "PUT", cookie: cookie[who], params, body: { ...fields, spec } });
  };
  const spec = (facing: Record<string, unknown>, cavity: Record<string, unknown> = {}) => ({ ...SPEC, facing: { ...SPEC.facing, ...facing }, cavity: { ...SPEC.cavity, ...cavity } });

  it("says a hole as wide as its pitch in millimetres to a metric user, without 'SI units'", async () => {
    await refused(() => save(spec({ holeDiameter: 0.04, pitch: 0.04 }), "metric"), "spec.facing.holeDiameter", /^The hole diameter \(40 mm\) must be less than the pitch \(40 mm\): the holes would overlap\.$/);
  });

  it("says it in inches to an imperial user", async () => {
    // 40 mm = 1.5748 in → 1.575 in.
    await refused(() => save(spec({ holeDiameter: 0.04, pitch: 0.04 }), "imperial"), "spec.facing.holeDiameter", /The hole diameter \(1.575 in\) must be less than the pitch \(1.575 in\)/);
  });

  it("says a negative size is negative, and a metre typed for millimetres is too large", async () => {
    await refused(() => save(spec({}, { depth: -0.2 }), "metric"), "spec.cavity.depth", /The cavity depth cannot be negative \(−200 mm\)/);
    await refused(() => save(spec({ thickness: 16 }), "metric"), "spec.facing.thickness", /The plate thickness must be at most 100 mm \(16000 mm was given\)/);
  });
});
