// `npm run jobs:reminders`: queue the service reminders due now (lib/service/reminders.ts) and try to
// send them once; a message the mail service refuses stays in the outbox, and the app's worker
// retries it. Prints how many reminders it queued; running it again the same day queues none. The
// app runs the same job daily on its own (lib/server-start.ts): this is for a cron or a manual run.
import { closeDatabase } from "@/db/client";
import { drainOutbox } from "@/lib/mail";
import { queueDueReminders } from "@/lib/service/reminders";

async function main() {
  const queued = await queueDueReminders();
  if (queued) await drainOutbox().catch(() => undefined);
  console.log(`[sagwise] service reminders queued: ${queued}`);
  await closeDatabase();
}

main().catch(async (error: unknown) => {
  console.error(`[sagwise] service reminders failed: ${(error as Error).message}`);
  await closeDatabase().catch(() => undefined);
  process.exit(1);
});
