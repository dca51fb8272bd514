// Which workflow step may start from which request status. The server checks these inside the
// transaction with a guarded `where status in (...)` update, so two tuners racing cannot both win.
import type { RequestStatus } from "@/db/schema";
import { STATUS_LABELS } from "@/lib/requests/status";

export type WorkflowAction = "save" | "ask" | "decline" | "approve" | "assign";

export const ALLOWED_FROM: Record<WorkflowAction, readonly RequestStatus[]> = {
  // Saving on an approved request is a revision: it creates the next version as a draft.
  save: ["submitted", "in_review", "waiting_for_rider", "approved"],
  ask: ["submitted", "in_review", "waiting_for_rider"],
  decline: ["submitted", "in_review", "waiting_for_rider"],
  // Approved only when a revision (a newer draft) exists; checked on the version, not the status.
  approve: ["submitted", "in_review", "waiting_for_rider", "approved"],
  assign: ["submitted", "in_review", "waiting_for_rider", "approved", "declined"],
};

const WHY: Partial<Record<WorkflowAction, Partial<Record<RequestStatus, string>>>> = {
  save: { declined: "This request was declined; it can no longer be changed." },
  ask: {
    approved: "This request is approved. Save a revision first, then ask the rider.",
    declined: "This request was declined; the rider can no longer be asked.",
  },
  decline: {
    approved: "This request is approved and cannot be declined.",
    declined: "This request is already declined.",
  },
  approve: { declined: "This request was declined and cannot be approved." },
};

export function canStart(action: WorkflowAction, status: RequestStatus): boolean {
  return ALLOWED_FROM[action].includes(status);
}

/** The 409 message for a step that may not start from this status. */
export function conflictMessage(action: WorkflowAction, status: RequestStatus): string {
  return WHY[action]?.[status] ?? `Not possible while the request is “${STATUS_LABELS[status]}”.`;
}
