/** @type {import('next').NextConfig} */
const nextConfig = {
  // The app is self-hosted on one machine with an embedded SQLite file; no image CDN.
  images: { unoptimized: true },
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
