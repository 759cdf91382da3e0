import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { makeFirm, makeUser, TINY_PDF } from "../support/factories";
import { APP_URL, signIn } from "../support/http";
import { tableCounts } from "../support/counts";

// The gate every API request passes before a service sees it: forged cross-site requests
// (defect 1) and bodies read before the session or past a limit (defect 4). Requests are built
// by hand here, as an attacker's page or script would send them.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let cookie = "";
let adminCookie = "";
let userId = "";
const EVIL = "http://evil.example";
const SIBLING_PORT = "http://localhost:4000"; // another port of the same host as APP_URL

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  const u = await makeUser({ firmId: firm.id, name: "Original Name (fictional)" });
  userId = u.id;
  cookie = await signIn(u.email);
  const admin = await makeUser({ firmId: firm.id, isFirmAdmin: true });
  adminCookie = await signIn(admin.email);
});
afterAll(() => envHandle.cleanup());

async function currentName(): Promise<string> {
  const { getDb } = await import("@/db/client");
  const { user } = await import("@/db/schema");
  const { eq } = await import("drizzle-orm");
  return getDb().select().from(user).where(eq(user.id, userId)).get()!.name;
}

type Init = { method?: string; headers?: Record<string, string>; body?: BodyInit | null; path?: string };
const request = (init: Init) =>
  new Request(`${APP_URL}${init.path ?? "/api/v1/me"}`, { method: init.method ?? "PATCH", headers: init.headers, body: init.body, duplex: "half" } as RequestInit);

async function patchMe(init: Init) {
  const { PATCH } = await import("@/app/api/v1/me/route");
  const res = await PATCH(request(init), { params: Promise.resolve({}) });
  return { status: res.status, json: await res.json() };
}

// A body that counts how much of it the server pulled: it makes a chunk only when asked. 8 MB
// in all: far over the JSON ceiling, small enough that a server reading it whole fails here
// rather than running out of memory.
function countingBody(chunk = 64 * 1024, chunks = 128) {
  const counter = { pulled: 0 };
  let left = chunks;
  const stream = new ReadableStream<Uint8Array>(
    {
      pull(controller) {
        if (left-- <= 0) return controller.close();
        counter.pulled += chunk;
        controller.enqueue(new Uint8Array(chunk).fill(0x20));
      },
    },
    { highWaterMark: 0 },
  );
  return { stream, counter };
}

