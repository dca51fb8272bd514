// The tuner's workflow steps on a request (the review service). Each runs in one transaction: the
// request row is locked, the status change is a guarded update (so a race cannot approve twice),
// and the audit events are written in the same transaction. Rider e-mails are queued in that
// transaction too (notifyRider, the outbox) and sent by the outbox worker once it has committed.
import { recordAudit, type AuditInsert } from "@/db/queries/audit";
import {
  approveDraftVersion,
  insertTunerMessage,
  lockRequest as lockRequestRow,
  moveStatusIf,
  setAssignedTuner,
  supersedeApproved,
} from "@/db/queries/review-steps";
import { markNoticesSeen } from "@/db/queries/notices";
import { inTransaction, type Tx } from "@/db/queries/transaction";
import { getLatestVersion, hasEarlierApproval } from "@/db/queries/versions";
import type { RequestStatus } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/guard";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { kickOutbox } from "@/lib/mail";
import { notifyRider } from "@/lib/notify";
import { STATUS_LABELS } from "@/lib/requests/status";
import { ALLOWED_FROM, conflictMessage, type WorkflowAction } from "@/lib/review/transitions";

export type Actor = Pick<SessionUser, "id" | "name">;

/** Locks the request row for this transaction; 404 if there is none. */
export async function lockRequest(tx: Tx, requestId: string) {
  const row = await lockRequestRow(tx, requestId);
  if (!row) throw new NotFoundError("No such request.");
  return row;
}

/** Throws 409 with the reason when `action` may not start from `status`. */
export function assertCanStart(action: WorkflowAction, status: RequestStatus): void {
  if (!ALLOWED_FROM[action].includes(status)) throw new ConflictError(conflictMessage(action, status));
}

export function auditBy(actor: Actor, requestId: string, action: string, detail: Record<string, unknown>): AuditInsert {
  return { requestId, actorUserId: actor.id, actorLabel: actor.name, action, detail };
}

/**
 * Moves the request to `to` only if it is still in one of `from`; 409 when another tuner changed it
 * first. Returns the audit event for the change (none when the status stays the same).
 */
export async function moveStatus(
  tx: Tx,
  requestId: string,
  current: RequestStatus,
  from: readonly RequestStatus[],
  to: RequestStatus,
  actor: Actor,
  extra: { declineReason?: string } = {},
): Promise<AuditInsert[]> {
  if (!(await moveStatusIf(tx, requestId, current, from, to, extra)))
    throw new ConflictError("The request changed meanwhile. Reload and try again.");
  return current === to ? [] : [auditBy(actor, requestId, "request.status_changed", { from: current, to })];
}

/**
 * "Start review" (or "Take", with `take`): a tuner's action, never a side effect of opening the
 * page (a GET never writes). Moves a submitted request to in review, audited; `take` also assigns it
 * to the actor. The request's "new request" notices are marked seen.
 */
export async function startReview(
  requestId: string,
  actor: Actor,
  { take = false }: { take?: boolean } = {},
): Promise<{ status: RequestStatus; assignedTunerId: string | null }> {
  return inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    if (req.status !== "submitted" && !take)
      throw new ConflictError(`The review has already started (the request is “${STATUS_LABELS[req.status]}”).`);
    if (take) assertCanStart("assign", req.status);
    const events: AuditInsert[] = [];
    if (req.status === "submitted") {
      events.push(...(await moveStatus(tx, requestId, "submitted", ["submitted"], "in_review", actor)));
      events.push(auditBy(actor, requestId, "request.review_started", {}));
    }
    let assignedTunerId = req.assignedTunerId;
    if (take && req.assignedTunerId !== actor.id) {
      await setAssignedTuner(tx, requestId, actor.id);
      events.push(
        auditBy(actor, requestId, "request.assigned", { from: req.assignedTunerId, to: actor.id, toName: actor.name }),
      );
      assignedTunerId = actor.id;
    }
    if (!events.length) throw new ConflictError("This request is already yours and in review.");
    await recordAudit(events, tx);
    await markNoticesSeen(tx, requestId, actor.id, ["new-request"]);
    return { status: req.status === "submitted" ? "in_review" : req.status, assignedTunerId };
  });
}

/** "Mark as seen": the request's unseen notices (answers, sag reports, payments) stop counting. */
export async function markRequestSeen(requestId: string, actor: Actor): Promise<{ marked: string[] }> {
  return inTransaction(async (tx) => {
    await lockRequest(tx, requestId);
    const marked = await markNoticesSeen(tx, requestId, actor.id);
    if (marked.length) await recordAudit([auditBy(actor, requestId, "request.notices_seen", { kinds: marked })], tx);
    return { marked };
  });
}

