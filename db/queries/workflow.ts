// The tuner's workflow steps on a request. Each runs in one transaction: the request row is locked,
// the status change is a guarded `update … where status in (allowed)` (so a race cannot approve
// twice), and the audit events are written in the same transaction. Rider e-mails go out after the
// commit through notifyRider (which records and audits them and never throws on a failed send).
import { and, eq, inArray } from "drizzle-orm";
import { getDb, type AppDb } from "@/db/client";
import { recommendationVersions, requestMessages, setupRequests, type RequestStatus } from "@/db/schema";
import { ConflictError, NotFoundError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/guard";
import { notifyRider } from "@/lib/notify";
import { ALLOWED_FROM, conflictMessage, type WorkflowAction } from "@/lib/review/transitions";
import { recordAudit, type AuditInsert } from "./audit";
import { getLatestVersion, hasEarlierApproval } from "./versions";

export type Tx = Parameters<Parameters<AppDb["transaction"]>[0]>[0];
export type Actor = Pick<SessionUser, "id" | "name">;

/** Locks the request row for this transaction; 404 if there is none. */
export async function lockRequest(tx: Tx, requestId: string) {
  const [row] = await tx
    .select({ id: setupRequests.id, status: setupRequests.status, assignedTunerId: setupRequests.assignedTunerId })
    .from(setupRequests)
    .where(eq(setupRequests.id, requestId))
    .for("update");
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
  extra: Partial<typeof setupRequests.$inferInsert> = {},
): Promise<AuditInsert[]> {
  const updated = await tx
    .update(setupRequests)
    .set({ status: to, updatedAt: new Date(), ...extra })
    .where(and(eq(setupRequests.id, requestId), eq(setupRequests.status, current), inArray(setupRequests.status, [...from])))
    .returning({ id: setupRequests.id });
  if (updated.length === 0) throw new ConflictError("The request changed meanwhile. Reload and try again.");
  return current === to ? [] : [auditBy(actor, requestId, "request.status_changed", { from: current, to })];
}

/** A tuner opened a new request: it is now being reviewed. No-op for any other status. */
export async function startReview(requestId: string, actor: Actor): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    if (req.status !== "submitted") return;
    await recordAudit(await moveStatus(tx, requestId, "submitted", ["submitted"], "in_review", actor), tx);
  });
}

export async function askRider(requestId: string, question: string, actor: Actor) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("ask", req.status);
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.ask, "waiting_for_rider", actor);
    await tx.insert(requestMessages).values({ requestId, author: "tuner", authorUserId: actor.id, body: question });
    events.push(auditBy(actor, requestId, "request.question_asked", { question }));
    await recordAudit(events, tx);
  });
  return notifyRider(requestId, { kind: "tuner-question", question, tunerName: actor.name }, { actor: { userId: actor.id, label: actor.name } });
}

export async function declineRequest(requestId: string, reason: string, actor: Actor) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("decline", req.status);
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.decline, "declined", actor, { declineReason: reason });
    events.push(auditBy(actor, requestId, "request.declined", { reason }));
    await recordAudit(events, tx);
  });
  return notifyRider(requestId, { kind: "request-declined", reason }, { actor: { userId: actor.id, label: actor.name } });
}

export async function assignRequest(requestId: string, tuner: { id: string; name: string } | null, actor: Actor) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("assign", req.status);
    const events: AuditInsert[] = [];
    await tx
      .update(setupRequests)
      .set({ assignedTunerId: tuner?.id ?? null, updatedAt: new Date() })
      .where(eq(setupRequests.id, requestId));
    events.push(auditBy(actor, requestId, "request.assigned", { from: req.assignedTunerId, to: tuner?.id ?? null, toName: tuner?.name ?? null }));
    if (req.status === "submitted") events.push(...(await moveStatus(tx, requestId, "submitted", ["submitted"], "in_review", actor)));
    await recordAudit(events, tx);
  });
}

/**
 * Freezes the current draft: earlier approved versions become superseded, the request is approved,
 * and the rider gets the sheet link (the PDF is rendered on demand by the sheet route).
 */
export async function approveRecommendation(requestId: string, actor: Actor, expectedVersion?: number) {
  const db = await getDb();
  const { version, revised } = await db.transaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("approve", req.status);
    const latest = await getLatestVersion(requestId, tx);
    if (!latest) throw new ConflictError("There is no recommendation to approve yet.");
    if (latest.state !== "draft")
      throw new ConflictError(`Version ${latest.version} is already approved. Save a revision first, then approve it.`);
    if (expectedVersion !== undefined && expectedVersion !== latest.version)
      throw new ConflictError(`Version ${latest.version} is the current draft now, not ${expectedVersion}. Reload to see it.`);
    const revised = await hasEarlierApproval(requestId, latest.version, tx);
    const superseded = await tx
      .update(recommendationVersions)
      .set({ state: "superseded", updatedAt: new Date() })
      .where(and(eq(recommendationVersions.requestId, requestId), eq(recommendationVersions.state, "approved")))
      .returning({ version: recommendationVersions.version });
    const now = new Date();
    const frozen = await tx
      .update(recommendationVersions)
      .set({ state: "approved", approvedById: actor.id, approvedAt: now, updatedAt: now })
      .where(and(eq(recommendationVersions.id, latest.id), eq(recommendationVersions.state, "draft")))
      .returning({ id: recommendationVersions.id });
    if (frozen.length === 0) throw new ConflictError("This version was approved meanwhile. Reload the request.");
    const events = await moveStatus(tx, requestId, req.status, ALLOWED_FROM.approve, "approved", actor);
    events.push(
      auditBy(actor, requestId, "recommendation.approved", {
        version: latest.version,
        superseded: superseded.map((s) => s.version),
        // Approving over a critical warning is the tuner's call (the screen asks to confirm); keep it on record.
        criticalWarnings: criticalCodes(latest.output),
      }),
    );
    await recordAudit(events, tx);
    return { version: latest.version, revised };
  });
  const mail = await notifyRider(
    requestId,
    { kind: "sheet-ready", version, tunerName: actor.name, revised },
    { actor: { userId: actor.id, label: actor.name } },
  );
  return { version, revised, mail };
}

function criticalCodes(output: unknown): string[] {
  const warnings = (output as { warnings?: { code: string; severity: string }[] } | null)?.warnings ?? [];
  return warnings.filter((w) => w.severity === "critical").map((w) => w.code);
}
