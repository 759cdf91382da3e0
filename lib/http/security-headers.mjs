// Every security header the app sends, in one place. next.config.mjs sends the common ones
// on every response and the API's policy on /api; proxy.ts sends each page's policy with a
// fresh nonce. Plain JavaScript with no imports, because next.config.mjs loads it with Node
// before any TypeScript or alias exists; its types are in security-headers.d.mts.

/** @type {{ key: string; value: string }[]} */
export const COMMON_HEADERS = [
  // A response is what its Content-Type says, never sniffed into HTML or script.
  { key: "X-Content-Type-Options", value: "nosniff" },
  // Paths hold project and room ids; no other site is told them.
  { key: "Referrer-Policy", value: "same-origin" },
  // No page of the app may be framed (older browsers; CSP frame-ancestors for the rest).
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
];

// JSON answers and stored files run nothing and load nothing, wherever they are opened.
export const API_POLICY = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

// A page may run only the scripts Next.js marks with this request's nonce (and what they load:
// 'strict-dynamic'); styles come from the app's own files or carry the nonce, and style
// attributes (React's style prop, set on the server) are allowed since they cannot run code.
// `next dev` needs eval for its error overlay and a websocket for hot reload.
/** @param {string} nonce @param {boolean} development @returns {string} */
export function pagePolicy(nonce, development) {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    `style-src 'self' ${development ? "'unsafe-inline'" : `'nonce-${nonce}'`}`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    `connect-src 'self'${development ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** @returns {string} */
export function newNonce() {
  const bytes = new Uint8Array(18);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
