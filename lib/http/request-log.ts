import { AsyncLocalStorage } from "node:async_hooks";
import { log } from "@/lib/log";

// Each API request gets an id, sent back in X-Request-Id and written on every log line made
// while it runs, so a person reporting a failure can quote it and the log shows what happened.
const current = new AsyncLocalStorage<string>();

export const currentRequestId = () => current.getStore();

export async function withRequestLog(req: Request, route: string, work: () => Promise<Response>): Promise<Response> {
  const requestId = crypto.randomUUID();
  const started = performance.now();
  const res = await current.run(requestId, work);
  res.headers.set("x-request-id", requestId);
  log.info("request", {
    requestId,
    method: req.method,
    route,
    status: res.status,
    ms: Math.round((performance.now() - started) * 10) / 10,
  });
  return res;
}

// The path with each parameter's value replaced by its name: /api/v1/invitations/[token]. The
// log then holds no token from a link and no id that would tie a line to a person.
export function routePattern(pathname: string, params: Record<string, unknown>): string {
  const names = new Map<string, string>();
  for (const [name, value] of Object.entries(params)) {
    for (const v of Array.isArray(value) ? value : [value]) if (typeof v === "string" && v) names.set(v, name);
  }
  return pathname
    .split("/")
    .map((segment) => {
      let decoded = segment;
      try {
        decoded = decodeURIComponent(segment);
      } catch {
        // keep it as sent
      }
      const name = names.get(decoded);
      return name ? `[${name}]` : segment;
    })
    .join("/");
}

// better-auth's paths name their endpoint in plain words (/api/auth/sign-in/email); anything
// else in them (a reset token) is left out.
export const authRoutePattern = (pathname: string) =>
  pathname
    .split("/")
    .map((segment) => (segment === "" || /^[a-z][a-z-]{0,31}$/.test(segment) ? segment : "[…]"))
    .join("/");
