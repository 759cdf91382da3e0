import { getDb, closeDb } from "@/db/client";
import { seedDemo } from "@/db/seed";
import { seedDemoSubmittals } from "./demo-submittals";
import { env } from "@/lib/env";

// npm run db:seed — migrate and load the fictional demo scenario (idempotent), with its
// submittal story (documents rendered and stored, e-mails sent to the catcher if it runs).
async function main() {
  const result = await seedDemo(getDb());
  if (result.created) await seedDemoSubmittals();
  console.log(result.created ? `Demo scenario loaded into ${env().databasePath}` : `Demo scenario already present in ${env().databasePath}`);
  closeDb();
}

void main();
