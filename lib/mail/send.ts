// Sends one e-mail through the resend SDK and records it in outbound_emails: 'queued' first, then
// 'sent' (provider id, time) or 'failed' (attempts, last error). Transient failures are retried with
// exponential backoff; a send failure is returned as an outcome, never thrown into the business flow.
import { eq } from "drizzle-orm";
import { Resend } from "resend";
import { z } from "zod";
import { getDb } from "@/db/client";
import { outboundEmails } from "@/db/schema";
import { getEnv, mailBaseUrl } from "@/lib/env";

export const mailAttachmentSchema = z.object({
  filename: z.string().trim().min(1, "needs a file name"),
  content: z.union([z.instanceof(Uint8Array), z.string().min(1, "must not be empty")]),
  contentType: z.string().trim().min(3).optional(),
});

export const sendMailInputSchema = z.object({
  template: z.string().trim().min(1, "names the template").max(100),
  to: z.email("must be an e-mail address"),
  subject: z.string().trim().min(1, "must not be empty").max(998).regex(/^[^\r\n]*$/, "must be one line"),
  html: z.string().min(1, "must not be empty"),
  text: z.string().min(1, "must not be empty"),
  requestId: z.uuid("must be a setup request id").optional(),
  replyTo: z.email("must be an e-mail address").optional(),
  attachments: z.array(mailAttachmentSchema).max(10).optional(),
});

export type SendMailInput = z.input<typeof sendMailInputSchema>;

export interface SendMailOptions {
  /** Total tries, first one included. */
  maxAttempts?: number;
  /** Wait before the 2nd try; doubles before each later one. */
  baseDelayMs?: number;
  /** Injected in tests to skip (and record) the waits. */
  sleep?: (ms: number) => Promise<void>;
}

export type SendMailResult =
  | { status: "sent"; outboundEmailId: string; providerMessageId: string; attempts: number }
  | { status: "failed"; outboundEmailId: string; attempts: number; error: string };

/** Bad input is a programming error: thrown at once, naming the field, before anything is recorded. */
export class MailInputError extends Error {
  constructor(
    readonly field: string,
    detail: string,
  ) {
    super(`sendMail: ${field} ${detail}`);
    this.name = "MailInputError";
  }
}

export const DEFAULT_MAX_ATTEMPTS = 3;
export const DEFAULT_BASE_DELAY_MS = 1000;

const sleepFor = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

interface AttemptError {
  message: string;
  retryable: boolean;
}

// Rate limits, server errors and network failures (statusCode null in the SDK) can pass on a later
// try; a rejected request (401, 403, 422) fails the same way every time.
function describeError(error: { name?: string; message?: string; statusCode?: number | null }): AttemptError {
  const status = error.statusCode ?? null;
  return {
    message: `${error.name ?? "error"}${status ? ` (${status})` : ""}: ${error.message ?? "no message"}`,
    retryable: status === null || status === 429 || status >= 500,
  };
}

export async function sendMail(input: SendMailInput, options: SendMailOptions = {}): Promise<SendMailResult> {
  const parsed = sendMailInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new MailInputError(issue?.path.join(".") || "input", issue?.message ?? "is invalid");
  }
  const mail = parsed.data;
  const maxAttempts = Math.max(1, options.maxAttempts ?? DEFAULT_MAX_ATTEMPTS);
  const baseDelayMs = options.baseDelayMs ?? DEFAULT_BASE_DELAY_MS;
  const sleep = options.sleep ?? sleepFor;

  const db = await getDb();
  const [row] = await db
    .insert(outboundEmails)
    .values({ requestId: mail.requestId ?? null, template: mail.template, toAddress: mail.to, subject: mail.subject, status: "queued" })
    .returning({ id: outboundEmails.id });
  if (!row) throw new Error("sendMail: the outbound e-mail row was not created");

  const env = getEnv();
  const resend = new Resend(env.RESEND_API_KEY, { baseUrl: mailBaseUrl().replace(/\/+$/, "") });
  let last: AttemptError = { message: "not attempted", retryable: false };
  let attempts = 0;

  while (attempts < maxAttempts) {
    if (attempts > 0) await sleep(baseDelayMs * 2 ** (attempts - 1));
    attempts += 1;
    try {
      const { data, error } = await resend.emails.send(
        {
          from: env.MAIL_FROM,
          to: mail.to,
          subject: mail.subject,
          html: mail.html,
          text: mail.text,
          replyTo: mail.replyTo,
          attachments: mail.attachments,
          tags: [{ name: "template", value: mail.template.replace(/[^A-Za-z0-9_-]/g, "_") }],
        },
        // One key per outbound row: if a response is lost and we retry, the provider sends once.
        { idempotencyKey: `sagwise-outbound-${row.id}` },
      );
      if (data) {
        await db
          .update(outboundEmails)
          .set({ status: "sent", providerMessageId: data.id, attempts, lastError: null, sentAt: new Date() })
          .where(eq(outboundEmails.id, row.id));
        return { status: "sent", outboundEmailId: row.id, providerMessageId: data.id, attempts };
      }
      last = describeError(error ?? {});
    } catch (thrown) {
      last = { message: thrown instanceof Error ? thrown.message : String(thrown), retryable: true };
    }
    // Recorded after every try, so a crash between tries still leaves the trail.
    await db.update(outboundEmails).set({ attempts, lastError: last.message }).where(eq(outboundEmails.id, row.id));
    if (!last.retryable) break;
  }

  await db.update(outboundEmails).set({ status: "failed", attempts, lastError: last.message }).where(eq(outboundEmails.id, row.id));
  console.warn(`[mail] ${mail.template} e-mail ${row.id} failed after ${attempts} attempt(s): ${last.message}`);
  return { status: "failed", outboundEmailId: row.id, attempts, error: last.message };
}
