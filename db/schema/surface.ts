import { integer, real, sqliteTable, text, index, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { room } from "./room";
// A wall elevation, ceiling or floor of a room, with its finish. Finishes and opening
// materials are material keys: a built-in library key, or "project:<id>" for a project's own
// material (lib/services/materials.ts resolves both). `key` is stable within the room, so
// treatments and, later, panels stay attached when the room's dimensions change.
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
    finish: text("finish").notNull(),
    position: integer("position").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("surface_room_key_uq").on(t.roomId, t.key)],
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
    material: text("material").notNull(),
    position: integer("position").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("opening_surface_idx").on(t.surfaceId)],
);

export type Surface = typeof surface.$inferSelect;
export type Opening = typeof opening.$inferSelect;
