import { getDb, closeDb } from "@/db/client";
import { env } from "@/lib/env";

// npm run db:migrate — opening the database applies every migration in drizzle/.
getDb();
console.log(`Database up to date: ${env().databasePath}`);
closeDb();
