import { and, eq, ne } from "drizzle-orm";
import { isAPIError } from "better-auth/api";
import { z } from "zod";
import { getDb, transaction } from "@/db/client";
import { account, session } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { LIMITS, minutesText, minutesUntil, throttleKey } from "@/lib/auth/limits";
import { consume, forget, lockedUntil, recordFailure } from "@/lib/auth/throttle";
import { gone, invalid, tooMany } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { passwordChangedMail } from "@/lib/mail/templates";
import { parseInput } from "@/lib/schemas/parse";
import { changePasswordSchema, completePasswordResetSchema, requestPasswordResetSchema } from "@/lib/schemas/account";
import type { Actor } from "./actor";
import { authorizeAccount } from "./guard";
import { recordAudit } from "./audit";

// The one answer to a reset request, whether or not the address has an account.
export const RESET_REQUESTED =
  "If an account uses that address, a link to set a new password is on its way. It works once, for one hour.";

export async function requestPasswordReset(actor: Actor | null, raw: unknown, clientAddress: string | null) {
  authorizeAccount(actor, "password.reset");
  const input = parseInput(requestPasswordResetSchema, raw);
  const verdict = consume(throttleKey.resetAddress(clientAddress), LIMITS.resetPerAddress);
  if (!verdict.allowed) {
    throw tooMany(`Too many reset requests from your network. Try again in ${minutesText(Math.ceil((verdict.retryAfter ?? 60) / 60))}.`);
  }
  // better-auth makes the single-use token (stored hashed, expiring after an hour) and calls
  // lib/auth/password-events.ts to mail it; server calls skip its per-address limiter, which
  // is why this route counts its own above.
  await auth().api.requestPasswordReset({ body: { email: input.email } });
  return { message: RESET_REQUESTED };
}

const tokenParam = z.string().min(1).max(200);
export const SPENT = "This link to set a new password has expired or has been used. Links work once, for one hour: ask for a new one.";

/** Whether a reset link can still be used, so its page can say so before anything is typed. */
export async function resetLinkIsOpen(actor: Actor | null, token: string): Promise<boolean> {
  authorizeAccount(actor, "password.reset");
  if (!tokenParam.safeParse(token).success) return false;
  const verification = await (await auth().$context).internalAdapter.findVerificationValue(`reset-password:${token}`);
  return Boolean(verification && verification.expiresAt > new Date());
}

export async function completePasswordReset(actor: Actor | null, token: string, raw: unknown) {
  authorizeAccount(actor, "password.reset");
  const input = parseInput(completePasswordResetSchema, raw);
  if (!tokenParam.safeParse(token).success) throw gone(SPENT);
  try {
    // Stores the new password, spends the token and ends every session; then
    // afterPasswordReset lifts any sign-in lock and sends the notice.
    await auth().api.resetPassword({ body: { newPassword: input.password, token } });
  } catch (e) {
    if (isAPIError(e) && e.statusCode === 400) throw gone(SPENT);
    throw e;
  }
  return { reset: true };
}

export async function changePassword(actor: Actor | null, raw: unknown) {
  const a = authorizeAccount(actor, "password.change");
  const input = parseInput(changePasswordSchema, raw);
  const key = throttleKey.passwordCheck(a.userId);
  const locked = lockedUntil(key);
  if (locked) throw tooMany(lockedMessage(locked));
  const ctx = await auth().$context;
  const credential = getDb()
    .select()
    .from(account)
    .where(and(eq(account.userId, a.userId), eq(account.providerId, "credential")))
    .get();
  const matches = credential?.password ? await ctx.password.verify({ hash: credential.password, password: input.currentPassword }) : false;
  if (!matches) {
    const until = recordFailure(key, LIMITS.passwordChecksPerAccount);
    if (until) throw tooMany(lockedMessage(until));
    throw invalid([{ field: "currentPassword", message: "That is not your current password." }]);
  }
  forget(key);
  const hash = await ctx.password.hash(input.password);
  const mail = passwordChangedMail({ name: a.name, how: "changed", at: new Date(), signInLink: LINKS.signIn(), resetLink: LINKS.forgotPassword() });
  const { ended, mailId } = transaction((tx) => {
    tx.update(account).set({ password: hash }).where(eq(account.id, credential!.id)).run();
    // Anyone signed in elsewhere with the old password is signed out; this device stays.
    const others = a.sessionId ? and(eq(session.userId, a.userId), ne(session.id, a.sessionId)) : eq(session.userId, a.userId);
    const ended = tx.delete(session).where(others).run().changes;
    recordAudit(tx, { actorId: a.userId, action: "password.changed", subjectId: a.userId, detail: { otherSessionsEnded: ended } });
    return { ended, mailId: enqueueMail(tx, { to: a.email, ...mail }) };
  });
  await deliver([mailId]);
  return { changed: true, otherSessionsEnded: ended };
}

function lockedMessage(until: Date) {
  return `Too many wrong current passwords. Try again in ${minutesText(minutesUntil(until))}, or sign out and set a new password by e-mail.`;
}
