// Total rows across every table of the app's schema, in one statement: a check that a refused
// request wrote nothing anywhere (not only in the table the endpoint is about). The limiter's own
// counters (PostgreSQL only) are bookkeeping of every request, refused or not, and not counted.
import { sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { RATE_LIMIT_TABLE } from "@/lib/api/rate-limit";

let statement: string | undefined;

export async function totalRows(): Promise<number> {
  const db = await getDb();
  if (!statement) {
    const tables = (await db.execute(
      sql`select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' and table_name not like '%drizzle%' and table_name <> ${RATE_LIMIT_TABLE} order by table_name`,
    )) as unknown as { rows: { table_name: string }[] };
    statement = `select ${tables.rows.map((t) => `(select count(*) from "${t.table_name}")`).join(" + ")} as n`;
  }
  const result = (await db.execute(sql.raw(statement))) as unknown as { rows: { n: string | number }[] };
  return Number(result.rows[0]?.n);
}
