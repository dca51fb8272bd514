// Liveness and readiness for the shop's server: public on purpose (no data, only the database kind
// and the newest applied migration).
import { getDatabase } from "@/db/client";
import { latestAppliedMigration } from "@/db/migrate";
import { json, route } from "@/lib/api/route";

export const dynamic = "force-dynamic";

export const GET = route({ access: "public" }, async () => {
  try {
    const handle = await getDatabase();
    const migration = await latestAppliedMigration(handle);
    return json({ ok: migration !== null, database: handle.kind, migration });
  } catch (error) {
    console.error("[health] database unavailable", error);
    return json({ ok: false, error: "Database unavailable" }, 503);
  }
});
