import { createHash } from "node:crypto";
import { unzipSync, strFromU8 } from "fflate";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { databaseDigest } from "../support/counts";
import { waitForMail } from "../support/mail";
import { pdfPages } from "../support/pdf-text";
import { actorOf } from "../support/actors";
import { designedRoom, hasExif, panelAt, pdfHashOf, photoWithLocation } from "../support/submittals";
import { getDb } from "@/db/client";
import { submittal } from "@/db/schema";

// The submittal workflow through its route handlers: issue (with what must be confirmed),
// the client's decision, supersession, the stored documents read back, the shop pack, install
// marks with site photos, and every refusal writing nothing.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let otherProjectId = "";
let roomId = "";
let buildUpId = "";
const cookie: Record<string, string> = {};
const email: Record<string, string> = {};

const listRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/route");
const oneRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/route");
const pdfRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/pdf/route");
const recordRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/decision-record/route");
const decisionRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/decision/route");
const packRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/shop-pack/route");
const placementRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]/route");
const photoRoute = () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]/photo/route");
const readinessRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/readiness/route");
const progressRoute = () => import("@/app/api/v1/projects/[projectId]/progress/route");
const boardRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route");
const projectRoute = () => import("@/app/api/v1/projects/[projectId]/route");

const sha256 = (bytes: Uint8Array | string) => createHash("sha256").update(bytes).digest("hex");
const rowOf = (id: string) => getDb().select().from(submittal).where(eq(submittal.id, id)).get()!;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function bytesOf(handler: (req: Request, ctx: { params: Promise<any> }) => Promise<Response>, who: string, params: Record<string, string>, query = "") {
  const res = await handler(new Request(`http://localhost:3999/api/v1/x${query}`, { headers: { cookie: cookie[who], origin: "http://localhost:3999" } }), { params: Promise.resolve(params) });
  return { status: res.status, headers: res.headers, bytes: new Uint8Array(await res.arrayBuffer()) };
}

async function readiness(room = roomId) {
  return (await call((await readinessRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId: room } })).json;
}

async function issue(who = "consultant", room = roomId, seen?: { letter: string; confirm: string[] }) {
  const r = await readiness(room);
  const body = { roomId: room, letter: seen?.letter ?? r.letter, confirm: seen?.confirm ?? r.items.map((i: { key: string }) => i.key) };
  return call((await listRoute()).POST, { method: "POST", cookie: cookie[who], params: { projectId }, body });
}

async function decide(id: string, body: Record<string, unknown>, who = "client") {
  return call((await decisionRoute()).POST, { method: "POST", cookie: cookie[who], params: { projectId, submittalId: id }, body });
}

const signed = async (id: string, over: Record<string, unknown> = {}) => ({ outcome: "approved", signature: "Cleo Client", notes: "", pdfSha256: await pdfHashOf(cookie.client, projectId, id), ...over });

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm("Submittal test firm (fictional)");
  projectId = makeProject(firm.id, "Submittal test project (fictional)").id;
  otherProjectId = makeProject(firm.id, "Another project (fictional)").id;
  const people = [
    ["consultant", "Casey Consultant (fictional)"],
    ["consultant2", "Corin Second (fictional)"],
    ["architect", "Ari Architect (fictional)"],
    ["client", "Cleo Client (fictional)"],
    ["installer", "Ines Installer (fictional)"],
  ] as const;
  for (const [key, name] of people) {
    const u = await makeUser({ firmId: key.startsWith("consultant") ? firm.id : null, name });
    addMember(projectId, u.id, key === "consultant2" ? "consultant" : key);
    cookie[key] = await signIn(u.email);
    email[key] = u.email;
  }
  const outsider = await makeUser({ name: "Otto Other (fictional)" });
  addMember(otherProjectId, outsider.id, "client");
  cookie.otherClient = await signIn(outsider.email);
  await call((await projectRoute()).PATCH, { method: "PATCH", cookie: cookie.consultant, params: { projectId }, body: { fireRequired: "b s1 d0" } });
  ({ roomId, buildUpId } = await designedRoom(cookie.consultant, projectId, { panels: 5, pinBy: cookie.architect }));
}, 60_000);
afterAll(() => envHandle.cleanup());

let revA = "";
let revB = "";

