// Local stand-in for the resend e-mail API: the SDK's send call (POST /emails, POST /emails/batch)
// with the same request and response shapes, every message kept on disk, and an outbox viewer.
// Run alone with `tsx fakes/mail/server.ts`; tests call startMailFake({ port: 0, dir }).
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { createMailStore, type MailStore, type StoredEmail } from "./store";
import { validateEmail, type ApiError } from "./validate";
import { inboxPage, messagePage, notFoundPage } from "./views";

// The real API takes up to 40 MB of attachments per message; base64 and JSON add a third.
const MAX_BODY_BYTES = 60 * 1024 * 1024;
const MAX_BATCH = 100;
const PAGE_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data: http: https:; form-action 'self'; base-uri 'none'; frame-ancestors 'none'";

export interface MailFakeOptions {
  port?: number;
  dir?: string;
  host?: string;
}

export interface MailFake {
  url: string;
  port: number;
  dir: string;
  close(): Promise<void>;
}

export function defaultMailFakeDir(): string {
  return process.env.MAIL_FAKE_DIR || path.join(process.env.DATA_DIR || "./data", "mail-fake");
}

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json; charset=utf-8", "cache-control": "no-store" });
  res.end(JSON.stringify(body));
}
const sendError = (res: ServerResponse, error: ApiError) => sendJson(res, error.statusCode, error);

function sendPage(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    "content-type": "text/html; charset=utf-8",
    "content-security-policy": PAGE_CSP,
    "x-content-type-options": "nosniff",
    "referrer-policy": "no-referrer",
    "cache-control": "no-store",
  });
  res.end(html);
}

async function readBody(req: IncomingMessage): Promise<string | null> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_BODY_BYTES) return null;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

function hasBearerKey(req: IncomingMessage): boolean {
  return /^Bearer\s+\S+/i.test(req.headers.authorization ?? "");
}

/** The list omits attachment bodies (size and name stay); GET /emails/:id has everything. */
const summarize = (m: StoredEmail) => ({
  ...m,
  attachments: m.attachments.map((a) => ({
    filename: a.filename,
    content_type: a.content_type,
    content_id: a.content_id,
    path: a.path,
    size: a.size,
  })),
});

function safeFilename(name: string): { ascii: string; encoded: string } {
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base.replace(/[\u0000-\u001f\u007f"]/g, "").trim() || "attachment";
  return {
    ascii: cleaned.replace(/[^\x20-\x7e]/g, "_").replace(/[%;]/g, "_"),
    encoded: encodeURIComponent(cleaned).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`),
  };
}

async function handlePost(req: IncomingMessage, res: ServerResponse, store: MailStore, batch: boolean) {
  if (!hasBearerKey(req)) {
    return sendError(res, {
      statusCode: 401,
      name: "missing_api_key",
      message: "Missing API key in the authorization header. Send `Authorization: Bearer <key>`.",
    });
  }
  const raw = await readBody(req);
  if (raw === null)
    return sendError(res, { statusCode: 413, name: "validation_error", message: "Request body too large." });
  let body: unknown;
  try {
    body = JSON.parse(raw);
  } catch {
    return sendError(res, {
      statusCode: 422,
      name: "validation_error",
      message: "The request body is not valid JSON.",
    });
  }
  if (!batch) {
    const result = validateEmail(body);
    if (!result.ok) return sendError(res, result.error);
    const key = req.headers["idempotency-key"];
    const idempotencyKey = typeof key === "string" && key !== "" ? key : null;
    // Same key, same message: the real API answers a repeated request without sending twice.
    const earlier = idempotencyKey ? store.findByIdempotencyKey(idempotencyKey) : undefined;
    if (earlier) return sendJson(res, 200, { id: earlier.id });
    const stored = store.add({ ...result.email, idempotency_key: idempotencyKey });
    return sendJson(res, 200, { id: stored.id });
  }
  if (!Array.isArray(body)) {
    return sendError(res, {
      statusCode: 422,
      name: "validation_error",
      message: "The batch body must be a JSON array of e-mails.",
    });
  }
  if (body.length === 0 || body.length > MAX_BATCH) {
    return sendError(res, {
      statusCode: 422,
      name: "validation_error",
      message: `A batch holds 1 to ${MAX_BATCH} e-mails.`,
    });
  }
  const permissive = req.headers["x-batch-validation"] === "permissive";
  const results = body.map((item: unknown, i) => {
    const hasAttachments =
      typeof item === "object" &&
      item !== null &&
      "attachments" in item &&
      (item as { attachments?: unknown }).attachments != null;
    if (hasAttachments) {
      return {
        ok: false as const,
        error: {
          statusCode: 422,
          name: "validation_error" as const,
          message: `Invalid \`[${i}].attachments\` field. Attachments are not supported in batch sends.`,
        },
      };
    }
    return validateEmail(item, `[${i}].`);
  });
  const firstError = results.find((r) => !r.ok);
  if (firstError && !firstError.ok && !permissive) return sendError(res, firstError.error);
  const data: { id: string }[] = [];
  const errors: { index: number; message: string }[] = [];
  results.forEach((r, index) => {
    if (r.ok) data.push({ id: store.add(r.email).id });
    else errors.push({ index, message: r.error.message });
  });
  return sendJson(res, 200, permissive ? { data, errors } : { data });
}

