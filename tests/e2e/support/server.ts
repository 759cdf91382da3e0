import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { buildIsCurrent, nextBin } from "@/lib/cli/build-state";
import { nextServerArgs } from "@/lib/cli/server-args";
import { startMailCatcher, type MailCatcher } from "@/lib/mail/catcher";
import { ensureChromium } from "./ensure-chromium";

// A production build served by `next start` on a temporary database seeded with the demo
// scenario, with its own mail catcher, on free ports. Used by the end-to-end tests and the
// board benchmark.
export type TestServer = {
  baseUrl: string;
  mailUrl: string;
  dataDir: string;
  databasePath: string;
  stop: () => Promise<void>;
  /** Kills the server process with SIGKILL (no shutdown of any kind) and waits for it to go. */
  crash: () => Promise<void>;
  /** Starts the server again on the same port and data folder, after a crash. */
  restart: () => Promise<void>;
};

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, timeoutMs = 60_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}`);
    try {
      const res = await fetch(url, { redirect: "manual" });
      if (res.status > 0) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The app did not answer at ${url} within ${timeoutMs} ms`);
}

export async function startTestServer(opts: { beforeStart?: (databasePath: string) => void | Promise<void> } = {}): Promise<TestServer> {
  const root = process.cwd();
  ensureChromium();
  if (!buildIsCurrent(root)) {
    const built = spawnSync(process.execPath, [nextBin(root), "build"], { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
    if (built.status !== 0) throw new Error("next build failed");
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-e2e-"));
  const databasePath = path.join(dataDir, "cavitas.sqlite");
  const mail: MailCatcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  const port = await freePort();
  const baseUrl = `http://localhost:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    PORT: String(port),
    CAVITAS_DATA_DIR: dataDir,
    CAVITAS_APP_URL: baseUrl,
    CAVITAS_SMTP_PORT: String(mail.smtpPort),
    CAVITAS_MAIL_HTTP_PORT: String(mail.httpPort),
    // A line per request would bury the test output; errors still show.
    CAVITAS_LOG_LEVEL: process.env.CAVITAS_LOG_LEVEL ?? "warn",
  };
  // Migrate and seed the demo scenario into the temporary database, as `npm run demo` does
  // (the PDF renderer's hyphenation package exports ESM only, hence the import condition).
  const seeded = spawnSync(process.execPath, [path.join(root, "node_modules", "tsx", "dist", "cli.mjs"), "--conditions=import", "lib/cli/seed.ts"], { env, stdio: "inherit" });
  if (seeded.status !== 0) throw new Error("seeding the e2e database failed");
  await opts.beforeStart?.(databasePath);
  const launch = async () => {
    const started = spawn(process.execPath, [nextBin(root), ...nextServerArgs("demo", { port, host: "127.0.0.1" })], { env, stdio: ["ignore", "inherit", "inherit"] });
    await waitForServer(`${baseUrl}/sign-in`, started);
    return started;
  };
  const exited = (c: ChildProcess) => (c.exitCode !== null || c.signalCode !== null ? Promise.resolve() : new Promise((r) => c.once("exit", r)));
  let child = await launch();
  return {
    baseUrl,
    mailUrl: `http://127.0.0.1:${mail.httpPort}`,
    dataDir,
    databasePath,
    crash: async () => {
      child.kill("SIGKILL");
      await exited(child);
    },
    restart: async () => {
      child = await launch();
    },
    stop: async () => {
      if (child.exitCode === null && child.signalCode === null) {
        child.kill("SIGTERM");
        await exited(child);
      }
      await mail.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
