import { getDb, closeDb } from "@/db/client";
import { seedDemo } from "@/db/seed";
import { env } from "@/lib/env";

// npm run db:seed — migrate and load the fictional demo scenario (idempotent).
async function main() {
  const result = await seedDemo(getDb());
  console.log(result.created ? `Demo scenario loaded into ${env().databasePath}` : `Demo scenario already present in ${env().databasePath}`);
  closeDb();
}

void main();
