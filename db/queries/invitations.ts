import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { invitation } from "@/db/schema";
import { hashToken } from "@/lib/tokens";

export function findInvitationByToken(token: string) {
  return getDb().select().from(invitation).where(eq(invitation.tokenHash, hashToken(token))).get();
}
