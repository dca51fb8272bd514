// lib/mail against msw standing in for the resend e-mail API. The expected request is the API's
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
import { MailInputError, sendMail, sendTemplateEmail } from "@/lib/mail";
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
afterEach(() => {
  server.resetHandlers();
  captured = [];
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

describe("sendMail / sendTemplateEmail", () => {
  it("posts the rendered template to the API and records the message as sent", async () => {
    respondWith(ok("4ef1c2f0-0000-4000-8000-00000000a001"));
    const result = await sendTemplateEmail(
      "sign-in-link",
      { url: LINK, expiresInMinutes: 15, shopName: "Sagwise Demo Suspension" },
      { to: "rider.one@riders.test" },
    );

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

    expect(result).toEqual({
      status: "sent",
      outboundEmailId: expect.any(String),
      providerMessageId: "4ef1c2f0-0000-4000-8000-00000000a001",
      attempts: 1,
    });
    const row = await rowOf(result.outboundEmailId);
    expect(row).toMatchObject({
      template: "sign-in-link",
      toAddress: "rider.one@riders.test",
      subject: "Your sign-in link for Sagwise Demo Suspension",
      status: "sent",
      providerMessageId: "4ef1c2f0-0000-4000-8000-00000000a001",
      attempts: 1,
      lastError: null,
      requestId: null,
    });
    expect(row?.sentAt).toBeInstanceOf(Date);
    expect(call.idempotencyKey).toBe(`sagwise-outbound-${result.outboundEmailId}`);
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
    const result = await sendMail({
      template: "approved",
      to: "rider.two@riders.test",
      subject: "Your setup sheet",
      html: "<p>Attached.</p>",
      text: "Attached.",
      requestId: request!.id,
      attachments: [{ filename: "setup-sheet.pdf", content: pdf, contentType: "application/pdf" }],
    });
    expect(result.status).toBe("sent");
    expect(captured[0]!.body.attachments).toEqual([
      { filename: "setup-sheet.pdf", content: pdf.toString("base64"), content_type: "application/pdf" },
    ]);
    expect((await rowOf(result.outboundEmailId))?.requestId).toBe(request!.id);
  });

  it("retries a send that fails twice with exponential backoff and records it sent after 3 attempts", async () => {
    respondWith(
      apiError(503, "internal_server_error", "Service unavailable"),
      apiError(429, "rate_limit_exceeded", "Too many requests"),
      ok("third-time-lucky"),
    );
    const waits: number[] = [];
    const result = await sendMail(
      { template: "staff-invite", to: "new.tuner@sagwise.test", subject: "Join", html: "<p>x</p>", text: "x" },
      { sleep: async (ms) => void waits.push(ms) },
    );
    expect(captured).toHaveLength(3);
    expect(waits).toEqual([1000, 2000]);
    // Every try carries the same key, so the provider never delivers twice.
    expect(new Set(captured.map((c) => c.idempotencyKey)).size).toBe(1);
    expect(result).toMatchObject({ status: "sent", providerMessageId: "third-time-lucky", attempts: 3 });
    expect(await rowOf(result.outboundEmailId)).toMatchObject({ status: "sent", attempts: 3, providerMessageId: "third-time-lucky", lastError: null });
  });

  it("records a send that always fails as failed, with the error, and returns instead of throwing", async () => {
    respondWith(apiError(500, "internal_server_error", "Upstream exploded"));
    const result = await sendMail(
      { template: "sign-in-link", to: "rider.three@riders.test", subject: "Sign in", html: "<p>x</p>", text: "x" },
      { baseDelayMs: 0 },
    );
    expect(captured).toHaveLength(3);
    expect(result).toEqual({
      status: "failed",
      outboundEmailId: expect.any(String),
      attempts: 3,
      error: "internal_server_error (500): Upstream exploded",
    });
    const row = await rowOf(result.outboundEmailId);
    expect(row).toMatchObject({ status: "failed", attempts: 3, lastError: "internal_server_error (500): Upstream exploded", providerMessageId: null, sentAt: null });
  });

  it("retries network failures too", async () => {
    respondWith(() => HttpResponse.error(), ok("after-network-blip"));
    const result = await sendMail(
      { template: "sign-in-link", to: "rider.four@riders.test", subject: "Sign in", html: "<p>x</p>", text: "x" },
      { baseDelayMs: 0 },
    );
    expect(result).toMatchObject({ status: "sent", attempts: 2, providerMessageId: "after-network-blip" });
  });

  it("does not retry a request the API rejects (422)", async () => {
    respondWith(apiError(422, "validation_error", "Invalid `to` field."));
    const result = await sendMail(
      { template: "sign-in-link", to: "rider.five@riders.test", subject: "Sign in", html: "<p>x</p>", text: "x" },
      { baseDelayMs: 0 },
    );
    expect(captured).toHaveLength(1);
    expect(result).toMatchObject({ status: "failed", attempts: 1, error: "validation_error (422): Invalid `to` field." });
  });

  it.each([
    ["to", { to: "not-an-address" }],
    ["subject", { subject: "  " }],
    ["text", { text: "" }],
    ["requestId", { requestId: "1042" }],
  ])("refuses bad input naming the field (%s) before recording or sending", async (field, patch) => {
    const db = await getDb();
    const before = (await db.select().from(outboundEmails)).length;
    const input = { template: "sign-in-link", to: "rider@riders.test", subject: "S", html: "<p>x</p>", text: "x", ...patch };
    const error = await sendMail(input).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(MailInputError);
    expect((error as MailInputError).field).toBe(field);
    expect((error as Error).message).toContain(field);
    expect((await db.select().from(outboundEmails)).length).toBe(before);
    expect(captured).toHaveLength(0);
  });
});
