import type { Env } from "@/lib/env";

// The Next.js command line for `npm run demo` (a production build) and `npm run dev`. It
// always names the address to listen on: 127.0.0.1 unless CAVITAS_HOST widens it (0.0.0.0 for
// every interface), so a demo on a laptop is not served to the café's network.
export function nextServerArgs(mode: "demo" | "dev", e: Pick<Env, "port" | "host">): string[] {
  return [mode === "dev" ? "dev" : "start", "--port", String(e.port), "--hostname", e.host];
}
