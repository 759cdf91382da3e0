import { eq, inArray } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { notification } from "@/db/schema";
import { env } from "@/lib/env";
import { mailTransport } from "./transport";

export type OutgoingMail = { to: string; subject: string; text: string; html?: string; projectId?: string | null };

// Queue a message inside the caller's transaction; deliver() sends it after the commit.
export function enqueueMail(tx: Tx, mail: OutgoingMail): string {
  const row = tx
    .insert(notification)
    .values({
      toEmail: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? null,
      projectId: mail.projectId ?? null,
    })
    .returning({ id: notification.id })
    .get();
  return row.id;
}

export type DeliveryResult = { id: string; status: "sent" | "failed"; error?: string };

export async function deliver(ids: string[]): Promise<DeliveryResult[]> {
  if (ids.length === 0) return [];
  const db = getDb();
  const rows = db.select().from(notification).where(inArray(notification.id, ids)).all();
  const results: DeliveryResult[] = [];
  for (const row of rows) {
    try {
      await mailTransport().sendMail({
        from: env().mailFrom,
        to: row.toEmail,
        subject: row.subject,
        text: row.text,
        html: row.html ?? undefined,
      });
      db.update(notification).set({ status: "sent", sentAt: new Date(), error: null }).where(eq(notification.id, row.id)).run();
      results.push({ id: row.id, status: "sent" });
    } catch (e) {
      const error = e instanceof Error ? e.message : String(e);
      db.update(notification).set({ status: "failed", error }).where(eq(notification.id, row.id)).run();
      results.push({ id: row.id, status: "failed", error });
    }
  }
  return results;
}
