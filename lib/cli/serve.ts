import { spawn, spawnSync } from "node:child_process";
import { getDb, closeDb } from "@/db/client";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from "@/db/seed";
import { env } from "@/lib/env";
import { startMailCatcher } from "@/lib/mail/catcher";
import { buildIsCurrent, nextBin } from "./build-state";
import { seedDemoSubmittals } from "./demo-submittals";
import { nextServerArgs } from "./server-args";

// npm run demo | npm run dev: migrate, seed the fictional demo scenario, start the local mail
// catcher, then the Next.js server (a production build for the demo, the dev server for dev).

const mode = process.argv[2] === "dev" ? "dev" : "demo";
async function main() {
  const e = env();
  const childEnv = { ...process.env, CAVITAS_APP_URL: e.appUrl, NEXT_TELEMETRY_DISABLED: "1" };
  // The catcher first, so the demo's own submittal story lands in its inbox.
  const catcher = await startMailCatcher({ smtpPort: e.smtpPort, httpPort: e.mailHttpPort });
  const seeded = await seedDemo(getDb());
  if (seeded.created) await seedDemoSubmittals();
  closeDb();

  if (mode === "demo" && !buildIsCurrent()) {
    console.log("Building Cavitas (first run, or the sources changed)…");
    const built = spawnSync(process.execPath, [nextBin(), "build"], { stdio: "inherit", env: childEnv });
    if (built.status !== 0) {
      await catcher.close();
      process.exit(built.status ?? 1);
    }
  }

  const server = spawn(process.execPath, [nextBin(), ...nextServerArgs(mode, e)], {
    stdio: "inherit",
    env: childEnv,
  });

  console.log(
    [
      "",
      `Cavitas ${mode}: ${e.appUrl} (listening on ${e.host}:${e.port}; set CAVITAS_HOST to widen)`,
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
