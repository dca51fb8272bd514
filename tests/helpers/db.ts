// A fresh, migrated database for one test file, installed as the app's database.
// PGlite: an in-memory clone of the dump made in global-setup. PostgreSQL (DATABASE_URL set): a new
// database created from the migrated template.
import { readFileSync } from "node:fs";
import { randomBytes } from "node:crypto";
import { closeDatabase, openPostgres, installTestDatabase, type DatabaseHandle } from "@/db/client";

let currentUrl: string | undefined;

/** The PostgreSQL URL of this file's database (for tests that start app processes of their own). */
export function testDatabaseUrl(): string {
  if (!currentUrl) throw new Error("No PostgreSQL test database: DATABASE_URL is not set");
  return currentUrl;
}

export async function createTestDatabase(): Promise<DatabaseHandle> {
  const template = process.env.SAGWISE_TEST_PG_TEMPLATE;
  const url = process.env.DATABASE_URL;
  let handle: DatabaseHandle;
  if (url && template) {
    const pg = (await import("pg")).default;
    const name = `sagwise_t${randomBytes(4).toString("hex")}_${template.split("_").pop()}`;
    const admin = new pg.Client({ connectionString: url });
    await admin.connect();
    await admin.query(`create database ${name} template ${template}`);
    await admin.end();
    const dbUrl = new URL(url);
    dbUrl.pathname = `/${name}`;
    currentUrl = dbUrl.toString();
    handle = await openPostgres(currentUrl);
  } else {
    const dumpPath = process.env.SAGWISE_TEST_PGLITE_DUMP;
    if (!dumpPath) throw new Error("tests/helpers/global-setup.ts did not run");
    const { createPglite } = await import("@/db/pglite");
    const { drizzle } = await import("drizzle-orm/pglite");
    const schema = await import("@/db/schema");
    const client = await createPglite({ loadDataDir: new Blob([readFileSync(dumpPath)]) });
    handle = {
      db: drizzle({ client, schema }) as unknown as DatabaseHandle["db"],
      kind: "pglite",
      close: () => client.close(),
    };
  }
  installTestDatabase(handle);
  return handle;
}

export async function closeTestDatabase(): Promise<void> {
  await closeDatabase();
}
