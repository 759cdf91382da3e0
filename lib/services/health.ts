import { sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { errorFields, log } from "@/lib/log";

export type Health = { status: "ok" | "failing"; database: "ok" | "failing" };

// For a process supervisor or a load balancer: the database opens, its schema is there and a
// table answers a read. Public and cheap; a failure says which part failed and nothing more
// (the log has the reason).
export function checkHealth(): Health {
  try {
    const row = getDb().get<{ tables: number }>(sql`select count(*) as tables from sqlite_master where type = 'table' and name = 'project'`);
    getDb().get(sql`select id from project limit 1`);
    if (!row || row.tables !== 1) throw new Error("schema missing");
    return { status: "ok", database: "ok" };
  } catch (e) {
    log.error("health check failed", errorFields(e));
    return { status: "failing", database: "failing" };
  }
}
