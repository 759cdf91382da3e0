import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { startMailCatcher, type MailCatcher } from "@/lib/mail/catcher";

// Each integration test file gets its own temporary data folder and SQLite file (never the
// demo database) and its own mail catcher on free ports. Call before anything touches env().
export async function useTestEnvironment(): Promise<{ dataDir: string; mail: MailCatcher; cleanup: () => Promise<void> }> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-test-"));
  const mail = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  process.env.CAVITAS_DATA_DIR = dataDir;
  process.env.CAVITAS_DATABASE = path.join(dataDir, "test.sqlite");
  process.env.CAVITAS_SMTP_PORT = String(mail.smtpPort);
  process.env.CAVITAS_MAIL_HTTP_PORT = String(mail.httpPort);
  process.env.CAVITAS_APP_URL = "http://localhost:3999";
  process.env.BETTER_AUTH_SECRET = "test-secret-".padEnd(48, "x");
  // One line per request would bury the test output; tests that read the log raise it.
  process.env.CAVITAS_LOG_LEVEL = "warn";
  return {
    dataDir,
    mail,
    cleanup: async () => {
      const { closeDb } = await import("@/db/client");
      closeDb();
      await mail.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
