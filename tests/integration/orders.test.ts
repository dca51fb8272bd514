// Orders after the sheet, end to end through the route handlers, the real payment SDK (stripe) and
// the local payments fake (fakes/payments): quote → accept → checkout → signed webhook → paid, the
// e-mails that follow, a bad signature, a replay outside the SDK's tolerance, a second delivery,
// refunds, illegal stage changes and who may open an order. Money checks are hand-computed from
// the lines (lib/orders/money.ts: tax on the net subtotal, half away from zero on minor units).
import { eq } from "drizzle-orm";
import { http, passthrough } from "msw";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PUT as putLines } from "@/app/api/orders/[id]/lines/route";
import { POST as accept } from "@/app/api/orders/[id]/accept/route";
import { POST as checkout } from "@/app/api/orders/[id]/checkout/route";
import { POST as checkIn } from "@/app/api/orders/[id]/check-in/route";
import { POST as finisherOut } from "@/app/api/orders/[id]/finishers/route";
import { POST as finisherBack } from "@/app/api/orders/[id]/finisher-back/route";
import { POST as refund } from "@/app/api/orders/[id]/refund/route";
import { GET as getOrder, PATCH as patchOrder } from "@/app/api/orders/[id]/route";
import { POST as webhook } from "@/app/api/payments/webhook/route";
import { GET as listOrders, POST as createOrder } from "@/app/api/requests/[id]/order/route";
import { GET as buildSheetPdf } from "@/app/api/orders/[id]/build-sheet/route";
import { PUT as putBuildNotes } from "@/app/api/shop/catalog/[id]/build-notes/route";
import { PUT as putOrderSettings } from "@/app/api/shop/orders-settings/route";
import { PUT as putPriceList } from "@/app/api/shop/price-list/route";
import { POST as addFinisher } from "@/app/api/shop/finishers/route";
import { auditEvents } from "@/db/schema";
import { pdfText } from "../helpers/pdf";
import { GET as getPhoto, POST as postPhotos } from "@/app/api/orders/[id]/photos/route";
import { tinyPng } from "../fixtures/images";
import { getDb } from "@/db/client";
import { listAuditForRequest } from "@/db/queries/audit";
import { findLatestShippedOrderForRequest, saveOrderSettings } from "@/db/queries/orders";
import { orders, payments } from "@/db/schema";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { getEnv, resetEnvForTests } from "@/lib/env";
import { drainOutbox } from "@/lib/mail";
import type { OrderView } from "@/lib/orders/view";
import { demoStatusToken } from "@/lib/requests/token";
import { startPaymentsFake, type PaymentsFake } from "@/fakes/payments/server";
import { signPayload } from "@/fakes/payments/wire";
import { setupTestApp } from "../helpers/app";
import { cookieFrom, ORIGIN, signInStaff, signInWithEmailLink } from "../helpers/auth";
import { fromClient } from "../helpers/client";

