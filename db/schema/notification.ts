import { integer, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { project } from "./project";

// Outbox of e-mails: written in the same transaction as the change that causes them,
// delivered afterwards, so a mail failure never loses the change itself.
export const notification = sqliteTable(
  "notification",
  {
    id: id(),
    projectId: text("project_id").references(() => project.id, { onDelete: "cascade" }),
    toEmail: text("to_email").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    status: text("status", { enum: ["pending", "sent", "failed"] }).notNull().default("pending"),
    error: text("error"),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("notification_status_idx").on(t.status)],
);

export type Notification = typeof notification.$inferSelect;
