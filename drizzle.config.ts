import { defineConfig } from "drizzle-kit";

// drizzle-kit generates SQL migrations from the schema into drizzle/ (committed);
// the app applies them itself on start (db/migrate.ts), so no credentials are needed here.
export default defineConfig({
  dialect: "sqlite",
  schema: "./db/schema/index.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.CAVITAS_DATABASE ?? ".data/cavitas.sqlite" },
});
