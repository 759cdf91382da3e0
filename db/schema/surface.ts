import { integer, real, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { room } from "./room";
import { projectMaterial } from "./material";

// A wall elevation, ceiling or floor of a room, with its finish: a library material key or a
// project material (exactly one of the two).
export const surface = sqliteTable(
  "surface",
  {
    id: id(),
    roomId: text("room_id")
      .notNull()
      .references(() => room.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    name: text("name").notNull(),
    kind: text("kind", { enum: ["wall", "ceiling", "floor"] }).notNull(),
    width: real("width").notNull(),
    height: real("height").notNull(),
    libraryMaterial: text("library_material"),
    projectMaterialId: text("project_material_id").references(() => projectMaterial.id, { onDelete: "restrict" }),
    position: integer("position").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("surface_room_idx").on(t.roomId)],
);

// A door, window, glazing or vent on a surface, positioned from the surface's lower-left corner.
export const opening = sqliteTable(
  "opening",
  {
    id: id(),
    surfaceId: text("surface_id")
      .notNull()
      .references(() => surface.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: ["door", "window", "glazing", "vent", "other"] }).notNull(),
    name: text("name").notNull(),
    x: real("x").notNull(),
    y: real("y").notNull(),
    width: real("width").notNull(),
    height: real("height").notNull(),
    libraryMaterial: text("library_material"),
    projectMaterialId: text("project_material_id").references(() => projectMaterial.id, { onDelete: "restrict" }),
    createdAt: createdAt(),
  },
  (t) => [index("opening_surface_idx").on(t.surfaceId)],
);

export type Surface = typeof surface.$inferSelect;
export type Opening = typeof opening.$inferSelect;
