import { integer, sqliteTable, text, index } from "drizzle-orm/sqlite-core";

// Attempt counters for sign-in and password throttling: better-auth's per-address limits
// (through its customStorage) and Cavitas's per-account locks. Kept in SQLite, not memory,
// so a restart does not hand an attacker a fresh allowance. Times are epoch milliseconds.
export const throttle = sqliteTable(
  "throttle",
  {
    key: text("key").primaryKey(),
    hits: integer("hits").notNull(),
    windowStart: integer("window_start").notNull(),
    lockedUntil: integer("locked_until"),
  },
  (t) => [index("throttle_window_idx").on(t.windowStart)],
);

export type ThrottleRow = typeof throttle.$inferSelect;
