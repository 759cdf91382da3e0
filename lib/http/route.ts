import { notFound, unauthenticated } from "@/lib/errors";
import { actorFromHeaders } from "@/lib/auth/session";
import { env } from "@/lib/env";
import type { Actor } from "@/lib/services/actor";
import { JSON_LIMIT, readFormBody, readJsonBody, readJsonText } from "./body";
import { appOrigins, assertSameOrigin, changesState } from "./origin";
import { errorResponse } from "./respond";
import { authRoutePattern, routePattern, withRequestLog } from "./request-log";

type Context<P> = { params: Promise<P> };
export type RouteArgs<P> = {
  req: Request;
  params: P;
  actor: Actor | null;
  /** The JSON body, read within the route's limit; 415 for any other type. */
  json: () => Promise<unknown>;
  /** A multipart/form-data body, read within the route's limit. */
  form: () => Promise<FormData>;
};

export type RouteOptions = {
  /** Largest body this route reads, in bytes (JSON: 256 KB unless set; uploads: the file limit). */
  maxBody?: number;
  /** May change state without a session: the e-mailed token is the proof (account from an invitation, password reset). */
  public?: boolean;
};

// Wraps a route handler. In order: a request id; the origin check for anything that changes
// state (403 from another site); the session, so a state-changing request without one is
// answered 401 before its body is read; the body readers with their ceilings (413, 415); the
// handler; errors mapped in one place; one log line. The role check itself is not here but in
// the service, through lib/services/guard.ts.
export function route<P = Record<string, never>>(fn: (args: RouteArgs<P>) => Promise<unknown> | unknown, options: RouteOptions = {}) {
  return async (req: Request, ctx: Context<P>): Promise<Response> => {
    const params = ctx?.params ? await ctx.params : ({} as P);
    return withRequestLog(req, routePattern(new URL(req.url).pathname, params as Record<string, unknown>), async () => {
      try {
        assertSameOrigin(req, appOrigins(env().appUrl));
        const actor = await actorFromHeaders(req.headers);
        if (!actor && changesState(req.method) && !options.public) throw unauthenticated();
        const result = await fn({
          req,
          params,
          actor,
          json: () => readJsonBody(req, options.maxBody ?? JSON_LIMIT),
          form: () => readFormBody(req, options.maxBody ?? env().uploadLimitBytes),
        });
        if (result instanceof Response) return result;
        return Response.json(result ?? { ok: true });
      } catch (e) {
        return errorResponse(e);
      }
    });
  };
}

// better-auth's own endpoints (/api/auth/*) keep their handler and their own checks, behind the
// same gate: the origin check, a JSON-only body of at most 16 KB, a request id and a log line.
const AUTH_BODY_LIMIT = 16 * 1024;

// Endpoints better-auth offers that Cavitas does not use, closed: each would change an account
// around the app's own checks (a name changes through PATCH /api/v1/me and its validation; an
// e-mail address is what invitations are bound to). update-user answered 500 to {"name":null}.
const CLOSED_AUTH_ENDPOINTS = ["/update-user", "/change-email", "/delete-user"];
const isClosed = (pathname: string) => {
  const endpoint = pathname.replace(/^\/api\/auth/, "");
  return CLOSED_AUTH_ENDPOINTS.some((c) => endpoint === c || endpoint.startsWith(`${c}/`));
};

export function authRoute(handler: (req: Request) => Promise<Response>) {
  return (req: Request): Promise<Response> =>
    withRequestLog(req, authRoutePattern(new URL(req.url).pathname), async () => {
      try {
        assertSameOrigin(req, appOrigins(env().appUrl));
        if (isClosed(new URL(req.url).pathname)) throw notFound("This account action");
        if (!changesState(req.method)) return await handler(req);
        const text = await readJsonText(req, AUTH_BODY_LIMIT);
        return await handler(new Request(req.url, { method: req.method, headers: req.headers, body: text || undefined }));
      } catch (e) {
        return errorResponse(e);
      }
    });
}
