import { integer, sqliteTable, text, index } from "drizzle-orm/sqlite-core";
import { createdAt, updatedAt } from "./columns";
import { firm } from "./firm";

// Tables of better-auth's core schema (user, session, account, verification), written by hand
// from its documented schema; user carries Cavitas's own fields as better-auth additionalFields.
export const user = sqliteTable("user", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  email: text("email").notNull().unique(),
  emailVerified: integer("email_verified", { mode: "boolean" }).notNull().default(false),
  image: text("image"),
  firmId: text("firm_id").references(() => firm.id, { onDelete: "set null" }),
  isFirmAdmin: integer("is_firm_admin", { mode: "boolean" }).notNull().default(false),
  unitPreference: text("unit_preference", { enum: ["metric", "imperial"] })
    .notNull()
    .default("metric"),
  // Set by a firm administrator: the account keeps its name on pins and decisions, but its
  // sessions are ended and it cannot sign in until re-enabled. disabledBy is the
  // administrator's user id (no foreign key: accounts are disabled, never deleted).
  disabledAt: integer("disabled_at", { mode: "timestamp_ms" }),
  disabledBy: text("disabled_by"),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const session = sqliteTable(
  "session",
  {
    id: text("id").primaryKey(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    token: text("token").notNull().unique(),
    ipAddress: text("ip_address"),
    userAgent: text("user_agent"),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("session_user_idx").on(t.userId)],
);

export const account = sqliteTable(
  "account",
  {
    id: text("id").primaryKey(),
    accountId: text("account_id").notNull(),
    providerId: text("provider_id").notNull(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    accessToken: text("access_token"),
    refreshToken: text("refresh_token"),
    idToken: text("id_token"),
    accessTokenExpiresAt: integer("access_token_expires_at", { mode: "timestamp_ms" }),
    refreshTokenExpiresAt: integer("refresh_token_expires_at", { mode: "timestamp_ms" }),
    scope: text("scope"),
    password: text("password"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("account_user_idx").on(t.userId)],
);

export const verification = sqliteTable("verification", {
  id: text("id").primaryKey(),
  identifier: text("identifier").notNull(),
  value: text("value").notNull(),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export type User = typeof user.$inferSelect;