function handleGet(url: URL, res: ServerResponse, store: MailStore) {
  const parts = url.pathname.split("/").filter(Boolean);
  const to = url.searchParams.get("to")?.trim() || undefined;
  if (parts.length === 0) return sendPage(res, 200, inboxPage(store.list({ to }), to));
  if (parts[0] === "health" && parts.length === 1) return sendJson(res, 200, { ok: true });
  if (parts[0] === "emails" && parts.length === 1) {
    return sendJson(res, 200, { object: "list", has_more: false, data: store.list({ to }).map(summarize) });
  }
  const message = parts[1] ? store.get(parts[1]) : undefined;
  if (parts[0] === "emails" && parts.length === 2) {
    return message
      ? sendJson(res, 200, message)
      : sendError(res, { statusCode: 404, name: "not_found", message: "Email not found." });
  }
  if (parts[0] === "inbox" && parts.length === 2) {
    if (!message) return sendPage(res, 404, notFoundPage());
    return sendPage(res, 200, messagePage(message, url.searchParams.get("width") === "wide" ? "wide" : "phone"));
  }
  if (parts[0] === "inbox" && parts.length === 4 && parts[2] === "attachments") {
    const attachment = message?.attachments[Number(parts[3])];
    if (!attachment || attachment.content === null) return sendPage(res, 404, notFoundPage());
    const { ascii, encoded } = safeFilename(attachment.filename ?? "attachment");
    const type = /^[\w.+-]+\/[\w.+-]+$/.test(attachment.content_type ?? "")
      ? attachment.content_type!
      : "application/octet-stream";
    const bytes = Buffer.from(attachment.content, "base64");
    res.writeHead(200, {
      "content-type": type,
      "content-length": bytes.length,
      // Always a download, never rendered in our origin.
      "content-disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`,
      "x-content-type-options": "nosniff",
      "content-security-policy": "sandbox",
    });
    return res.end(bytes);
  }
  return sendError(res, { statusCode: 404, name: "not_found", message: `No route for GET ${url.pathname}.` });
}

export function createMailFakeHandler(store: MailStore) {
  return async (req: IncomingMessage, res: ServerResponse) => {
    const url = new URL(req.url ?? "/", "http://mail-fake.local");
    try {
      const route = url.pathname.replace(/\/+$/, "") || "/";
      if (req.method === "POST" && (route === "/emails" || route === "/emails/batch")) {
        return await handlePost(req, res, store, route === "/emails/batch");
      }
      if (req.method === "DELETE" && route === "/emails") return sendJson(res, 200, { deleted: store.clear() });
      if (req.method === "GET" || req.method === "HEAD") return handleGet(url, res, store);
      return sendError(res, {
        statusCode: 405,
        name: "method_not_allowed",
        message: `Method ${req.method} not allowed on ${url.pathname}.`,
      });
    } catch (error) {
      console.error("[mail-fake]", error);
      if (!res.headersSent)
        sendJson(res, 500, {
          statusCode: 500,
          name: "internal_server_error",
          message: "The mail fake failed; see its log.",
        });
      else res.end();
    }
  };
}

export function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const dir = path.resolve(options.dir ?? defaultMailFakeDir());
  const store = createMailStore(dir);
  const handle = createMailFakeHandler(store);
  const server = createServer((req, res) => void handle(req, res));
  const host = options.host ?? "127.0.0.1";
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? Number(process.env.MAIL_FAKE_PORT || 4025), host, () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      resolve({
        url: `http://${host.includes(":") ? `[${host}]` : host}:${port}`,
        port,
        dir,
        close: () =>
          new Promise<void>((done, fail) => {
            server.close((err) => (err ? fail(err) : done()));
            server.closeAllConnections();
          }),
      });
    });
  });
}

const isMain = process.argv[1] !== undefined && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href;
if (isMain) {
  startMailFake({ host: process.env.MAIL_FAKE_HOST || undefined })
    .then((fake) => {
      console.log(`[mail-fake] outbox viewer and send API on ${fake.url} (messages in ${fake.dir})`);
      const stop = () => void fake.close().then(() => process.exit(0));
      process.on("SIGINT", stop);
      process.on("SIGTERM", stop);
    })
    .catch((error: unknown) => {
      const code = (error as NodeJS.ErrnoException).code;
      console.error(code === "EADDRINUSE" ? "[mail-fake] port already in use; set MAIL_FAKE_PORT" : error);
      process.exit(1);
    });
}