describe("issuing revision A", () => {
  it("says what must be confirmed first: the open pin and the fire flag, by key", async () => {
    const r = await readiness();
    expect(r.letter).toBe("A");
    expect(r.panels).toBe(5);
    const kinds = r.items.map((i: { kind: string }) => i.kind).sort();
    expect(kinds).toEqual(["fire", "pin"]);
    expect(r.items.find((i: { kind: string }) => i.kind === "fire").message).toMatch(/No class is declared; the room requires B-s1,d0/);
  });

  it("refuses to issue while an item is unconfirmed, naming it, and writes nothing", async () => {
    const before = databaseDigest();
    const res = await issue("consultant", roomId, { letter: "A", confirm: [] });
    expect(res.status).toBe(409);
    expect(res.json.error.message).toMatch(/Revision A was not issued: confirm these 2 items/);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toEqual(["confirm", "confirm"]);
    expect(res.json.error.issues.map((i: { message: string }) => i.message).join(" ")).toMatch(/Pin 1 on Wall A \(length\) is open: "Check the sprinkler head above\."/);
    expect(databaseDigest()).toEqual(before);
  });

  it("refuses an architect, a client and an installer (403) and writes nothing", async () => {
    for (const who of ["architect", "client", "installer"]) {
      const before = databaseDigest();
      const res = await issue(who);
      expect(res.status, who).toBe(403);
      expect(databaseDigest()).toEqual(before);
    }
  });

  it("issues A: the snapshot and its hash, the PDF stored with its hash, what was confirmed, the audit, and mail to the architect and the client only", async () => {
    const res = await issue();
    expect(res.status).toBe(201);
    expect(res.json.letter).toBe("A");
    revA = res.json.id;
    const row = rowOf(revA);
    expect(row.state).toBe("issued");
    expect(sha256(row.snapshot!)).toBe(row.snapshotSha256);
    expect(JSON.parse(row.confirmed!).map((i: { kind: string }) => i.kind).sort()).toEqual(["fire", "pin"]);

    const view = (await call((await oneRoute()).GET, { cookie: cookie.consultant, params: { projectId, submittalId: revA } })).json;
    expect(view.state).toBe("issued");
    expect(view.changes).toBeNull();
    const pdf = await bytesOf((await pdfRoute()).GET, "client", { projectId, submittalId: revA });
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    expect(sha256(pdf.bytes)).toBe(view.pdf.sha256);
    expect(pdf.headers.get("repr-digest")).toBe(`sha-256=:${Buffer.from(view.pdf.sha256, "hex").toString("base64")}:`);

    // The stored PDF read back says what the snapshot holds: its hash, the revision, the panels.
    const text = (await pdfPages(pdf.bytes)).join("\n");
    const snapshot = JSON.parse(row.snapshot!);
    expect(text).toContain(row.snapshotSha256!);
    expect(text).toMatch(/Revision\s+A/i);
    for (const p of snapshot.placements) expect(text).toContain(p.code);
    // … and the check's predicted times after treatment, as the snapshot holds them.
    for (const o of snapshot.check.octaves) if (o.after) expect(text).toContain(`${o.after.sabine.toFixed(2)} s`);
    for (const row of snapshot.schedule) expect(text).toContain(row.name);
    expect(snapshot.fire.required).toBe("B-s1,d0");

    const [architectMail] = await waitForMail(envHandle.mail, email.architect);
    const [clientMail] = await waitForMail(envHandle.mail, email.client);
    expect(architectMail.subject).toBe("Submittal issued: Hall, revision A (Submittal test project (fictional))");
    expect(clientMail.text).toContain(view.pdf.sha256);
    expect(clientMail.text).toMatch(/approve it, approve it as noted, or return it/);
    expect(envHandle.mail.messages.filter((m) => m.to.includes(email.installer))).toEqual([]);
  });

  it("keeps A from the installer until it is approved (the state named), and its shop pack too", async () => {
    const res = await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revA } });
    expect(res.status).toBe(409);
    expect(res.json.error.message).toBe("Revision A of Hall is issued, awaiting the client's decision; installers see a revision once the client approves it.");
    expect((await call((await packRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revA } })).status).toBe(409);
    const list = (await call((await listRoute()).GET, { cookie: cookie.installer, params: { projectId } })).json;
    expect(list.rooms).toEqual([]);
  });
});

