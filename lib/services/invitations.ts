import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb, transaction, type Tx } from "@/db/client";
import { account, firm, invitation, membership, project, user, type Invitation } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { findInvitationByToken } from "@/db/queries/invitations";
import { conflict, forbidden, gone, notFound } from "@/lib/errors";
import { LINKS } from "@/lib/mail/links";
import { deliver, enqueueMail, type DeliveryResult } from "@/lib/mail/outbox";
import { firmInvitationMail, projectInvitationMail } from "@/lib/mail/templates";
import { ROLE_WORDS } from "@/lib/permissions";
import { parseInput } from "@/lib/schemas/parse";
import { inviteSignUpSchema, inviteToFirmSchema, inviteToProjectSchema } from "@/lib/schemas/invitation";
import { hashToken, newToken } from "@/lib/tokens";
import type { Actor } from "./actor";
import { authorize, requireActor, requireFirmAdmin } from "./guard";
import { recordAudit } from "./audit";

const INVITATION_DAYS = 7;

export type InvitationSummary = {
  id: string;
  email: string;
  role: Invitation["role"];
  expiresAt: string;
  invitedBy: string | null;
};

function summary(inv: Invitation, inviterName: string | null): InvitationSummary {
  return { id: inv.id, email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString(), invitedBy: inviterName };
}

const inviteLink = LINKS.invitation;

function openInvitationWhere(email: string, projectId: string | null) {
  return and(
    eq(invitation.email, email),
    projectId ? eq(invitation.projectId, projectId) : isNull(invitation.projectId),
    isNull(invitation.acceptedAt),
    isNull(invitation.revokedAt),
    gt(invitation.expiresAt, new Date()),
  );
}

export async function inviteToProject(actor: Actor | null, projectId: string, raw: unknown) {
  const access = authorize(actor, projectId, "team.invite");
  const input = parseInput(inviteToProjectSchema, raw);
  const db = getDb();
  const existing = db
    .select({ role: membership.role })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.projectId, projectId), eq(user.email, input.email)))
    .get();
  if (existing) {
    throw conflict(`${input.email} is already on this project as ${ROLE_WORDS[existing.role].toLowerCase()}.`, "email");
  }
  if (db.select({ id: invitation.id }).from(invitation).where(openInvitationWhere(input.email, projectId)).get()) {
    throw conflict(`${input.email} already has an open invitation to this project. Withdraw it to send a new one.`, "email");
  }
  const token = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
  const { inv, mailId } = transaction((tx) => {
    const inv = tx
      .insert(invitation)
      .values({
        tokenHash: hashToken(token),
        email: input.email,
        firmId: access.project.firmId,
        projectId,
        role: input.role,
        invitedBy: access.actor.userId,
        message: input.message || null,
        expiresAt,
      })
      .returning()
      .get();
    const mail = projectInvitationMail({
      inviterName: access.actor.name,
      projectName: access.project.name,
      role: input.role,
      link: inviteLink(token),
      message: input.message,
      expiresAt,
    });
    const mailId = enqueueMail(tx, { to: input.email, projectId, ...mail });
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "invitation.sent", subjectId: inv.id, detail: { email: input.email, role: input.role } });
    return { inv, mailId };
  });
  const [delivery] = await deliver([mailId]);
  return { invitation: summary(inv, access.actor.name), delivery: delivery satisfies DeliveryResult };
}

export function listOpenInvitations(actor: Actor | null, projectId: string): InvitationSummary[] {
  authorize(actor, projectId, "team.invite");
  return getDb()
    .select({ inv: invitation, inviter: user.name })
    .from(invitation)
    .leftJoin(user, eq(user.id, invitation.invitedBy))
    .where(and(eq(invitation.projectId, projectId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, new Date())))
    .all()
    .map((r) => summary(r.inv, r.inviter));
}

export function revokeInvitation(actor: Actor | null, projectId: string, invitationId: string) {
  const access = authorize(actor, projectId, "team.invite");
  const inv = getDb()
    .select()
    .from(invitation)
    .where(and(eq(invitation.id, invitationId), eq(invitation.projectId, projectId)))
    .get();
  if (!inv) throw notFound("Invitation");
  if (inv.acceptedAt) throw conflict("This invitation was already accepted; remove the member instead.");
  if (inv.revokedAt) return { id: inv.id, revoked: true };
  transaction((tx) => {
    tx.update(invitation).set({ revokedAt: new Date() }).where(eq(invitation.id, inv.id)).run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "invitation.revoked", subjectId: inv.id });
  });
  return { id: inv.id, revoked: true };
}

export async function inviteToFirm(actor: Actor | null, raw: unknown) {
  const admin = requireFirmAdmin(actor);
  const input = parseInput(inviteToFirmSchema, raw);
  const db = getDb();
  const existingUser = db.select().from(user).where(eq(user.email, input.email)).get();
  if (existingUser?.firmId === admin.firmId) throw conflict(`${input.email} already has an account with this firm.`, "email");
  if (existingUser?.firmId) throw conflict(`${input.email} belongs to another firm.`, "email");
  if (db.select({ id: invitation.id }).from(invitation).where(and(openInvitationWhere(input.email, null), eq(invitation.firmId, admin.firmId))).get()) {
    throw conflict(`${input.email} already has an open invitation to this firm.`, "email");
  }
  const theFirm = db.select().from(firm).where(eq(firm.id, admin.firmId)).get()!;
  const token = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
  const { inv, mailId } = transaction((tx) => {
    const inv = tx
      .insert(invitation)
      .values({ tokenHash: hashToken(token), email: input.email, firmId: admin.firmId, invitedBy: admin.userId, message: input.message || null, expiresAt })
      .returning()
      .get();
    const mail = firmInvitationMail({ inviterName: admin.name, firmName: theFirm.name, link: inviteLink(token), message: input.message, expiresAt });
    const mailId = enqueueMail(tx, { to: input.email, ...mail });
    recordAudit(tx, { actorId: admin.userId, action: "firm.invitation.sent", subjectId: inv.id, detail: { email: input.email } });
    return { inv, mailId };
  });
  const [delivery] = await deliver([mailId]);
  return { invitation: summary(inv, admin.name), delivery };
}

