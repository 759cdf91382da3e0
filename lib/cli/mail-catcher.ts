import { startMailCatcher } from "@/lib/mail/catcher";
import { env } from "@/lib/env";

// npm run mail — the local mail catcher on its own.
async function main() {
  const e = env();
  const catcher = await startMailCatcher({ smtpPort: e.smtpPort, httpPort: e.mailHttpPort });
  console.log(`Mail catcher: SMTP 127.0.0.1:${catcher.smtpPort}, inbox http://127.0.0.1:${catcher.httpPort}/`);
  const stop = () => catcher.close().then(() => process.exit(0));
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

void main();
