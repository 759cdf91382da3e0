import { sqliteTable, text } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";

// The consultancy that owns accounts; its administrator manages them.
export const firm = sqliteTable("firm", {
  id: id(),
  name: text("name").notNull(),
  createdAt: createdAt(),
});

export type Firm = typeof firm.$inferSelect;