export type InvitationState = "open" | "expired" | "used" | "withdrawn";

export type InvitationView = {
  state: InvitationState;
  email: string;
  role: Invitation["role"];
  projectId: string | null;
  projectName: string | null;
  firmName: string;
  inviterName: string | null;
  expiresAt: string;
  accountExists: boolean;
};

function stateOf(inv: Invitation): InvitationState {
  if (inv.revokedAt) return "withdrawn";
  if (inv.acceptedAt) return "used";
  if (inv.expiresAt.getTime() <= Date.now()) return "expired";
  return "open";
}

// Anyone holding the link may read what it is for; the token is the secret.
export function describeInvitation(token: string): InvitationView {
  const inv = findInvitationByToken(token);
  if (!inv) throw notFound("Invitation");
  const db = getDb();
  const proj = inv.projectId ? db.select().from(project).where(eq(project.id, inv.projectId)).get() : undefined;
  const theFirm = db.select().from(firm).where(eq(firm.id, inv.firmId)).get();
  const inviter = inv.invitedBy ? db.select({ name: user.name }).from(user).where(eq(user.id, inv.invitedBy)).get() : undefined;
  const account = db.select({ id: user.id }).from(user).where(eq(user.email, inv.email)).get();
  return {
    state: stateOf(inv),
    email: inv.email,
    role: inv.role,
    projectId: inv.projectId,
    projectName: proj?.name ?? null,
    firmName: theFirm?.name ?? "",
    inviterName: inviter?.name ?? null,
    expiresAt: inv.expiresAt.toISOString(),
    accountExists: Boolean(account),
  };
}

// An invitation that can still be used, or the refusal that says why not.
function usableInvitation(token: string): Invitation {
  const inv = findInvitationByToken(token);
  if (!inv) throw notFound("Invitation");
  const state = stateOf(inv);
  if (state === "withdrawn") throw gone("This invitation was withdrawn. Ask for a new one.");
  if (state === "used") throw conflict("This invitation has already been used. Sign in to reach the project.");
  if (state === "expired") throw gone("This invitation has expired. Ask for a new one.");
  return inv;
}

// The membership or firm place the invitation grants, its use recorded.
function join(tx: Tx, inv: Invitation, userId: string) {
  if (inv.projectId && inv.role) {
    tx.insert(membership).values({ projectId: inv.projectId, userId, role: inv.role }).run();
  } else {
    tx.update(user).set({ firmId: inv.firmId }).where(eq(user.id, userId)).run();
  }
  tx.update(invitation).set({ acceptedAt: new Date(), acceptedBy: userId }).where(eq(invitation.id, inv.id)).run();
  recordAudit(tx, { actorId: userId, projectId: inv.projectId, action: "invitation.accepted", subjectId: inv.id, detail: { role: inv.role } });
}

export function acceptInvitation(actor: Actor | null, token: string): { projectId: string | null } {
  const a = requireActor(actor);
  const inv = usableInvitation(token);
  if (a.email !== inv.email) {
    throw forbidden(`This invitation is for ${inv.email}, but you are signed in as ${a.email}. Sign out and use the invited address.`);
  }
  const db = getDb();
  if (inv.projectId) {
    const existing = db
      .select({ role: membership.role })
      .from(membership)
      .where(and(eq(membership.projectId, inv.projectId), eq(membership.userId, a.userId)))
      .get();
    if (existing) throw conflict(`You are already on this project as ${ROLE_WORDS[existing.role].toLowerCase()}.`);
  } else if (a.firmId && a.firmId !== inv.firmId) {
    throw conflict("Your account already belongs to another firm.");
  }
  transaction((tx) => join(tx, inv, a.userId));
  return { projectId: inv.projectId };
}

// Sign-up exists only here: the holder of an open invitation link creates the account for
// the invited address (never one they choose) and joins in the same transaction. The link
// is the proof of the mailbox, so the address counts as verified.
export async function createAccountFromInvitation(token: string, raw: unknown): Promise<{ email: string; projectId: string | null }> {
  const input = parseInput(inviteSignUpSchema, raw);
  refuseExistingAccount(usableInvitation(token));
  const hash = await (await auth().$context).password.hash(input.password);
  // Hashing takes a moment: check again, then write with no pause in between.
  const inv = usableInvitation(token);
  refuseExistingAccount(inv);
  transaction((tx) => {
    const id = crypto.randomUUID();
    tx.insert(user).values({ id, name: input.name, email: inv.email, emailVerified: true }).run();
    tx.insert(account).values({ id: crypto.randomUUID(), accountId: id, providerId: "credential", userId: id, password: hash }).run();
    recordAudit(tx, { actorId: id, projectId: inv.projectId, action: "account.created", subjectId: id });
    join(tx, inv, id);
  });
  return { email: inv.email, projectId: inv.projectId };
}

function refuseExistingAccount(inv: Invitation) {
  if (getDb().select({ id: user.id }).from(user).where(eq(user.email, inv.email)).get()) {
    throw conflict(`An account for ${inv.email} already exists. Sign in with it to accept the invitation.`);
  }
}
