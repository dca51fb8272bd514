// Queries read on every page, whose shape never changes, built once per database instead of once
// per call. drizzle builds a query's SQL text from its query builder each time it runs (0.2-0.3 ms
// here for a select of twenty columns); a prepared query keeps the text and fills in only its
// placeholders (drizzle docs, "Query performance: prepared statements"). On a PostgreSQL server the
// name also makes node-postgres keep a named prepared statement per connection.
// Kept per drizzle instance: tests and scripts install databases of their own.
import type { AppDb } from "@/db/client";

/**
 * `build(db, name)` once per database, then the same prepared query. `name` must be unique in the
 * app, since on PostgreSQL it names the statement on each connection (tests/unit/prepared-names.test.ts
 * checks the sources).
 */
export function prepared<T>(name: string, build: (db: AppDb, name: string) => T): (db: AppDb) => T {
  const byDb = new WeakMap<AppDb, T>();
  return (db) => {
    let query = byDb.get(db);
    if (query === undefined) {
      query = build(db, name);
      byDb.set(db, query);
    }
    return query;
  };
}
