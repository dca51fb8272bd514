// PostgreSQL's own tools for backups: found on PATH or in Debian's /usr/lib/postgresql/<version>/bin
// (the newest version, since pg_dump must be at least as new as the server).
import { existsSync, readdirSync } from "node:fs";
import path from "node:path";

export function findPostgresTool(name: "pg_dump" | "pg_restore"): string {
  for (const dir of (process.env.PATH ?? "").split(path.delimiter)) {
    if (dir && existsSync(path.join(dir, name))) return path.join(dir, name);
  }
  const root = "/usr/lib/postgresql";
  const versions = existsSync(root) ? readdirSync(root).filter((v) => existsSync(path.join(root, v, "bin", name))) : [];
  const newest = versions.sort((a, b) => Number.parseFloat(b) - Number.parseFloat(a))[0];
  if (newest) return path.join(root, newest, "bin", name);
  throw new Error(
    `${name} was not found (on PATH or in /usr/lib/postgresql/*/bin). Backups of a PostgreSQL database use PostgreSQL's own tools: ` +
      "install the PostgreSQL client (Debian: apt-get install postgresql-client) and try again.",
  );
}

/** True when the database has no tables of its own (a fresh database to restore into). */
export async function postgresIsEmpty(url: string): Promise<boolean> {
  const pg = (await import("pg")).default;
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const result = await client.query(
      "select count(*)::int as n from pg_tables where schemaname not in ('pg_catalog', 'information_schema')",
    );
    return (result.rows[0] as { n: number }).n === 0;
  } finally {
    await client.end();
  }
}
