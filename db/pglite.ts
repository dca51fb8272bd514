// Every PGlite the project opens (app, scripts, tests) loads the same extensions the migrations use.
import { PGlite, types, type PGliteOptions, type QueryOptions, type Transaction } from "@electric-sql/pglite";
import { pg_trgm } from "@electric-sql/pglite/contrib/pg_trgm";

// drizzle-orm's PGlite driver asks for these types as text on every query (timestamps, dates,
// intervals and their arrays: it converts them itself) by passing identity `parsers` in the query
// options. PGlite merges such options into its own parser map, one entry per type and array type
// of the database (about 320), on every query: about 0.13 ms each here, more than many of our
// queries take inside PostgreSQL. The same identity parsers are installed on the client once
// instead, and the per-query option is dropped when it asks for exactly these: every query's
// values come out as they did. (A caller using this PGlite without drizzle also gets these types
// as text.)
const AS_TEXT: readonly number[] = [
  types.TIMESTAMP,
  types.TIMESTAMPTZ,
  types.INTERVAL,
  types.DATE,
  1231, // numeric[]
  1115, // timestamp[]
  1185, // timestamptz[]
  1187, // interval[]
  1182, // date[]
];
const asText = (value: string) => value;

function withoutTextParsers(options: QueryOptions | undefined): QueryOptions | undefined {
  const parsers = options?.parsers;
  if (!parsers) return options;
  const oids = Object.keys(parsers).map(Number);
  if (oids.length !== AS_TEXT.length || !oids.every((oid) => AS_TEXT.includes(oid))) return options;
  const rest = { ...options };
  delete rest.parsers;
  return rest;
}

export async function createPglite(options: Omit<PGliteOptions, "extensions"> = {}): Promise<PGlite> {
  const client = new PGlite({ ...options, extensions: { pg_trgm } });
  await client.waitReady;
  for (const oid of AS_TEXT) client.parsers[oid] = asText;

  const query = client.query.bind(client);
  client.query = ((sql: string, params?: unknown[], queryOptions?: QueryOptions) =>
    query(sql, params, withoutTextParsers(queryOptions))) as PGlite["query"];
  const transaction = client.transaction.bind(client);
  client.transaction = ((run: (tx: Transaction) => Promise<unknown>) =>
    transaction((tx) =>
      run(
        new Proxy(tx, {
          get(target, property, receiver) {
            if (property !== "query") return Reflect.get(target, property, receiver) as unknown;
            return (sql: string, params?: unknown[], queryOptions?: QueryOptions) =>
              target.query(sql, params, withoutTextParsers(queryOptions));
          },
        }),
      ),
    )) as PGlite["transaction"];
  return client;
}
