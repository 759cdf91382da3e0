import { eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { user as userTable } from "@/db/schema";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { passwordChangedMail, passwordResetMail } from "@/lib/mail/templates";
import { recordAudit } from "@/lib/services/audit";
import { LIMITS, throttleKey } from "./limits";
import { consume, forget } from "./throttle";

type AuthUser = { id: string; email: string; name: string };

const sendInBackground = (id: string) =>
  deliver([id]).catch((e) => console.error("mail delivery failed", e instanceof Error ? e.message : e));

// better-auth's sendResetPassword: it is called only when the address has an account.
// The message is queued in the outbox and sent without waiting, so the answer to the
// request takes the same time whether or not an account exists. A disabled account, or one
// that has had its share of reset mails this hour, gets nothing; the answer is the same.
export async function sendResetPasswordMail({ user, token }: { user: AuthUser; token: string }) {
  const row = getDb().select({ disabledAt: userTable.disabledAt }).from(userTable).where(eq(userTable.id, user.id)).get();
  if (!row || row.disabledAt) return;
  if (!consume(throttleKey.resetMail(user.email), LIMITS.resetMailsPerAccount).allowed) return;
  const expiresAt = new Date(Date.now() + LIMITS.resetLinkSeconds * 1000);
  const mail = passwordResetMail({ name: user.name, link: LINKS.resetPassword(token), expiresAt });
  const id = transaction((tx) => {
    recordAudit(tx, { actorId: null, action: "password.reset.requested", subjectId: user.id });
    return enqueueMail(tx, { to: user.email, ...mail });
  });
  void sendInBackground(id);
}

// better-auth's onPasswordReset, after the new password is stored, the token spent and every
// session ended: the mailbox owner has proved themselves, so a sign-in lock is lifted.
export async function afterPasswordReset({ user }: { user: AuthUser }) {
  forget(throttleKey.signIn(user.email));
  const mail = passwordChangedMail({ name: user.name, how: "reset", at: new Date(), signInLink: LINKS.signIn(), resetLink: LINKS.forgotPassword() });
  const id = transaction((tx) => {
    recordAudit(tx, { actorId: user.id, action: "password.reset", subjectId: user.id });
    return enqueueMail(tx, { to: user.email, ...mail });
  });
  await deliver([id]);
}
