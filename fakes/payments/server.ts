// Local stand-in for the hosted payment service, speaking the SDK's wire format (fakes/payments/wire.ts)
// for the calls Sagwise makes: checkout sessions (create, retrieve), refunds (create) and payment
// intents (retrieve). It serves a payment page a person can click through, records every payment
// (GET /payments), and on payment POSTs a signed `checkout.session.completed` event to the app's
// webhook. `POST /_test/sessions/{id}/complete` pays a session as the "Pay" button would;
// `POST /_test/events/{id}/resend` delivers an event again (same id, fresh signature).
// Run alone with `npm run payments:fake`; tests call startPaymentsFake({ port: 0, ... }).
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { paymentPage } from "./page";
import { apiError, newId, parseForm, signPayload } from "./wire";

export interface Delivery {
  eventId: string;
  status: number | null;
  error?: string;
}

export interface PaymentsFakeOptions {
  port?: number;
  host?: string;
  /** Where events go (the app's /api/payments/webhook). */
  webhookUrl?: string;
  webhookSecret?: string;
  /** Tests hand events to the route handler directly instead of over HTTP. */
  deliver?: (payload: string, signature: string) => Promise<number>;
}

export interface PaymentsFake {
  url: string;
  port: number;
  close(): Promise<void>;
}

interface Session {
  id: string;
  object: "checkout.session";
  mode: string;
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  amount_subtotal: number;
  currency: string;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  payment_intent: string | null;
  url: string;
  created: number;
  livemode: false;
  productName: string;
}

interface Refund {
  id: string;
  object: "refund";
  amount: number;
  currency: string;
  payment_intent: string;
  status: "succeeded";
  metadata: Record<string, string>;
  created: number;
}

const now = () => Math.floor(Date.now() / 1000);

function sendJson(res: ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { "content-type": "application/json; charset=utf-8", "cache-control": "no-store" });
  res.end(JSON.stringify(body));
}

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > 1024 * 1024) throw new Error("body too large");
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

/** The session as the API shows it (the page's product name is the fake's own). */
function publicSession(session: Session) {
  const shown: Partial<Session> = { ...session };
  delete shown.productName;
  return shown;
}

