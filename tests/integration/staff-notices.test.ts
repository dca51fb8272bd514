// Telling the shop (lib/notify-staff.ts), through the real route handlers: a new request, the
// rider's answer and a sag report each leave an unseen notice and an e-mail in the outbox, to the
// assigned tuner or to the shop's address when nobody is assigned; the queue marks the row, the
// counts add up, and "Mark as seen" clears them. Opening a request (GET) writes nothing; "Start
// review" and "Take" are actions, audited.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as listQueue, POST as submit } from "@/app/api/requests/route";
import { GET as getDetail } from "@/app/api/requests/[id]/route";
import { POST as seen } from "@/app/api/requests/[id]/seen/route";
import { POST as start } from "@/app/api/requests/[id]/start/route";
import { POST as answer } from "@/app/api/status/[id]/answer/route";
import { POST as sag } from "@/app/api/status/[id]/sag/route";
import { getDb } from "@/db/client";
import { listAuditForRequest } from "@/db/queries/audit";
import { countUnseenNotices } from "@/db/queries/notices";
import { auditEvents, outboundEmails, setupRequests, staffNotices } from "@/db/schema";
import { DEMO_SHOP } from "@/db/seed-data";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { drainOutbox } from "@/lib/mail";
import { demoStatusToken } from "@/lib/requests/token";
import { setupTestApp } from "../helpers/app";
import { ORIGIN, cookieFrom, signInStaff } from "../helpers/auth";
import { fromClient } from "../helpers/client";

const app = setupTestApp({ seed: true, tempDataDir: true });
const id = (key: string) => stableUuid(`request:${key}`);
const token = (key: string) => demoStatusToken(resolveAuthSecret(), id(key));
let ip = 0;

