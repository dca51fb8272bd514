import { asc, eq } from "drizzle-orm";
import { getDb, type AppDb } from "@/db/client";
import { auditEvents } from "@/db/schema";

export type AuditInsert = typeof auditEvents.$inferInsert;

/** Appends audit events (in the caller's transaction when given). */
export async function recordAudit(events: AuditInsert | AuditInsert[], executor?: Pick<AppDb, "insert">) {
  const db = executor ?? (await getDb());
  const rows = Array.isArray(events) ? events : [events];
  if (rows.length) await db.insert(auditEvents).values(rows);
}

export async function listAuditForRequest(requestId: string) {
  const db = await getDb();
  return db
    .select()
    .from(auditEvents)
    .where(eq(auditEvents.requestId, requestId))
    .orderBy(asc(auditEvents.createdAt), asc(auditEvents.id));
}