const app = setupTestApp({ seed: true, tempDataDir: true });
const requestId = (key: string) => stableUuid(`request:${key}`);
const token = (key: string) => demoStatusToken(resolveAuthSecret(), requestId(key));
let fake: PaymentsFake;
let tuner = "";
let riderB = "";

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
async function call(
  handler: Handler,
  method: string,
  id: string,
  body?: unknown,
  options: { cookie?: string; query?: string } = {},
) {
  const response = await handler(
    new Request(`${ORIGIN()}/api/x/${id}${options.query ?? ""}`, {
      method,
      headers: {
        origin: ORIGIN(),
        ...fromClient(),
        ...(body === undefined ? {} : { "content-type": "application/json" }),
        ...(options.cookie ? { cookie: options.cookie } : {}),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
    { params: Promise.resolve({ id }) },
  );
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

const deliverToApp = async (payload: string, signature: string) =>
  (
    await webhook(
      new Request(`${ORIGIN()}/api/payments/webhook`, {
        method: "POST",
        headers: { "content-type": "application/json", "stripe-signature": signature },
        body: payload,
      }),
      { params: Promise.resolve({}) },
    )
  ).status;

beforeAll(async () => {
  fake = await startPaymentsFake({ port: 0, deliver: deliverToApp, webhookSecret: getEnv().PAYMENT_WEBHOOK_SECRET });
  process.env.PAYMENT_API_URL = fake.url;
  resetEnvForTests();
  app.server.use(http.all(`${fake.url}/*`, () => passthrough()));
  tuner = cookieFrom(await signInStaff("tuner@sagwise.test", getEnv().DEMO_PASSWORD));
  riderB = (await signInWithEmailLink("hana.whitlock@example.test", app.sent)).cookie;
}, 120_000);
afterAll(async () => {
  await fake?.close();
  delete process.env.PAYMENT_API_URL;
  resetEnvForTests();
});

const fakeState = async () =>
  (await (await fetch(`${fake.url}/payments`)).json()) as {
    sessions: { id: string; amount_total: number; status: string; payment_intent: string | null }[];
    refunds: { amount: number; payment_intent: string }[];
    deliveries: { eventId: string; status: number | null }[];
  };

async function newOrder(key: string, serviceType: string, cookie?: string) {
  const created = await call(
    createOrder,
    "POST",
    requestId(key),
    cookie ? { serviceType } : { serviceType, token: token(key) },
    { cookie },
  );
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  return created.body.id as string;
}

const view = async (id: string) =>
  (await call(getOrder, "GET", id, undefined, { cookie: tuner })).body as unknown as OrderView;

describe("quote, payment and webhook", () => {
  let orderId = "";

  it("the rider makes an order from the approved sheet: springs come in as lines by themselves", async () => {
    orderId = await newOrder("r10", "send-in");
    const order = await view(orderId);
    expect(order.stage).toBe("awaiting_parts");
    expect(order.paymentStatus).toBe("unpaid");
    expect(order.currency).toBe("EUR");
    const springs = order.lines.filter((l) => l.source === "sheet");
    expect(springs.map((l) => l.spring?.end).sort()).toEqual(["fork", "shock"]);
    for (const line of springs) expect(line.description).toMatch(/spring \d+\.\d\d N\/mm$/);
  });

  it("staff edit the lines; totals follow by hand: 2×62.00 + 115.00 + 30.00 = 269.00, 20 % tax 53.80, total 322.80", async () => {
    const order = await view(orderId);
    const fork = order.lines.find((l) => l.spring?.end === "fork")!;
    const shock = order.lines.find((l) => l.spring?.end === "shock")!;
    const saved = await call(
      putLines,
      "PUT",
      orderId,
      {
        lines: [
          { description: fork.description, quantity: 2, unitPriceMinor: 6200 },
          { description: shock.description, quantity: 1, unitPriceMinor: 11500 },
          { description: "Fork oil change", quantity: 1, unitPriceMinor: 3000 },
        ],
      },
      { cookie: tuner },
    );
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const after = await view(orderId);
    expect([after.subtotalMinor, after.taxMinor, after.totalMinor]).toEqual([26900, 5380, 32280]);
    expect(after.lines.filter((l) => l.source === "sheet")).toHaveLength(2);
  });

  it("a line with a bad quantity is refused with the field named, in the shop's words", async () => {
    const bad = await call(
      putLines,
      "PUT",
      orderId,
      { lines: [{ description: "X", quantity: 0, unitPriceMinor: 1 }] },
      { cookie: tuner },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ "lines.0.quantity": "The quantity must be at least 1" });
    expect((await view(orderId)).totalMinor).toBe(32280);
  });

  it("paying before accepting is refused; the rider accepts, and the lines are then fixed", async () => {
    expect((await call(checkout, "POST", orderId, { token: token("r10") })).status).toBe(409);
    expect((await call(accept, "POST", orderId, { token: token("r10") })).status).toBe(200);
    const late = await call(putLines, "PUT", orderId, { lines: [] }, { cookie: tuner });
    expect(late.status).toBe(409);
  });

  let sessionId = "";
  let eventId = "";
  it("checkout answers the fake's page URL, ending with the session id, for the whole total", async () => {
    const started = await call(checkout, "POST", orderId, { token: token("r10") });
    expect(started.status, JSON.stringify(started.body)).toBe(200);
    const url = String(started.body.url);
    expect(url.startsWith(`${fake.url}/pay/`)).toBe(true);
    sessionId = url.split("/").pop()!;
    const state = await fakeState();
    const session = state.sessions.find((s) => s.id === sessionId)!;
    expect(session.amount_total).toBe(32280);
    const page = await (await fetch(url)).text();
    expect(page).toContain("€322.80");
  });

  it("the fake pays the session and fires the signed webhook: the order is paid and the rider told", async () => {
    const before = app.sent.length;
    const done = await fetch(`${fake.url}/_test/sessions/${sessionId}/complete`, { method: "POST" });
    const delivery = ((await done.json()) as { delivery: { status: number; eventId: string } }).delivery;
    expect(delivery.status).toBe(200);
    eventId = delivery.eventId;
    const order = await view(orderId);
    expect(order.paymentStatus).toBe("paid");
    expect(order.paidMinor).toBe(32280);
    await drainOutbox();
    const mails = app.sent.slice(before).filter((m) => m.subject.startsWith("Payment received for order"));
    expect(mails).toHaveLength(1);
    expect(mails[0]!.text).toContain("€322.80");
    const audit = await listAuditForRequest(requestId("r10"));
    expect(audit.filter((a) => a.action === "order.payment_received")).toHaveLength(1);
  });

  it("a second delivery of the same event pays once", async () => {
    const again = await fetch(`${fake.url}/_test/events/${eventId}/resend`, { method: "POST" });
    expect(((await again.json()) as { delivery: { status: number } }).delivery.status).toBe(200);
    const order = await view(orderId);
    expect(order.paidMinor).toBe(32280);
    const db = await getDb();
    const rows = await db.select().from(payments).where(eq(payments.orderId, orderId));
    expect(rows.filter((r) => r.status === "paid")).toHaveLength(1);
    const audit = await listAuditForRequest(requestId("r10"));
    expect(audit.filter((a) => a.action === "order.payment_received")).toHaveLength(1);
  });

  it("a bad signature and a replay outside the tolerance change nothing (400)", async () => {
    const db = await getDb();
    const [before] = await db.select().from(orders).where(eq(orders.id, orderId));
    const forged = JSON.stringify({
      id: "evt_forged",
      object: "event",
      type: "checkout.session.completed",
      data: { object: { id: sessionId, payment_status: "paid", amount_total: 32280 } },
    });
    expect(await deliverToApp(forged, signPayload(forged, "whsec_someone_else"))).toBe(400);
    expect(await deliverToApp(forged, "t=1,v1=deadbeef")).toBe(400);
    expect(await deliverToApp(forged, "")).toBe(400);
    // The SDK's default tolerance is 300 s (stripe-node, Webhooks.DEFAULT_TOLERANCE); an hour old is a replay.
    const old = Math.floor(Date.now() / 1000) - 3600;
    expect(await deliverToApp(forged, signPayload(forged, getEnv().PAYMENT_WEBHOOK_SECRET, old))).toBe(400);
    const [after] = await db.select().from(orders).where(eq(orders.id, orderId));
    expect(after).toEqual(before);
  });

  it("staff refund part, then the rest, through the payment service; audited", async () => {
    const bad = await call(refund, "POST", orderId, { amountMinor: 99999, reason: "Too much" }, { cookie: tuner });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields as object)).toEqual(["amountMinor"]);
    const part = await call(
      refund,
      "POST",
      orderId,
      { amountMinor: 3000, reason: "Oil change not needed" },
      { cookie: tuner },
    );
    expect(part.status, JSON.stringify(part.body)).toBe(200);
    expect(part.body).toEqual({ paymentStatus: "paid", refundedMinor: 3000 });
    const rest = await call(refund, "POST", orderId, { reason: "Rider cancelled" }, { cookie: tuner });
    expect(rest.body).toEqual({ paymentStatus: "refunded", refundedMinor: 32280 });
    const state = await fakeState();
    const intent = state.sessions.find((s) => s.id === sessionId)!.payment_intent;
    expect(state.refunds.filter((r) => r.payment_intent === intent).map((r) => r.amount)).toEqual([3000, 29280]);
    const audit = await listAuditForRequest(requestId("r10"));
    expect(audit.filter((a) => a.action === "order.refunded").map((a) => a.detail.amountMinor)).toEqual([3000, 29280]);
    expect((await call(refund, "POST", orderId, { reason: "Again" }, { cookie: tuner })).status).toBe(409);
  });
});

describe("deposit", () => {
  it("with a 30 % deposit the first checkout asks 30 % of the total, rounded half away from zero", async () => {
    await saveOrderSettings({
      currency: "EUR",
      taxRateBp: 2000,
      paymentMode: "deposit",
      depositPercent: 30,
      notifyStages: ["shipped"],
      packingInstructions: null,
    });
    const id = await newOrder("r11", "springs-only", tuner);
    await call(
      putLines,
      "PUT",
      id,
      { lines: [{ description: "Shock spring", quantity: 1, unitPriceMinor: 1999 }] },
      { cookie: tuner },
    );
    await call(accept, "POST", id, {}, { cookie: tuner });
    // 19.99 + 20 % (3.998 → 4.00) = 23.99; 30 % = 7.197 → 7.20 (hand-computed)
    const first = await call(checkout, "POST", id, {}, { cookie: tuner });
    expect(first.body.amountMinor).toBe(720);
    const session = String(first.body.url).split("/").pop();
    await fetch(`${fake.url}/_test/sessions/${session}/complete`, { method: "POST" });
    expect((await view(id)).paymentStatus).toBe("deposit");
    const second = await call(checkout, "POST", id, {}, { cookie: tuner });
    expect(second.body.amountMinor).toBe(2399 - 720);
    await fetch(`${fake.url}/_test/sessions/${String(second.body.url).split("/").pop()}/complete`, { method: "POST" });
    expect((await view(id)).paymentStatus).toBe("paid");
    await saveOrderSettings({
      currency: "EUR",
      taxRateBp: 2000,
      paymentMode: "full",
      depositPercent: 30,
      notifyStages: ["received", "shipped"],
      packingInstructions: null,
    });
  });
});

describe("stages", () => {
  it("walks a send-in order through the workshop; illegal moves answer 409 and change nothing", async () => {
    const id = await newOrder("r09", "send-in", tuner);
    // Not accepted yet: work cannot start.
    expect((await call(patchOrder, "PATCH", id, { stage: "received" }, { cookie: tuner })).status).toBe(409);
    await call(accept, "POST", id, {}, { cookie: tuner });
    for (const stage of ["shipped", "closed", "assembled", "in_work"]) {
      const wrong = await call(patchOrder, "PATCH", id, { stage }, { cookie: tuner });
      expect(wrong.status, stage).toBe(409);
    }
    expect((await view(id)).stage).toBe("awaiting_parts");
    const bad = await call(patchOrder, "PATCH", id, { stage: "somewhere" }, { cookie: tuner });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ stage: "Choose a stage of the board" });

    const sent = app.sent.length;
    const checked = await call(
      checkIn,
      "POST",
      id,
      { serials: [{ part: "Shock", serial: "SN-1" }], conditionNotes: "Shaft scratched" },
      { cookie: tuner },
    );
    expect(checked.body.stage).toBe("received");
    await drainOutbox();
    // "received" is ticked in the settings: the rider is told.
    expect(app.sent.slice(sent).some((m) => m.subject.includes("checked in"))).toBe(true);

    expect((await call(patchOrder, "PATCH", id, { stage: "in_work" }, { cookie: tuner })).status).toBe(200);
    expect((await call(patchOrder, "PATCH", id, { stage: "at_finisher" }, { cookie: tuner })).status).toBe(409);
    const finisherId = stableUuid("finisher:coat");
    const out = await call(
      finisherOut,
      "POST",
      id,
      { finisherId, part: "Fork tubes", sentOn: "2026-11-20" },
      { cookie: tuner },
    );
    expect(out.status, JSON.stringify(out.body)).toBe(201);
    // Due from the finisher's usual turnaround (10 days in the demo list): 20 + 10 = 30 November.
    expect(out.body.dueOn).toBe("2026-11-30");
    expect((await view(id)).stage).toBe("at_finisher");
    expect((await call(patchOrder, "PATCH", id, { stage: "in_work" }, { cookie: tuner })).status).toBe(409);
    await call(finisherBack, "POST", id, { jobId: out.body.id }, { cookie: tuner });
    expect((await view(id)).stage).toBe("in_work");
    await call(patchOrder, "PATCH", id, { stage: "assembled" }, { cookie: tuner });
    const noTracking = await call(patchOrder, "PATCH", id, { stage: "shipped" }, { cookie: tuner });
    expect(noTracking.status).toBe(400);
    expect(Object.keys(noTracking.body.fields as object).sort()).toEqual(["carrier", "trackingNumber"]);
    const shipped = await call(
      patchOrder,
      "PATCH",
      id,
      { stage: "shipped", carrier: "Demo Parcel", trackingNumber: "TRK1" },
      { cookie: tuner },
    );
    expect(shipped.body.stage).toBe("shipped");
    const latest = await findLatestShippedOrderForRequest(requestId("r09"));
    expect(latest?.id).toBe(id);
    const timeline = (await view(id)).timeline.map((t) => t.stage);
    expect(timeline).toEqual([
      "awaiting_parts",
      "received",
      "in_work",
      "at_finisher",
      "in_work",
      "assembled",
      "shipped",
    ]);
    const audit = await listAuditForRequest(requestId("r09"));
    expect(audit.filter((a) => a.action === "order.stage_changed" && a.detail.orderId === id)).toHaveLength(6);
  });
});

