import fs from "node:fs";
import path from "node:path";
import crypto from "node:crypto";
import { z } from "zod";

// The one module that reads process.env. Everything else asks env().
const envSchema = z.object({
  CAVITAS_DATA_DIR: z.string().min(1).default(".data"),
  CAVITAS_DATABASE: z.string().min(1).optional(),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  // The address `npm run demo` and `npm run dev` listen on: loopback only unless widened.
  CAVITAS_HOST: z.string().min(1).default("127.0.0.1"),
  CAVITAS_APP_URL: z.url().optional(),
  CAVITAS_SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  CAVITAS_SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  CAVITAS_MAIL_HTTP_PORT: z.coerce.number().int().min(1).max(65535).default(1080),
  CAVITAS_MAIL_FROM: z.string().min(3).default("Cavitas <noreply@cavitas.example.test>"),
  CAVITAS_UPLOAD_LIMIT_MB: z.coerce.number().positive().default(20),
  BETTER_AUTH_SECRET: z.string().min(32).optional(),
  // Reverse proxies whose X-Forwarded-For Cavitas believes: addresses or CIDR ranges,
  // comma-separated. Unset, no forwarded header is believed at all.
  CAVITAS_TRUSTED_PROXIES: z
    .string()
    .optional()
    .transform((v) => (v ?? "").split(",").map((s) => s.trim()).filter(Boolean))
    .pipe(z.array(z.union([z.ipv4(), z.ipv6(), z.cidrv4(), z.cidrv6()], { error: "each entry must be an IP address or a CIDR range" }))),
  CAVITAS_LOG_LEVEL: z.enum(["debug", "info", "warn", "error", "silent"]).default("info"),
});

export type LogLevel = z.infer<typeof envSchema>["CAVITAS_LOG_LEVEL"];

export type Env = {
  port: number;
  host: string;
  dataDir: string;
  databasePath: string;
  appUrl: string;
  smtpHost: string;
  smtpPort: number;
  mailHttpPort: number;
  mailFrom: string;
  uploadLimitBytes: number;
  authSecret: string;
  trustedProxies: string[];
  logLevel: LogLevel;
};

let cached: Env | null = null;

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  const dataDir = path.resolve(/*turbopackIgnore: true*/ e.CAVITAS_DATA_DIR);
  fs.mkdirSync(dataDir, { recursive: true });
  cached = {
    dataDir,
    databasePath: path.resolve(/*turbopackIgnore: true*/ e.CAVITAS_DATABASE ?? path.join(dataDir, "cavitas.sqlite")),
    port: e.PORT,
    host: e.CAVITAS_HOST,
    appUrl: (e.CAVITAS_APP_URL ?? `http://localhost:${e.PORT}`).replace(/\/$/, ""),
    smtpHost: e.CAVITAS_SMTP_HOST,
    smtpPort: e.CAVITAS_SMTP_PORT,
    mailHttpPort: e.CAVITAS_MAIL_HTTP_PORT,
    mailFrom: e.CAVITAS_MAIL_FROM,
    uploadLimitBytes: Math.round(e.CAVITAS_UPLOAD_LIMIT_MB * 1024 * 1024),
    authSecret: e.BETTER_AUTH_SECRET ?? localSecret(dataDir),
    trustedProxies: e.CAVITAS_TRUSTED_PROXIES,
    logLevel: e.CAVITAS_LOG_LEVEL,
  };
  return cached;
}

// Next.js sets NODE_ENV itself ("development" under `next dev`); the page policy relaxes for it.
export const isDevelopment = () => process.env.NODE_ENV === "development";

// Without a configured secret, one is made once per data folder and kept there, so a
// fresh machine needs no hand-made .env and sessions survive restarts.
function localSecret(dataDir: string): string {
  const file = path.join(dataDir, "auth-secret");
  try {
    const existing = fs.readFileSync(file, "utf8").trim();
    if (existing.length >= 32) return existing;
  } catch {
    // not there yet
  }
  const secret = crypto.randomBytes(32).toString("hex");
  fs.writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
