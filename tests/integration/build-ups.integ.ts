import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser, SPEC, TINY_PDF, TINY_PNG } from "../support/factories";
import { call, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let otherProjectId = "";
const cookie: Record<string, string> = {};

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id).id;
  otherProjectId = makeProject(firm.id, "Someone else's project (fictional)").id;
  for (const role of ["consultant", "installer"] as const) {
    const u = await makeUser({ firmId: firm.id });
    addMember(projectId, u.id, role);
    cookie[role] = await signIn(u.email);
  }
  const other = await makeUser({ firmId: firm.id });
  addMember(otherProjectId, other.id, "consultant");
  cookie.other = await signIn(other.email);
});
afterAll(() => envHandle.cleanup());

const list = () => import("@/app/api/v1/projects/[projectId]/build-ups/route");
const one = () => import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route");
const uploads = () => import("@/app/api/v1/projects/[projectId]/attachments/route");
const download = () => import("@/app/api/v1/projects/[projectId]/attachments/[attachmentId]/route");

const body = (over: Record<string, unknown> = {}) => ({ name: "Panel A", spec: SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03, ...over });

async function create(over: Record<string, unknown> = {}) {
  return call((await list()).POST, { method: "POST", cookie: cookie.consultant, params: { projectId }, body: body(over) });
}

function upload(bytes: Uint8Array<ArrayBuffer>, name: string, purpose = "fire-report", who = "consultant", project = projectId) {
  const form = new FormData();
  form.set("purpose", purpose);
  form.set("file", new File([new Uint8Array(bytes)], name));
  return uploads().then((m) => call(m.POST, { method: "POST", cookie: cookie[who], params: { projectId: project }, form }));
}

describe("build-ups", () => {
  it("creates a build-up and returns the engine's evaluation of it", async () => {
    const res = await create();
    expect(res.status).toBe(201);
    expect(res.json.version).toBe(1);
    // Open area of Ø8 mm holes on a 40 mm square grid: π·8²/(4·40²) = 0.031416 (exact geometry).
    expect(res.json.result.openArea).toBeCloseTo(Math.PI * 64 / (4 * 1600), 5);
    expect(res.json.result.thirdOctaves).toHaveLength(21);
  });

  it.each([
    ["holes as large as their pitch", { spec: { ...SPEC, facing: { ...SPEC.facing, holeDiameter: 0.04 } } }, "spec.facing.holeDiameter"],
    ["a negative cavity", { spec: { ...SPEC, cavity: { depth: -0.1, partitioned: true } } }, "spec.cavity.depth"],
    ["an infill thicker than the cavity", { spec: { ...SPEC, infill: { thickness: 0.3, flowResistivity: 10000, position: "on-backing", model: "miki" } } }, "spec.infill.thickness"],
    // legal numbers below the contract's practical minimums: such a spec would break the check of every room using it
    ["a hole of 1e-300 m", { spec: { ...SPEC, facing: { ...SPEC.facing, holeDiameter: 1e-300 } } }, "spec.facing.holeDiameter"],
    ["a cavity of 5e-324 m", { spec: { ...SPEC, cavity: { depth: 5e-324, partitioned: true } } }, "spec.cavity.depth"],
    ["borders wider than the module", { borderX: 0.35 }, "borderX"],
    ["no name", { name: " " }, "name"],
  ])("refuses %s with 422 naming the field, writing nothing", async (_what, over, field) => {
    const before = tableCounts();
    const res = await create(over);
    expect(res.status).toBe(422);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toContain(field);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses a save on a stale version with 409 and keeps the other editor's change", async () => {
    const made = (await create({ name: "Shared panel" })).json;
    const first = await call((await one()).PUT, { method: "PUT", cookie: cookie.consultant, params: { projectId, buildUpId: made.id }, body: { ...body({ name: "Edited by the first" }), version: 1 } });
    expect(first.status).toBe(200);
    expect(first.json.version).toBe(2);
    const second = await call((await one()).PUT, { method: "PUT", cookie: cookie.consultant, params: { projectId, buildUpId: made.id }, body: { ...body({ name: "Edited by the second" }), version: 1 } });
    expect(second.status).toBe(409);
    expect(second.json.error.message).toMatch(/changed by someone else/);
    const now = await call((await one()).GET, { cookie: cookie.consultant, params: { projectId, buildUpId: made.id } });
    expect(now.json).toMatchObject({ name: "Edited by the first", version: 2 });
  });

  it("hides build-ups from an installer (403) and from other projects' members (404)", async () => {
    const made = (await create()).json;
    expect((await call((await one()).GET, { cookie: cookie.installer, params: { projectId, buildUpId: made.id } })).status).toBe(403);
    expect((await call((await one()).GET, { cookie: cookie.other, params: { projectId, buildUpId: made.id } })).status).toBe(404);
    expect((await call((await one()).GET, { cookie: cookie.other, params: { projectId: otherProjectId, buildUpId: made.id } })).status).toBe(404);
  });
});