describe("the client's decision on A", () => {
  it.each([
    ["no typed name", { signature: "  " }, 422, "signature", /Type your full name to sign/],
    ["another person's name", { signature: "Casey Consultant" }, 422, "signature", /Type your full name as your account has it \("Cleo Client"\)/],
    ["a return without notes", { outcome: "returned" }, 422, "notes", /Say what must change/],
    ["an approval as noted without notes", { outcome: "approved-as-noted" }, 422, "notes", /notes your approval is subject to/],
    ["a PDF hash that is not the issued one", { pdfSha256: "0".repeat(64) }, 409, "pdfSha256", /not the one issued/],
  ])("refuses %s, naming the field, and changes nothing", async (_what, over, status, field, message) => {
    const before = databaseDigest();
    const res = await decide(revA, await signed(revA, over));
    expect(res.status).toBe(status);
    expect(res.json.error.issues.find((i: { field: string }) => i.field === field)?.message ?? res.json.error.message).toMatch(message);
    expect(databaseDigest()).toEqual(before);
    expect(rowOf(revA).state).toBe("issued");
  });

  it("refuses the consultant (who may not decide their own submittal) and a client of another project", async () => {
    const before = databaseDigest();
    expect((await decide(revA, await signed(revA), "consultant")).status).toBe(403);
    // A forged request: another project's client naming this project's revision, either way round.
    expect((await decide(revA, await signed(revA), "otherClient")).status).toBe(404);
    const forged = await call((await decisionRoute()).POST, { method: "POST", cookie: cookie.client, params: { projectId: otherProjectId, submittalId: revA }, body: await signed(revA) });
    expect(forged.status).toBe(404);
    expect(databaseDigest()).toEqual(before);
  });

  it("returns A with notes: the decision, signer, time and PDF hash recorded, the decision record stored, the consultants told", async () => {
    const res = await decide(revA, await signed(revA, { outcome: "returned", notes: "Move P-005 clear of the sprinkler head." }));
    expect(res.status).toBe(200);
    const row = rowOf(revA);
    expect(row.state).toBe("returned");
    expect(row.signature).toBe("Cleo Client");
    expect(row.decidedPdfSha256).toBe(await pdfHashOf(cookie.consultant, projectId, revA));
    const view = (await call((await oneRoute()).GET, { cookie: cookie.consultant, params: { projectId, submittalId: revA } })).json;
    expect(view.decision).toMatchObject({ outcome: "returned", by: "Cleo Client (fictional)", notes: "Move P-005 clear of the sprinkler head." });
    expect(view.shopPacks).toEqual([]);
    const record = await bytesOf((await recordRoute()).GET, "architect", { projectId, submittalId: revA });
    expect(sha256(record.bytes)).toBe(view.decisionRecord.sha256);
    const text = (await pdfPages(record.bytes)).join("\n");
    expect(text).toContain("Returned for revision");
    expect(text).toContain(view.pdf.sha256);
    expect(text).toContain("Move P-005 clear of the sprinkler head.");
    for (const who of ["consultant", "consultant2"]) {
      const mails = await waitForMail(envHandle.mail, email[who]);
      expect(mails.at(-1)!.subject).toBe("Submittal returned for revision: Hall, revision A (Submittal test project (fictional))");
      expect(mails.at(-1)!.text).toContain("Their notes: Move P-005 clear of the sprinkler head.");
    }
    expect(view.history.map((h: { what: string }) => h.what).join("\n")).toMatch(/Issued[\s\S]*Returned for revision, signed "Cleo Client"/);
  });

  it("refuses a second decision on A, naming its state", async () => {
    const before = databaseDigest();
    const res = await decide(revA, await signed(revA));
    expect(res.status).toBe(409);
    expect(res.json.error.message).toMatch(/^Revision A of Hall is already returned for revision \(\d{4}-\d\d-\d\d\); a decision is final\.$/);
    expect(databaseDigest()).toEqual(before);
  });
});

