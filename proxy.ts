import { NextResponse, type NextRequest } from "next/server";
import { isDevelopment } from "@/lib/env";
import { newNonce, pagePolicy } from "@/lib/http/security-headers.mjs";

// Each page gets a Content-Security-Policy with a fresh nonce. Next.js reads the policy from
// the request headers while rendering and puts the nonce on its own scripts, so no other
// inline script can run. API routes are left out (see the matcher): they set their own
// headers, and a proxy in front of them would buffer request bodies before the session check.
export function proxy(request: NextRequest) {
  const policy = pagePolicy(newNonce(), isDevelopment());
  const headers = new Headers(request.headers);
  headers.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  matcher: [{ source: "/((?!api/|_next/static/|_next/image|favicon.ico|icon.svg).*)" }],
};