export async function askRider(requestId: string, question: string, actor: Actor) {
  const mail = await inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("ask", req.status);
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.ask, "waiting_for_rider", actor);
    await insertTunerMessage(tx, requestId, actor.id, question);
    events.push(auditBy(actor, requestId, "request.question_asked", { question }));
    await recordAudit(events, tx);
    return notifyRider(
      tx,
      requestId,
      { kind: "tuner-question", question, tunerName: actor.name },
      { actor: { userId: actor.id, label: actor.name } },
    );
  });
  kickOutbox();
  return mail;
}

export async function declineRequest(requestId: string, reason: string, actor: Actor) {
  const mail = await inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("decline", req.status);
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.decline, "declined", actor, {
      declineReason: reason,
    });
    events.push(auditBy(actor, requestId, "request.declined", { reason }));
    await recordAudit(events, tx);
    return notifyRider(
      tx,
      requestId,
      { kind: "request-declined", reason },
      { actor: { userId: actor.id, label: actor.name } },
    );
  });
  kickOutbox();
  return mail;
}

export async function assignRequest(requestId: string, tuner: { id: string; name: string } | null, actor: Actor) {
  await inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("assign", req.status);
    await setAssignedTuner(tx, requestId, tuner?.id ?? null);
    const events: AuditInsert[] = [
      auditBy(actor, requestId, "request.assigned", {
        from: req.assignedTunerId,
        to: tuner?.id ?? null,
        toName: tuner?.name ?? null,
      }),
    ];
    if (req.status === "submitted")
      events.push(...(await moveStatus(tx, requestId, "submitted", ["submitted"], "in_review", actor)));
    await recordAudit(events, tx);
  });
}

/**
 * Freezes the current draft: earlier approved versions become superseded, the request is approved,
 * and the rider gets the sheet link (the PDF is rendered on demand by the sheet route).
 */
export async function approveRecommendation(
  requestId: string,
  actor: Actor,
  expectedVersion?: number,
  acknowledged: readonly string[] = [],
) {
  const { version, revised, mail } = await inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("approve", req.status);
    const latest = await getLatestVersion(requestId, tx);
    if (!latest) throw new ConflictError("There is no recommendation to approve yet.");
    if (latest.state !== "draft")
      throw new ConflictError(`Version ${latest.version} is already approved. Save a revision first, then approve it.`);
    if (expectedVersion !== undefined && expectedVersion !== latest.version)
      throw new ConflictError(
        `Version ${latest.version} is the current draft now, not ${expectedVersion}. Reload to see it.`,
      );
    // Sanity warnings (lib/sizing/README.md, "Sanity limits") hold approval until the tuner acknowledges each.
    const missing = acknowledgementCodes(latest.output).filter((c) => !acknowledged.includes(c));
    if (missing.length)
      throw new ConflictError(
        `Version ${latest.version} has ${missing.length} warning${missing.length === 1 ? "" : "s"} to check before approval: tick the box under the warnings, then approve.`,
        {
          acknowledgedWarnings: `Not yet acknowledged: ${missing.join(", ")}`,
        },
      );
    const revised = await hasEarlierApproval(requestId, latest.version, tx);
    const superseded = await supersedeApproved(tx, requestId);
    if (!(await approveDraftVersion(tx, latest.id, actor.id)))
      throw new ConflictError("This version was approved meanwhile. Reload the request.");
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.approve, "approved", actor);
    events.push(
      auditBy(actor, requestId, "recommendation.approved", {
        version: latest.version,
        superseded,
        // Approving over a critical warning is the tuner's call (the screen asks to confirm); keep it on record.
        criticalWarnings: criticalCodes(latest.output),
        acknowledgedWarnings: acknowledgementCodes(latest.output),
      }),
    );
    await recordAudit(events, tx);
    const mail = await notifyRider(
      tx,
      requestId,
      { kind: "sheet-ready", version: latest.version, tunerName: actor.name, revised },
      { actor: { userId: actor.id, label: actor.name } },
    );
    return { version: latest.version, revised, mail };
  });
  kickOutbox();
  return { version, revised, mail };
}

function acknowledgementCodes(output: unknown): string[] {
  const warnings =
    (output as { warnings?: { code: string; requiresAcknowledgement?: boolean }[] } | null)?.warnings ?? [];
  return [...new Set(warnings.filter((w) => w.requiresAcknowledgement).map((w) => w.code))];
}

function criticalCodes(output: unknown): string[] {
  const warnings = (output as { warnings?: { code: string; severity: string }[] } | null)?.warnings ?? [];
  return warnings.filter((w) => w.severity === "critical").map((w) => w.code);
}
