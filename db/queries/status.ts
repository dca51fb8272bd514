// The rider's side of a request: who may open it (status token or the signed-in rider's e-mail,
// checked in the query), what the status page shows, and what the rider may send back.
import { and, asc, desc, eq, inArray, isNotNull } from "drizzle-orm";
import { getDb, type Executor, type Tx } from "@/db/client";
import {
  auditEvents,
  recommendationVersions,
  requestMessages,
  sagReports,
  setupRequests,
  statusLinks,
  uploads,
} from "@/db/schema";
import { hashStatusToken } from "@/lib/requests/token";
import { ConflictError } from "@/lib/errors";

/** Who is looking: a status-link token, or a signed-in rider's e-mail. */
export type RiderViewer = { token: string } | { email: string };

/** The request id if this viewer may open it (a token opens its own request only). */
export async function findRequestForViewer(viewer: RiderViewer, requestId?: string): Promise<string | null> {
  const db = await getDb();
  if ("token" in viewer) {
    if (viewer.token.length < 20 || viewer.token.length > 200) return null;
    const where = [eq(statusLinks.tokenHash, hashStatusToken(viewer.token))];
    if (requestId) where.push(eq(statusLinks.requestId, requestId));
    const [row] = await db
      .select({ id: statusLinks.requestId })
      .from(statusLinks)
      .where(and(...where))
      .limit(1);
    return row?.id ?? null;
  }
  if (!requestId) return null;
  const [row] = await db
    .select({ id: setupRequests.id })
    .from(setupRequests)
    .where(and(eq(setupRequests.id, requestId), eq(setupRequests.riderEmail, viewer.email.toLowerCase())))
    .limit(1);
  return row?.id ?? null;
}

/** Marks a token as used (best effort: the page still opens if this write fails). */
export async function touchStatusToken(token: string) {
  const db = await getDb();
  await db
    .update(statusLinks)
    .set({ lastUsedAt: new Date() })
    .where(eq(statusLinks.tokenHash, hashStatusToken(token)));
}

export async function loadRiderStatus(requestId: string) {
  const db = await getDb();
  const [request] = await db
    .select({
      id: setupRequests.id,
      number: setupRequests.number,
      status: setupRequests.status,
      riderName: setupRequests.riderName,
      bikeLabel: setupRequests.bikeLabel,
      answers: setupRequests.answers,
      declineReason: setupRequests.declineReason,
      createdAt: setupRequests.createdAt,
    })
    .from(setupRequests)
    .where(eq(setupRequests.id, requestId));
  if (!request) return null;
  const [versions, messages, photos, reports] = await Promise.all([
    db
      .select({
        id: recommendationVersions.id,
        version: recommendationVersions.version,
        state: recommendationVersions.state,
        approvedAt: recommendationVersions.approvedAt,
        notesForRider: recommendationVersions.notesForRider,
      })
      .from(recommendationVersions)
      .where(
        and(
          eq(recommendationVersions.requestId, requestId),
          inArray(recommendationVersions.state, ["approved", "superseded"]),
          isNotNull(recommendationVersions.approvedAt),
        ),
      )
      .orderBy(desc(recommendationVersions.version)),
    db
      .select({
        id: requestMessages.id,
        author: requestMessages.author,
        body: requestMessages.body,
        createdAt: requestMessages.createdAt,
      })
      .from(requestMessages)
      .where(eq(requestMessages.requestId, requestId))
      .orderBy(asc(requestMessages.createdAt)),
    db
      .select({ id: uploads.id, originalName: uploads.originalName })
      .from(uploads)
      .where(eq(uploads.requestId, requestId))
      .orderBy(asc(uploads.createdAt), asc(uploads.id)),
    db
      .select({
        id: sagReports.id,
        measured: sagReports.measured,
        verdict: sagReports.verdict,
        createdAt: sagReports.createdAt,
      })
      .from(sagReports)
      .where(eq(sagReports.requestId, requestId))
      .orderBy(desc(sagReports.createdAt)),
  ]);
  return { request, versions, messages, photos, reports };
}
export type RiderStatus = NonNullable<Awaited<ReturnType<typeof loadRiderStatus>>>;

/** The rider answers the tuner's question: message, back to review, audit, all at once. */
export async function recordRiderAnswer(requestId: string, body: string, also?: (tx: Tx) => Promise<unknown>) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const moved = await tx
      .update(setupRequests)
      .set({ status: "in_review", updatedAt: new Date() })
      .where(and(eq(setupRequests.id, requestId), eq(setupRequests.status, "waiting_for_rider")))
      .returning({ id: setupRequests.id });
    if (!moved.length) throw new ConflictError("The shop is not waiting for an answer on this request.");
    await tx.insert(requestMessages).values({ requestId, author: "rider", body });
    await tx.insert(auditEvents).values({
      requestId,
      actorLabel: "rider",
      action: "request.rider_answered",
      detail: { from: "waiting_for_rider", to: "in_review", length: body.length },
    });
    // The service tells the shop in this same transaction (lib/notify-staff.ts).
    await also?.(tx);
  });
}

/**
 * The newest approved version of an approved request: what the sag follow-up is judged against and
 * what an order is made from (in the caller's transaction when given one).
 */
export async function findApprovedVersion(requestId: string, executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db
    .select({
      id: recommendationVersions.id,
      version: recommendationVersions.version,
      input: recommendationVersions.input,
      output: recommendationVersions.output,
    })
    .from(recommendationVersions)
    .innerJoin(setupRequests, eq(setupRequests.id, recommendationVersions.requestId))
    .where(
      and(
        eq(recommendationVersions.requestId, requestId),
        eq(recommendationVersions.state, "approved"),
        eq(setupRequests.status, "approved"),
      ),
    )
    .orderBy(desc(recommendationVersions.version))
    .limit(1);
  return row ?? null;
}

export async function insertSagReport(
  report: Pick<typeof sagReports.$inferInsert, "requestId" | "versionId" | "measured" | "verdict"> & {
    versionId: string;
    version: number;
  },
  also?: (tx: Tx) => Promise<unknown>,
) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(sagReports)
      .values({
        requestId: report.requestId,
        versionId: report.versionId,
        measured: report.measured,
        verdict: report.verdict,
      })
      .returning({ id: sagReports.id, createdAt: sagReports.createdAt });
    await tx.insert(auditEvents).values({
      requestId: report.requestId,
      actorLabel: "rider",
      action: "sag.reported",
      detail: { sagReportId: row!.id, version: report.version },
    });
    await also?.(tx);
    return row!;
  });
}

/** An upload with its number among the request's photos (1-based), if this viewer may see it. */
export async function findUploadForViewer(uploadId: string, viewer: RiderViewer | "staff") {
  const db = await getDb();
  const [row] = await db
    .select({
      id: uploads.id,
      requestId: uploads.requestId,
      storageKey: uploads.storageKey,
      contentType: uploads.contentType,
    })
    .from(uploads)
    .where(eq(uploads.id, uploadId));
  if (!row) return null;
  if (viewer !== "staff" && !(await findRequestForViewer(viewer, row.requestId))) return null;
  const siblings = await db
    .select({ id: uploads.id })
    .from(uploads)
    .where(eq(uploads.requestId, row.requestId))
    .orderBy(asc(uploads.createdAt), asc(uploads.id));
  return { ...row, n: siblings.findIndex((s) => s.id === row.id) + 1 };
}
