// The payload the resend SDK posts for EACH template, captured by msw at the e-mail API: sender,
// recipient, subject, html and plain-text parts, and a link that is right AND works (the status
// token opens the request, the sheet link downloads the PDF, the sign-in link signs in). Retry and
// the outbound record of a failed send are covered in mail.test.ts; here the failure is followed
// through notifyRider to the request's e-mail list, with the approval kept.
import { http, HttpResponse } from "msw";
import { setupServer } from "msw/node";
import { renderToStaticMarkup } from "react-dom/server";
import { eq, and } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { GET as sheetGet } from "@/app/api/requests/[id]/sheet/route";
import { EmailStatusItems } from "@/components/mail/email-status-list";
import { getDb } from "@/db/client";
import { listOutboundEmailsForRequest } from "@/db/queries/outbound-emails";
import { findSheetVersion } from "@/db/queries/sheet";
import { findRequestIdByStatusToken } from "@/db/queries/status-links";
import { recommendationVersions } from "@/db/schema";
import { seedDemo, stableUuid } from "@/db/seed-demo";
import { emailTemplateNames } from "@/emails";
import { appBaseUrl, mailBaseUrl } from "@/lib/env";
import { configureOutbox, drainOutbox, queueTemplateEmail, resetOutboxPolicy } from "@/lib/mail";
import { notifyRider } from "@/lib/notify";
import { notifyStaff } from "@/lib/notify-staff";
import { findOrder } from "@/db/queries/orders";
import { notifyOrderStage, notifyPaymentReceived } from "@/lib/orders/notify";
import { RIDER_STAGE_WORDS } from "@/lib/orders/stages";
import { renderSetupSheet } from "@/lib/pdf";
import { queueDueReminders } from "@/lib/service/reminders";
import { demoSheetData } from "@/lib/pdf/demo-data";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { pdfText } from "../helpers/pdf";
import { ORIGIN, cookieFrom } from "../helpers/auth";
import { POST as authPost, GET as authGet } from "@/app/api/auth/[...all]/route";

interface Payload {
  from: string;
  to: string | string[];
  subject: string;
  html: string;
  text: string;
  tags?: { name: string; value: string }[];
}
const server = setupServer();
let posted: Payload[] = [];
let failNext = 0;
const SHOP = "Cinderline Suspension (demo)"; // db/seed-data.ts
const RIDER = "dario.lindqvist@example.test";
const r09 = stableUuid("request:r09");
const C04_RIDER = "idris.mp@example.test";
const c04 = stableUuid("request:c04");
const covered = new Set<string>();

function listen() {
  server.use(
    http.post(`${mailBaseUrl()}/emails`, async ({ request }) => {
      posted.push((await request.json()) as Payload);
      if (failNext > 0) {
        failNext -= 1;
        return HttpResponse.json(
          { statusCode: 503, name: "internal_server_error", message: "Mail API unavailable" },
          { status: 503 },
        );
      }
      return HttpResponse.json({ id: `msg_${posted.length}` });
    }),
  );
}

/** Queues the rider's e-mail as the workflow does and lets the outbox send it. */
async function notify(...args: Parameters<typeof notifyRider> extends [unknown, ...infer Rest] ? Rest : never) {
  const queued = await notifyRider(await getDb(), ...args);
  await drainOutbox({ settle: true });
  return queued;
}

/** Checks the parts every message must have and returns the one posted. */
function lastPayload(template: string, to: string): Payload {
  // One message to this address (a notice to the shop may go out beside it).
  const mine = posted.filter((m) => [m.to].flat().includes(to));
  expect(mine).toHaveLength(1);
  const mail = mine[0]!;
  covered.add(template);
  expect(mail.from).toBe(process.env.MAIL_FROM);
  expect([mail.to].flat()).toEqual([to]);
  expect(mail.subject).not.toMatch(/[\r\n]/);
  expect(mail.html).toMatch(/^<!DOCTYPE html/i);
  expect(mail.text.length).toBeGreaterThan(40);
  expect(mail.tags).toEqual([{ name: "template", value: template }]);
  return mail;
}

/** The absolute link with this path prefix, from the text part; the html carries the same, as a
 *  button's href or (`inHtml: "text"`) written out in a sentence. */
