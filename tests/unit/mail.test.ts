// lib/mail's outbox against msw standing in for the resend e-mail API. The expected request is the API's
// documented send call as the resend SDK 6.38.0 builds it (POST {base}/emails, Bearer key, JSON with
// snake_case fields, Idempotency-Key header; see parseEmailToApiOptions and post() in
// node_modules/resend/dist/index.mjs); error bodies use its ErrorResponse shape.
import { eq } from "drizzle-orm";
import { http, HttpResponse } from "msw";
import { setupServer } from "msw/node";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { outboundEmails, setupRequests } from "@/db/schema";
import { resetEnvForTests } from "@/lib/env";
import {
  MailInputError,
  configureOutbox,
  drainOutbox,
  queueMail,
  queueTemplateEmail,
  resetOutboxPolicy,
  type SendMailInput,
} from "@/lib/mail";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";

const API = "https://mail-api.sagwise.test";
const KEY = "re_unit_test_key";
const FROM = "Sagwise test shop <setup@sagwise.test>"; // MAIL_FROM in vitest.config.mts
const LINK = "https://demo.sagwise.test/api/auth/magic-link/verify?token=t0k&callbackURL=/my";

interface Captured {
  authorization: string | null;
  idempotencyKey: string | null;
  body: Record<string, unknown>;
}
let captured: Captured[] = [];
const server = setupServer();
const saved = { base: process.env.RESEND_BASE_URL, key: process.env.RESEND_API_KEY };

/** Answers the queued responses in order, the last one for every later call. */
function respondWith(...responses: (() => Response)[]) {
  server.use(
    http.post(`${API}/emails`, async ({ request }) => {
      captured.push({
        authorization: request.headers.get("authorization"),
        idempotencyKey: request.headers.get("idempotency-key"),
        body: (await request.json()) as Record<string, unknown>,
      });
      const next = responses[Math.min(captured.length, responses.length) - 1]!;
      return next();
    }),
  );
}
const ok = (id: string) => () => HttpResponse.json({ id });
const apiError = (statusCode: number, name: string, message: string) => () =>
  HttpResponse.json({ statusCode, name, message }, { status: statusCode });

/** Queues one message in its own transaction, as a caller's change would. */
async function queue(input: SendMailInput) {
  const db = await getDb();
  return db.transaction((tx) => queueMail(tx, input));
}

const simple = (to: string): SendMailInput => ({
  template: "sign-in-link",
  to,
  subject: "Sign in",
  html: "<p>x</p>",
  text: "x",
});

async function rowOf(id: string) {
  const db = await getDb();
  const [row] = await db.select().from(outboundEmails).where(eq(outboundEmails.id, id));
  return row;
}

beforeAll(async () => {
  await createTestDatabase();
  process.env.RESEND_BASE_URL = API;
  process.env.RESEND_API_KEY = KEY;
  resetEnvForTests();
  server.listen({ onUnhandledRequest: "error" });
});
afterEach(async () => {
  // Nothing is left queued for the next test.
  await drainOutbox({ settle: true });
  server.resetHandlers();
  captured = [];
  resetOutboxPolicy();
});
afterAll(async () => {
  server.close();
  process.env.RESEND_BASE_URL = saved.base;
  process.env.RESEND_API_KEY = saved.key;
  if (saved.base === undefined) delete process.env.RESEND_BASE_URL;
  if (saved.key === undefined) delete process.env.RESEND_API_KEY;
  resetEnvForTests();
  await closeTestDatabase();
});

