// The e-mail outbox service. A message is queued in the caller's transaction (queueMail), so it
// exists exactly when the change it reports was committed; a worker sends it afterwards through
// the resend SDK with retries and exponential backoff. The worker is kicked after each commit (no
// waiting for a tick), polls every few seconds, and on start picks up what an earlier run left.
// Several app instances on one PostgreSQL can run it: each row is claimed by one of them (FOR
// UPDATE SKIP LOCKED, with a lease so a crashed instance's rows are tried again), and every attempt
// carries the row's idempotency key, so a message is delivered once.
import { randomUUID } from "node:crypto";
import { getDb, type Executor } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import {
  claimDueEmails,
  insertOutboundEmail,
  markEmailFailed,
  markEmailSent,
  nextEmailDueAt,
  rescheduleEmail,
  type OutboundEmail,
} from "@/db/queries/outbound-emails";
import type { EmailAuditActor } from "@/db/schema";
import { deliverMessage, parseMailInput, type SendMailInput } from "./send";

export interface OutboxPolicy {
  /** Total tries per message, the first included. */
  maxAttempts: number;
  /** Wait before the 2nd try; doubles before each later one, up to maxDelayMs. */
  baseDelayMs: number;
  maxDelayMs: number;
  /** Messages claimed at once by one sender. */
  batchSize: number;
  /** How long a claim holds: longer than any one send, short enough to retry soon after a crash. */
  leaseMs: number;
  /** Poll interval of the running worker (kicks after commits make most sends immediate). */
  pollMs: number;
}

// 8 tries with waits of 5 s, 10 s, … 320 s: about ten minutes, enough to ride out a short outage
// of the mail service, short enough that a sign-in link (valid 15 minutes) still works.
export const DEFAULT_OUTBOX_POLICY: OutboxPolicy = {
  maxAttempts: 8,
  baseDelayMs: 5_000,
  maxDelayMs: 10 * 60_000,
  batchSize: 20,
  leaseMs: 2 * 60_000,
  pollMs: 3_000,
};

export interface QueuedMail {
  status: "queued";
  outboundEmailId: string;
}

export interface QueueMailOptions {
  /** Write the email.sent / email.failed audit event of the request in this actor's name. */
  audit?: EmailAuditActor;
}

/** Checks and queues one message in `executor` (the caller's transaction). Call kickOutbox() after the commit. */
export async function queueMail(
  executor: Executor,
  input: SendMailInput,
  options: QueueMailOptions = {},
): Promise<QueuedMail> {
  const mail = parseMailInput(input);
  const id = randomUUID();
  const row = await insertOutboundEmail(executor, {
    id,
    idempotencyKey: `sagwise-outbound-${id}`,
    requestId: mail.requestId ?? null,
    template: mail.template,
    toAddress: mail.to,
    subject: mail.subject,
    html: mail.html,
    textBody: mail.text,
    replyTo: mail.replyTo ?? null,
    attachments:
      mail.attachments?.map((a) => ({
        filename: a.filename,
        // A string is already base64 (as the resend SDK reads it); bytes are encoded here.
        contentBase64: typeof a.content === "string" ? a.content : Buffer.from(a.content).toString("base64"),
        contentType: a.contentType,
      })) ?? null,
    audit: options.audit ?? null,
    // Due from this moment by the clock the senders compare with (a JavaScript Date, whole
    // milliseconds). The database's default now() has microseconds, so a drain in the same
    // millisecond as the insert found the row "not yet due" and left it for the next poll.
    nextAttemptAt: new Date(),
  });
  return { status: "queued", outboundEmailId: row.id };
}

/** The wait before attempt `attempt + 1`, after `attempt` failed ones. */
export function backoffMs(attempt: number, policy: Pick<OutboxPolicy, "baseDelayMs" | "maxDelayMs">): number {
  return Math.min(policy.maxDelayMs, policy.baseDelayMs * 2 ** Math.max(0, attempt - 1));
}

interface WorkerState {
  policy: OutboxPolicy;
  /** This process's name on the rows it claims. */
  claimer: string;
  /** Runs one after another: one drain at a time per process. */
  tail: Promise<unknown>;
  kickPending: boolean;
  timer: NodeJS.Timeout | null;
}

// On globalThis: Next bundles route handlers and instrumentation into separate module graphs, and
// all of them must share one worker.
const holder = globalThis as unknown as { __sagwiseOutbox?: WorkerState };
function state(): WorkerState {
  holder.__sagwiseOutbox ??= {
    policy: { ...DEFAULT_OUTBOX_POLICY },
    claimer: `${process.pid}-${randomUUID()}`,
    tail: Promise.resolve(),
    kickPending: false,
    timer: null,
  };
  return holder.__sagwiseOutbox;
}

/** Changes the retry policy (tests use short or zero waits). */
export function configureOutbox(policy: Partial<OutboxPolicy>): void {
  Object.assign(state().policy, policy);
}

export function resetOutboxPolicy(): void {
  state().policy = { ...DEFAULT_OUTBOX_POLICY };
}

