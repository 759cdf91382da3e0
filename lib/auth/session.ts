import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { user } from "@/db/schema";
import type { Actor } from "@/lib/services/actor";
import { auth } from "./server";

// The signed-in person for a request, read fresh from the database so a changed unit
// preference, firm membership or disabled account applies at once. Null when there is no
// valid session (disabling an account also deletes its sessions; this is the second lock).
export async function actorFromHeaders(headers: Headers): Promise<Actor | null> {
  const session = await auth().api.getSession({ headers });
  if (!session) return null;
  const row = getDb().select().from(user).where(eq(user.id, session.user.id)).get();
  if (!row || row.disabledAt) return null;
  return {
    userId: row.id,
    email: row.email.toLowerCase(),
    name: row.name,
    firmId: row.firmId,
    isFirmAdmin: row.isFirmAdmin,
    unitPreference: row.unitPreference,
    sessionId: session.session.id,
  };
}
