import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeBuildUp, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let buildUpId = "";
const cookie: Record<string, string> = {};

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id).id;
  buildUpId = makeBuildUp(projectId, "Low panel").id;
  for (const role of ["consultant", "architect", "client"] as const) {
    const u = await makeUser({ firmId: firm.id });
    addMember(projectId, u.id, role);
    cookie[role] = await signIn(u.email);
  }
});
afterAll(() => envHandle.cleanup());

const rooms = () => import("@/app/api/v1/projects/[projectId]/rooms/route");
const oneRoom = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route");
const materials = () => import("@/app/api/v1/projects/[projectId]/materials/route");

const flat = (a: number) => ({ "125": a, "250": a, "500": a, "1000": a, "2000": a, "4000": a });

async function material(name: string, a: number): Promise<string> {
  const res = await call((await materials()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId }, body: { name, alpha: flat(a), source: "values of a worked room example, computed in numpy" } });
  expect(res.status).toBe(201);
  return res.json.key;
}

async function create(body: Record<string, unknown>) {
  return call((await rooms()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId }, body });
}

describe("the reverberation check through the API", () => {
  it("reproduces the worked room example: 10 × 8 × 3 m, Sabine about 0.565 s at 500 Hz", async () => {
    // A worked room, computed in numpy with c = 343 m/s and air absorption (ISO 9613-1) at the
    // nominal 500 Hz for 20 °C / 50 %: floor 80 m² α 0.05, ceiling 80 m² α 0.70, long walls
    // 60 m² α 0.05, short walls 48 m² α 0.10 → Sabine 0.5653 s, Eyring 0.4909 s at 500 Hz.
    // We use c from the temperature and the exact mid-band frequency, so allow 1 %.
    const hard = await material("Hard (α 0.05)", 0.05);
    const ceiling = await material("Absorbent ceiling (α 0.70)", 0.7);
    const short = await material("Short walls (α 0.10)", 0.1);
    const finish: Record<string, string> = { "wall-a": hard, "wall-c": hard, "wall-b": short, "wall-d": short, ceiling, floor: hard };
    const surfaces = ["wall-a", "wall-b", "wall-c", "wall-d", "ceiling", "floor"].map((key) => ({ key, name: key, kind: key.startsWith("wall") ? "wall" : key, width: 1, height: 1, finish: finish[key], openings: [] }));
    const res = await create({ name: "Reference room", use: "speech", shape: "shoebox", length: 10, width: 8, height: 3, temperature: 20, humidity: 50, surfaces });
    expect(res.status).toBe(201);
    expect(res.json.volumeM3).toBe(240);
    expect(res.json.surfaces.reduce((a: number, s: { grossArea: number }) => a + s.grossArea, 0)).toBeCloseTo(268, 9);
    const at500 = res.json.check.octaves.find((o: { f: number }) => o.f === 500);
    expect(at500.before.sabine).toBeGreaterThan(0.5653 * 0.99);
    expect(at500.before.sabine).toBeLessThan(0.5653 * 1.01);
    expect(at500.before.eyring).toBeGreaterThan(0.4909 * 0.99);
    expect(at500.before.eyring).toBeLessThan(0.4909 * 1.01);
    // DIN 18041:2016-03 group A2 for 240 m³: 0.37·lg 240 − 0.14 = 0.7407 → 0.74 s, by hand.
    expect(res.json.targetResolved.nominal).toBe(0.74);
  });

  it("counts treatment by area: panels replace the finish they cover and lower T where they absorb more", async () => {
    const made = await create({ name: "Treated room", use: "speech", shape: "shoebox", length: 12, width: 9, height: 4 });
    const before = made.json.check.octaves.find((o: { f: number }) => o.f === 125).after.sabine;
    const put = await call((await oneRoom()).PUT, {
      method: "PUT",
      cookie: cookie.consultant,
      params: { projectId, roomId: made.json.id },
      body: { ...made.json, treatments: [{ surfaceKey: "wall-a", buildUpId, area: 20 }], version: 1 },
    });
    expect(put.status).toBe(200);
    const after = put.json.check.octaves.find((o: { f: number }) => o.f === 125).after.sabine;
    expect(after).toBeLessThan(before);
    expect(put.json.check.treated).toBe(true);
  });
});

