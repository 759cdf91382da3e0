import { and, asc, count, eq, gt, isNull } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { firm, invitation, membership, project, session, user, type User } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { accountDisabledMail, accountEnabledMail } from "@/lib/mail/templates";
import { parseInput } from "@/lib/schemas/parse";
import { setAccountDisabledSchema } from "@/lib/schemas/account";
import type { Actor } from "./actor";
import { authorizeAccount, requireFirmAdmin } from "./guard";
import { recordAudit } from "./audit";

export type FirmAccount = {
  id: string;
  name: string;
  email: string;
  isFirmAdmin: boolean;
  isYou: boolean;
  projects: number;
  since: string;
  /** when a firm administrator disabled the account; null while it is active */
  disabledAt: string | null;
  /** projects where this account is the only consultant: disabling it leaves them without one */
  soleConsultantOn: string[];
};

function accountView(u: User, actorId: string): FirmAccount {
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    isFirmAdmin: u.isFirmAdmin,
    isYou: u.id === actorId,
    projects: getDb().select({ n: count() }).from(membership).where(eq(membership.userId, u.id)).get()?.n ?? 0,
    since: u.createdAt.toISOString(),
    disabledAt: u.disabledAt?.toISOString() ?? null,
    soleConsultantOn: soleConsultantProjects(u.id),
  };
}

function soleConsultantProjects(userId: string): string[] {
  const db = getDb();
  return db
    .select({ id: project.id, name: project.name })
    .from(membership)
    .innerJoin(project, eq(project.id, membership.projectId))
    .where(and(eq(membership.userId, userId), eq(membership.role, "consultant")))
    .orderBy(asc(project.name))
    .all()
    .filter((p) => db.select({ n: count() }).from(membership).where(and(eq(membership.projectId, p.id), eq(membership.role, "consultant"))).get()!.n === 1)
    .map((p) => p.name);
}

export function getFirmAccounts(actor: Actor | null) {
  const admin = requireFirmAdmin(actor);
  const db = getDb();
  const theFirm = db.select().from(firm).where(eq(firm.id, admin.firmId)).get()!;
  const accounts = db
    .select()
    .from(user)
    .where(eq(user.firmId, admin.firmId))
    .orderBy(asc(user.name))
    .all()
    .map((u) => accountView(u, admin.userId));
  const pending = db
    .select({ id: invitation.id, email: invitation.email, expiresAt: invitation.expiresAt })
    .from(invitation)
    .where(and(eq(invitation.firmId, admin.firmId), isNull(invitation.projectId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, new Date())))
    .all()
    .map((p) => ({ ...p, expiresAt: p.expiresAt.toISOString() }));
  return { firm: { id: theFirm.id, name: theFirm.name }, accounts, pending };
}

// Disable or re-enable a colleague's account. Disabling ends its sessions at once and stops
// sign-in; the user row stays, so pins, replies and decisions keep their author.
export async function setAccountDisabled(actor: Actor | null, userId: string, raw: unknown): Promise<FirmAccount> {
  const admin = authorizeAccount(actor, "account.disable");
  const input = parseInput(setAccountDisabledSchema, raw);
  const db = getDb();
  const target = db.select().from(user).where(and(eq(user.id, userId), eq(user.firmId, admin.firmId))).get();
  if (!target) throw notFound("Account");
  if (target.id === admin.userId) throw conflict("You cannot disable your own account.", "disabled");
  if (Boolean(target.disabledAt) === input.disabled) return accountView(target, admin.userId);
  const firmName = db.select({ name: firm.name }).from(firm).where(eq(firm.id, admin.firmId)).get()!.name;
  const at = new Date();
  const mailId = transaction((tx) => {
    tx.update(user)
      .set(input.disabled ? { disabledAt: at, disabledBy: admin.userId } : { disabledAt: null, disabledBy: null })
      .where(eq(user.id, target.id))
      .run();
    const ended = input.disabled ? tx.delete(session).where(eq(session.userId, target.id)).run().changes : 0;
    recordAudit(tx, { actorId: admin.userId, action: input.disabled ? "account.disabled" : "account.enabled", subjectId: target.id, detail: { sessionsEnded: ended } });
    const common = { name: target.name, adminName: admin.name, firmName, signInLink: LINKS.signIn() };
    const mail = input.disabled ? accountDisabledMail({ ...common, at }) : accountEnabledMail(common);
    return enqueueMail(tx, { to: target.email, ...mail });
  });
  await deliver([mailId]);
  return accountView(db.select().from(user).where(eq(user.id, target.id)).get()!, admin.userId);
}