describe("cross-site requests (defect 1)", () => {
  const rename = JSON.stringify({ name: "Renamed by another site" });

  it("refuses a change from another site's page, with the cookie it lent, and changes nothing", async () => {
    const res = await patchMe({ headers: { cookie, origin: EVIL, "content-type": "text/plain" }, body: rename });
    expect(res.status).toBe(403);
    expect(res.json.error.message).toMatch(/did not come from a Cavitas page/);
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("refuses another port of the same host, which SameSite=Lax does not stop", async () => {
    const res = await patchMe({ headers: { cookie, origin: SIBLING_PORT, "content-type": "application/json" }, body: rename });
    expect(res.status).toBe(403);
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("refuses a form post from another port creating a consultant's invitation", async () => {
    const { POST } = await import("@/app/api/v1/firm/invitations/route");
    const before = tableCounts();
    const res = await POST(
      request({ method: "POST", path: "/api/v1/firm/invitations", headers: { cookie: adminCookie, origin: SIBLING_PORT, "content-type": "application/x-www-form-urlencoded" }, body: "email=outsider%40example.test" }),
      { params: Promise.resolve({}) },
    );
    expect(res.status).toBe(403);
    expect(tableCounts()).toEqual(before);
  });

  it("reads Referer where a browser sent no Origin, and refuses an opaque or missing one with a cookie", async () => {
    const json = { "content-type": "application/json" };
    expect((await patchMe({ headers: { ...json, cookie, referer: `${EVIL}/page` }, body: rename })).status).toBe(403);
    expect((await patchMe({ headers: { ...json, cookie, origin: "null" }, body: rename })).status).toBe(403);
    expect((await patchMe({ headers: { ...json, cookie }, body: rename })).status).toBe(403);
    expect(await currentName()).toBe("Original Name (fictional)");
    const ok = await patchMe({ headers: { ...json, cookie, referer: `${APP_URL}/settings` }, body: JSON.stringify({ name: "Renamed here" }) });
    expect(ok.status).toBe(200);
    expect(await currentName()).toBe("Renamed here");
  });

  it("takes the app's own loopback aliases as its own", async () => {
    const res = await patchMe({ headers: { cookie, origin: APP_URL.replace("localhost", "127.0.0.1"), "content-type": "application/json" }, body: JSON.stringify({ name: "Original Name (fictional)" }) });
    expect(res.status).toBe(200);
  });

  it("refuses a body that is not JSON from the app's own origin with 415", async () => {
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x"]) {
      const res = await patchMe({ headers: { cookie, origin: APP_URL, "content-type": type }, body: rename });
      expect(res.status, type).toBe(415);
      expect(res.json.error.message).toMatch(/application\/json/);
    }
    const untyped = await patchMe({ headers: { cookie, origin: APP_URL }, body: rename });
    expect(untyped.status).toBe(415);
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("refuses an upload that is not multipart with 415", async () => {
    const { POST } = await import("@/app/api/v1/projects/[projectId]/attachments/route");
    const res = await POST(request({ method: "POST", path: "/api/v1/projects/p/attachments", headers: { cookie, origin: APP_URL, "content-type": "application/pdf" }, body: TINY_PDF }), {
      params: Promise.resolve({ projectId: "p" }),
    });
    expect(res.status).toBe(415);
  });
});

describe("better-auth's own routes behind the same gate (defect 1)", () => {
  async function authCall(path: string, headers: Record<string, string>, body: string) {
    const { POST } = await import("@/app/api/auth/[...all]/route");
    const res = await POST(request({ method: "POST", path: `/api/auth${path}`, headers, body }));
    return { status: res.status, setCookie: res.headers.getSetCookie(), text: await res.text() };
  }

  it("refuses a sign-in posted by another site (no session is made)", async () => {
    const { getDb } = await import("@/db/client");
    const { session } = await import("@/db/schema");
    const sessions = getDb().select().from(session).all().length;
    const u = await makeUser();
    const res = await authCall("/sign-in/email", { origin: EVIL, "content-type": "application/json" }, JSON.stringify({ email: u.email, password: "test-password-123" }));
    expect(res.status).toBe(403);
    expect(res.setCookie).toEqual([]);
    expect(getDb().select().from(session).all().length).toBe(sessions);
  });

  it("refuses a change of name through better-auth from another port", async () => {
    const res = await authCall("/update-user", { cookie, origin: SIBLING_PORT, "content-type": "application/json" }, JSON.stringify({ name: "Renamed through auth" }));
    expect(res.status).toBe(403);
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("closes better-auth's account endpoints that Cavitas does not use (update-user was a 500 on a null name)", async () => {
    for (const endpoint of ["/update-user", "/change-email", "/delete-user"]) {
      const res = await authCall(endpoint, { cookie, origin: APP_URL, "content-type": "application/json" }, JSON.stringify({ name: null, newEmail: "x@example.test" }));
      expect(res.status, endpoint).toBe(404);
    }
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("refuses a form-encoded sign-in from the app's own origin with 415", async () => {
    const u = await makeUser();
    const res = await authCall("/sign-in/email", { origin: APP_URL, "content-type": "application/x-www-form-urlencoded" }, `email=${encodeURIComponent(u.email)}&password=test-password-123`);
    expect(res.status).toBe(415);
    expect(res.setCookie).toEqual([]);
  });

  it("still signs in from the app's own page", async () => {
    const u = await makeUser();
    const res = await authCall("/sign-in/email", { origin: APP_URL, "content-type": "application/json" }, JSON.stringify({ email: u.email, password: "test-password-123" }));
    expect(res.status).toBe(200);
    expect(res.setCookie.length).toBeGreaterThan(0);
  });
});

describe("bodies and the session (defect 4)", () => {
  const json = { origin: APP_URL, "content-type": "application/json" };

  it("answers a stranger's body 401 without reading a byte of it", async () => {
    const { stream, counter } = countingBody();
    const res = await patchMe({ headers: json, body: stream });
    expect(res.status).toBe(401);
    expect(counter.pulled).toBe(0);
  });

  it("answers a stranger's upload 401 without reading it", async () => {
    const { POST } = await import("@/app/api/v1/projects/[projectId]/attachments/route");
    const { stream, counter } = countingBody();
    const res = await POST(request({ method: "POST", path: "/api/v1/projects/p/attachments", headers: { origin: APP_URL, "content-type": "multipart/form-data; boundary=x" }, body: stream }), {
      params: Promise.resolve({ projectId: "p" }),
    });
    expect(res.status).toBe(401);
    expect(counter.pulled).toBe(0);
  });

  it("refuses a declared Content-Length over the route's limit with 413 before reading", async () => {
    const { stream, counter } = countingBody();
    const res = await patchMe({ headers: { ...json, cookie, "content-length": String(200 * 1024 * 1024) }, body: stream });
    expect(res.status).toBe(413);
    expect(res.json.error.message).toMatch(/larger than this action accepts/);
    expect(counter.pulled).toBe(0);
  });

  it("stops reading a body without a length once it passes the limit", async () => {
    const { JSON_LIMIT } = await import("@/lib/http/body");
    const chunk = 64 * 1024;
    const { stream, counter } = countingBody(chunk);
    const res = await patchMe({ headers: { ...json, cookie }, body: stream });
    expect(res.status).toBe(413);
    expect(counter.pulled).toBeLessThanOrEqual(JSON_LIMIT + chunk);
    expect(await currentName()).toBe("Original Name (fictional)");
  });

  it("refuses an upload declared over the upload limit with 413 on the file field", async () => {
    const { POST } = await import("@/app/api/v1/projects/[projectId]/attachments/route");
    const { stream, counter } = countingBody();
    const res = await POST(
      request({ method: "POST", path: "/api/v1/projects/p/attachments", headers: { cookie, origin: APP_URL, "content-type": "multipart/form-data; boundary=x", "content-length": String(200 * 1024 * 1024) }, body: stream }),
      { params: Promise.resolve({ projectId: "p" }) },
    );
    expect(res.status).toBe(413);
    expect((await res.json()).error.issues[0].field).toBe("file");
    expect(counter.pulled).toBe(0);
  });
});