export interface DrainSummary {
  sent: number;
  retried: number;
  failed: number;
}

async function recordOutcome(
  row: OutboundEmail,
  claimer: string,
  now: Date,
  policy: OutboxPolicy,
  summary: DrainSummary,
) {
  const outcome =
    row.html && row.textBody
      ? await deliverMessage({
          template: row.template,
          to: row.toAddress,
          subject: row.subject,
          html: row.html,
          text: row.textBody,
          replyTo: row.replyTo,
          attachments: row.attachments,
          idempotencyKey: row.idempotencyKey,
        })
      : ({ ok: false, error: "The message has no body to send.", retryable: false } as const);
  const finalFailure = !outcome.ok && (!outcome.retryable || row.attempts >= policy.maxAttempts);
  const db = await getDb();
  await db.transaction(async (tx) => {
    let recorded: boolean;
    if (outcome.ok) recorded = await markEmailSent(tx, row.id, claimer, outcome.providerMessageId, new Date());
    else if (finalFailure) recorded = await markEmailFailed(tx, row.id, claimer, outcome.error);
    else
      recorded = await rescheduleEmail(
        tx,
        row.id,
        claimer,
        outcome.error,
        new Date(now.getTime() + backoffMs(row.attempts, policy)),
      );
    if (!recorded) return; // another sender took the row over after our lease ran out: it records the outcome
    if (row.audit && row.requestId && (outcome.ok || finalFailure)) {
      await recordAudit(
        {
          requestId: row.requestId,
          actorUserId: row.audit.actorUserId,
          actorLabel: row.audit.actorLabel,
          action: outcome.ok ? "email.sent" : "email.failed",
          detail: {
            template: row.template,
            to: row.toAddress,
            outboundEmailId: row.id,
            attempts: row.attempts,
            ...(outcome.ok ? {} : { error: outcome.error }),
          },
        },
        tx,
      );
    }
  });
  if (outcome.ok) summary.sent += 1;
  else if (finalFailure) {
    summary.failed += 1;
    console.warn(`[mail] ${row.template} e-mail ${row.id} failed after ${row.attempts} attempt(s): ${outcome.error}`);
  } else summary.retried += 1;
}

/** Sends every message due at `now`, batch by batch, until none is due. */
async function drainDue(now: Date, summary: DrainSummary): Promise<void> {
  const { policy, claimer } = state();
  for (;;) {
    const batch = await claimDueEmails({
      now,
      leaseUntil: new Date(now.getTime() + policy.leaseMs),
      claimer,
      limit: policy.batchSize,
    });
    for (const row of batch) await recordOutcome(row, claimer, now, policy, summary);
    if (batch.length < policy.batchSize) return;
  }
}

function serialised<T>(run: () => Promise<T>): Promise<T> {
  const s = state();
  const next = s.tail.then(run);
  s.tail = next.catch(() => undefined);
  return next;
}

/**
 * Sends what is due now and waits for it: for tests and scripts, which then read the mail fake
 * deterministically. With `settle`, also waits out every backoff (on a virtual clock: no real
 * sleeping) until no message is queued: each ends sent or failed.
 */
export function drainOutbox(options: { now?: Date; settle?: boolean } = {}): Promise<DrainSummary> {
  return serialised(async () => {
    const summary: DrainSummary = { sent: 0, retried: 0, failed: 0 };
    // PostgreSQL stamps rows in microseconds, a JS Date in milliseconds: one millisecond ahead, a row
    // queued in this very millisecond counts as due.
    let now = options.now ?? new Date(Date.now() + 1);
    await drainDue(now, summary);
    while (options.settle) {
      const next = await nextEmailDueAt();
      if (!next) break;
      const before = summary.sent + summary.retried + summary.failed;
      now = new Date(Math.max(now.getTime(), next.getTime()));
      await drainDue(now, summary);
      // Nothing claimable (another sender holds what is left): stop rather than spin.
      if (summary.sent + summary.retried + summary.failed === before) break;
    }
    return summary;
  });
}

/** Asks the running worker to send now (after a commit); does nothing when no worker runs (tests drain instead). */
export function kickOutbox(): void {
  const s = state();
  if (!s.timer || s.kickPending) return;
  s.kickPending = true;
  void serialised(async () => {
    s.kickPending = false;
    await drainDue(new Date(), { sent: 0, retried: 0, failed: 0 });
  }).catch((error: unknown) => console.error("[mail] outbox run failed:", error));
}

/** Starts the worker of this process: sends what an earlier run left at once, then polls. */
export function startOutboxWorker(): () => void {
  const s = state();
  if (!s.timer) {
    s.timer = setInterval(() => kickOutbox(), s.policy.pollMs);
    // The poll alone never keeps a script or a test process alive.
    s.timer.unref();
  }
  kickOutbox();
  return stopOutboxWorker;
}

/** Stops polling and waits for the run in progress. */
export async function stopOutboxWorker(): Promise<void> {
  const s = state();
  if (s.timer) clearInterval(s.timer);
  s.timer = null;
  s.kickPending = false;
  await s.tail;
}
