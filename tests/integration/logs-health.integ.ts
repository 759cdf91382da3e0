import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { makeFirm, makeUser, TEST_PASSWORD } from "../support/factories";
import { APP_URL, call } from "../support/http";

// Structured logs: a JSON line per request with the id the response carries, and nothing a
// person would not want kept (cookies, passwords, addresses, names, tokens from links).
// /api/health answers from the database.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
const lines: string[] = [];

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  process.env.CAVITAS_LOG_LEVEL = "info"; // before anything reads the settings
  for (const stream of [process.stdout, process.stderr]) {
    const write = stream.write.bind(stream);
    vi.spyOn(stream, "write").mockImplementation((chunk: string | Uint8Array, ...rest: unknown[]) => {
      const text = typeof chunk === "string" ? chunk : Buffer.from(chunk).toString("utf8");
      if (text.startsWith("{")) lines.push(...text.trim().split("\n"));
      return write(chunk, ...(rest as []));
    });
  }
});
afterAll(() => {
  vi.restoreAllMocks();
  return envHandle.cleanup();
});

const parsed = () => lines.map((l) => JSON.parse(l) as Record<string, unknown>);

describe("logs", () => {
  it("writes one JSON line per request, with its id, and no personal data or secrets", async () => {
    const name = "Wilhelmina Quist (fictional)";
    const u = await makeUser({ firmId: makeFirm().id, name });
    const { POST } = await import("@/app/api/auth/[...all]/route");
    const signIn = await POST(
      new Request(`${APP_URL}/api/auth/sign-in/email`, { method: "POST", headers: { origin: APP_URL, "content-type": "application/json" }, body: JSON.stringify({ email: u.email, password: TEST_PASSWORD }) }),
    );
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const me = await import("@/app/api/v1/me/route");
    const renamed = await call(me.PATCH, { method: "PATCH", cookie, body: { name: "Another Name (fictional)" } });
    expect(renamed.status).toBe(200);
    const invite = await import("@/app/api/v1/invitations/[token]/route");
    const token = "tok3nFromAnEmailLink_abcdefghijkl";
    await call(invite.GET, { params: { token }, path: `/api/v1/invitations/${token}` });

    const requestLines = parsed().filter((l) => l.msg === "request");
    expect(requestLines.map((l) => l.route)).toEqual(expect.arrayContaining(["/api/auth/sign-in/email", "/api/v1/test", "/api/v1/invitations/[token]"]));
    expect(requestLines.find((l) => l.requestId === renamed.headers.get("x-request-id"))).toMatchObject({ level: "info", method: "PATCH", status: 200 });
    for (const l of requestLines) expect(Object.keys(l).sort()).toEqual(["level", "method", "ms", "msg", "requestId", "route", "status", "time"]);
    const all = lines.join("\n");
    for (const secret of [u.email, TEST_PASSWORD, name, "Another Name", token, cookie.split("=")[1]]) expect(all).not.toContain(secret);
  });

  it("logs an unexpected error under the id the person is shown, and shows them nothing else", async () => {
    const { route } = await import("@/lib/http/route");
    const failing = route(() => {
      throw new Error("SQLITE_CONSTRAINT: FOREIGN KEY constraint failed at /srv/cavitas/db/client.ts");
    });
    const res = await call(failing);
    expect(res.status).toBe(500);
    const id = res.headers.get("x-request-id")!;
    expect(res.json.error.message).toContain(id);
    expect(JSON.stringify(res.json)).not.toMatch(/SQLITE|constraint|\/srv\/|at /);
    expect(parsed().find((l) => l.level === "error" && l.requestId === id)).toMatchObject({ msg: "unexpected error", error: "Error" });
  });
});

describe("/api/health", () => {
  it("answers 200 when the database answers, and 503 without a detail when it does not", async () => {
    const { GET } = await import("@/app/api/health/route");
    const ok = await call(GET);
    expect(ok.status).toBe(200);
    expect(ok.json).toEqual({ status: "ok", database: "ok" });
    expect(ok.headers.get("cache-control")).toBe("no-store");
    const { getDb } = await import("@/db/client");
    const sqlite = (getDb() as unknown as { $client: { exec(sql: string): void } }).$client;
    sqlite.exec("alter table project rename to project_moved_away");
    try {
      const failing = await call(GET);
      expect(failing.status).toBe(503);
      expect(failing.json).toEqual({ status: "failing", database: "failing" });
    } finally {
      sqlite.exec("alter table project_moved_away rename to project");
    }
    expect((await call(GET)).status).toBe(200);
  });

  it("needs no session and makes none", async () => {
    const { GET } = await import("@/app/api/health/route");
    const res = await call(GET, { cookie: null });
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie()).toEqual([]);
  });
});
