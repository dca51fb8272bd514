// One delivery attempt of a queued message through the resend SDK (pointed at the mail fake in
// development and tests), and the input checks every queued message passes first.
import { Resend } from "resend";
import { z } from "zod";
import { getEnv, mailBaseUrl } from "@/lib/env";

export const mailAttachmentSchema = z.object({
  filename: z.string().trim().min(1, "needs a file name"),
  content: z.union([z.instanceof(Uint8Array), z.string().min(1, "must not be empty")]),
  contentType: z.string().trim().min(3).optional(),
});

export const sendMailInputSchema = z.object({
  template: z.string().trim().min(1, "names the template").max(100),
  to: z.email("must be an e-mail address"),
  subject: z
    .string()
    .trim()
    .min(1, "must not be empty")
    .max(998)
    .regex(/^[^\r\n]*$/, "must be one line"),
  html: z.string().min(1, "must not be empty"),
  text: z.string().min(1, "must not be empty"),
  requestId: z.uuid("must be a setup request id").optional(),
  replyTo: z.email("must be an e-mail address").optional(),
  attachments: z.array(mailAttachmentSchema).max(10).optional(),
});

export type SendMailInput = z.input<typeof sendMailInputSchema>;

/** Bad input is a programming error: thrown at once, naming the field, before anything is recorded. */
export class MailInputError extends Error {
  constructor(
    readonly field: string,
    detail: string,
  ) {
    super(`queueMail: ${field} ${detail}`);
    this.name = "MailInputError";
  }
}

export function parseMailInput(input: SendMailInput) {
  const parsed = sendMailInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new MailInputError(issue?.path.join(".") || "input", issue?.message ?? "is invalid");
  }
  return parsed.data;
}

export interface DeliveryMessage {
  template: string;
  to: string;
  subject: string;
  html: string;
  text: string;
  replyTo?: string | null;
  attachments?: { filename: string; contentBase64: string; contentType?: string }[] | null;
  idempotencyKey: string;
}

export type DeliveryOutcome =
  { ok: true; providerMessageId: string } | { ok: false; error: string; retryable: boolean };

// Rate limits, server errors and network failures (statusCode null in the SDK) can pass on a later
// try; a rejected request (401, 403, 422) fails the same way every time.
function describeError(error: { name?: string; message?: string; statusCode?: number | null }): DeliveryOutcome {
  const status = error.statusCode ?? null;
  return {
    ok: false,
    error: `${error.name ?? "error"}${status ? ` (${status})` : ""}: ${error.message ?? "no message"}`,
    retryable: status === null || status === 429 || status >= 500,
  };
}

/** One POST /emails; never throws. */
export async function deliverMessage(message: DeliveryMessage): Promise<DeliveryOutcome> {
  const env = getEnv();
  const resend = new Resend(env.RESEND_API_KEY, { baseUrl: mailBaseUrl().replace(/\/+$/, "") });
  try {
    const { data, error } = await resend.emails.send(
      {
        from: env.MAIL_FROM,
        to: message.to,
        subject: message.subject,
        html: message.html,
        text: message.text,
        replyTo: message.replyTo ?? undefined,
        attachments: message.attachments?.map((a) => ({
          filename: a.filename,
          content: a.contentBase64,
          contentType: a.contentType,
        })),
        tags: [{ name: "template", value: message.template.replace(/[^A-Za-z0-9_-]/g, "_") }],
      },
      // The same key on every attempt: if an answer is lost and we try again, the provider sends
      // once (resend keeps keys for 24 hours; see its "Idempotency Keys" documentation).
      { idempotencyKey: message.idempotencyKey },
    );
    if (data) return { ok: true, providerMessageId: data.id };
    return describeError(error ?? {});
  } catch (thrown) {
    return { ok: false, error: thrown instanceof Error ? thrown.message : String(thrown), retryable: true };
  }
}
