import fs from "node:fs";
import path from "node:path";

// Whether .next holds a production build newer than every source file, so the demo and the
// end-to-end tests rebuild only when something changed.
function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSource(full));
    else newest = Math.max(newest, fs.statSync(full).mtimeMs);
  }
  return newest;
}

export function buildIsCurrent(root = process.cwd()): boolean {
  const buildId = path.join(root, ".next", "BUILD_ID");
  if (!fs.existsSync(buildId)) return false;
  const built = fs.statSync(buildId).mtimeMs;
  const sources = ["app", "components", "lib", "db", "public", "fonts", "drizzle"]
    .map((d) => path.join(root, d))
    .filter((d) => fs.existsSync(d));
  const configs = ["next.config.mjs", "proxy.ts", "tailwind.config.ts", "postcss.config.mjs", "package-lock.json"]
    .map((f) => path.join(root, f))
    .filter((f) => fs.existsSync(f))
    .map((f) => fs.statSync(f).mtimeMs);
  return sources.every((d) => newestSource(d) < built) && configs.every((m) => m < built);
}

export const nextBin = (root = process.cwd()) => path.join(root, "node_modules", "next", "dist", "bin", "next");
