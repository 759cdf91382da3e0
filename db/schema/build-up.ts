import { integer, real, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { project } from "./project";
import { attachment } from "./attachment";
import { room } from "./room";

// A panel build-up of a project's library. `spec` is the calculation contract's evaluate
// input as JSON (facing, cavity, infill), so the bench, the check and the command line agree.
export const buildUp = sqliteTable(
  "build_up",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    spec: text("spec").notNull(),
    moduleWidth: real("module_width").notNull(),
    moduleHeight: real("module_height").notNull(),
    borderX: real("border_x").notNull().default(0.03),
    borderY: real("border_y").notNull().default(0.03),
    facingMaterial: text("facing_material").notNull().default(""),
    fireStandard: text("fire_standard", { enum: ["EN 13501-1", "ASTM E84", "other", "none"] }).notNull().default("none"),
    fireClass: text("fire_class").notNull().default(""),
    fireReportId: text("fire_report_id").references(() => attachment.id, { onDelete: "set null" }),
    notes: text("notes").notNull().default(""),
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("build_up_project_idx").on(t.projectId)],
);

// Treated area of a build-up on a surface, counted by area until the elevation board places
// individual panels. A surface removed from the room takes its treatments with it (service).
export const treatment = sqliteTable(
  "treatment",
  {
    id: id(),
    roomId: text("room_id")
      .notNull()
      .references(() => room.id, { onDelete: "cascade" }),
    // the surface's key within the room (db/schema/surface.ts)
    surfaceKey: text("surface_key").notNull(),
    buildUpId: text("build_up_id")
      .notNull()
      .references(() => buildUp.id, { onDelete: "cascade" }),
    area: real("area").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("treatment_room_idx").on(t.roomId)],
);

export type BuildUp = typeof buildUp.$inferSelect;
export type Treatment = typeof treatment.$inferSelect;
