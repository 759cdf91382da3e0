import { forbidden } from "@/lib/errors";

// Cross-site request forgery: a browser attaches the session cookie (SameSite=Lax) to requests
// that another site, or another port of the same host, makes it send. Every request that can
// change something must therefore come from one of the app's own origins, as the browser
// states it in Origin (or, where a browser sends no Origin, in Referer).

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
const LOOPBACK = new Set(["localhost", "127.0.0.1", "[::1]"]);

export const changesState = (method: string) => !SAFE_METHODS.has(method.toUpperCase());

// The configured address, and where it is a loopback one, the other loopback names of the
// same port: http://localhost:3000 and http://127.0.0.1:3000 are the same server.
export function appOrigins(appUrl: string): string[] {
  const url = new URL(appUrl);
  if (!LOOPBACK.has(url.hostname)) return [url.origin];
  const port = url.port ? `:${url.port}` : "";
  return [...LOOPBACK].map((host) => `${url.protocol}//${host}${port}`);
}

function originOf(value: string | null): string | null {
  if (!value) return null;
  try {
    return new URL(value).origin;
  } catch {
    return "null";
  }
}

// Where the request says it comes from: its Origin, else its Referer's origin, else null. An
// opaque origin ("null": a sandboxed frame, a file, a redirect across sites) is never ours.
export function claimedOrigin(headers: Headers): string | null {
  const origin = headers.get("origin");
  if (origin !== null) return origin.trim() || "null";
  return originOf(headers.get("referer"));
}

// Throws 403 for a state-changing request from anywhere but the app's own pages. A request
// with neither header and no cookie is a program's (curl, a script): it carries no session a
// page could have lent it, so it is left to the session check.
export function assertSameOrigin(req: Request, allowed: readonly string[]): void {
  if (!changesState(req.method)) return;
  const claimed = claimedOrigin(req.headers);
  if (claimed === null && !req.headers.has("cookie")) return;
  if (claimed !== null && allowed.includes(claimed)) return;
  throw forbidden("This request did not come from a Cavitas page, so it was refused. Nothing was changed.");
}
