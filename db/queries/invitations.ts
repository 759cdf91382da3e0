import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { invitation } from "@/db/schema";
import { hashToken } from "@/lib/tokens";

// An invitation that can still be accepted: not used, not revoked, not expired.
export function hasOpenInvitationFor(email: string): boolean {
  const row = getDb()
    .select({ id: invitation.id })
    .from(invitation)
    .where(
      and(
        eq(invitation.email, email.trim().toLowerCase()),
        isNull(invitation.acceptedAt),
        isNull(invitation.revokedAt),
        gt(invitation.expiresAt, new Date()),
      ),
    )
    .get();
  return Boolean(row);
}

export function findInvitationByToken(token: string) {
  return getDb().select().from(invitation).where(eq(invitation.tokenHash, hashToken(token))).get();
}
