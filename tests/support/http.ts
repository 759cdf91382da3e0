import { TEST_PASSWORD } from "./factories";

// Calls route handlers in-process, as Next would, with a real Request and the session cookie.
export const APP_URL = "http://localhost:3999";

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Handler = (req: Request, ctx: { params: Promise<any> }) => Promise<Response>;

export type CallOptions = { method?: string; body?: unknown; rawBody?: string; form?: FormData; cookie?: string | null; params?: Record<string, string>; path?: string };

export async function call(handler: Handler, opts: CallOptions = {}) {
  const headers = new Headers({ origin: APP_URL });
  if (opts.cookie) headers.set("cookie", opts.cookie);
  let body: string | FormData | undefined;
  if (opts.form) body = opts.form;
  else if (opts.rawBody !== undefined) body = opts.rawBody;
  else if (opts.body !== undefined) body = JSON.stringify(opts.body);
  if (body !== undefined && !opts.form) headers.set("content-type", "application/json");
  const req = new Request(`${APP_URL}${opts.path ?? "/api/v1/test"}`, { method: opts.method ?? "GET", headers, body });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? {}) });
  return { status: res.status, json: await bodyOf(res), headers: res.headers };
}

/** The response body as JSON, or as text when it is not JSON, or null when empty. */
export async function bodyOf(res: Response): Promise<any> {
  const text = await res.text();
  try {
    return text ? JSON.parse(text) : null;
  } catch {
    return text;
  }
}

// Sign in through better-auth's own endpoint and keep the session cookie.
export async function signIn(email: string, password = TEST_PASSWORD): Promise<string> {
  const { auth } = await import("@/lib/auth/server");
  const res = await auth().handler(
    new Request(`${APP_URL}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP_URL },
      body: JSON.stringify({ email, password }),
    }),
  );
  if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${await res.text()}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(";")[0]);
  return cookies.join("; ");
}

export async function readMail(httpPort: number, to: string) {
  const res = await fetch(`http://127.0.0.1:${httpPort}/messages?to=${encodeURIComponent(to)}`);
  return ((await res.json()) as { messages: { subject: string; text: string; to: string[] }[] }).messages;
}
