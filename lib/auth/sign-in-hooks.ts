import { eq } from "drizzle-orm";
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { getDb } from "@/db/client";
import { user } from "@/db/schema";
import { ACCOUNT_DISABLED_MESSAGE, LIMITS, accountLockedMessage, throttleKey } from "./limits";
import { forget, lockedUntil, recordFailure } from "./throttle";

// better-auth hooks around sign-in: the per-account limit and disabled accounts. The
// per-address limit is better-auth's own rate limiter (see server.ts).

const emailOf = (body: unknown): string | null => {
  const email = (body as { email?: unknown } | null)?.email;
  return typeof email === "string" && email.trim() ? email : null;
};

// Before the password is checked: a locked address is refused whatever the password, and
// any address can be locked, registered or not, so the answer reveals nothing.
export const beforeAuth = createAuthMiddleware(async (ctx) => {
  if (ctx.path !== "/sign-in/email") return;
  const email = emailOf(ctx.body);
  if (!email) return;
  const until = lockedUntil(throttleKey.signIn(email));
  if (until) return lockedResponse(until);
});

function lockedResponse(until: Date) {
  const retryAfter = String(Math.ceil((until.getTime() - Date.now()) / 1000));
  return Response.json({ code: "ACCOUNT_LOCKED", message: accountLockedMessage(until) }, { status: 429, headers: { "retry-after": retryAfter } });
}

// After it: a wrong password counts towards the lock; a right one clears the count.
export const afterAuth = createAuthMiddleware(async (ctx) => {
  if (ctx.path !== "/sign-in/email") return;
  const email = emailOf(ctx.body);
  if (!email) return;
  const returned = ctx.context.returned;
  if (isAPIError(returned)) {
    if (returned.statusCode !== 401) return;
    const until = recordFailure(throttleKey.signIn(email), LIMITS.signInPerAccount);
    // The failure that locks says so at once. A thrown error here would keep the endpoint's
    // 401 status, so the hook answers with a response of its own.
    if (until) return lockedResponse(until);
    return;
  }
  forget(throttleKey.signIn(email));
});

// Runs when a session is about to be made, after the password was verified, so only the
// holder of the right password learns that the account is disabled.
export async function refuseDisabledAccount(session: { userId: string }) {
  const row = getDb().select({ disabledAt: user.disabledAt }).from(user).where(eq(user.id, session.userId)).get();
  if (row?.disabledAt) throw new APIError("FORBIDDEN", { code: "ACCOUNT_DISABLED", message: ACCOUNT_DISABLED_MESSAGE });
}
