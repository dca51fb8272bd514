// Liveness and readiness for the shop's server: public on purpose (no data, only the database kind
// and the newest applied migration).
// A healthy answer is kept for a second (lru-cache with a TTL; concurrent calls share one lookup):
// a load balancer polling many times a second costs no database round trip each time, and a
// database that stops answering is reported within a second. A failure is never kept.
import { LRUCache } from "lru-cache";
import { getDatabase } from "@/db/client";
import { latestAppliedMigration } from "@/db/migrate";
import { json, route } from "@/lib/api/route";

export const dynamic = "force-dynamic";

type Readiness = { ok: boolean; database: string; migration: string | null };

const readiness = new LRUCache<"db", Readiness>({
  max: 1,
  ttl: 1000,
  fetchMethod: async () => {
    const handle = await getDatabase();
    const migration = await latestAppliedMigration(handle);
    return { ok: migration !== null, database: handle.kind, migration };
  },
});

export const GET = route({ access: "public" }, async () => {
  try {
    const body = (await readiness.fetch("db"))!;
    if (!body.ok) readiness.delete("db");
    return json(body);
  } catch (error) {
    console.error("[health] database unavailable", error);
    return json({ ok: false, error: "Database unavailable" }, 503);
  }
});
