// Before the first request: refuse to run in production without BETTER_AUTH_SECRET, and open and
// migrate the database (so a fresh data folder is ready, and a locked one fails at start, loudly).
import { getDatabase } from "@/db/client";
import { resolveAuthSecret } from "@/lib/auth/secret";

export async function prepareServer(): Promise<void> {
  try {
    resolveAuthSecret();
    await getDatabase();
  } catch (error) {
    console.error(`[sagwise] cannot start: ${(error as Error).message}`);
    process.exit(1);
  }
}