function linkIn(mail: Payload, prefix: string, inHtml: "href" | "text" = "href"): string {
  const escaped = `${appBaseUrl()}${prefix}`.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");
  const link = new RegExp(`${escaped}[^\\s<>"]*`).exec(mail.text)?.[0];
  expect(link, `a ${prefix} link in the text part`).toBeTruthy();
  const html = link!.replaceAll("&", "&amp;");
  expect(mail.html).toContain(inHtml === "href" ? `href="${html}"` : html);
  return link!;
}

async function opensRequest(statusLink: string, requestId = r09) {
  const token = new URL(statusLink).pathname.split("/").at(-1)!;
  expect(await findRequestIdByStatusToken(token)).toBe(requestId);
}

async function download(sheetLink: string) {
  const url = new URL(sheetLink);
  return sheetGet(new Request(url), { params: Promise.resolve({ id: url.pathname.split("/")[3]! }) });
}

beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  await renderSetupSheet(demoSheetData()); // loads react-pdf's WebAssembly before msw takes over fetch
  server.listen({ onUnhandledRequest: "error" });
}, 120_000);
afterEach(() => {
  server.resetHandlers();
  posted = [];
  failNext = 0;
});
afterAll(async () => {
  // Every template of the registry had its payload checked here.
  expect([...covered].sort()).toEqual([...emailTemplateNames].sort());
  server.close();
  await closeTestDatabase();
});

describe("rider e-mails through notifyRider", () => {
  it("request-received: confirmation with the private status link", async () => {
    listen();
    await notify(r09, { kind: "request-received" });
    const mail = lastPayload("request-received", RIDER);
    expect(mail.subject).toBe(`${SHOP} received your setup request 9`);
    await opensRequest(linkIn(mail, "/status/"));
  });

  it("tuner-question: the question in both parts and the link to answer it", async () => {
    listen();
    const question = "Is the linkage original, or has a lowering link been fitted?";
    await notify(r09, { kind: "tuner-question", question, tunerName: "Teo Brambleton" });
    const mail = lastPayload("tuner-question", RIDER);
    expect(mail.subject).toBe("A question about your setup request 9");
    expect(mail.text).toContain(question);
    expect(mail.html).toContain("Is the linkage original, or has a lowering link been fitted?");
    await opensRequest(linkIn(mail, "/status/"));
  });

  it("request-declined: the reason in both parts", async () => {
    listen();
    const reason = "We do not service this cartridge & its springs.";
    await notify(r09, { kind: "request-declined", reason });
    const mail = lastPayload("request-declined", RIDER);
    expect(mail.subject).toBe("About your setup request 9");
    expect(mail.text).toContain(reason);
    expect(mail.html).toContain("We do not service this cartridge &amp; its springs.");
    await opensRequest(linkIn(mail, "/status/"));
  });

  it("sheet-ready: the sheet link downloads the approved PDF with the e-mail's own token", async () => {
    listen();
    await notify(r09, { kind: "sheet-ready", version: 1, tunerName: "Teo Brambleton", revised: false });
    const mail = lastPayload("sheet-ready", RIDER);
    expect(mail.subject).toBe("Your setup sheet for request 9 is ready");
    const sheet = linkIn(mail, `/api/requests/${r09}/sheet?version=1&token=`);
    // Here the status link is written out in the sentence about reporting sag.
    await opensRequest(linkIn(mail, "/status/", "text"));
    const response = await download(sheet);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(
      Buffer.from(await response.arrayBuffer())
        .subarray(0, 5)
        .toString(),
    ).toBe("%PDF-");
  });

  it("sheet-ready, revised: links the new version, and the old one stays readable", async () => {
    const db = await getDb();
    const v1 = await db
      .select()
      .from(recommendationVersions)
      .where(and(eq(recommendationVersions.requestId, r09), eq(recommendationVersions.version, 1)));
    const copy = { ...v1[0]!, id: stableUuid("version:r09:2") };
    await db
      .insert(recommendationVersions)
      .values({ ...copy, version: 2, state: "approved", notesForRider: "Revised: one more turn of preload." });
    await db
      .update(recommendationVersions)
      .set({ state: "superseded" })
      .where(eq(recommendationVersions.id, v1[0]!.id));

    listen();
    await notify(r09, { kind: "sheet-ready", version: 2, tunerName: "Teo Brambleton", revised: true });
    const mail = lastPayload("sheet-ready", RIDER);
    expect(mail.subject).toBe("Revised setup sheet (version 2) for request 9");
    const sheet = linkIn(mail, `/api/requests/${r09}/sheet?version=2&token=`);
    expect((await download(sheet)).status).toBe(200);
    const old = await download(sheet.replace("version=2", "version=1"));
    expect(old.status).toBe(200);
    // The superseded sheet says so, so a rider holding the old file knows to use the new one.
    expect(pdfText(new Uint8Array(await old.arrayBuffer()))).toContain("A newer version of this sheet exists");
  });
});

