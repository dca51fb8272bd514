// The e-mail outbox (table outbound_emails): queueing a message in the caller's transaction,
// claiming due messages for one sender (FOR UPDATE SKIP LOCKED, so several app instances on one
// PostgreSQL never claim the same row), and recording how each attempt went.
import { and, asc, eq, inArray, isNull, lt, lte, min, or, sql } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { prepared } from "@/db/prepared";
import { outboundEmails } from "@/db/schema";

export type OutboundEmail = typeof outboundEmails.$inferSelect;
export type NewOutboundEmail = Omit<
  typeof outboundEmails.$inferInsert,
  "status" | "attempts" | "providerMessageId" | "sentAt"
>;

const requestEmails = prepared("request_emails", (db, name) =>
  db
    .select({
      id: outboundEmails.id,
      template: outboundEmails.template,
      toAddress: outboundEmails.toAddress,
      subject: outboundEmails.subject,
      status: outboundEmails.status,
      attempts: outboundEmails.attempts,
      lastError: outboundEmails.lastError,
      createdAt: outboundEmails.createdAt,
      sentAt: outboundEmails.sentAt,
    })
    .from(outboundEmails)
    .where(eq(outboundEmails.requestId, sql.placeholder("id")))
    .orderBy(asc(outboundEmails.createdAt), asc(outboundEmails.id))
    .prepare(name),
);

/** Every e-mail sent (or tried) about a request, oldest first: the request page shows the trail. */
export async function listOutboundEmailsForRequest(requestId: string) {
  return requestEmails(await getDb()).execute({ id: requestId });
}

export type OutboundEmailRow = Awaited<ReturnType<typeof listOutboundEmailsForRequest>>[number];

/** Queues one message; visible to senders once the caller's transaction commits. */
export async function insertOutboundEmail(executor: Executor, values: NewOutboundEmail) {
  const [row] = await executor
    .insert(outboundEmails)
    .values({ ...values, status: "queued" })
    .returning({ id: outboundEmails.id, idempotencyKey: outboundEmails.idempotencyKey });
  if (!row) throw new Error("insertOutboundEmail: no row returned");
  return row;
}

const due = (now: Date) =>
  and(
    eq(outboundEmails.status, "queued"),
    lte(outboundEmails.nextAttemptAt, now),
    or(isNull(outboundEmails.claimedUntil), lt(outboundEmails.claimedUntil, now)),
  );

/**
 * Claims up to `limit` due messages for `claimer` until `leaseUntil`, counting the attempt now (so a
 * message whose sending kills the process still runs out of attempts). Rows another sender holds
 * locked are skipped, not waited for; a lease that ran out (its sender crashed) is claimed again.
 */
export async function claimDueEmails(options: { now: Date; leaseUntil: Date; claimer: string; limit: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const picked = await tx
      .select({ id: outboundEmails.id })
      .from(outboundEmails)
      .where(due(options.now))
      .orderBy(asc(outboundEmails.nextAttemptAt), asc(outboundEmails.createdAt))
      .limit(options.limit)
      .for("update", { skipLocked: true });
    if (picked.length === 0) return [];
    return tx
      .update(outboundEmails)
      .set({
        claimedUntil: options.leaseUntil,
        claimedBy: options.claimer,
        attempts: sql`${outboundEmails.attempts} + 1`,
      })
      .where(
        inArray(
          outboundEmails.id,
          picked.map((p) => p.id),
        ),
      )
      .returning();
  });
}

// Every outcome is written only while this sender still holds the row: if its lease ran out and
// another sender took the row over, the other one records the outcome.
const heldBy = (id: string, claimer: string) => and(eq(outboundEmails.id, id), eq(outboundEmails.claimedBy, claimer));

/** Delivered: the provider's id, and the body is dropped (links in it carry private tokens). */
export async function markEmailSent(
  executor: Executor,
  id: string,
  claimer: string,
  providerMessageId: string,
  at: Date,
) {
  const rows = await executor
    .update(outboundEmails)
    .set({
      status: "sent",
      providerMessageId,
      lastError: null,
      sentAt: at,
      claimedUntil: null,
      html: null,
      textBody: null,
      attachments: null,
    })
    .where(heldBy(id, claimer))
    .returning({ id: outboundEmails.id });
  return rows.length > 0;
}

/** A failed attempt that may pass later: back in the queue from `nextAttemptAt`. */
export async function rescheduleEmail(
  executor: Executor,
  id: string,
  claimer: string,
  lastError: string,
  nextAttemptAt: Date,
) {
  const rows = await executor
    .update(outboundEmails)
    .set({ lastError, nextAttemptAt, claimedUntil: null })
    .where(heldBy(id, claimer))
    .returning({ id: outboundEmails.id });
  return rows.length > 0;
}

/** No more attempts: 'failed' with the last error, shown on the request page. */
export async function markEmailFailed(executor: Executor, id: string, claimer: string, lastError: string) {
  const rows = await executor
    .update(outboundEmails)
    .set({ status: "failed", lastError, claimedUntil: null, html: null, textBody: null, attachments: null })
    .where(heldBy(id, claimer))
    .returning({ id: outboundEmails.id });
  return rows.length > 0;
}

/** When the next queued message falls due (null when none waits), for draining in tests. */
export async function nextEmailDueAt(): Promise<Date | null> {
  const db = await getDb();
  const [row] = await db
    .select({ at: min(outboundEmails.nextAttemptAt) })
    .from(outboundEmails)
    .where(eq(outboundEmails.status, "queued"));
  return row?.at ? new Date(row.at) : null;
}

export async function findOutboundEmail(id: string) {
  const db = await getDb();
  const [row] = await db.select().from(outboundEmails).where(eq(outboundEmails.id, id));
  return row ?? null;
}
