import { integer, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { firm } from "./firm";
import { project, PROJECT_ROLES } from "./project";
import { user } from "./auth";

// An invitation either to a project with a role, or (projectId null) to the firm itself.
// Only the SHA-256 of the token is stored; the token itself travels in the e-mail link.
export const invitation = sqliteTable(
  "invitation",
  {
    id: id(),
    tokenHash: text("token_hash").notNull().unique(),
    email: text("email").notNull(),
    firmId: text("firm_id")
      .notNull()
      .references(() => firm.id),
    projectId: text("project_id").references(() => project.id, { onDelete: "cascade" }),
    role: text("role", { enum: PROJECT_ROLES }),
    invitedBy: text("invited_by").references(() => user.id, { onDelete: "set null" }),
    message: text("message"),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    acceptedBy: text("accepted_by").references(() => user.id, { onDelete: "set null" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("invitation_email_idx").on(t.email), index("invitation_project_idx").on(t.projectId)],
);

export type Invitation = typeof invitation.$inferSelect;
