// Every PGlite the project opens (app, scripts, tests) loads the same extensions the migrations use.
import { PGlite, type PGliteOptions } from "@electric-sql/pglite";
import { pg_trgm } from "@electric-sql/pglite/contrib/pg_trgm";

export async function createPglite(options: Omit<PGliteOptions, "extensions"> = {}): Promise<PGlite> {
  const client = new PGlite({ ...options, extensions: { pg_trgm } });
  await client.waitReady;
  return client;
}
