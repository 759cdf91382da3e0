import { parse } from "content-disposition";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser, TINY_PDF, TINY_PNG } from "../support/factories";
import { call, signIn } from "../support/http";

// Defect 5: a file uploaded under any name downloads again, named as it was (RFC 6266
// `filename*=UTF-8''…` with an ASCII `filename` for older clients), with an ending true to
// what the file is.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let cookie = "";

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  projectId = makeProject(firm.id).id;
  const u = await makeUser({ firmId: firm.id });
  addMember(projectId, u.id, "consultant");
  cookie = await signIn(u.email);
});
afterAll(() => envHandle.cleanup());

async function roundTrip(name: string, bytes: Uint8Array = TINY_PNG) {
  const uploads = await import("@/app/api/v1/projects/[projectId]/attachments/route");
  const download = await import("@/app/api/v1/projects/[projectId]/attachments/[attachmentId]/route");
  const form = new FormData();
  form.set("purpose", "drawing");
  form.set("file", new File([new Uint8Array(bytes)], name));
  const up = await call(uploads.POST, { method: "POST", cookie, params: { projectId }, form });
  expect(up.status, JSON.stringify(up.json)).toBe(201);
  const res = await call(download.GET, { cookie, params: { projectId, attachmentId: up.json.id } });
  expect(res.status).toBe(200);
  const header = res.headers.get("content-disposition")!;
  expect(header).toMatch(/^[\x20-\x7e]+$/); // a header carries ASCII only
  const { type, parameters } = parse(header);
  return { type, stored: up.json.name as string, filename: parameters.filename, raw: header };
}

describe("downloads (defect 5)", () => {
  it.each([
    ["图纸.png", "图纸.png", "file.png"],
    ["😀.png", "😀.png", "file.png"],
    ["plan-é.png", "plan-é.png", "plan-e.png"],
    ["Grundriss Straße 3 (rev. B).png", "Grundriss Straße 3 (rev. B).png", "Grundriss Stra_e 3 (rev. B).png"],
  ])("sends %s back under its own name, with an ASCII fallback", async (sent, name, fallback) => {
    const got = await roundTrip(sent);
    expect(got.stored).toBe(name);
    expect(got.type).toBe("inline");
    // parse() prefers filename* (decoded from UTF-8) over the fallback when both are sent.
    expect(got.filename).toBe(name);
    expect(got.raw).toContain(`filename*=UTF-8''${encodeURIComponent(name).replace(/[()']/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`);
    expect(got.raw).toMatch(new RegExp(`filename="?${fallback.replace(/[.()]/g, "\\$&")}"?;`));
  });

  it("takes control characters, direction overrides and path separators out of the name", async () => {
    expect((await roundTrip("a\u0000b\r\n.png")).stored).toBe("ab.png");
    expect((await roundTrip("invoice\u202Egnp.pdf")).stored).toBe("invoicegnp.png");
    expect((await roundTrip("../../etc/passwd.png")).stored).toBe("_.._etc_passwd.png");
  });

  it("keeps the ending true to the content, whatever the name claimed", async () => {
    expect((await roundTrip("plan.png", TINY_PDF)).stored).toBe("plan.pdf");
    expect((await roundTrip("notes.txt", TINY_PDF)).stored).toBe("notes.txt.pdf");
    expect((await roundTrip("scan", TINY_PNG)).stored).toBe("scan.png");
    expect((await roundTrip(".png", TINY_PNG)).stored).toBe("upload.png");
  });

  it("mends the name of a file stored before names were cleaned", async () => {
    const { getDb } = await import("@/db/client");
    const { attachment } = await import("@/db/schema");
    const { storeFile } = await import("@/lib/storage");
    const stored = storeFile(TINY_PDF, ["pdf"]);
    const row = getDb().insert(attachment).values({ projectId, purpose: "drawing", sha256: stored.sha256, mime: stored.mime, size: stored.size, originalName: "图纸\u0000.png" }).returning().get();
    const download = await import("@/app/api/v1/projects/[projectId]/attachments/[attachmentId]/route");
    const res = await call(download.GET, { cookie, params: { projectId, attachmentId: row.id } });
    expect(res.status).toBe(200);
    expect(parse(res.headers.get("content-disposition")!).parameters.filename).toBe("图纸.pdf");
  });
});
