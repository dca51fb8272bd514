// Everything the request detail page shows, loaded in parallel (one query per kind, no per-row
// lookups), each a prepared query (db/prepared.ts).
import { and, asc, eq, inArray, or, isNull, sql } from "drizzle-orm";
import { listOutboundEmailsForRequest } from "@/db/queries/outbound-emails";
import { getDb } from "@/db/client";
import { prepared } from "@/db/prepared";
import { bikeModels, requestMessages, sagReports, setupRequests, uploads, user } from "@/db/schema";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { listAuditForRequest } from "./audit";
import { listVersions } from "./versions";

const requestRow = prepared("request_row", (db, name) =>
  db
    .select({ request: setupRequests, tunerName: user.name })
    .from(setupRequests)
    .leftJoin(user, eq(user.id, setupRequests.assignedTunerId))
    .where(eq(setupRequests.id, sql.placeholder("id")))
    .prepare(name),
);

const requestMessagesOf = prepared("request_messages", (db, name) =>
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
    .where(eq(requestMessages.requestId, sql.placeholder("id")))
    .orderBy(asc(requestMessages.createdAt))
    .prepare(name),
);

const requestPhotos = prepared("request_photos", (db, name) =>
  db
    .select({
      id: uploads.id,
      originalName: uploads.originalName,
      contentType: uploads.contentType,
      sizeBytes: uploads.sizeBytes,
    })
    .from(uploads)
    .where(eq(uploads.requestId, sql.placeholder("id")))
    .orderBy(asc(uploads.createdAt))
    .prepare(name),
);

const requestSagReports = prepared("request_sag_reports", (db, name) =>
  db
    .select()
    .from(sagReports)
    .where(eq(sagReports.requestId, sql.placeholder("id")))
    .orderBy(asc(sagReports.createdAt))
    .prepare(name),
);

export async function getRequestRow(requestId: string) {
  const [row] = await requestRow(await getDb()).execute({ id: requestId });
  return row ?? null;
}

export async function getRequestDetail(requestId: string) {
  const db = await getDb();
  // The row and its lists together (one round trip on a PostgreSQL server, not two); an unknown id
  // finds no row and empty lists.
  const [row, versions, messages, photos, sags, emails, audit] = await Promise.all([
    getRequestRow(requestId),
    listVersions(requestId),
    requestMessagesOf(db).execute({ id: requestId }),
    requestPhotos(db).execute({ id: requestId }),
    requestSagReports(db).execute({ id: requestId }),
    listOutboundEmailsForRequest(requestId),
    listAuditForRequest(requestId),
  ]);
  if (!row) return null;
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

const activeStaff = prepared("active_staff", (db, name) =>
  db
    .select({ id: user.id, name: user.name, role: user.role })
    .from(user)
    .where(and(inArray(user.role, [...STAFF_ROLES]), or(isNull(user.banned), eq(user.banned, false))))
    .orderBy(asc(user.name))
    .prepare(name),
);

/** Active staff who can be assigned a request. */
export async function listStaffMembers() {
  return activeStaff(await getDb()).execute();
}

/** The staff member with this id, or null if there is none (or the account is deactivated). */
export async function findStaffMember(userId: string) {
  const staff = await listStaffMembers();
  return staff.find((s) => s.id === userId) ?? null;
}

const bikeClassNames = prepared("bike_class_names", (db, name) =>
  db
    .selectDistinct({ value: bikeModels.bikeClass, label: bikeModels.name })
    .from(bikeModels)
    .orderBy(asc(bikeModels.name))
    .prepare(name),
);

/** Bike classes of the catalog for the queue's filter (requests store the class, not the model). */
export async function listBikeClassOptions() {
  const rows = await bikeClassNames(await getDb()).execute();
  // One entry per class: the first model's name labels it.
  const seen = new Map<string, string>();
  for (const r of rows) if (!seen.has(r.value)) seen.set(r.value, r.label);
  return [...seen].map(([value, label]) => ({ value, label }));
}
