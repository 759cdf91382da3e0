import { and, desc, eq, gt } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { session } from "@/db/schema";
import { describeUserAgent } from "@/lib/auth/user-agent";
import { notFound } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { signedOutEverywhereMail } from "@/lib/mail/templates";
import type { Actor } from "./actor";
import { authorizeAccount } from "./guard";
import { recordAudit } from "./audit";

// The signed-in person's own sessions (devices). Session tokens never leave the server; the
// list shows ids, times, the address (when a trusted proxy supplies one) and the browser.
export type SessionView = {
  id: string;
  current: boolean;
  device: string;
  address: string | null;
  signedInAt: string;
  /** when the session was last renewed (better-auth renews it at most once a day) */
  renewedAt: string;
  expiresAt: string;
};

export function listMySessions(actor: Actor | null): SessionView[] {
  const a = authorizeAccount(actor, "sessions.manage");
  return getDb()
    .select()
    .from(session)
    .where(and(eq(session.userId, a.userId), gt(session.expiresAt, new Date())))
    .orderBy(desc(session.updatedAt))
    .all()
    .map((s) => ({
      id: s.id,
      current: s.id === a.sessionId,
      device: describeUserAgent(s.userAgent),
      address: s.ipAddress,
      signedInAt: s.createdAt.toISOString(),
      renewedAt: s.updatedAt.toISOString(),
      expiresAt: s.expiresAt.toISOString(),
    }))
    .sort((x, y) => Number(y.current) - Number(x.current));
}

export function endSession(actor: Actor | null, sessionId: string) {
  const a = authorizeAccount(actor, "sessions.manage");
  const ended = transaction((tx) => {
    const n = tx.delete(session).where(and(eq(session.id, sessionId), eq(session.userId, a.userId))).run().changes;
    if (n) recordAudit(tx, { actorId: a.userId, action: "session.ended", subjectId: a.userId });
    return n;
  });
  // Someone else's session id is "not found", so ids reveal nothing.
  if (!ended) throw notFound("Session");
  return { ended, current: sessionId === a.sessionId };
}

// Sign out everywhere, this device included; the holder is told by e-mail, since a stranger
// who has the password would use this too.
export async function endAllSessions(actor: Actor | null) {
  const a = authorizeAccount(actor, "sessions.manage");
  const { ended, mailId } = transaction((tx) => {
    const ended = tx.delete(session).where(eq(session.userId, a.userId)).run().changes;
    recordAudit(tx, { actorId: a.userId, action: "session.ended.all", subjectId: a.userId, detail: { ended } });
    const mail = signedOutEverywhereMail({ name: a.name, count: ended, at: new Date(), resetLink: LINKS.forgotPassword() });
    return { ended, mailId: enqueueMail(tx, { to: a.email, ...mail }) };
  });
  await deliver([mailId]);
  return { ended };
}