describe("revision B", () => {
  it("is issued after the design changes: A superseded, B's change list and its PDF name the change", async () => {
    const board = (await call((await boardRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId, surfaceKey: "wall-a" } })).json;
    const moved = board.placements.map((p: { code: string; y: number }) => (p.code === "P-005" ? { ...p, y: 1.4 } : p));
    const saved = await call((await boardRoute()).PUT, { method: "PUT", cookie: cookie.consultant, params: { projectId, roomId, surfaceKey: "wall-a" }, body: { version: board.version, placements: [...moved, panelAt(5, buildUpId, roomId)] } });
    expect(saved.status).toBe(200);
    const res = await issue();
    expect(res.status).toBe(201);
    expect(res.json.letter).toBe("B");
    revB = res.json.id;
    expect(rowOf(revA).state).toBe("superseded");
    expect(rowOf(revA).outcome).toBe("returned");
    const view = (await call((await oneRoute()).GET, { cookie: cookie.client, params: { projectId, submittalId: revB } })).json;
    expect(view.previous).toEqual({ id: revA, letter: "A" });
    expect(view.changes).toEqual(expect.arrayContaining(["Added: P-006 on Wall A (length).", "Moved: P-005 on Wall A (length).", expect.stringMatching(/^T1 Bass panel \w+: panels, 5 → 6\.$/)]));
    const pdf = await bytesOf((await pdfRoute()).GET, "client", { projectId, submittalId: revB });
    const cover = (await pdfPages(pdf.bytes)).join("\n");
    expect(cover).toContain("What changed since revision A");
    expect(cover).toMatch(/Added: P-006 on Wall A \(length\)\./);
    const a = (await call((await oneRoute()).GET, { cookie: cookie.client, params: { projectId, submittalId: revA } })).json;
    expect(a.supersededBy).toEqual({ id: revB, letter: "B" });
  });

  it("refuses a decision on the superseded A, naming B", async () => {
    const res = await decide(revA, await signed(revA));
    expect(res.status).toBe(409);
    expect(res.json.error.message).toBe("Revision A of Hall was superseded by revision B; decide on the revision in force instead.");
  });

  it("yields one revision when two consultants issue at once", async () => {
    const { roomId: race } = await designedRoom(cookie.consultant, projectId, { name: "Race room", panels: 2 });
    // Both saw revision A as the next one, with the same items to confirm.
    const r = await readiness(race);
    const seen = { letter: r.letter, confirm: r.items.map((i: { key: string }) => i.key) };
    const [one, two] = await Promise.all([issue("consultant", race, seen), issue("consultant2", race, seen)]);
    expect([one.status, two.status].sort()).toEqual([201, 409]);
    const loser = one.status === 409 ? one : two;
    expect(loser.json.error.message).toMatch(/^Revision A of Race room was just issued by (Casey Consultant|Corin Second) \(fictional\); yours was not issued\. Open the submittals to see it, and issue revision B if the design has changed since\.$/);
    expect(loser.json.error.issues[0].field).toBe("letter");
    const rows = getDb().select().from(submittal).where(eq(submittal.roomId, race)).all();
    expect(rows.map((r) => [r.letter, r.state])).toEqual([["A", "issued"]]);
  });
});

