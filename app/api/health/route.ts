// Liveness and readiness for the shop's server: public on purpose (no data, only the database kind
// and the newest applied migration).
import { NextResponse } from "next/server";
import { getDatabase } from "@/db/client";
import { latestAppliedMigration } from "@/db/migrate";
import { publicRoute } from "@/lib/auth/guard";

export const dynamic = "force-dynamic";

export const GET = publicRoute(async () => {
  try {
    const handle = await getDatabase();
    const migration = await latestAppliedMigration(handle);
    return NextResponse.json({ ok: migration !== null, database: handle.kind, migration });
  } catch (error) {
    console.error("[health] database unavailable", error);
    return NextResponse.json({ ok: false, error: "Database unavailable" }, { status: 503 });
  }
});
