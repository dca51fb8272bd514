import { defineConfig } from "drizzle-kit";

// `npm run db:generate` writes SQL migrations from db/schema.ts; they are committed and applied by
// db/migrate.ts (both PGlite and PostgreSQL), never with `push`.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  strict: true,
});
