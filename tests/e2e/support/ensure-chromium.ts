import fs from "node:fs";
import { spawnSync } from "node:child_process";
import { CHROMIUM } from "./browser";

// The end-to-end tests use Debian's Chromium. On a fresh machine where we are root, install
// it from Debian's packages; otherwise say exactly what is missing.
export function ensureChromium(): void {
  if (fs.existsSync(CHROMIUM)) return;
  const isRoot = typeof process.getuid === "function" && process.getuid() === 0;
  const hasApt = spawnSync("sh", ["-c", "command -v apt-get"]).status === 0;
  if (!isRoot || !hasApt) {
    throw new Error(`Chromium is missing at ${CHROMIUM}. Install Debian's package: sudo apt-get install -y chromium`);
  }
  console.log("Installing Debian's chromium for the end-to-end tests…");
  for (const args of [["update", "-qq"], ["install", "-y", "-qq", "chromium"]]) {
    const r = spawnSync("apt-get", args, { stdio: "inherit", env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(" ")} failed`);
  }
}