describe("uploads", () => {
  it("stores a PDF by content hash, links it as the fire report, and serves it to members only", async () => {
    const up = await upload(TINY_PDF, "classification.pdf");
    expect(up.status).toBe(201);
    expect(up.json).toMatchObject({ purpose: "fire-report", mime: "application/pdf", name: "classification.pdf" });
    const made = await create({ fireStandard: "EN 13501-1", fireClass: "B-s1,d0", fireReportId: up.json.id });
    expect(made.status).toBe(201);
    expect(made.json.fireReport.id).toBe(up.json.id);

    const got = await call((await download()).GET, { cookie: cookie.consultant, params: { projectId, attachmentId: up.json.id } });
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("application/pdf");
    expect(String(got.json)).toContain("%PDF-1.4");
    expect((await call((await download()).GET, { cookie: cookie.other, params: { projectId, attachmentId: up.json.id } })).status).toBe(404);
    expect((await call((await download()).GET, { cookie: cookie.installer, params: { projectId, attachmentId: up.json.id } })).status).toBe(403);
    expect((await call((await download()).GET, { params: { projectId, attachmentId: up.json.id } })).status).toBe(401);
  });

  it("keeps one file on disk for the same content uploaded twice", async () => {
    const a = await upload(TINY_PDF, "one.pdf");
    const b = await upload(TINY_PDF, "two.pdf");
    const { getDb } = await import("@/db/client");
    const { attachment } = await import("@/db/schema");
    const { inArray } = await import("drizzle-orm");
    const rows = getDb().select().from(attachment).where(inArray(attachment.id, [a.json.id, b.json.id])).all();
    expect(new Set(rows.map((r) => r.sha256)).size).toBe(1);
  });

  it("refuses a file whose content is not a PDF, whatever its name says", async () => {
    const before = tableCounts();
    const res = await upload(TINY_PNG, "report.pdf");
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0]).toMatchObject({ field: "file" });
    expect(res.json.error.issues[0].message).toMatch(/not a PDF/);
    expect(tableCounts()).toEqual(before);
  });

  it("refuses a file over the size limit and an unknown purpose, naming the field", async () => {
    const big = new Uint8Array(21 * 1024 * 1024);
    big.set(TINY_PDF);
    // Refused from its size before it is parsed (413), on the field where the file was chosen.
    const tooBig = await upload(big, "huge.pdf");
    expect(tooBig.status).toBe(413);
    expect(tooBig.json.error.issues[0]).toMatchObject({ field: "file", message: expect.stringMatching(/20 MB/) });
    const odd = await upload(TINY_PDF, "x.pdf", "selfie");
    expect(odd.status).toBe(422);
    expect(odd.json.error.issues[0].field).toBe("purpose");
  });

  it("refuses a fire report of another project when linking it", async () => {
    const foreign = await upload(TINY_PDF, "theirs.pdf", "fire-report", "other", otherProjectId);
    expect(foreign.status).toBe(201);
    const res = await create({ fireReportId: foreign.json.id });
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0].field).toBe("fireReportId");
  });
});