describe("who may open an order", () => {
  it("the request's token opens its order; another rider's token or session gets 404; no one at all 401", async () => {
    const id = await newOrder("r11", "kit", tuner);
    expect((await call(getOrder, "GET", id, undefined, { query: `?token=${token("r11")}` })).status).toBe(200);
    expect((await call(getOrder, "GET", id, undefined, { query: `?token=${token("r09")}` })).status).toBe(404);
    expect((await call(getOrder, "GET", id, undefined, { cookie: riderB })).status).toBe(404);
    expect((await call(getOrder, "GET", id)).status).toBe(401);
    expect((await call(accept, "POST", id, { token: token("r09") })).status).toBe(404);
    expect((await call(checkout, "POST", id, { token: token("r09") })).status).toBe(404);
    // Riders never see the workshop's own notes.
    const rider = (await call(getOrder, "GET", id, undefined, { query: `?token=${token("r11")}` })).body;
    expect(rider.workshop).toBeUndefined();
    expect(
      (await call(createOrder, "POST", requestId("r11"), { serviceType: "kit", token: token("r09") })).status,
    ).toBe(404);
  });
});

describe("build sheet and settings", () => {
  it("prints the sheet's springs with their rates, the model's build notes and the steps", async () => {
    const id = stableUuid("order:o3"); // demo kit order on r09 (db/seed-orders.ts)
    const order = await view(id);
    const bikeModelId = stableUuid("bike:mx-450-4t"); // r09's bike (db/seed-data.ts)
    const saved = await call(
      putBuildNotes,
      "PUT",
      bikeModelId,
      { buildNotes: "Check the linkage bearings." },
      { cookie: tuner },
    );
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const response = await buildSheetPdf(
      new Request(`${ORIGIN()}/api/orders/${id}/build-sheet`, { headers: { cookie: tuner, ...fromClient() } }),
      { params: Promise.resolve({ id }) },
    );
    expect(response.status).toBe(200);
    const text = pdfText(new Uint8Array(await response.arrayBuffer()));
    expect(text).toContain(`Build sheet · order ${order.number}`);
    for (const line of order.lines.filter((l) => l.spring))
      expect(text).toContain(`${line.spring!.rateNmm.toFixed(2)} N/mm`);
    expect(text).toContain("Check the linkage bearings.");
    expect(text).toContain("Pick the springs and parts listed");
  });

  it("lists a request's orders for its rider, and refuses settings in the shop's words", async () => {
    const listed = await call(listOrders, "GET", requestId("r09"), undefined, { query: `?token=${token("r09")}` });
    expect(listed.status).toBe(200);
    expect((listed.body.orders as OrderView[]).length).toBeGreaterThan(1);
    const owner = cookieFrom(await signInStaff("owner@sagwise.test", getEnv().DEMO_PASSWORD));
    const bad = await call(
      putOrderSettings,
      "PUT",
      "",
      {
        currency: "EURO",
        taxRateBp: -1,
        paymentMode: "half",
        depositPercent: 0,
        notifyStages: [],
        packingInstructions: null,
      },
      { cookie: owner },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({
      currency: "Enter a three-letter currency code (ISO 4217, e.g. EUR)",
      taxRateBp: "The tax rate cannot be negative",
      paymentMode: "Choose full payment or a deposit",
      depositPercent: "The deposit must be at least 1 %",
    });
  });
});

describe("check-in photos", () => {
  it("keeps a photo of the parts with the type sniffed from its bytes, and refuses a non-photo by name", async () => {
    const id = stableUuid("order:o2"); // demo send-in order, checked in (db/seed-orders.ts)
    const form = new FormData();
    form.append("photos", new File([tinyPng() as BlobPart], "shock.png", { type: "image/png" }));
    const sent = await postPhotos(
      new Request(`${ORIGIN()}/api/orders/${id}/photos`, {
        method: "POST",
        body: form,
        headers: { cookie: tuner, origin: ORIGIN(), ...fromClient() },
      }),
      { params: Promise.resolve({ id }) },
    );
    expect(sent.status, await sent.clone().text()).toBe(201);
    const [photo] = ((await sent.json()) as { photos: { id: string }[] }).photos;
    const read = await getPhoto(
      new Request(`${ORIGIN()}/api/orders/${id}/photos?photo=${photo!.id}`, {
        headers: { cookie: tuner, ...fromClient() },
      }),
      { params: Promise.resolve({ id }) },
    );
    expect(read.headers.get("content-type")).toBe("image/png");
    expect(Buffer.from(await read.arrayBuffer())).toEqual(Buffer.from(tinyPng()));

    const bad = new FormData();
    bad.append("photos", new File(["not a picture"], "notes.txt", { type: "image/png" }));
    const refused = await postPhotos(
      new Request(`${ORIGIN()}/api/orders/${id}/photos`, {
        method: "POST",
        body: bad,
        headers: { cookie: tuner, origin: ORIGIN(), ...fromClient() },
      }),
      { params: Promise.resolve({ id }) },
    );
    expect(refused.status).toBe(400);
    const body = (await refused.json()) as { fields: Record<string, string> };
    expect(Object.values(body.fields)[0]).toContain("notes.txt");
  });
});

describe("the admin's price list and finishers", () => {
  it("changes a price and adds a finisher, both in the audit log; a tuner may not", async () => {
    const owner = cookieFrom(await signInStaff("owner@sagwise.test", getEnv().DEMO_PASSWORD));
    const item = { code: "seal-kit-fork", label: "Fork seal and bushing kit", kind: "part", unitPriceMinor: 5100 };
    expect((await call(putPriceList, "PUT", "", { items: [item] }, { cookie: tuner })).status).toBe(403);
    const saved = await call(putPriceList, "PUT", "", { items: [item] }, { cookie: owner });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const added = await call(
      addFinisher,
      "POST",
      "",
      { name: "Test Anodisers", work: "Anodising", turnaroundDays: 0 },
      { cookie: owner },
    );
    expect(added.status).toBe(400);
    expect(added.body.fields).toEqual({ turnaroundDays: "The turnaround must be at least 1 day" });
    const ok = await call(
      addFinisher,
      "POST",
      "",
      { name: "Test Anodisers", work: "Anodising", turnaroundDays: 6 },
      { cookie: owner },
    );
    expect(ok.status).toBe(201);
    const db = await getDb();
    const actions = (await db.select({ action: auditEvents.action }).from(auditEvents)).map((a) => a.action);
    expect(actions).toContain("settings.price_list_changed");
    expect(actions).toContain("settings.finisher_added");
  });
});
