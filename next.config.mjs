import { API_POLICY, COMMON_HEADERS } from "./lib/http/security-headers.mjs";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // The app is self-hosted on one machine with an embedded SQLite file; no image CDN.
  images: { unoptimized: true },
  poweredByHeader: false,
  typedRoutes: false,
  // Types are checked once for the whole tree (app, lib, tests) by `npm run typecheck`,
  // which `npm test` runs first; the build does not repeat it.
  typescript: { ignoreBuildErrors: true },
  // Security headers (lib/http/security-headers.mjs): the common ones everywhere, the API's
  // policy on /api; pages get theirs, with a nonce, from proxy.ts.
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_POLICY }] },
    ];
  },
};

export default nextConfig;
