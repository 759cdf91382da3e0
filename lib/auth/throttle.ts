import { and, eq, isNull, lt, or } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { throttle } from "@/db/schema";

// Attempt counters in SQLite (table `throttle`), so limits survive a restart. better-sqlite3
// runs each transaction synchronously on the one connection, so a read-then-write here is
// atomic: concurrent requests cannot all pass a stale count.

/** window in seconds; max attempts inside it */
export type Rule = { window: number; max: number };
/** as Rule, plus how long (seconds) the key stays locked once max failures are reached */
export type LockRule = Rule & { lock: number };
export type Verdict = { allowed: boolean; retryAfter: number | null };

const DAY_MS = 86_400_000;

// Count one attempt against `key`. The window starts at the first attempt and restarts once
// it has passed (the same rolling rule as better-auth's own storages).
export function consume(key: string, rule: Rule, now = Date.now()): Verdict {
  const windowMs = rule.window * 1000;
  return transaction((tx) => {
    const row = tx.select().from(throttle).where(eq(throttle.key, key)).get();
    if (!row || now - row.windowStart >= windowMs) {
      restart(key, now);
      return { allowed: true, retryAfter: null };
    }
    if (row.hits >= rule.max) return { allowed: false, retryAfter: Math.max(1, Math.ceil((row.windowStart + windowMs - now) / 1000)) };
    tx.update(throttle).set({ hits: row.hits + 1 }).where(eq(throttle.key, key)).run();
    return { allowed: true, retryAfter: null };
  });
}

/** When the key's lock ends, or null when it is not locked. */
export function lockedUntil(key: string, now = Date.now()): Date | null {
  const row = getDb().select({ lockedUntil: throttle.lockedUntil }).from(throttle).where(eq(throttle.key, key)).get();
  return row?.lockedUntil && row.lockedUntil > now ? new Date(row.lockedUntil) : null;
}

// Record one failure (a wrong password). The max-th failure inside the window locks the key
// for rule.lock seconds and starts counting afresh. Returns the lock's end when it locks.
export function recordFailure(key: string, rule: LockRule, now = Date.now()): Date | null {
  return transaction((tx) => {
    const row = tx.select().from(throttle).where(eq(throttle.key, key)).get();
    const fresh = !row || now - row.windowStart >= rule.window * 1000;
    const hits = fresh ? 1 : row.hits + 1;
    if (hits < rule.max) {
      if (fresh) restart(key, now, row?.lockedUntil ?? null);
      else tx.update(throttle).set({ hits }).where(eq(throttle.key, key)).run();
      return null;
    }
    const until = now + rule.lock * 1000;
    tx.insert(throttle)
      .values({ key, hits: 0, windowStart: now, lockedUntil: until })
      .onConflictDoUpdate({ target: throttle.key, set: { hits: 0, windowStart: now, lockedUntil: until } })
      .run();
    return new Date(until);
  });
}

/** Forget a key: a correct password or a completed reset clears the account's failures. */
export function forget(key: string): void {
  transaction((tx) => tx.delete(throttle).where(eq(throttle.key, key)).run());
}

function restart(key: string, now: number, lockedUntilMs: number | null = null) {
  transaction((tx) => {
    tx.insert(throttle)
      .values({ key, hits: 1, windowStart: now, lockedUntil: lockedUntilMs })
      .onConflictDoUpdate({ target: throttle.key, set: { hits: 1, windowStart: now, lockedUntil: lockedUntilMs } })
      .run();
    // A new window is the moment to drop counters nobody has touched for a day (an attacker
    // cycling addresses or e-mails would otherwise grow the table without bound).
    tx.delete(throttle)
      .where(and(lt(throttle.windowStart, now - DAY_MS), or(isNull(throttle.lockedUntil), lt(throttle.lockedUntil, now))))
      .run();
  });
}
