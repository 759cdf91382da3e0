import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { getDb } from "@/db/client";
import * as schema from "@/db/schema";
import { env } from "@/lib/env";
import { hasOpenInvitationFor } from "@/db/queries/invitations";

export { MIN_PASSWORD_LENGTH } from "./password-rules";
import { MIN_PASSWORD_LENGTH } from "./password-rules";

function trustedOrigins(appUrl: string): string[] {
  const url = new URL(appUrl);
  const port = url.port ? `:${url.port}` : "";
  return [url.origin, `${url.protocol}//localhost${port}`, `${url.protocol}//127.0.0.1${port}`];
}

function createAuth() {
  const e = env();
  return betterAuth({
    appName: "Cavitas",
    baseURL: e.appUrl,
    secret: e.authSecret,
    trustedOrigins: trustedOrigins(e.appUrl),
    database: drizzleAdapter(getDb(), { provider: "sqlite", schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      autoSignIn: true,
    },
    session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
    rateLimit: {
      window: 60,
      max: 600,
      customRules: { "/sign-in/email": { window: 60, max: 30 }, "/sign-up/email": { window: 60, max: 20 } },
    },
    user: {
      additionalFields: {
        firmId: { type: "string", required: false, input: false },
        isFirmAdmin: { type: "boolean", required: false, defaultValue: false, input: false },
        unitPreference: { type: "string", required: false, defaultValue: "metric", input: false },
      },
      // Accounts are by invitation only: a firm administrator invites colleagues, a
      // consultant invites project members. Sign-up for any other address is refused.
      validateUserInfo: async ({ user, source }) => {
        if (source.action !== "create-user") return;
        const email = typeof user.email === "string" ? user.email : "";
        if (!hasOpenInvitationFor(email)) {
          return {
            error: "invitation_required",
            errorDescription: "Cavitas accounts are by invitation. Ask your consultant or firm administrator for an invitation link.",
          };
        }
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
