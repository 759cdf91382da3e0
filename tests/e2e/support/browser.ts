import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext } from "playwright-core";

// Debian's Chromium driven by playwright-core; never a downloaded browser. The flags keep
// it from reaching for the network, which this machine does not have.
export const CHROMIUM = process.env.CAVITAS_CHROMIUM ?? "/usr/bin/chromium";

export async function newBrowserContext(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1360, height: 900 },
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
