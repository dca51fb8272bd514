import { asc, eq, sql } from "drizzle-orm";
import { getDb, type AppDb } from "@/db/client";
import { prepared } from "@/db/prepared";
import { auditEvents } from "@/db/schema";

export type AuditInsert = typeof auditEvents.$inferInsert;

/** Appends audit events (in the caller's transaction when given). */
export async function recordAudit(events: AuditInsert | AuditInsert[], executor?: Pick<AppDb, "insert">) {
  const db = executor ?? (await getDb());
  const rows = Array.isArray(events) ? events : [events];
  if (rows.length) await db.insert(auditEvents).values(rows);
}

const requestAudit = prepared("request_audit", (db, name) =>
  db
    .select()
    .from(auditEvents)
    .where(eq(auditEvents.requestId, sql.placeholder("id")))
    .orderBy(asc(auditEvents.createdAt), asc(auditEvents.id))
    .prepare(name),
);

export async function listAuditForRequest(requestId: string) {
  return requestAudit(await getDb()).execute({ id: requestId });
}
