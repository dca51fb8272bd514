// Checks a send request the way the resend API does and answers with its error shape
// ({ statusCode, message, name }, see ErrorResponse in node_modules/resend/dist/index.d.mts).
import type { NewEmail, StoredAttachment } from "./store";

export interface ApiError {
  statusCode: number;
  name:
    | "missing_required_field"
    | "validation_error"
    | "invalid_attachment"
    | "missing_api_key"
    | "not_found"
    | "method_not_allowed";
  message: string;
}

type Result = { ok: true; email: NewEmail } | { ok: false; error: ApiError };

const BARE = /^[^\s@<>",;]+@[^\s@<>",;]+\.[^\s@<>",;]+$/;
const NAMED = /^[^<>]*<([^<>]+)>$/;
const TAG = /^[A-Za-z0-9_-]{1,256}$/;
const BASE64 = /^[A-Za-z0-9+/]*={0,2}$/;
const MAX_RECIPIENTS = 50;

const missing = (field: string): ApiError => ({
  statusCode: 422,
  name: "missing_required_field",
  message: `Missing \`${field}\` field.`,
});
const invalid = (field: string, why: string): ApiError => ({
  statusCode: 422,
  name: "validation_error",
  message: `Invalid \`${field}\` field. ${why}`,
});

export function isAddress(value: string): boolean {
  const named = NAMED.exec(value.trim());
  return BARE.test(named?.[1]?.trim() ?? value.trim());
}

const ADDRESS_HINT = "Use `rider@example.test` or `Name <rider@example.test>`.";

function addressList(body: Record<string, unknown>, field: string, required: boolean): string[] | null | ApiError {
  const raw = body[field];
  if (raw === undefined || raw === null || raw === "" || (Array.isArray(raw) && raw.length === 0)) {
    return required ? missing(field) : null;
  }
  const list = Array.isArray(raw) ? raw : [raw];
  if (list.length > MAX_RECIPIENTS) return invalid(field, `At most ${MAX_RECIPIENTS} addresses.`);
  for (const item of list) {
    if (typeof item !== "string" || !isAddress(item)) return invalid(field, ADDRESS_HINT);
  }
  return list as string[];
}

const isError = (v: unknown): v is ApiError => typeof v === "object" && v !== null && "statusCode" in v && "name" in v;

function attachments(raw: unknown): StoredAttachment[] | ApiError {
  if (raw === undefined || raw === null) return [];
  if (!Array.isArray(raw)) return invalid("attachments", "Must be an array.");
  const out: StoredAttachment[] = [];
  for (const [i, a] of raw.entries()) {
    const field = `attachments[${i}]`;
    if (typeof a !== "object" || a === null) return invalid(field, "Must be an object.");
    const att = a as Record<string, unknown>;
    const content = typeof att.content === "string" ? att.content.replace(/\s+/g, "") : undefined;
    const remote = typeof att.path === "string" && att.path !== "" ? att.path : undefined;
    if (content === undefined && !remote) return missing(`${field}.content`);
    if (content !== undefined && (!BASE64.test(content) || content.length % 4 !== 0)) {
      return {
        statusCode: 422,
        name: "invalid_attachment",
        message: `Invalid \`${field}.content\` field. Must be base64.`,
      };
    }
    if (content !== undefined && (typeof att.filename !== "string" || att.filename === "")) {
      return missing(`${field}.filename`);
    }
    out.push({
      filename: typeof att.filename === "string" ? att.filename : null,
      content_type: typeof att.content_type === "string" ? att.content_type : null,
      content_id: typeof att.content_id === "string" ? att.content_id : null,
      path: remote ?? null,
      size: content ? Buffer.from(content, "base64").length : 0,
      content: content ?? null,
    });
  }
  return out;
}

/** Validates one e-mail of POST /emails (or one item of POST /emails/batch, `prefix` "[3].") */
export function validateEmail(body: unknown, prefix = ""): Result {
  const fail = (error: ApiError): Result => ({
    ok: false,
    error: { ...error, message: error.message.replace(/`([^`]+)`/, (_m, f: string) => `\`${prefix}${f}\``) },
  });
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    return fail({ statusCode: 422, name: "validation_error", message: "The request body must be a JSON object." });
  }
  const b = body as Record<string, unknown>;
  if (b.template !== undefined && b.template !== null) {
    return fail(invalid("template", "Hosted templates are not supported by the local mail fake; send html or text."));
  }
  if (typeof b.from !== "string" || b.from.trim() === "") return fail(missing("from"));
  if (!isAddress(b.from)) return fail(invalid("from", ADDRESS_HINT));
  const to = addressList(b, "to", true);
  if (isError(to)) return fail(to);
  if (typeof b.subject !== "string" || b.subject.trim() === "") return fail(missing("subject"));
  const html = typeof b.html === "string" && b.html !== "" ? b.html : null;
  const text = typeof b.text === "string" && b.text !== "" ? b.text : null;
  if (html === null && text === null) return fail(missing("html` or `text"));
  const cc = addressList(b, "cc", false);
  if (isError(cc)) return fail(cc);
  const bcc = addressList(b, "bcc", false);
  if (isError(bcc)) return fail(bcc);
  const replyTo = addressList(b, "reply_to", false);
  if (isError(replyTo)) return fail(replyTo);

  let headers: Record<string, string> | null = null;
  if (b.headers !== undefined && b.headers !== null) {
    if (typeof b.headers !== "object" || Array.isArray(b.headers))
      return fail(invalid("headers", "Must be an object."));
    headers = {};
    for (const [k, v] of Object.entries(b.headers)) {
      if (typeof v !== "string") return fail(invalid(`headers.${k}`, "Header values must be strings."));
      headers[k] = v;
    }
  }
  let tags: { name: string; value: string }[] | null = null;
  if (b.tags !== undefined && b.tags !== null) {
    if (!Array.isArray(b.tags)) return fail(invalid("tags", "Must be an array."));
    tags = [];
    for (const [i, t] of b.tags.entries()) {
      const tag = (t ?? {}) as Record<string, unknown>;
      for (const key of ["name", "value"] as const) {
        const v = tag[key];
        if (typeof v !== "string" || !TAG.test(v)) {
          return fail(invalid(`tags[${i}].${key}`, "Only ASCII letters, digits, underscores and dashes (1-256)."));
        }
      }
      tags.push({ name: tag.name as string, value: tag.value as string });
    }
  }
  const atts = attachments(b.attachments);
  if (isError(atts)) return fail(atts);

  return {
    ok: true,
    email: {
      from: b.from,
      to: to ?? [],
      cc,
      bcc,
      reply_to: replyTo,
      subject: b.subject,
      html,
      text,
      headers,
      tags,
      attachments: atts,
      scheduled_at: typeof b.scheduled_at === "string" ? b.scheduled_at : null,
      idempotency_key: null,
    },
  };
}
