import { sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { project } from "./project";
import { attachment } from "./attachment";

// A project's own finish (for example from a manufacturer's test report); the built-in
// library lives in code (lib/rooms/materials-library.ts). alpha is JSON by octave label.
export const projectMaterial = sqliteTable(
  "project_material",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    category: text("category").notNull().default("any"),
    alpha: text("alpha").notNull(),
    source: text("source").notNull(),
    reportId: text("report_id").references(() => attachment.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("project_material_project_idx").on(t.projectId)],
);

export type ProjectMaterial = typeof projectMaterial.$inferSelect;
