// Rider e-mails: each is queued in the caller's transaction, carries a working private link, is
// recorded and audited once sent; a failed send is recorded as failed without throwing.
import { http, HttpResponse } from "msw";
import { describe, expect, it } from "vitest";
import { listAuditForRequest } from "@/db/queries/audit";
import { findRequestIdByStatusToken } from "@/db/queries/status-links";
import { stableUuid } from "@/db/seed-demo";
import { getDb } from "@/db/client";
import { findOutboundEmail } from "@/db/queries/outbound-emails";
import { mailBaseUrl } from "@/lib/env";
import { configureOutbox, drainOutbox, resetOutboxPolicy } from "@/lib/mail";
import { notifyRider } from "@/lib/notify";
import { setupTestApp } from "../helpers/app";

const app = setupTestApp({ seed: true });

const requestId = stableUuid("request:r09");

const tokenIn = (text: string) => /\/status\/([A-Za-z0-9_-]{40,})/.exec(text)?.[1];

describe("notifyRider", () => {
  it("sends the confirmation with a status link that opens this request", async () => {
    const result = await notifyRider(await getDb(), requestId, { kind: "request-received" });
    expect(result.status).toBe("queued");
    await drainOutbox();
    expect((await findOutboundEmail(result.outboundEmailId))?.status).toBe("sent");
    const mail = app.sent.at(-1)!;
    expect(mail.to).toEqual(["dario.lindqvist@example.test"]);
    expect(mail.subject).toContain("received your setup request");
    const token = tokenIn(mail.text);
    expect(token).toBeTruthy();
    expect(await findRequestIdByStatusToken(token!)).toBe(requestId);
    expect(await findRequestIdByStatusToken(`${token}x`)).toBeNull();
  });

  it("links the approved sheet by version with the rider's token", async () => {
    await notifyRider(await getDb(), requestId, { kind: "sheet-ready", version: 2, tunerName: "Teo", revised: true });
    // PostgreSQL stamps the queued row in microseconds: a JS "now" in the same millisecond can fall
    // before it, so drain a second ahead; and find the message by subject, not by position.
    await drainOutbox({ now: new Date(Date.now() + 1000) });
    const mail = app.sent.find((m) => m.subject === "Revised setup sheet (version 2) for request 9")!;
    expect(mail).toBeDefined();
    const sheet = new RegExp(`/api/requests/${requestId}/sheet\\?version=2&token=([A-Za-z0-9_-]+)`).exec(mail.text);
    expect(sheet).toBeTruthy();
    expect(await findRequestIdByStatusToken(sheet![1]!)).toBe(requestId);
  });

  it("records a failed send as failed in the audit trail, without throwing", async () => {
    app.server.use(
      http.post(`${mailBaseUrl()}/emails`, () =>
        HttpResponse.json({ statusCode: 500, name: "internal_server_error", message: "down" }, { status: 500 }),
      ),
    );
    configureOutbox({ maxAttempts: 2 });
    const result = await notifyRider(
      await getDb(),
      requestId,
      { kind: "request-declined", reason: "Test" },
      { actor: { userId: null, label: "Test tuner" } },
    );
    await drainOutbox({ settle: true });
    resetOutboxPolicy();
    expect(await findOutboundEmail(result.outboundEmailId)).toMatchObject({ status: "failed", attempts: 2 });
    const audit = await listAuditForRequest(requestId);
    const last = audit.at(-1)!;
    expect(last.action).toBe("email.failed");
    expect(last.actorLabel).toBe("Test tuner");
    expect(last.detail).toMatchObject({
      template: "request-declined",
      outboundEmailId: result.outboundEmailId,
      attempts: 2,
    });
  });
});
