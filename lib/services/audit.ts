import { auditEvent } from "@/db/schema";
import type { Tx } from "@/db/client";

// Written inside the transaction of the change it records.
export function recordAudit(
  tx: Tx,
  event: { actorId: string | null; projectId?: string | null; action: string; subjectId?: string | null; detail?: unknown },
): void {
  tx.insert(auditEvent)
    .values({
      actorId: event.actorId,
      projectId: event.projectId ?? null,
      action: event.action,
      subjectId: event.subjectId ?? null,
      detail: event.detail === undefined ? null : JSON.stringify(event.detail),
    })
    .run();
}
