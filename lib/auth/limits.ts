import type { LockRule, Rule } from "./throttle";

// Every sign-in and password limit in one place, so the screens, the tests and the README
// can say the same numbers. Windows and locks are in seconds.
export const LIMITS = {
  /** sign-in attempts from one client address (better-auth's limiter, per path) */
  signInPerAddress: { window: 60, max: 30 } satisfies Rule,
  /** wrong passwords for one e-mail address, existing or not, before it is locked */
  signInPerAccount: { window: 15 * 60, max: 5, lock: 15 * 60 } satisfies LockRule,
  /** every other better-auth endpoint, per client address */
  authPerAddress: { window: 60, max: 600 } satisfies Rule,
  /** password-reset requests from one client address */
  resetPerAddress: { window: 60 * 60, max: 10 } satisfies Rule,
  /** reset e-mails to one address; beyond this, requests are answered alike but send nothing */
  resetMailsPerAccount: { window: 60 * 60, max: 3 } satisfies Rule,
  /** wrong current passwords when changing it, per account */
  passwordChecksPerAccount: { window: 15 * 60, max: 5, lock: 15 * 60 } satisfies LockRule,
  /** how long a reset link works */
  resetLinkSeconds: 60 * 60,
} as const;

// Throttle keys, named here so no two uses share one by accident.
export const throttleKey = {
  signIn: (email: string) => `sign-in:${email.trim().toLowerCase()}`,
  resetAddress: (address: string | null) => `reset-from:${address ?? "unknown"}`,
  resetMail: (email: string) => `reset-mail:${email.trim().toLowerCase()}`,
  passwordCheck: (userId: string) => `password-check:${userId}`,
};

export function minutesUntil(until: Date, now = Date.now()): number {
  return Math.max(1, Math.ceil((until.getTime() - now) / 60_000));
}

export const minutesText = (n: number) => `${n} minute${n === 1 ? "" : "s"}`;

export function accountLockedMessage(until: Date): string {
  return `Too many wrong passwords for this account. Sign-in is paused for ${minutesText(minutesUntil(until))}; try again then, or reset your password by e-mail.`;
}

export const ACCOUNT_DISABLED_MESSAGE =
  "This account has been disabled by your firm administrator. Ask them to re-enable it; your work stays in the projects.";