type Handler = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
async function call(handler: Handler, requestId: string, method: string, body?: unknown, cookie = "") {
  const response = await handler(
    new Request(`${ORIGIN()}/api/requests/${requestId}`, {
      method,
      headers: {
        "content-type": "application/json",
        origin: ORIGIN(),
        ...fromClient(`10.7.${++ip >> 8}.${ip & 255}`),
        ...(cookie ? { cookie } : {}),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
    { params: Promise.resolve({ id: requestId }) },
  );
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

const staffMails = () => app.sent.filter((m) => /^(New setup request|The rider|Payment received)/.test(m.subject));
const drain = () => drainOutbox({ now: new Date(Date.now() + 1000) });

let tuner = "";

describe("notifications to the shop", () => {
  it("a new request e-mails the shop's address (nobody assigned), marks the row and counts on the navigation", async () => {
    tuner = cookieFrom(await signInStaff("tuner@sagwise.test", "sagwise-demo"));
    const before = await countUnseenNotices();
    const response = await submit(
      new Request(`${ORIGIN()}/api/requests`, {
        method: "POST",
        headers: { "content-type": "application/json", ...fromClient("10.7.200.1") },
        body: JSON.stringify({
          rider: {
            name: "Notice Rider",
            email: "notice.rider@example.test",
            weight: { value: 82, unit: "kg" },
            gearIncluded: false,
            skill: "advanced",
            style: "aggressive",
          },
          riding: { discipline: "enduro", terrain: ["rocky"], jumpSize: "small", hoursPerMonth: 12 },
          bike: { modelId: stableUuid("bike:enduro-300-2t"), year: 2022 },
          feel: { complaints: ["harsh-small-bumps"] },
          review: { consent: true },
        }),
      }),
      undefined as never,
    );
    expect(response.status).toBe(201);
    const created = (await response.json()) as { id: string };
    const db = await getDb();
    const [row] = await db.select().from(setupRequests).where(eq(setupRequests.id, created.id));
    // The number every e-mail uses ("request 19": the seed holds 18 requests).
    const number = row!.number;
    expect(number).toBeGreaterThan(12);

    // Queued in the same transaction as the request: the outbox row exists before any send.
    const queued = await db.select().from(outboundEmails).where(eq(outboundEmails.requestId, created.id));
    expect(queued.map((q) => q.template).sort()).toEqual(["request-received", "staff-notice"]);
    await drain();
    const mail = staffMails().find((m) => m.subject === `New setup request: request ${number} (Notice Rider)`);
    expect(mail).toBeDefined();
    expect(mail!.to).toEqual([DEMO_SHOP.email]);
    expect(mail!.text).toContain(`/shop/requests/${created.id}`);

    const after = await countUnseenNotices();
    expect(after["new-request"]).toBe(before["new-request"] + 1);
    expect(after.total).toBe(before.total + 1);

    // Searching its number finds it; its row carries the "new request" mark.
    const listed = await listQueue(
      new Request(`${ORIGIN()}/api/requests?q=${number}`, { headers: { cookie: tuner } }),
      undefined as never,
    );
    const page = (await listed.json()) as { items: { id: string; number: number; notices: string[] }[] };
    expect(page.items.map((i) => i.number)).toEqual([number]);
    expect(page.items.find((i) => i.id === created.id)!.notices).toEqual(["new-request"]);
  });

  it("the rider's answer e-mails the assigned tuner", async () => {
    // r07 waits for the rider and is assigned to tuner2 (the seed).
    const answered = await call(answer as Handler, id("r07"), "POST", {
      token: token("r07"),
      body: "Original linkage, never lowered.",
    });
    expect(answered.status).toBe(201);
    await drain();
    const mail = staffMails().find((m) => m.subject.startsWith("The rider answered your question: request 7"));
    expect(mail).toBeDefined();
    expect(mail!.to).toEqual(["tuner2@sagwise.test"]);
  });

  it("a sag report e-mails the assigned tuner with the verdict in words and flags the row", async () => {
    // r09 is approved and assigned to tuner@ (the seed).
    const reported = await call(sag as Handler, id("r09"), "POST", {
      token: token("r09"),
      unit: "mm",
      rear: { static: "30", race: "104" },
      front: {},
    });
    expect(reported.status).toBe(201);
    const verdict = (reported.body.verdict as { rear: { verdict: string } }).rear.verdict;
    await drain();
    const mail = staffMails().find((m) => m.subject.startsWith("The rider reported the measured sag: request 9"));
    expect(mail).toBeDefined();
    expect(mail!.to).toEqual(["tuner@sagwise.test"]);
    const words = { "too-soft": "spring too soft", right: "spring right", "too-stiff": "spring too stiff" }[
      verdict as "right"
    ];
    expect(mail!.text).toContain(`Shock: ${words ?? "measure again"}.`);
    expect(mail!.text).not.toContain(verdict === "right" ? "too-" : verdict);

    const listed = await listQueue(
      new Request(`${ORIGIN()}/api/requests?q=${encodeURIComponent("request 9")}`, { headers: { cookie: tuner } }),
      undefined as never,
    );
    const page = (await listed.json()) as { items: { id: string; notices: string[] }[] };
    expect(page.items).toHaveLength(1);
    expect(page.items[0]!.notices).toEqual(["sag-reported"]);
  });

  it("'Mark as seen' clears the request's notices from the counts, audited; a second time changes nothing", async () => {
    const before = await countUnseenNotices();
    const marked = await call(seen as Handler, id("r09"), "POST", {}, tuner);
    expect(marked.status).toBe(200);
    expect(marked.body.marked).toEqual(["sag-reported"]);
    const after = await countUnseenNotices();
    expect(after["sag-reported"]).toBe(before["sag-reported"] - 1);
    expect((await listAuditForRequest(id("r09"))).at(-1)).toMatchObject({
      action: "request.notices_seen",
      actorLabel: "Teo Brambleton",
    });
    expect((await call(seen as Handler, id("r09"), "POST", {}, tuner)).body.marked).toEqual([]);
    expect((await call(seen as Handler, id("r09"), "POST", {})).status).toBe(401);
  });
});

describe("opening a request never changes it; starting the review is an action", () => {
  const r01 = id("r01"); // submitted, nobody assigned (the seed)

  async function snapshot() {
    const db = await getDb();
    const [row] = await db.select().from(setupRequests).where(eq(setupRequests.id, r01));
    const [audit] = await db.select({ n: count() }).from(auditEvents).where(eq(auditEvents.requestId, r01));
    return { status: row!.status, tuner: row!.assignedTunerId, updatedAt: row!.updatedAt, audit: audit!.n };
  }

  it("GET leaves status, assignment and audit unchanged", async () => {
    const before = await snapshot();
    expect(before.status).toBe("submitted");
    for (let i = 0; i < 2; i++)
      expect((await call(getDetail as Handler, r01, "GET", undefined, tuner)).status).toBe(200);
    expect(await snapshot()).toEqual(before);
  });

  it("'Start review' moves it to in review, audited in the tuner's name; a second start is refused (409)", async () => {
    const db = await getDb();
    const started = await call(start as Handler, r01, "POST", {}, tuner);
    expect(started.status).toBe(200);
    expect(started.body).toMatchObject({ status: "in_review", assignedTunerId: null });
    const audit = await listAuditForRequest(r01);
    expect(audit.slice(-2).map((a) => [a.action, a.actorLabel])).toEqual([
      ["request.status_changed", "Teo Brambleton"],
      ["request.review_started", "Teo Brambleton"],
    ]);
    const again = await call(start as Handler, r01, "POST", {}, tuner);
    expect(again.status).toBe(409);
    expect(String(again.body.error)).toMatch(/already started/);
    // Starting marks the request's "new request" notice (the demo seed makes one) seen.
    const notices = await db.select().from(staffNotices).where(eq(staffNotices.requestId, r01));
    expect(notices.map((n) => n.kind)).toEqual(["new-request"]);
    expect(notices.every((n) => n.seenAt !== null)).toBe(true);
  });

  it("'Take' assigns it to the caller, audited; it answers 409 when it is already theirs", async () => {
    const taken = await call(start as Handler, r01, "POST", { take: true }, tuner);
    expect(taken.status).toBe(200);
    const snap = await snapshot();
    expect(snap.status).toBe("in_review");
    expect(snap.tuner).not.toBeNull();
    expect((await listAuditForRequest(r01)).at(-1)).toMatchObject({
      action: "request.assigned",
      detail: { toName: "Teo Brambleton" },
    });
    expect((await call(start as Handler, r01, "POST", { take: true }, tuner)).status).toBe(409);
    expect((await call(start as Handler, r01, "POST", { take: "yes" }, tuner)).body.fields).toEqual({
      take: "take is true or false",
    });
  });
});
