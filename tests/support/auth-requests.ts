import { APP_URL, bodyOf } from "./http";

// Requests to better-auth's own endpoints (/api/auth/...), as a browser would send them.
export async function authPost(path: string, body: unknown, headers: Record<string, string> = {}) {
  const { auth } = await import("@/lib/auth/server");
  const res = await auth().handler(
    new Request(`${APP_URL}/api/auth${path}`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP_URL, ...headers },
      body: JSON.stringify(body),
    }),
  );
  const json = await bodyOf(res);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  return { status: res.status, json, cookie };
}

/** Empty the attempt counters, so one test's throttling does not leak into the next. */
export async function clearThrottle() {
  const { getDb } = await import("@/db/client");
  const { throttle } = await import("@/db/schema");
  getDb().delete(throttle).run();
}
