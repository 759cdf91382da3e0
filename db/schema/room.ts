import { integer, real, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { project } from "./project";

import { ROOM_USES } from "../../lib/room-uses";

export { ROOM_USES, type RoomUse } from "../../lib/room-uses";

// A room of a project. Lengths in metres, temperature in °C, humidity in %.
export const room = sqliteTable(
  "room",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    use: text("use", { enum: ROOM_USES }).notNull(),
    length: real("length"),
    width: real("width"),
    height: real("height"),
    volume: real("volume"),
    // "shoebox": the six surfaces follow length × width × height; "free": a volume and a
    // surface list entered by hand.
    shape: text("shape", { enum: ["shoebox", "free"] }).notNull().default("shoebox"),
    temperature: real("temperature").notNull().default(20),
    humidity: real("humidity").notNull().default(50),
    pressure: real("pressure").notNull().default(101325),
    // The target spec as JSON (lib/rooms/targets.ts schema); null = the default for the use.
    target: text("target"),
    // The fire class this room requires, overriding the project's; null: the project's applies.
    fireRequired: text("fire_required"),
    // Optimistic concurrency: every save names the version it started from.
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("room_project_idx").on(t.projectId)],
);

export type Room = typeof room.$inferSelect;
