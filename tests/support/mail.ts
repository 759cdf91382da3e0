import type { MailCatcher } from "@/lib/mail/catcher";

// Messages to one address in the local catcher, waiting (up to a few seconds) until at least
// `count` have arrived: some mail is sent after the response, so that the response does not
// reveal whether an account exists.
export async function waitForMail(catcher: MailCatcher, to: string, count = 1, timeoutMs = 5000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = catcher.messages.filter((m) => m.to.includes(to.toLowerCase()));
    if (found.length >= count || Date.now() > until) return found;
    await new Promise((r) => setTimeout(r, 25));
  }
}

export function linkIn(text: string, path: string): string {
  const m = new RegExp(`(https?://\\S+${path}/[A-Za-z0-9_%-]+)`).exec(text);
  if (!m) throw new Error(`no ${path} link in: ${text}`);
  return m[1];
}

export const tokenIn = (text: string, path: string) => decodeURIComponent(linkIn(text, path).split(`${path}/`)[1]);
