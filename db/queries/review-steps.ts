// The rows the tuner's workflow steps write, each inside the caller's transaction. Guarded updates
// (`… where status = current`) report whether they matched, so a race shows as `false`, not as a
// second approval; what a mismatch means is the service's business (lib/review/workflow.ts).
import { and, eq, inArray } from "drizzle-orm";
import { recommendationVersions, requestMessages, setupRequests, type RequestStatus } from "@/db/schema";
import type { Tx } from "./transaction";

/** Locks the request row for this transaction; null when there is none. */
export async function lockRequest(tx: Tx, requestId: string) {
  const [row] = await tx
    .select({ id: setupRequests.id, status: setupRequests.status, assignedTunerId: setupRequests.assignedTunerId })
    .from(setupRequests)
    .where(eq(setupRequests.id, requestId))
    .for("update");
  return row ?? null;
}

/** Sets the status to `to` only if it is still `current` and one of `from`; false when it was not. */
export async function moveStatusIf(
  tx: Tx,
  requestId: string,
  current: RequestStatus,
  from: readonly RequestStatus[],
  to: RequestStatus,
  extra: Partial<typeof setupRequests.$inferInsert> = {},
): Promise<boolean> {
  const updated = await tx
    .update(setupRequests)
    .set({ status: to, updatedAt: new Date(), ...extra })
    .where(
      and(eq(setupRequests.id, requestId), eq(setupRequests.status, current), inArray(setupRequests.status, [...from])),
    )
    .returning({ id: setupRequests.id });
  return updated.length > 0;
}

export async function insertTunerMessage(tx: Tx, requestId: string, authorUserId: string, body: string) {
  await tx.insert(requestMessages).values({ requestId, author: "tuner", authorUserId, body });
}

export async function setAssignedTuner(tx: Tx, requestId: string, tunerId: string | null) {
  await tx
    .update(setupRequests)
    .set({ assignedTunerId: tunerId, updatedAt: new Date() })
    .where(eq(setupRequests.id, requestId));
}

/** Approved versions of the request become superseded; returns their numbers. */
export async function supersedeApproved(tx: Tx, requestId: string): Promise<number[]> {
  const rows = await tx
    .update(recommendationVersions)
    .set({ state: "superseded", updatedAt: new Date() })
    .where(and(eq(recommendationVersions.requestId, requestId), eq(recommendationVersions.state, "approved")))
    .returning({ version: recommendationVersions.version });
  return rows.map((r) => r.version);
}

/** Freezes a draft as approved by `approverId`; false when it was no longer a draft. */
export async function approveDraftVersion(tx: Tx, versionId: string, approverId: string): Promise<boolean> {
  const now = new Date();
  const rows = await tx
    .update(recommendationVersions)
    .set({ state: "approved", approvedById: approverId, approvedAt: now, updatedAt: now })
    .where(and(eq(recommendationVersions.id, versionId), eq(recommendationVersions.state, "draft")))
    .returning({ id: recommendationVersions.id });
  return rows.length > 0;
}

type VersionInsert = typeof recommendationVersions.$inferInsert;

export async function updateDraftVersion(
  tx: Tx,
  versionId: string,
  values: Pick<VersionInsert, "output" | "overrides" | "notesForRider" | "internalNotes" | "engineVersion">,
) {
  await tx
    .update(recommendationVersions)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(recommendationVersions.id, versionId));
}

export async function insertVersion(tx: Tx, values: VersionInsert) {
  await tx.insert(recommendationVersions).values(values);
}
