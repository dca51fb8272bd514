// One database transaction for a service step: everything written inside commits or rolls back together.
import { getDb, type Tx } from "@/db/client";

export type { Tx };

export async function inTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const db = await getDb();
  return db.transaction(work);
}