describe("notices to the shop through notifyStaff", () => {
  it("staff-notice: to the assigned tuner, with the link that opens the request in the workspace", async () => {
    listen();
    // r09 is assigned to the tuner Teo Brambleton (db/seed-data.ts).
    await notifyStaff(await getDb(), { kind: "rider-answered", requestId: r09 });
    await drainOutbox({ settle: true });
    const mail = lastPayload("staff-notice", "tuner@sagwise.test");
    expect(mail.subject).toBe("The rider answered your question: request 9 (Dario Lindqvist)");
    expect(linkIn(mail, `/shop/requests/${r09}`)).toBe(`${appBaseUrl()}/shop/requests/${r09}`);
  });
});

describe("order e-mails (lib/orders/notify.ts)", () => {
  it("order-stage: the stage in the rider's words, the tracking once shipped, and the status link", async () => {
    listen();
    // The shipped demo order, on 125-class rider c04 (db/seed-orders.ts, db/seed-data.ts).
    const order = (await findOrder(stableUuid("order:o6")))!;
    await notifyOrderStage(await getDb(), order, "shipped", { userId: null, label: "system" });
    await drainOutbox({ settle: true });
    const mail = lastPayload("order-stage", C04_RIDER);
    expect(mail.subject).toBe(`Order ${order.number}: ${RIDER_STAGE_WORDS.shipped}`);
    expect(mail.text).toContain(`${order.carrier}, tracking ${order.trackingNumber}`);
    await opensRequest(linkIn(mail, "/status/"), c04);
  });

  it("payment-received: the amount in the order's currency and what is left to pay", async () => {
    listen();
    const order = (await findOrder(stableUuid("order:o6")))!;
    await notifyPaymentReceived(await getDb(), order, 12345, 500, { userId: null, label: "payment service" });
    await drainOutbox({ settle: true });
    const mail = lastPayload("payment-received", C04_RIDER);
    expect(mail.subject).toBe(`Payment received for order ${order.number}`);
    expect(mail.text).toContain("€123.45");
    expect(mail.text).toContain("Still to pay before we ship: €5.00");
    await opensRequest(linkIn(mail, "/status/"), c04);
  });
});

describe("e-mails not tied to a request", () => {
  it("sign-in-link: better-auth's link signs the rider in, and the session opens their sheet", async () => {
    listen();
    const asked = await authPost(
      new Request(`${ORIGIN()}/api/auth/sign-in/magic-link`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: ORIGIN() },
        body: JSON.stringify({ email: RIDER, callbackURL: "/my-requests" }),
      }),
    );
    expect(asked.status).toBe(200);
    await drainOutbox();
    const mail = lastPayload("sign-in-link", RIDER);
    expect(mail.subject).toBe(`Your sign-in link for ${SHOP}`);
    const link = linkIn(mail, "/api/auth/magic-link/verify?token=");
    const cookie = cookieFrom(await authGet(new Request(link, { headers: { origin: ORIGIN() } })));
    expect(cookie).toContain("session_token");
    const sheet = await sheetGet(
      new Request(`${appBaseUrl()}/api/requests/${r09}/sheet?version=2`, { headers: { cookie } }),
      {
        params: Promise.resolve({ id: r09 }),
      },
    );
    expect(sheet.status).toBe(200);
  });

  it("staff-invite: names the inviter, the role and carries the invitation link", async () => {
    listen();
    const url = `${appBaseUrl()}/invite/invented-invite-token`;
    await queueTemplateEmail(
      await getDb(),
      "staff-invite",
      { url, role: "tuner", inviterName: "Mara Quillfeather", shopName: SHOP },
      { to: "new.tuner@sagwise.test" },
    );
    await drainOutbox();
    const mail = lastPayload("staff-invite", "new.tuner@sagwise.test");
    expect(mail.subject).toBe(`Mara Quillfeather invited you to the ${SHOP} workspace`);
    expect(linkIn(mail, "/invite/")).toBe(url);
    expect(mail.text).toContain("As a tuner you can");
  });
});

