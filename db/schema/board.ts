import { integer, real, sqliteTable, text, index, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { surface } from "./surface";
import { buildUp } from "./build-up";
import { attachment } from "./attachment";
import { user } from "./auth";

// The elevation board of one surface: its panels, its version (every save names the version
// it started from), its grid, and an optional reference drawing set to scale underneath.
export const board = sqliteTable(
  "board",
  {
    id: id(),
    surfaceId: text("surface_id")
      .notNull()
      .references(() => surface.id, { onDelete: "cascade" }),
    version: integer("version").notNull().default(1),
    gridModule: real("grid_module").notNull().default(0.3),
    drawingId: text("drawing_id").references(() => attachment.id, { onDelete: "set null" }),
    // Where the drawing's top-left pixel sits on the surface (m, from the lower-left datum),
    // and how many metres one of its pixels spans, from the two points the person picked.
    drawingX: real("drawing_x").notNull().default(0),
    drawingY: real("drawing_y").notNull().default(0),
    drawingMetresPerPixel: real("drawing_metres_per_pixel").notNull().default(0.01),
    drawingOpacity: real("drawing_opacity").notNull().default(0.5),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("board_surface_uq").on(t.surfaceId)],
);

// One panel of a build-up on a board, from the surface's lower-left datum, in metres.
export const placement = sqliteTable(
  "placement",
  {
    id: id(),
    boardId: text("board_id")
      .notNull()
      .references(() => board.id, { onDelete: "cascade" }),
    buildUpId: text("build_up_id")
      .notNull()
      .references(() => buildUp.id, { onDelete: "restrict" }),
    code: text("code").notNull(),
    x: real("x").notNull(),
    y: real("y").notNull(),
    width: real("width").notNull(),
    height: real("height").notNull(),
    position: integer("position").notNull().default(0),
  },
  (t) => [index("placement_board_idx").on(t.boardId)],
);

// A review pin at a point of a board, with its thread of replies; the consultant resolves it.
export const pin = sqliteTable(
  "pin",
  {
    id: id(),
    boardId: text("board_id")
      .notNull()
      .references(() => board.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    x: real("x").notNull(),
    y: real("y").notNull(),
    body: text("body").notNull(),
    authorId: text("author_id").references(() => user.id, { onDelete: "set null" }),
    resolvedAt: integer("resolved_at", { mode: "timestamp_ms" }),
    resolvedBy: text("resolved_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("pin_board_idx").on(t.boardId)],
);

export const pinReply = sqliteTable(
  "pin_reply",
  {
    id: id(),
    pinId: text("pin_id")
      .notNull()
      .references(() => pin.id, { onDelete: "cascade" }),
    body: text("body").notNull(),
    authorId: text("author_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("pin_reply_pin_idx").on(t.pinId)],
);

export type Board = typeof board.$inferSelect;
export type Placement = typeof placement.$inferSelect;
export type Pin = typeof pin.$inferSelect;
export type PinReply = typeof pinReply.$inferSelect;
