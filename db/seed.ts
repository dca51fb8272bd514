// `npm run db:seed`: migrate and load the invented demo scenario. Safe to run again.
import { closeDatabase } from "@/db/client";
import { seedDemo } from "./seed-demo";

seedDemo()
  .then(async (summary) => {
    console.log(`[sagwise] demo data: ${summary}`);
    await closeDatabase();
  })
  .catch(async (error: unknown) => {
    console.error(`[sagwise] seeding failed: ${(error as Error).message}`);
    await closeDatabase().catch(() => undefined);
    process.exit(1);
  });
