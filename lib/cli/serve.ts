import fs from "node:fs";
import path from "node:path";
import { spawn, spawnSync } from "node:child_process";
import { getDb, closeDb } from "@/db/client";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from "@/db/seed";
import { env } from "@/lib/env";
import { startMailCatcher } from "@/lib/mail/catcher";

// npm run demo | npm run dev: migrate, seed the fictional demo scenario, start the local mail
// catcher, then the Next.js server (a production build for the demo, the dev server for dev).

const mode = process.argv[2] === "dev" ? "dev" : "demo";
const port = Number(process.env.PORT ?? 3000);
const nextBin = path.join(process.cwd(), "node_modules", "next", "dist", "bin", "next");

function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSource(full));
    else newest = Math.max(newest, fs.statSync(full).mtimeMs);
  }
  return newest;
}

function buildIsCurrent(): boolean {
  const buildId = path.join(process.cwd(), ".next", "BUILD_ID");
  if (!fs.existsSync(buildId)) return false;
  const built = fs.statSync(buildId).mtimeMs;
  const sources = ["app", "components", "lib", "db", "public", "fonts"].filter((d) => fs.existsSync(d));
  return sources.every((d) => newestSource(d) < built);
}

async function main() {
  process.env.CAVITAS_APP_URL ??= `http://localhost:${port}`;
  process.env.NEXT_TELEMETRY_DISABLED ??= "1";
  const e = env();
  const seeded = await seedDemo(getDb());
  closeDb();
  const catcher = await startMailCatcher({ smtpPort: e.smtpPort, httpPort: e.mailHttpPort });

  if (mode === "demo" && !buildIsCurrent()) {
    console.log("Building Cavitas (first run, or the sources changed)…");
    const built = spawnSync(process.execPath, [nextBin, "build"], { stdio: "inherit", env: process.env });
    if (built.status !== 0) {
      await catcher.close();
      process.exit(built.status ?? 1);
    }
  }

  const server = spawn(process.execPath, [nextBin, mode === "dev" ? "dev" : "start", "-p", String(port)], {
    stdio: "inherit",
    env: process.env,
  });

  console.log(
    [
      "",
      `Cavitas ${mode}: ${e.appUrl}`,
      `Database: ${e.databasePath}${seeded.created ? " (demo scenario loaded)" : ""}`,
      `Local mail catcher: inbox http://127.0.0.1:${catcher.httpPort}/ (SMTP 127.0.0.1:${catcher.smtpPort})`,
      `Demo accounts (password ${DEMO_PASSWORD}):`,
      ...DEMO_ACCOUNTS.map((a) => `  ${a.email.padEnd(26)} ${a.name}`),
      "",
    ].join("\n"),
  );

  const stop = (signal: NodeJS.Signals) => {
    server.kill(signal);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  server.on("exit", async (code) => {
    await catcher.close();
    process.exit(code ?? 0);
  });
}

void main();
