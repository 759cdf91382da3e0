import { defineConfig } from "vitest/config";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

// Unit tests (*.test.ts) and integration tests through route handlers (*.integ.ts).
// End-to-end tests run in Chromium through tests/e2e/run.ts, not here.
export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    environment: "node",
    include: ["tests/**/*.test.ts", "lib/**/*.test.ts", "tests/**/*.integ.ts"],
    exclude: ["node_modules/**", "tests/e2e/**"],
    pool: "forks",
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
