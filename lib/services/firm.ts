import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { firm, invitation, membership, user } from "@/db/schema";
import type { Actor } from "./actor";
import { requireFirmAdmin } from "./guard";

export type FirmAccount = { id: string; name: string; email: string; isFirmAdmin: boolean; projects: number; since: string };

export function getFirmAccounts(actor: Actor | null) {
  const admin = requireFirmAdmin(actor);
  const db = getDb();
  const theFirm = db.select().from(firm).where(eq(firm.id, admin.firmId)).get()!;
  const accounts: FirmAccount[] = db
    .select()
    .from(user)
    .where(eq(user.firmId, admin.firmId))
    .orderBy(asc(user.name))
    .all()
    .map((u) => ({
      id: u.id,
      name: u.name,
      email: u.email,
      isFirmAdmin: u.isFirmAdmin,
      projects: db.select({ id: membership.id }).from(membership).where(eq(membership.userId, u.id)).all().length,
      since: u.createdAt.toISOString(),
    }));
  const pending = db
    .select({ id: invitation.id, email: invitation.email, expiresAt: invitation.expiresAt })
    .from(invitation)
    .where(and(eq(invitation.firmId, admin.firmId), isNull(invitation.projectId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, new Date())))
    .all()
    .map((p) => ({ ...p, expiresAt: p.expiresAt.toISOString() }));
  return { firm: { id: theFirm.id, name: theFirm.name }, accounts, pending };
}
