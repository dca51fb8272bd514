// Runs once per `vitest run`: builds one migrated database that every test file clones, because a
// fresh PGlite takes seconds to create and migrate (stack-notes.md).
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { drizzle } from "drizzle-orm/pglite";
import { migrate } from "drizzle-orm/pglite/migrator";
import pg from "pg";
import { MIGRATIONS_FOLDER } from "../../db/migrate";
import { createPglite } from "../../db/pglite";

export default async function setup() {
  const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-test-"));
  process.env.SAGWISE_TEST_TMP = dir;
  const url = process.env.DATABASE_URL;
  if (url) {
    // PostgreSQL: a migrated template database; each test file creates its own copy.
    const admin = new pg.Client({ connectionString: url });
    await admin.connect();
    const template = `sagwise_tpl_${process.pid}`;
    await admin.query(`drop database if exists ${template}`);
    await admin.query(`create database ${template}`);
    const tplUrl = new URL(url);
    tplUrl.pathname = `/${template}`;
    const pool = new pg.Pool({ connectionString: tplUrl.toString() });
    const { drizzle: drizzlePg } = await import("drizzle-orm/node-postgres");
    const { migrate: migratePg } = await import("drizzle-orm/node-postgres/migrator");
    await migratePg(drizzlePg({ client: pool }), { migrationsFolder: MIGRATIONS_FOLDER });
    await pool.end();
    process.env.SAGWISE_TEST_PG_TEMPLATE = template;
    await admin.end();
    return async () => {
      const cleanup = new pg.Client({ connectionString: url });
      await cleanup.connect();
      const rows = await cleanup.query(
        `select datname from pg_database where datname like 'sagwise_t%_${process.pid}%' or datname = $1`,
        [template],
      );
      for (const row of rows.rows as { datname: string }[]) {
        await cleanup.query(`drop database if exists ${row.datname} with (force)`);
      }
      await cleanup.end();
      rmSync(dir, { recursive: true, force: true });
    };
  }
  const client = await createPglite();
  await migrate(drizzle({ client }), { migrationsFolder: MIGRATIONS_FOLDER });
  const dump = await client.dumpDataDir("none");
  await client.close();
  const file = path.join(dir, "migrated.tar");
  writeFileSync(file, Buffer.from(await dump.arrayBuffer()));
  process.env.SAGWISE_TEST_PGLITE_DUMP = file;
  return () => rmSync(dir, { recursive: true, force: true });
}