export function startPaymentsFake(options: PaymentsFakeOptions = {}): Promise<PaymentsFake> {
  const secret = options.webhookSecret ?? process.env.PAYMENT_WEBHOOK_SECRET ?? "whsec_sagwise_local_fake";
  const webhookUrl =
    options.webhookUrl ??
    process.env.PAYMENT_WEBHOOK_URL ??
    `http://localhost:${process.env.PORT || 3000}/api/payments/webhook`;
  const sessions = new Map<string, Session>();
  const refunds: Refund[] = [];
  const events = new Map<string, string>();
  const deliveries: Delivery[] = [];
  const idempotent = new Map<string, { status: number; body: unknown }>();

  async function deliver(eventId: string): Promise<Delivery> {
    const payload = events.get(eventId)!;
    const signature = signPayload(payload, secret);
    let delivery: Delivery;
    try {
      const status = options.deliver
        ? await options.deliver(payload, signature)
        : (
            await fetch(webhookUrl, {
              method: "POST",
              headers: { "content-type": "application/json", "stripe-signature": signature },
              body: payload,
            })
          ).status;
      delivery = { eventId, status };
    } catch (error) {
      delivery = { eventId, status: null, error: String(error) };
      console.error(`[payments-fake] webhook to ${webhookUrl} failed:`, error);
    }
    deliveries.push(delivery);
    return delivery;
  }

  async function complete(session: Session) {
    if (session.status !== "open") return null;
    session.status = "complete";
    session.payment_status = "paid";
    session.payment_intent = newId("pi");
    const event = {
      id: newId("evt"),
      object: "event",
      api_version: "2025-01-01",
      created: now(),
      type: "checkout.session.completed",
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      data: { object: publicSession(session) },
    };
    events.set(event.id, JSON.stringify(event));
    return deliver(event.id);
  }

  function createSession(form: Record<string, unknown>, base: string) {
    const items = (form.line_items as Record<string, unknown>[] | undefined) ?? [];
    if (!items.length) return apiError(400, "Missing required param: line_items.", "line_items");
    if (form.mode !== "payment") return apiError(400, "Only mode=payment is supported here.", "mode");
    for (const key of ["success_url", "cancel_url"] as const)
      if (typeof form[key] !== "string") return apiError(400, `Missing required param: ${key}.`, key);
    let total = 0;
    let currency = "";
    let productName = "";
    for (const [i, item] of items.entries()) {
      const price = item.price_data as Record<string, unknown> | undefined;
      const amount = Number(price?.unit_amount);
      const quantity = Number(item.quantity ?? 1);
      if (!price || !Number.isInteger(amount) || amount < 0)
        return apiError(400, "Invalid integer: unit_amount.", `line_items[${i}][price_data][unit_amount]`);
      if (!Number.isInteger(quantity) || quantity < 1)
        return apiError(400, "Invalid integer: quantity.", `line_items[${i}][quantity]`);
      const c = String(price.currency ?? "").toLowerCase();
      if (!/^[a-z]{3}$/.test(c)) return apiError(400, "Invalid currency.", `line_items[${i}][price_data][currency]`);
      if (currency && c !== currency) return apiError(400, "All line items must have the same currency.");
      currency = c;
      total += amount * quantity;
      productName ||= String((price.product_data as Record<string, unknown> | undefined)?.name ?? "Payment");
    }
    const id = newId("cs");
    const session: Session = {
      id,
      object: "checkout.session",
      mode: "payment",
      status: "open",
      payment_status: "unpaid",
      amount_total: total,
      amount_subtotal: total,
      currency,
      client_reference_id: typeof form.client_reference_id === "string" ? form.client_reference_id : null,
      metadata: (form.metadata as Record<string, string>) ?? {},
      success_url: String(form.success_url),
      cancel_url: String(form.cancel_url),
      payment_intent: null,
      url: `${base}/pay/${id}`,
      created: now(),
      livemode: false,
      productName,
    };
    sessions.set(id, session);
    return { status: 200, body: publicSession(session) };
  }

  function createRefund(form: Record<string, unknown>) {
    const intent = String(form.payment_intent ?? "");
    const session = [...sessions.values()].find((s) => s.payment_intent === intent && s.payment_status === "paid");
    if (!session) return apiError(404, `No such payment_intent: '${intent}'`, "payment_intent");
    const already = refunds.filter((r) => r.payment_intent === intent).reduce((n, r) => n + r.amount, 0);
    const amount = form.amount === undefined ? session.amount_total - already : Number(form.amount);
    if (!Number.isInteger(amount) || amount < 1) return apiError(400, "Invalid integer: amount.", "amount");
    if (amount > session.amount_total - already)
      return apiError(400, "Refund amount is greater than the unrefunded amount of the charge.", "amount");
    const refund: Refund = {
      id: newId("re"),
      object: "refund",
      amount,
      currency: session.currency,
      payment_intent: intent,
      status: "succeeded",
      metadata: (form.metadata as Record<string, string>) ?? {},
      created: now(),
    };
    refunds.push(refund);
    return { status: 200, body: refund };
  }

  const server = createServer((req, res) => {
    void (async () => {
      const url = new URL(req.url ?? "/", "http://fake.local");
      const base = `http://${req.headers.host ?? "127.0.0.1"}`;
      const method = req.method ?? "GET";
      const parts = url.pathname.split("/").filter(Boolean);

      if (method === "GET" && url.pathname === "/payments")
        return sendJson(res, 200, {
          sessions: [...sessions.values()].map(publicSession),
          refunds,
          deliveries,
        });
      if (parts[0] === "pay" && parts[1]) {
        const session = sessions.get(parts[1]);
        if (!session) {
          res.writeHead(404, { "content-type": "text/plain; charset=utf-8" });
          return res.end("No such payment.");
        }
        if (method === "POST") {
          await readBody(req);
          await complete(session);
          res.writeHead(303, { location: session.success_url });
          return res.end();
        }
        res.writeHead(200, {
          "content-type": "text/html; charset=utf-8",
          "content-security-policy":
            "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; frame-ancestors 'none'",
          "cache-control": "no-store",
        });
        return res.end(
          paymentPage({
            id: session.id,
            amountTotal: session.amount_total,
            currency: session.currency,
            productName: session.productName,
            status: session.status,
            cancelUrl: session.cancel_url,
            successUrl: session.success_url,
          }),
        );
      }
      if (parts[0] === "_test" && method === "POST") {
        if (parts[1] === "sessions" && parts[3] === "complete") {
          const session = sessions.get(parts[2] ?? "");
          if (!session) return sendJson(res, 404, { error: "No such session" });
          const delivery = await complete(session);
          if (!delivery) return sendJson(res, 409, { error: "The session is not open" });
          return sendJson(res, 200, { session: publicSession(session), delivery });
        }
        if (parts[1] === "events" && parts[3] === "resend") {
          if (!events.has(parts[2] ?? "")) return sendJson(res, 404, { error: "No such event" });
          return sendJson(res, 200, { delivery: await deliver(parts[2]!) });
        }
      }
      if (parts[0] === "v1") {
        if (!/^Bearer\s+\S+/i.test(req.headers.authorization ?? ""))
          return sendJson(res, 401, {
            error: { type: "invalid_request_error", message: "You did not provide an API key." },
          });
        const key = req.headers["idempotency-key"];
        const cacheKey = typeof key === "string" ? `${method} ${url.pathname} ${key}` : null;
        if (cacheKey && idempotent.has(cacheKey)) {
          const cached = idempotent.get(cacheKey)!;
          return sendJson(res, cached.status, cached.body);
        }
        const form = method === "POST" ? parseForm(await readBody(req)) : {};
        let answer: { status: number; body: unknown } | null = null;
        const path = parts.slice(1).join("/");
        if (method === "POST" && path === "checkout/sessions") answer = createSession(form, base);
        else if (method === "GET" && parts[1] === "checkout" && parts[2] === "sessions" && parts[3]) {
          const session = sessions.get(parts[3]);
          answer = session
            ? { status: 200, body: publicSession(session) }
            : apiError(404, `No such checkout.session: '${parts[3]}'`, "id");
        } else if (method === "POST" && path === "refunds") answer = createRefund(form);
        else if (method === "GET" && parts[1] === "payment_intents" && parts[2]) {
          const session = [...sessions.values()].find((s) => s.payment_intent === parts[2]);
          answer = session
            ? {
                status: 200,
                body: {
                  id: parts[2],
                  object: "payment_intent",
                  amount: session.amount_total,
                  currency: session.currency,
                  status: "succeeded",
                },
              }
            : apiError(404, `No such payment_intent: '${parts[2]}'`, "id");
        }
        answer ??= apiError(404, `Unrecognized request URL (${method}: ${url.pathname}).`);
        if (cacheKey) idempotent.set(cacheKey, answer);
        return sendJson(res, answer.status, answer.body);
      }
      sendJson(res, 404, { error: "Not found" });
    })().catch((error: unknown) => {
      console.error("[payments-fake]", error);
      if (!res.headersSent) sendJson(res, 500, { error: { type: "api_error", message: "fake failed" } });
    });
  });

  return new Promise((resolve, reject) => {
    server.on("error", reject);
    const host = options.host ?? process.env.PAYMENT_FAKE_HOST ?? "127.0.0.1";
    server.listen(options.port ?? Number(process.env.PAYMENT_FAKE_PORT || 4026), host, () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      resolve({
        url: `http://${host}:${port}`,
        port,
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
  startPaymentsFake()
    .then((fake) => {
      console.log(`[payments-fake] payment API and pages on ${fake.url}`);
      const stop = () => void fake.close().then(() => process.exit(0));
      process.on("SIGINT", stop);
      process.on("SIGTERM", stop);
    })
    .catch((error: unknown) => {
      const code = (error as NodeJS.ErrnoException).code;
      console.error(code === "EADDRINUSE" ? "[payments-fake] port already in use; set PAYMENT_FAKE_PORT" : error);
      process.exit(1);
    });
}
