import { getDb } from "@/db/client";

// Row counts of every table that a mutation could touch, to prove a refusal wrote nothing.
const TABLES = ["user", "account", "session", "verification", "throttle", "firm", "project", "membership", "invitation", "room", "notification", "audit_event", "build_up", "attachment", "treatment", "surface", "opening", "project_material", "board", "placement", "pin", "pin_reply", "submittal", "submittal_document", "installation"];

export function tableCounts(): Record<string, number> {
  const sqlite = (getDb() as unknown as { $client: { prepare(sql: string): { get(): { n: number } } } }).$client;
  return Object.fromEntries(TABLES.map((t) => [t, sqlite.prepare(`select count(*) as n from "${t}"`).get().n]));
}
