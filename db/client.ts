import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { drizzle, type BetterSQLite3Database } from "drizzle-orm/better-sqlite3";
import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import * as schema from "./schema";
import { env } from "@/lib/env";

export type Db = BetterSQLite3Database<typeof schema>;
type Handle = { db: Db; sqlite: Database.Database };

// One connection per process, kept on globalThis so Next's dev reloads do not open more.
const holder = globalThis as unknown as { __cavitasDb?: Handle };

export function migrationsFolder(): string {
  return path.join(process.cwd(), "drizzle");
}

export function openDatabase(file: string): Handle {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  sqlite.pragma("busy_timeout = 5000");
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: migrationsFolder() });
  return { db, sqlite };
}

export function getDb(): Db {
  if (!holder.__cavitasDb) holder.__cavitasDb = openDatabase(env().databasePath);
  return holder.__cavitasDb.db;
}

export function closeDb(): void {
  holder.__cavitasDb?.sqlite.close();
  holder.__cavitasDb = undefined;
}

export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
let current: Tx | null = null;

// better-sqlite3 transactions are synchronous; an inner call reuses the outer transaction.
export function transaction<T>(fn: (tx: Tx) => T): T {
  if (current) return fn(current);
  return getDb().transaction((tx) => {
    current = tx;
    try {
      return fn(tx);
    } finally {
      current = null;
    }
  });
}
