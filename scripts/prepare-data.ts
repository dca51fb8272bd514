// Before the server starts: check the environment (production needs BETTER_AUTH_SECRET), apply
// migrations, and with --seed load the demo scenario. Releases the data folder before exiting so
// the server can take it (PGlite allows one process per folder).
import { closeDatabase, getDatabase } from "@/db/client";
import { latestAppliedMigration } from "@/db/migrate";
import { resolveAuthSecret } from "@/lib/auth/secret";

async function main() {
  resolveAuthSecret();
  const handle = await getDatabase();
  console.log(`[sagwise] ${handle.kind} migrated to ${await latestAppliedMigration(handle)}`);
  if (process.argv.includes("--seed")) {
    const { seedDemo } = await import("@/db/seed-demo");
    const summary = await seedDemo();
    console.log(`[sagwise] demo data: ${summary}`);
  }
  await closeDatabase();
}

main().catch((error: unknown) => {
  console.error(`[sagwise] ${(error as Error).message}`);
  process.exit(1);
});