describe("bad input keeps what was saved", () => {
  it.each([
    ["a zero length", { length: 0 }, "length"],
    ["a negative height", { height: -3 }, "height"],
    ["a humidity above 100 %", { humidity: 120 }, "humidity"],
    ["an opening larger than its wall", { surfaces: [{ key: "wall-a", name: "Wall A", kind: "wall", width: 10, height: 3, finish: "plaster-on-masonry", openings: [{ kind: "door", name: "", x: 0, y: 0, width: 11, height: 2, material: "timber-door" }] }] }, "surfaces.0.openings.0.width"],
    ["an unknown finish", { surfaces: [{ key: "wall-a", name: "Wall A", kind: "wall", width: 10, height: 3, finish: "moon-dust", openings: [] }] }, "surfaces.0.finish"],
  ])("refuses %s with 422 naming the field", async (_what, over, field) => {
    const before = tableCounts();
    const res = await create({ name: "Bad room", use: "speech", shape: "shoebox", length: 10, width: 8, height: 3, ...over });
    expect(res.status).toBe(422);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toContain(field);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses a volume that cannot hold the surfaces given", async () => {
    const surfaces = [{ key: "s-1", name: "Everything", kind: "wall", width: 20, height: 20, finish: "plaster-on-masonry", openings: [] }];
    const res = await create({ name: "Impossible", use: "other", shape: "free", volume: 50_000, surfaces });
    expect(res.status).toBe(422);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toContain("volume");
  });

  it("refuses more panel area than the surface has, and keeps the saved room", async () => {
    const made = await create({ name: "Small room", use: "speech", shape: "shoebox", length: 5, width: 4, height: 3 });
    const res = await call((await oneRoom()).PUT, {
      method: "PUT",
      cookie: cookie.consultant,
      params: { projectId, roomId: made.json.id },
      body: { ...made.json, name: "Should not stick", treatments: [{ surfaceKey: "wall-a", buildUpId, area: 16 }], version: 1 },
    });
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0]).toMatchObject({ field: "treatments.0.area" });
    const now = await call((await oneRoom()).GET, { cookie: cookie.consultant, params: { projectId, roomId: made.json.id } });
    expect(now.json).toMatchObject({ name: "Small room", version: 1, treatments: [] });
  });

  it("tells the second of two editors that the room changed (409), losing nothing", async () => {
    const made = await create({ name: "Shared room", use: "speech", shape: "shoebox", length: 10, width: 8, height: 3 });
    const edit = (name: string) =>
      oneRoom().then((m) => call(m.PUT, { method: "PUT", cookie: cookie.consultant, params: { projectId, roomId: made.json.id }, body: { ...made.json, name, version: 1 } }));
    expect((await edit("First editor's name")).status).toBe(200);
    const second = await edit("Second editor's name");
    expect(second.status).toBe(409);
    expect(second.json.error.message).toMatch(/changed by someone else/);
    const now = await call((await oneRoom()).GET, { cookie: cookie.consultant, params: { projectId, roomId: made.json.id } });
    expect(now.json).toMatchObject({ name: "First editor's name", version: 2 });
  });
});

describe("who sees rooms", () => {
  it("lets the architect read but not edit, and shows the client nothing of drafts", async () => {
    const made = await create({ name: "Visible room", use: "speech", shape: "shoebox", length: 6, width: 5, height: 3 });
    expect((await call((await oneRoom()).GET, { cookie: cookie.architect, params: { projectId, roomId: made.json.id } })).status).toBe(200);
    const put = await call((await oneRoom()).PUT, { method: "PUT", cookie: cookie.architect, params: { projectId, roomId: made.json.id }, body: { ...made.json, version: 1 } });
    expect(put.status).toBe(403);
    expect((await call((await rooms()).GET, { cookie: cookie.client, params: { projectId } })).status).toBe(403);
  });
});

describe("project materials", () => {
  it("refuses an absorption coefficient outside 0–1.5, naming the octave", async () => {
    const res = await call((await materials()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId }, body: { name: "Odd", alpha: { ...flat(0.2), "500": 3 }, source: "a test" } });
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0].field).toBe("alpha.500");
  });
});