describe("queueMail / queueTemplateEmail, then the outbox worker", () => {
  it("queues the rendered template, sends nothing until drained, then posts it and records it sent", async () => {
    respondWith(ok("4ef1c2f0-0000-4000-8000-00000000a001"));
    const db = await getDb();
    const queued = await queueTemplateEmail(
      db,
      "sign-in-link",
      { url: LINK, expiresInMinutes: 15, shopName: "Sagwise Demo Suspension" },
      { to: "rider.one@riders.test" },
    );
    expect(queued).toEqual({ status: "queued", outboundEmailId: expect.any(String) });
    expect(captured).toHaveLength(0);
    expect(await rowOf(queued.outboundEmailId)).toMatchObject({ status: "queued", attempts: 0, sentAt: null });

    expect(await drainOutbox()).toEqual({ sent: 1, retried: 0, failed: 0 });
    expect(captured).toHaveLength(1);
    const call = captured[0]!;
    expect(call.authorization).toBe(`Bearer ${KEY}`);
    expect(call.body.from).toBe(FROM);
    expect(call.body.to).toBe("rider.one@riders.test");
    expect(call.body.subject).toBe("Your sign-in link for Sagwise Demo Suspension");
    // In html the link is an attribute, so & is written &amp;; the text part has it verbatim.
    expect(call.body.html).toContain(`href="${LINK.replace(/&/g, "&amp;")}"`);
    expect(call.body.text).toContain(LINK);
    expect(call.body.text).toContain("15 minutes");
    expect(call.body.tags).toEqual([{ name: "template", value: "sign-in-link" }]);

    const row = await rowOf(queued.outboundEmailId);
    expect(row).toMatchObject({
      template: "sign-in-link",
      toAddress: "rider.one@riders.test",
      subject: "Your sign-in link for Sagwise Demo Suspension",
      status: "sent",
      providerMessageId: "4ef1c2f0-0000-4000-8000-00000000a001",
      attempts: 1,
      lastError: null,
      requestId: null,
      claimedUntil: null,
      // The body carried a sign-in link: it is not kept once sent.
      html: null,
      textBody: null,
    });
    expect(row?.sentAt).toBeInstanceOf(Date);
    expect(call.idempotencyKey).toBe(`sagwise-outbound-${queued.outboundEmailId}`);
    expect(call.idempotencyKey).toBe(row?.idempotencyKey);
    // Drained again: nothing is sent twice.
    expect(await drainOutbox()).toEqual({ sent: 0, retried: 0, failed: 0 });
    expect(captured).toHaveLength(1);
  });

  it("a message queued in a transaction that rolls back never exists and is never sent", async () => {
    respondWith(ok("never"));
    const db = await getDb();
    const before = (await db.select().from(outboundEmails)).length;
    const failed = await db
      .transaction(async (tx) => {
        await queueMail(tx, simple("rolled.back@riders.test"));
        throw new Error("the change it reports failed");
      })
      .catch((e: unknown) => e);
    expect((failed as Error).message).toBe("the change it reports failed");
    expect((await db.select().from(outboundEmails)).length).toBe(before);
    await drainOutbox();
    expect(captured).toHaveLength(0);
  });

  it("links the record to its setup request and sends attachments as base64", async () => {
    const db = await getDb();
    const [request] = await db
      .insert(setupRequests)
      .values({
        riderName: "Test Rider",
        riderEmail: "rider.two@riders.test",
        discipline: "enduro",
        skill: "intermediate",
        bikeLabel: "300 two-stroke enduro (typical)",
        riderMassKg: 82,
        answers: {},
      })
      .returning({ id: setupRequests.id });
    respondWith(ok("msg-with-attachment"));
    const pdf = Buffer.from("%PDF-1.7 sheet");
    const queued = await queue({
      template: "approved",
      to: "rider.two@riders.test",
      subject: "Your setup sheet",
      html: "<p>Attached.</p>",
      text: "Attached.",
      requestId: request!.id,
      attachments: [{ filename: "setup-sheet.pdf", content: pdf, contentType: "application/pdf" }],
    });
    await drainOutbox();
    expect((await rowOf(queued.outboundEmailId))?.status).toBe("sent");
    expect(captured[0]!.body.attachments).toEqual([
      { filename: "setup-sheet.pdf", content: pdf.toString("base64"), content_type: "application/pdf" },
    ]);
    expect((await rowOf(queued.outboundEmailId))?.requestId).toBe(request!.id);
  });

  it("retries a send that fails twice with exponential backoff (5 s, then 10 s) and records it sent after 3 attempts", async () => {
    respondWith(
      apiError(503, "internal_server_error", "Service unavailable"),
      apiError(429, "rate_limit_exceeded", "Too many requests"),
      ok("third-time-lucky"),
    );
    const queued = await queue(simple("new.tuner@sagwise.test"));
    // A virtual clock: each drain runs "at" t, nothing sleeps.
    const t0 = new Date(Date.now() + 60_000);
    const at = (ms: number) => new Date(t0.getTime() + ms);

    expect(await drainOutbox({ now: t0 })).toEqual({ sent: 0, retried: 1, failed: 0 });
    let row = await rowOf(queued.outboundEmailId);
    expect(row).toMatchObject({
      status: "queued",
      attempts: 1,
      lastError: "internal_server_error (503): Service unavailable",
    });
    // Exponential backoff (common practice): the base wait, then doubled before each later try.
    expect(row!.nextAttemptAt.getTime() - t0.getTime()).toBe(5_000);
    expect(await drainOutbox({ now: at(4_999) })).toEqual({ sent: 0, retried: 0, failed: 0 });

    expect(await drainOutbox({ now: at(5_000) })).toEqual({ sent: 0, retried: 1, failed: 0 });
    row = await rowOf(queued.outboundEmailId);
    expect(row).toMatchObject({
      status: "queued",
      attempts: 2,
      lastError: "rate_limit_exceeded (429): Too many requests",
    });
    expect(row!.nextAttemptAt.getTime() - at(5_000).getTime()).toBe(10_000);

    expect(await drainOutbox({ now: at(15_000) })).toEqual({ sent: 1, retried: 0, failed: 0 });
    expect(captured).toHaveLength(3);
    // Every try carries the same key, so the provider never delivers twice.
    expect(new Set(captured.map((c) => c.idempotencyKey)).size).toBe(1);
    expect(await rowOf(queued.outboundEmailId)).toMatchObject({
      status: "sent",
      attempts: 3,
      providerMessageId: "third-time-lucky",
      lastError: null,
    });
  });

  it("records a send that always fails as failed after the last attempt, with the error", async () => {
    configureOutbox({ maxAttempts: 3 });
    respondWith(apiError(500, "internal_server_error", "Upstream exploded"));
    const queued = await queue(simple("rider.three@riders.test"));
    expect(await drainOutbox({ settle: true })).toEqual({ sent: 0, retried: 2, failed: 1 });
    expect(captured).toHaveLength(3);
    const row = await rowOf(queued.outboundEmailId);
    expect(row).toMatchObject({
      status: "failed",
      attempts: 3,
      lastError: "internal_server_error (500): Upstream exploded",
      providerMessageId: null,
      sentAt: null,
      claimedUntil: null,
    });
  });

  it("retries network failures too", async () => {
    respondWith(() => HttpResponse.error(), ok("after-network-blip"));
    const queued = await queue(simple("rider.four@riders.test"));
    await drainOutbox({ settle: true });
    expect(await rowOf(queued.outboundEmailId)).toMatchObject({
      status: "sent",
      attempts: 2,
      providerMessageId: "after-network-blip",
    });
  });

  it("does not retry a request the API rejects (422)", async () => {
    respondWith(apiError(422, "validation_error", "Invalid `to` field."));
    const queued = await queue(simple("rider.five@riders.test"));
    expect(await drainOutbox({ settle: true })).toEqual({ sent: 0, retried: 0, failed: 1 });
    expect(captured).toHaveLength(1);
    expect(await rowOf(queued.outboundEmailId)).toMatchObject({
      status: "failed",
      attempts: 1,
      lastError: "validation_error (422): Invalid `to` field.",
    });
  });

  it("sends at most one batch per claim and keeps claiming until nothing is due", async () => {
    configureOutbox({ batchSize: 2 });
    respondWith(ok("batch"));
    for (let i = 0; i < 5; i++) await queue(simple(`batch.${i}@riders.test`));
    expect(await drainOutbox()).toEqual({ sent: 5, retried: 0, failed: 0 });
    expect(captured.map((c) => c.body.to).sort()).toEqual([0, 1, 2, 3, 4].map((i) => `batch.${i}@riders.test`));
  });

  it.each([
    ["to", { to: "not-an-address" }],
    ["subject", { subject: "  " }],
    ["text", { text: "" }],
    ["requestId", { requestId: "1042" }],
  ])("refuses bad input naming the field (%s) before recording or sending", async (field, patch) => {
    const db = await getDb();
    const before = (await db.select().from(outboundEmails)).length;
    const error = await queue({ ...simple("rider@riders.test"), ...patch }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(MailInputError);
    expect((error as MailInputError).field).toBe(field);
    expect((error as Error).message).toContain(field);
    expect((await db.select().from(outboundEmails)).length).toBe(before);
    await drainOutbox();
    expect(captured).toHaveLength(0);
  });
});
