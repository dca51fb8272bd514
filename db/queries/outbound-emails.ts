import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outboundEmails } from "@/db/schema";

/** Every e-mail sent (or tried) about a request, oldest first: the request page shows the trail. */
export async function listOutboundEmailsForRequest(requestId: string) {
  const db = await getDb();
  return db
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
    .where(eq(outboundEmails.requestId, requestId))
    .orderBy(asc(outboundEmails.createdAt), asc(outboundEmails.id));
}

export type OutboundEmailRow = Awaited<ReturnType<typeof listOutboundEmailsForRequest>>[number];