describe("approval, the shop pack and install progress", () => {
  let pack: { sha256: string; name: string };

  it("approves B as noted: shop packs in both unit systems stored, the installer sent the link and the hash", async () => {
    const res = await decide(revB, await signed(revB, { outcome: "approved-as-noted", notes: "Paint the edges to match the wall." }));
    expect(res.status).toBe(200);
    const view = (await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revB } })).json;
    expect(view.state).toBe("approved-as-noted");
    expect(view.shopPacks.map((d: { units: string }) => d.units).sort()).toEqual(["imperial", "metric"]);
    expect(view.may).toEqual({ decide: false, shop: true, install: true });
    pack = view.shopPacks.find((d: { units: string }) => d.units === "metric");
    const [mail] = await waitForMail(envHandle.mail, email.installer);
    expect(mail.subject).toBe("Ready to build: Hall, revision B (Submittal test project (fictional))");
    expect(mail.text).toContain(pack.sha256);
    expect(mail.text).toContain(`/projects/${projectId}/shop-pack/${revB}`);
    expect(mail.text).toContain("Build to the client's notes: Paint the edges to match the wall.");
  });

  it("gives the installer the shop pack: its bytes hash to the recorded SHA-256, its manifest cites the approved PDF, and the download is audited", async () => {
    const got = await bytesOf((await packRoute()).GET, "installer", { projectId, submittalId: revB });
    expect(got.status).toBe(200);
    expect(got.headers.get("content-disposition")).toBe(`attachment; filename=${pack.name}`);
    expect(sha256(got.bytes)).toBe(pack.sha256);
    const files = unzipSync(got.bytes);
    const pdfHash = await pdfHashOf(cookie.installer, projectId, revB);
    expect(strFromU8(files["manifest.txt"])).toContain(`Submittal PDF SHA-256: ${pdfHash}`);
    expect(Object.keys(files)).toEqual(expect.arrayContaining(["cut-list.csv", "placement-schedule.csv"]));
    expect(strFromU8(files["placement-schedule.csv"])).toContain("P-006");
    const view = (await call((await oneRoute()).GET, { cookie: cookie.consultant, params: { projectId, submittalId: revB } })).json;
    expect(view.history.at(-1).what).toBe(`Shop pack downloaded (metric), SHA-256 ${pack.sha256}.`);
    expect((await bytesOf((await packRoute()).GET, "installer", { projectId, submittalId: revB }, "?units=yards")).status).toBe(422);
  });

  it("refuses the shop pack to the architect and the client (403)", async () => {
    for (const who of ["architect", "client"]) expect((await call((await packRoute()).GET, { cookie: cookie[who], params: { projectId, submittalId: revB } })).status).toBe(403);
  });

  it("records three panels installed, one with a site photo stripped of its location and camera, and every member sees the progress", async () => {
    const view = (await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revB } })).json;
    const [p1, p2, p3] = view.install.placements;
    for (const p of [p1, p2, p3]) {
      const res = await call((await placementRoute()).PUT, { method: "PUT", cookie: cookie.installer, params: { projectId, submittalId: revB, placementId: p.id }, body: { installed: true } });
      expect(res.status).toBe(200);
      expect(res.json.installedBy).toBe("Ines Installer (fictional)");
    }
    const original = await photoWithLocation();
    expect(hasExif(original)).toBe(true);
    const form = new FormData();
    form.set("file", new File([new Uint8Array(original)], "IMG_0001.jpg", { type: "image/jpeg" }));
    const up = await call((await photoRoute()).POST, { method: "POST", cookie: cookie.installer, params: { projectId, submittalId: revB, placementId: p1.id }, form });
    expect(up.status).toBe(201);
    const { readAttachment } = await import("@/lib/services/attachments");
    const stored = readAttachment(await actorOf(cookie.consultant), projectId, up.json.photo.id);
    expect(stored.mime).toBe("image/jpeg");
    expect(hasExif(new Uint8Array(stored.bytes))).toBe(false);
    expect(stored.bytes.includes("FictionalCam")).toBe(false);

    for (const who of ["consultant", "architect", "client", "installer"]) {
      const progress = (await call((await progressRoute()).GET, { cookie: cookie[who], params: { projectId } })).json;
      expect(progress.rooms).toEqual([expect.objectContaining({ roomName: "Hall", letter: "B", panels: 6, installed: 3, photos: 1 })]);
    }
    const board = (await call((await boardRoute()).GET, { cookie: cookie.consultant, params: { projectId, roomId, surfaceKey: "wall-a" } })).json;
    expect(board.installed).toEqual({ letter: "B", submittalId: revB, placementIds: expect.arrayContaining([p1.id, p2.id, p3.id]) });
    expect(board.installed.placementIds).toHaveLength(3);
  });

  it.each([
    ["a text file named .jpg", () => new TextEncoder().encode("not a photo at all"), /not a JPEG, PNG or WebP photo/],
    ["a JPEG cut short", async () => (await photoWithLocation()).subarray(0, 200), /could not be read/],
  ])("refuses %s as a site photo, naming the file field, and writes nothing", async (_what, make, message) => {
    const view = (await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revB } })).json;
    const form = new FormData();
    form.set("file", new File([new Uint8Array(await make())], "photo.jpg", { type: "image/jpeg" }));
    const before = databaseDigest();
    const res = await call((await photoRoute()).POST, { method: "POST", cookie: cookie.installer, params: { projectId, submittalId: revB, placementId: view.install.placements[4].id }, form });
    expect(res.status).toBe(422);
    expect(res.json.error.issues[0]).toMatchObject({ field: "file", message: expect.stringMatching(message) });
    expect(databaseDigest()).toEqual(before);
  });

  it("refuses install marks from others, on a panel not in the revision, or with a body that is not a yes or no", async () => {
    const placementId = (await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revB } })).json.install.placements[0].id;
    const put = async (who: string, id: string, body: unknown) => call((await placementRoute()).PUT, { method: "PUT", cookie: cookie[who], params: { projectId, submittalId: revB, placementId: id }, body });
    const before = databaseDigest();
    expect((await put("consultant", placementId, { installed: false })).status).toBe(403);
    expect((await put("installer", "no-such-panel", { installed: true })).status).toBe(404);
    const bad = await put("installer", placementId, { installed: "yes" });
    expect(bad.status).toBe(422);
    expect(bad.json.error.issues[0].field).toBe("installed");
    expect(databaseDigest()).toEqual(before);
    expect((await put("installer", placementId, { installed: true })).status).toBe(200);
  });

  it("carries the installed panels over when the next approved revision keeps them where they were", async () => {
    const res = await issue();
    expect(res.status).toBe(201);
    const revC = res.json.id;
    // B is superseded: the installer can no longer open it, nor record on it.
    const closed = await call((await oneRoute()).GET, { cookie: cookie.installer, params: { projectId, submittalId: revB } });
    expect(closed.status).toBe(409);
    expect(closed.json.error.message).toBe("Revision B of Hall was superseded by revision C; installers see only the approved revision in force.");
    expect((await decide(revC, await signed(revC))).status).toBe(200);
    const progress = (await call((await progressRoute()).GET, { cookie: cookie.client, params: { projectId } })).json;
    expect(progress.rooms).toEqual([expect.objectContaining({ letter: "C", panels: 6, installed: 3, photos: 1 })]);
  });
});
