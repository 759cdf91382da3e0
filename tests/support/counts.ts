import { createHash } from "node:crypto";
import { getDb } from "@/db/client";

// Row counts of every table that a mutation could touch, to prove a refusal wrote nothing.
const TABLES = ["user", "account", "session", "verification", "throttle", "firm", "project", "membership", "invitation", "room", "notification", "audit_event", "build_up", "attachment", "treatment", "surface", "opening", "project_material", "board", "placement", "pin", "pin_reply", "submittal", "submittal_document", "installation"];

export function tableCounts(): Record<string, number> {
  const sqlite = (getDb() as unknown as { $client: { prepare(sql: string): { get(): { n: number } } } }).$client;
  return Object.fromEntries(TABLES.map((t) => [t, sqlite.prepare(`select count(*) as n from "${t}"`).get().n]));
}

// A digest of every row of every table but the session bookkeeping and the sign-in counters
// (which count every attempt, refused or not: that is their job), to prove that a refusal
// changed nothing at all (an update, not only an insert).
export function databaseDigest(): string {
  const sqlite = (getDb() as unknown as { $client: { prepare(sql: string): { all(): Record<string, unknown>[] } } }).$client;
  const tables = sqlite
    .prepare("select name from sqlite_master where type = 'table' and name not in ('session', 'verification', 'throttle') and name not like 'sqlite_%' and name not like '__drizzle%' order by name")
    .all()
    .map((r) => String(r.name));
  const hash = createHash("sha256");
  for (const t of tables) hash.update(t).update(JSON.stringify(sqlite.prepare(`select * from "${t}" order by rowid`).all()));
  return hash.digest("hex");
}
