import { sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";

// Append-only record of who did what; detail is JSON text.
export const auditEvent = sqliteTable(
  "audit_event",
  {
    id: id(),
    actorId: text("actor_id"),
    projectId: text("project_id"),
    action: text("action").notNull(),
    subjectId: text("subject_id"),
    detail: text("detail"),
    createdAt: createdAt(),
  },
  (t) => [index("audit_project_idx").on(t.projectId)],
);

export type AuditEvent = typeof auditEvent.$inferSelect;
