// Every e-mail a rider gets about a request goes through here: it mints a fresh private status link,
// renders the template and queues it in the outbox (lib/mail/outbox.ts) IN THE CALLER'S TRANSACTION,
// so the e-mail exists exactly when the change it reports was committed. The worker sends it after
// the commit and writes the email.sent / email.failed audit event in the actor's name; a failed send
// never undoes the business step that caused it.
import type { Executor } from "@/db/client";
import { findRiderEmailContext } from "@/db/queries/notices";
import { FALLBACK_SHOP_NAME } from "@/db/queries/settings";
import { createStatusLink } from "@/db/queries/status-links";
import { appBaseUrl } from "@/lib/env";
import { queueTemplateEmail, type QueuedMail } from "@/lib/mail";
import { sheetPath, statusPath } from "@/lib/requests/token";

export type RiderNotice =
  | { kind: "request-received" }
  | { kind: "tuner-question"; question: string; tunerName: string }
  | { kind: "request-declined"; reason: string }
  | { kind: "sheet-ready"; version: number; tunerName: string; revised: boolean };

export interface NotifyOptions {
  /** Reuse the token just created with the request, instead of minting another. */
  statusToken?: string;
  /** Who caused the e-mail, for the audit trail. */
  actor?: { userId: string | null; label: string };
}

/** Queues the rider's e-mail in `tx`; the caller calls kickOutbox() once the transaction committed. */
export async function notifyRider(
  tx: Executor,
  requestId: string,
  notice: RiderNotice,
  options: NotifyOptions = {},
): Promise<QueuedMail> {
  const request = await findRiderEmailContext(tx, requestId, notice.kind);
  if (!request) throw new Error(`notifyRider: no request ${requestId}`);

  const token = options.statusToken ?? (await createStatusLink(requestId, tx));
  const base = appBaseUrl();
  const statusUrl = `${base}${statusPath(token)}`;
  const common = {
    // The shop's own heading and opening paragraph for this e-mail, when the owner wrote some.
    wording: request.wording,
    shopName: request.shopName ?? FALLBACK_SHOP_NAME,
    riderName: request.riderName,
    requestNumber: request.number,
    statusUrl,
  };
  const envelope = { to: request.riderEmail, requestId };
  const audit = { audit: { actorUserId: options.actor?.userId ?? null, actorLabel: options.actor?.label ?? "system" } };

  switch (notice.kind) {
    case "request-received":
      return queueTemplateEmail(tx, "request-received", { ...common, bikeLabel: request.bikeLabel }, envelope, audit);
    case "tuner-question":
      return queueTemplateEmail(
        tx,
        "tuner-question",
        { ...common, question: notice.question, tunerName: notice.tunerName },
        envelope,
        audit,
      );
    case "request-declined":
      return queueTemplateEmail(tx, "request-declined", { ...common, reason: notice.reason }, envelope, audit);
    case "sheet-ready":
      return queueTemplateEmail(
        tx,
        "sheet-ready",
        {
          ...common,
          version: notice.version,
          tunerName: notice.tunerName,
          revised: notice.revised,
          sheetUrl: `${base}${sheetPath(requestId, notice.version, token)}`,
        },
        envelope,
        audit,
      );
  }
}
