// Everything the request detail page shows, loaded in parallel (one query per kind, no per-row lookups).
import { and, asc, eq, inArray, or, isNull } from "drizzle-orm";
import { listOutboundEmailsForRequest } from "@/db/queries/outbound-emails";
import { getDb } from "@/db/client";
import { bikeModels, requestMessages, sagReports, setupRequests, uploads, user } from "@/db/schema";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { listAuditForRequest } from "./audit";
import { listVersions } from "./versions";

export async function getRequestRow(requestId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ request: setupRequests, tunerName: user.name })
    .from(setupRequests)
    .leftJoin(user, eq(user.id, setupRequests.assignedTunerId))
    .where(eq(setupRequests.id, requestId));
  return row ?? null;
}

export async function getRequestDetail(requestId: string) {
  const row = await getRequestRow(requestId);
  if (!row) return null;
  const db = await getDb();
  const [versions, messages, photos, sags, emails, audit] = await Promise.all([
    listVersions(requestId),
    db
      .select({
        id: requestMessages.id,
        author: requestMessages.author,
        body: requestMessages.body,
        createdAt: requestMessages.createdAt,
        authorName: user.name,
      })
      .from(requestMessages)
      .leftJoin(user, eq(user.id, requestMessages.authorUserId))
      .where(eq(requestMessages.requestId, requestId))
      .orderBy(asc(requestMessages.createdAt)),
    db
      .select({
        id: uploads.id,
        originalName: uploads.originalName,
        contentType: uploads.contentType,
        sizeBytes: uploads.sizeBytes,
      })
      .from(uploads)
      .where(eq(uploads.requestId, requestId))
      .orderBy(asc(uploads.createdAt)),
    db.select().from(sagReports).where(eq(sagReports.requestId, requestId)).orderBy(asc(sagReports.createdAt)),
    listOutboundEmailsForRequest(requestId),
    listAuditForRequest(requestId),
  ]);
  return {
    ...row.request,
    assignedTunerName: row.tunerName,
    versions,
    messages,
    photos,
    sagReports: sags,
    emails,
    audit,
  };
}

export type RequestDetail = NonNullable<Awaited<ReturnType<typeof getRequestDetail>>>;

/** Active staff who can be assigned a request. */
export async function listStaffMembers() {
  const db = await getDb();
  return db
    .select({ id: user.id, name: user.name, role: user.role })
    .from(user)
    .where(and(inArray(user.role, [...STAFF_ROLES]), or(isNull(user.banned), eq(user.banned, false))))
    .orderBy(asc(user.name));
}

/** The staff member with this id, or null if there is none (or the account is deactivated). */
export async function findStaffMember(userId: string) {
  const staff = await listStaffMembers();
  return staff.find((s) => s.id === userId) ?? null;
}

/** Bike classes of the catalog for the queue's filter (requests store the class, not the model). */
export async function listBikeClassOptions() {
  const db = await getDb();
  const rows = await db
    .selectDistinct({ value: bikeModels.bikeClass, label: bikeModels.name })
    .from(bikeModels)
    .orderBy(asc(bikeModels.name));
  // One entry per class: the first model's name labels it.
  const seen = new Map<string, string>();
  for (const r of rows) if (!seen.has(r.value)) seen.set(r.value, r.label);
  return [...seen].map(([value, label]) => ({ value, label }));
}
