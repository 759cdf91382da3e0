import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { getDb } from "@/db/client";
import * as schema from "@/db/schema";
import { env } from "@/lib/env";
import { ipAddressSettings } from "./client-address";
import { LIMITS } from "./limits";
import { afterAuth, beforeAuth, refuseDisabledAccount } from "./sign-in-hooks";
import { afterPasswordReset, sendResetPasswordMail } from "./password-events";
import { consume } from "./throttle";

export { MIN_PASSWORD_LENGTH } from "./password-rules";
import { MIN_PASSWORD_LENGTH, MAX_PASSWORD_LENGTH } from "./password-rules";

function trustedOrigins(appUrl: string): string[] {
  const url = new URL(appUrl);
  const port = url.port ? `:${url.port}` : "";
  return [url.origin, `${url.protocol}//localhost${port}`, `${url.protocol}//127.0.0.1${port}`];
}

// better-auth's own endpoints that Cavitas does not offer: accounts are made only from an
// invitation (POST /api/v1/invitations/:token/account), and password, session and profile
// changes go through /api/v1, where the guard, the audit and the e-mails are.
const CLOSED_PATHS = [
  "/sign-up/email",
  "/request-password-reset",
  "/reset-password",
  "/change-password",
  "/set-password",
  "/change-email",
  "/update-user",
  "/delete-user",
  "/list-sessions",
  "/revoke-session",
  "/revoke-sessions",
  "/revoke-other-sessions",
];

function createAuth() {
  const e = env();
  return betterAuth({
    appName: "Cavitas",
    baseURL: e.appUrl,
    secret: e.authSecret,
    trustedOrigins: trustedOrigins(e.appUrl),
    database: drizzleAdapter(getDb(), { provider: "sqlite", schema }),
    disabledPaths: CLOSED_PATHS,
    emailAndPassword: {
      enabled: true,
      disableSignUp: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      maxPasswordLength: MAX_PASSWORD_LENGTH,
      sendResetPassword: sendResetPasswordMail,
      onPasswordReset: afterPasswordReset,
      resetPasswordTokenExpiresIn: LIMITS.resetLinkSeconds,
      revokeSessionsOnPasswordReset: true,
    },
    // Reset tokens are kept only as hashes, like invitation tokens.
    verification: { storeIdentifier: "hashed" },
    session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
    // better-auth's limiter keyed by client address, counting in Cavitas's SQLite throttle
    // table (survives a restart). On in every environment, so tests exercise it.
    rateLimit: {
      enabled: true,
      window: LIMITS.authPerAddress.window,
      max: LIMITS.authPerAddress.max,
      customRules: { "/sign-in/email": LIMITS.signInPerAddress },
      customStorage: { consume: async (key, rule) => consume(`address:${key}`, rule) },
    },
    advanced: { ipAddress: ipAddressSettings(e.trustedProxies) },
    hooks: { before: beforeAuth, after: afterAuth },
    databaseHooks: { session: { create: { before: async (session) => void (await refuseDisabledAccount(session)) } } },
    user: {
      additionalFields: {
        firmId: { type: "string", required: false, input: false },
        isFirmAdmin: { type: "boolean", required: false, defaultValue: false, input: false },
        unitPreference: { type: "string", required: false, defaultValue: "metric", input: false },
      },
    },
    plugins: [nextCookies()],
  });
}

type Auth = ReturnType<typeof createAuth>;
const holder = globalThis as unknown as { __cavitasAuth?: Auth };

export function auth(): Auth {
  if (!holder.__cavitasAuth) holder.__cavitasAuth = createAuth();
  return holder.__cavitasAuth;
}
