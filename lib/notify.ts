// Every e-mail a rider gets about a request goes through here: it mints a fresh private status link,
// renders the template, sends it through lib/mail (recorded in outbound_emails, retried with
// backoff) and writes the audit event. A failed send never undoes the business step that caused it.
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { getShopName } from "@/db/queries/settings";
import { createStatusLink } from "@/db/queries/status-links";
import { setupRequests } from "@/db/schema";
import { appBaseUrl } from "@/lib/env";
import { sendTemplateEmail, type SendMailOptions, type SendMailResult } from "@/lib/mail";
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
  mail?: SendMailOptions;
}

export async function notifyRider(
  requestId: string,
  notice: RiderNotice,
  options: NotifyOptions = {},
): Promise<SendMailResult> {
  const db = await getDb();
  const [request] = await db
    .select({
      number: setupRequests.number,
      riderName: setupRequests.riderName,
      riderEmail: setupRequests.riderEmail,
      bikeLabel: setupRequests.bikeLabel,
    })
    .from(setupRequests)
    .where(eq(setupRequests.id, requestId));
  if (!request) throw new Error(`notifyRider: no request ${requestId}`);

  const token = options.statusToken ?? (await createStatusLink(requestId));
  const base = appBaseUrl();
  const statusUrl = `${base}${statusPath(token)}`;
  const common = {
    shopName: await getShopName(),
    riderName: request.riderName,
    requestNumber: request.number,
    statusUrl,
  };
  const envelope = { to: request.riderEmail, requestId };

  let result: SendMailResult;
  switch (notice.kind) {
    case "request-received":
      result = await sendTemplateEmail("request-received", { ...common, bikeLabel: request.bikeLabel }, envelope, options.mail);
      break;
    case "tuner-question":
      result = await sendTemplateEmail(
        "tuner-question",
        { ...common, question: notice.question, tunerName: notice.tunerName },
        envelope,
        options.mail,
      );
      break;
    case "request-declined":
      result = await sendTemplateEmail("request-declined", { ...common, reason: notice.reason }, envelope, options.mail);
      break;
    case "sheet-ready":
      result = await sendTemplateEmail(
        "sheet-ready",
        {
          ...common,
          version: notice.version,
          tunerName: notice.tunerName,
          revised: notice.revised,
          sheetUrl: `${base}${sheetPath(requestId, notice.version, token)}`,
        },
        envelope,
        options.mail,
      );
      break;
  }

  await recordAudit({
    requestId,
    actorUserId: options.actor?.userId ?? null,
    actorLabel: options.actor?.label ?? "system",
    action: result.status === "sent" ? "email.sent" : "email.failed",
    detail: {
      template: notice.kind,
      to: request.riderEmail,
      outboundEmailId: result.outboundEmailId,
      attempts: result.attempts,
      ...(result.status === "failed" ? { error: result.error } : {}),
    },
  });
  return result;
}
