import { real, sqliteTable, text, uniqueIndex, index } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { firm } from "./firm";
import { user } from "./auth";

import { PROJECT_ROLES } from "../../lib/roles";

export { PROJECT_ROLES, type ProjectRole } from "../../lib/roles";

export const project = sqliteTable("project", {
  id: id(),
  firmId: text("firm_id")
    .notNull()
    .references(() => firm.id),
  name: text("name").notNull(),
  reference: text("reference"),
  site: text("site"),
  // Least distance from a panel to a surface edge or an opening, m (elevation board rule).
  edgeClearance: real("edge_clearance").notNull().default(0.05),
  // The reaction-to-fire or flame spread class the project's rooms require unless a room says
  // otherwise, as the consultant typed it (lib/fire reads it); null when none is entered.
  fireRequired: text("fire_required"),
  createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

// One role per person per project: a second membership for the same person is refused.
export const membership = sqliteTable(
  "membership",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: text("role", { enum: PROJECT_ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("membership_project_user_uq").on(t.projectId, t.userId),
    index("membership_user_idx").on(t.userId),
  ],
);

export type Project = typeof project.$inferSelect;
export type Membership = typeof membership.$inferSelect;
