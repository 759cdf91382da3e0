import { defineConfig } from "vitest/config";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

// End-to-end tests: a production build served by `next start` on a temporary database, the
// local mail catcher, and Debian's Chromium driven by playwright-core. One file at a time,
// since they share the server.
export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    environment: "node",
    include: ["tests/e2e/**/*.e2e.ts"],
    globalSetup: ["tests/e2e/support/global-setup.ts"],
    fileParallelism: false,
    pool: "forks",
    testTimeout: 90_000,
    hookTimeout: 300_000,
  },
});
