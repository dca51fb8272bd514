// Before the first request: refuse to run in production without BETTER_AUTH_SECRET, open and
// migrate the database (so a fresh data folder is ready, and a locked one fails at start, loudly),
// start the e-mail outbox worker, which first sends what an earlier run left queued, the daily
// service reminder job and, on the embedded database, its vacuum (db/upkeep.ts).
import { getDatabase } from "@/db/client";
import { vacuumEmbeddedDatabase } from "@/db/upkeep";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { startOutboxWorker } from "@/lib/mail";
import { startPeriodic } from "@/lib/periodic";
import { startReminderScheduler } from "@/lib/service/reminders";

export async function prepareServer(): Promise<void> {
  try {
    resolveAuthSecret();
    await getDatabase();
  } catch (error) {
    console.error(`[sagwise] cannot start: ${(error as Error).message}`);
    process.exit(1);
  }
  startOutboxWorker();
  startReminderScheduler();
  startPeriodic({
    name: "database upkeep",
    run: vacuumEmbeddedDatabase,
    firstRunMs: 2 * 60_000,
    everyMs: 6 * 60 * 60_000,
  });
}
