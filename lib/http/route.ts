import { AppError } from "@/lib/errors";
import { actorFromHeaders } from "@/lib/auth/session";
import type { Actor } from "@/lib/services/actor";
import { errorResponse } from "./respond";

type Context<P> = { params: Promise<P> };
export type RouteArgs<P> = { req: Request; params: P; actor: Actor | null };

// Wraps a route handler: resolves the actor from the session and maps errors. The role
// check itself is not here but in the service, through lib/services/guard.ts.
export function route<P = Record<string, never>>(fn: (args: RouteArgs<P>) => Promise<unknown> | unknown) {
  return async (req: Request, ctx: Context<P>): Promise<Response> => {
    try {
      const actor = await actorFromHeaders(req.headers);
      const params = ctx?.params ? await ctx.params : ({} as P);
      const result = await fn({ req, params, actor });
      if (result instanceof Response) return result;
      return Response.json(result ?? { ok: true });
    } catch (e) {
      return errorResponse(e);
    }
  };
}

export async function readJson(req: Request): Promise<unknown> {
  const text = await req.text();
  if (!text.trim()) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
}
