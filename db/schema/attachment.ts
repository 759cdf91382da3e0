import { integer, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { project } from "./project";
import { user } from "./auth";

// An upload (test report, reference drawing, site photo). The file lives under the data
// folder, named by the SHA-256 of its content; this row says whose it is and what it is.
export const attachment = sqliteTable(
  "attachment",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    purpose: text("purpose", { enum: ["test-report", "fire-report", "drawing", "photo"] }).notNull(),
    sha256: text("sha256").notNull(),
    mime: text("mime").notNull(),
    size: integer("size").notNull(),
    originalName: text("original_name").notNull(),
    uploadedBy: text("uploaded_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("attachment_project_idx").on(t.projectId)],
);

export type Attachment = typeof attachment.$inferSelect;
