import { eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { firm, user } from "@/db/schema";
import { parseInput } from "@/lib/schemas/parse";
import { updateSettingsSchema } from "@/lib/schemas/settings";
import type { Actor } from "./actor";
import { requireActor } from "./guard";
import { recordAudit } from "./audit";

export type Me = {
  id: string;
  name: string;
  email: string;
  unitPreference: "metric" | "imperial";
  firm: { id: string; name: string } | null;
  isFirmAdmin: boolean;
};

export function getMe(actor: Actor | null): Me {
  const a = requireActor(actor);
  const theFirm = a.firmId ? getDb().select().from(firm).where(eq(firm.id, a.firmId)).get() : undefined;
  return {
    id: a.userId,
    name: a.name,
    email: a.email,
    unitPreference: a.unitPreference,
    firm: theFirm ? { id: theFirm.id, name: theFirm.name } : null,
    isFirmAdmin: a.isFirmAdmin,
  };
}

export function updateSettings(actor: Actor | null, raw: unknown): Me {
  const a = requireActor(actor);
  const input = parseInput(updateSettingsSchema, raw);
  transaction((tx) => {
    tx.update(user)
      .set({ ...(input.name !== undefined && { name: input.name }), ...(input.unitPreference && { unitPreference: input.unitPreference }) })
      .where(eq(user.id, a.userId))
      .run();
    recordAudit(tx, { actorId: a.userId, action: "settings.updated", subjectId: a.userId, detail: input });
  });
  return getMe({ ...a, ...(input.name !== undefined && { name: input.name }), ...(input.unitPreference && { unitPreference: input.unitPreference }) });
}
