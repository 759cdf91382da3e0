import { env, type LogLevel } from "@/lib/env";

// Structured logs: one JSON object per line on standard output, so a log shipper or `jq` can
// read them. Callers pass only what is safe to keep: request ids, route patterns (never the
// path itself, which can hold an invitation token), statuses, timings and error names. No
// cookies, tokens, e-mail addresses, names, bodies or client addresses.

const RANK: Record<LogLevel, number> = { debug: 10, info: 20, warn: 30, error: 40, silent: 100 };

export type LogFields = Record<string, string | number | boolean | null | undefined>;

function write(level: Exclude<LogLevel, "silent">, msg: string, fields: LogFields) {
  if (RANK[level] < RANK[env().logLevel]) return;
  const line = JSON.stringify({ time: new Date().toISOString(), level, msg, ...fields });
  (level === "error" || level === "warn" ? process.stderr : process.stdout).write(`${line}\n`);
}

export const log = {
  debug: (msg: string, fields: LogFields = {}) => write("debug", msg, fields),
  info: (msg: string, fields: LogFields = {}) => write("info", msg, fields),
  warn: (msg: string, fields: LogFields = {}) => write("warn", msg, fields),
  error: (msg: string, fields: LogFields = {}) => write("error", msg, fields),
};

// What an unexpected error may put in the log: its class, message and where it was thrown.
// A driver message names tables and constraints, never the values that were written.
export function errorFields(e: unknown): LogFields {
  if (e instanceof Error) return { error: e.name, message: e.message, stack: e.stack?.split("\n").slice(1, 6).join(" | ") };
  return { error: typeof e };
}
