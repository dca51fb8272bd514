// Upkeep of the embedded database. A PostgreSQL server runs autovacuum, which removes the dead row
// versions every UPDATE and DELETE leaves behind, marks pages all-visible so that index-only scans
// (the queue's page walk and filtered counts) need not visit the table, and refreshes the planner's statistics (PostgreSQL
// 16 manual, 25.1 "Routine Vacuuming"). PGlite runs no autovacuum: without this job its tables only
// grow and its plans are made on the row counts of the day the data folder was created. So the
// app's process runs VACUUM (ANALYZE) on PGlite a little after start and then every 6 hours
// (lib/server-start.ts). With DATABASE_URL the server's autovacuum does this, and the job does nothing.
import { sql } from "drizzle-orm";
import { getDatabase } from "./client";

/** One pass over every table; true when it ran (PGlite), false for a PostgreSQL server. */
export async function vacuumEmbeddedDatabase(): Promise<boolean> {
  const handle = await getDatabase();
  if (handle.kind !== "pglite") return false;
  await handle.db.execute(sql`vacuum (analyze)`);
  return true;
}
