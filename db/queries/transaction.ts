// One database transaction for a service step: everything written inside commits or rolls back together.
import { getDb, type AppDb } from "@/db/client";

export type Tx = Parameters<Parameters<AppDb["transaction"]>[0]>[0];

export async function inTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const db = await getDb();
  return db.transaction(work);
}