describe("the service reminder job", () => {
  it("service-reminder: the due services, the booking link with the bike, and a status link that opens the request", async () => {
    listen();
    // The demo shop: r09's rider logged 12 h three days ago (db/seed-service.ts), so fork oil
    // (15 h for motocross, common practice) falls due within the 14-day notice.
    expect(await queueDueReminders()).toBeGreaterThan(0);
    await drainOutbox();
    const mail = posted.find((m) => [m.to].flat().includes(RIDER))!;
    expect(mail, "a reminder to r09's rider").toBeTruthy();
    covered.add("service-reminder");
    expect(mail.from).toBe(process.env.MAIL_FROM);
    expect(mail.tags).toEqual([{ name: "template", value: "service-reminder" }]);
    expect(mail.subject).toMatch(/due for your /);
    expect(mail.text).toContain("Fork oil change");
    const booking = linkIn(mail, "/request?bike=");
    expect(new URL(booking).searchParams.get("bike")).toBe(stableUuid("bike:mx-450-4t"));
    await opensRequest(linkIn(mail, "/status/", "text"));
  });
});

describe("a failed rider e-mail", () => {
  it("is retried with backoff, recorded as failed on the request, shown clearly, and the approval stays", async () => {
    listen();
    failNext = 99;
    configureOutbox({ maxAttempts: 3 });
    const queued = await notifyRider(await getDb(), r09, {
      kind: "sheet-ready",
      version: 2,
      tunerName: "Teo Brambleton",
      revised: true,
    });
    // Until the worker has sent it, the request page shows it on its way.
    const pending = renderToStaticMarkup(EmailStatusItems({ emails: await listOutboundEmailsForRequest(r09) }))
      .split("<li")
      .at(-1)!;
    expect(pending).toContain(">Sending<");
    expect(pending).not.toContain('role="alert"');
    // Backoff waits are passed on a virtual clock (their lengths are checked in mail.test.ts).
    expect(await drainOutbox({ settle: true })).toEqual({ sent: 0, retried: 2, failed: 1 });
    resetOutboxPolicy();
    expect(posted).toHaveLength(3);
    covered.add("sheet-ready");

    const emails = await listOutboundEmailsForRequest(r09);
    const failed = emails.at(-1)!;
    expect(failed.id).toBe(queued.outboundEmailId);
    expect(failed).toMatchObject({
      template: "sheet-ready",
      status: "failed",
      attempts: 3,
      toAddress: RIDER,
      sentAt: null,
    });
    expect(failed.lastError).toBe("internal_server_error (503): Mail API unavailable");
    expect(emails.filter((e) => e.status === "sent").length).toBeGreaterThanOrEqual(5);
    expect((await findSheetVersion(r09, 2))?.state).toBe("approved");

    const html = renderToStaticMarkup(EmailStatusItems({ emails }));
    const items = html.split("<li").slice(1);
    expect(items).toHaveLength(emails.length);
    const shown = items.at(-1)!;
    expect(shown).toContain(">Failed<");
    expect(shown).toContain('role="alert"');
    expect(shown).toContain("Not delivered after 3 attempts: internal_server_error (503): Mail API unavailable");
    expect(shown).toContain("border-red-300");
    expect(items[0]).toContain(">Sent<");
    expect(items[0]).not.toContain('role="alert"');
  });

  it("an empty list says so", () => {
    expect(renderToStaticMarkup(EmailStatusItems({ emails: [] }))).toContain("No e-mails sent for this request yet.");
  });
});
