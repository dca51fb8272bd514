// Telling the shop: every event staff should act on (a new request, a rider's answer, a sag report,
// a payment) is one call of notifyStaff in the event's own transaction. It records a notice (the
// counts on the workspace navigation and the marks in the queue, db/tables/notices.ts) and queues an
// e-mail through the outbox (lib/mail) to the assigned tuner, or to the shop's address when nobody
// is assigned (or the assigned account is deactivated). Both commit or roll back with the event;
// the caller calls kickOutbox() after the commit. See docs/architecture.md, "Telling the shop".
import type { Executor } from "@/db/client";
import { findNoticeRecipient, insertStaffNotice } from "@/db/queries/notices";
import type { StaffNoticeKind } from "@/db/schema";
import { END_LABELS, SAG_VERDICT_LABELS } from "@/lib/labels";
import { appBaseUrl } from "@/lib/env";
import { queueTemplateEmail, type QueuedMail } from "@/lib/mail";
import type { SagVerdict } from "@/lib/sizing";

export type StaffEvent =
  | { kind: "new-request"; requestId: string }
  | { kind: "rider-answered"; requestId: string }
  | { kind: "sag-reported"; requestId: string; verdict: Partial<Record<"front" | "rear", SagVerdict>> }
  /** `summary`: the payment in words, as the caller formats money ("Deposit of 120.00 EUR paid"). */
  | { kind: "payment-received"; requestId: string; summary: string; amountMinor?: number; currency?: string };

export interface StaffNoticeQueued {
  noticeId: string;
  to: string;
  /** null when the shop has no address yet and nobody is assigned: the notice still shows in the workspace. */
  mail: QueuedMail | null;
}

function summaryOf(event: StaffEvent): string | null {
  switch (event.kind) {
    case "sag-reported": {
      const parts = (["rear", "front"] as const)
        .filter((end) => event.verdict[end])
        .map((end) => `${END_LABELS[end]}: ${SAG_VERDICT_LABELS[event.verdict[end]!.verdict].toLowerCase()}.`);
      return parts.length ? parts.join(" ") : null;
    }
    case "payment-received":
      return event.summary;
    default:
      return null;
  }
}

/** Records the notice and queues the e-mail in `tx`; kickOutbox() after the commit sends it. */
export async function notifyStaff(tx: Executor, event: StaffEvent): Promise<StaffNoticeQueued> {
  const found = await findNoticeRecipient(tx, event.requestId);
  if (!found) throw new Error(`notifyStaff: no request ${event.requestId}`);
  const tuner = found.tunerEmail && !found.tunerBanned ? { email: found.tunerEmail, name: found.tunerName } : null;
  const to = tuner?.email ?? found.shopEmail;
  // The shop's address is required in settings and the seed sets it; without one the notice still
  // shows in the workspace, and the e-mail goes nowhere rather than failing the rider's step.
  const summary = summaryOf(event);
  const detail: Record<string, string | number | null> = { summary };
  if (event.kind === "payment-received") {
    detail.amountMinor = event.amountMinor ?? null;
    detail.currency = event.currency ?? null;
  }
  const notice = await insertStaffNotice(tx, {
    requestId: event.requestId,
    kind: event.kind satisfies StaffNoticeKind,
    toAddress: to ?? "",
    detail,
  });
  if (!to) return { noticeId: notice.id, to: "", mail: null };
  const mail = await queueTemplateEmail(
    tx,
    "staff-notice",
    {
      kind: event.kind,
      shopName: found.shopName ?? "Your suspension shop",
      requestNumber: found.number,
      riderName: found.riderName,
      bikeLabel: found.bikeLabel,
      tunerName: tuner?.name ?? null,
      summary,
      url: `${appBaseUrl()}/shop/requests/${event.requestId}`,
    },
    { to, requestId: event.requestId },
    { audit: { actorUserId: null, actorLabel: "system" } },
  );
  return { noticeId: notice.id, to, mail };
}
