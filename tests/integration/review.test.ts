// The tuner's review path through the real route handlers: override → recompute on the server → save
// as a draft → approve → revise → approve again, with the versions, audit rows and e-mails it must
// leave; illegal transitions answer 409; every staff endpoint refuses anonymous and rider callers.
import { setupServer } from "msw/node";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as getDetail } from "@/app/api/requests/[id]/route";
import { POST as approve } from "@/app/api/requests/[id]/approve/route";
import { POST as ask } from "@/app/api/requests/[id]/ask/route";
import { POST as assign } from "@/app/api/requests/[id]/assign/route";
import { POST as decline } from "@/app/api/requests/[id]/decline/route";
import { PATCH as saveRecommendation } from "@/app/api/requests/[id]/recommendation/route";
import { listAuditForRequest } from "@/db/queries/audit";
import { getRequestRow, listStaffMembers } from "@/db/queries/review";
import { listVersions } from "@/db/queries/versions";
import { seedDemo, stableUuid } from "@/db/seed-demo";
import type { Recommendation, SizingInput } from "@/lib/sizing";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { drainOutbox } from "@/lib/mail";
import { ORIGIN, captureMail, cookieFrom, signInStaff, signInWithEmailLink } from "../helpers/auth";

const server = setupServer();
let sent: ReturnType<typeof captureMail>;
let tuner: string;
let rider: string;

type Handler = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
async function call(handler: Handler, id: string, method: string, body?: unknown, cookie = tuner) {
  const response = await handler(
    new Request(`${ORIGIN()}/api/requests/${id}`, {
      method,
      headers: { cookie, "content-type": "application/json", origin: ORIGIN() },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
    { params: Promise.resolve({ id }) },
  );
  return {
    status: response.status,
    body: (await response.json()) as Record<string, unknown> & { error?: string; fields?: Record<string, string> },
  };
}

beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  server.listen({ onUnhandledRequest: "error" });
  sent = captureMail(server);
  tuner = cookieFrom(await signInStaff("tuner@sagwise.test", "sagwise-demo"));
  rider = (await signInWithEmailLink("hana.whitlock@example.test", sent)).cookie;
}, 120_000);
afterAll(async () => {
  server.close();
  await closeTestDatabase();
});

describe("override → recompute → save → approve → revise", () => {
  const id = stableUuid("request:r06"); // Gudrun, in review, enduro class with a coil fork
  let v1: { input: SizingInput; output: Recommendation };
  let stiffer: number;

  it("saves overrides into the draft, recomputed on the server, with old and new values audited", async () => {
    const [first] = await listVersions(id);
    v1 = first as unknown as typeof v1;
    expect(first).toMatchObject({ version: 1, state: "draft" });
    const chosen = v1.output.rear.chosenRate.nMm;
    stiffer = v1.input.stock.shockRatesNmm.find((r) => r > chosen + 1)!;
    expect(stiffer).toBeDefined();
    const preload = v1.output.rear.preloadMm;
    const oil = v1.output.front.oilLevelMm! + 10;

    const saved = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: stiffer, preloadMm: preload }, front: { oilLevelMm: oil } },
      notesForRider: "Check race sag after fitting.",
      // The server never trusts figures from the browser: this is ignored.
      output: { rear: { chosenRate: { nMm: 1 } } },
    });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ version: 1, state: "draft", newVersion: false });
    const out = saved.body.output as Recommendation;
    expect(out.rear.chosenRate.nMm).toBe(stiffer);
    expect(out.rear.source).toBe("override");
    expect(out.front.oilLevelMm).toBe(oil);
    // Hooke's law: a stiffer spring with the same preload under the same load sags less.
    expect(out.rear.predicted.raceSagMm).toBeLessThan(v1.output.rear.predicted.raceSagMm);
    expect(out.rear.predicted.staticSagMm).toBeLessThan(v1.output.rear.predicted.staticSagMm);
    // Oil level is measured down from the top: 10 mm more means more air above the oil, so the air
    // is compressed less at full travel and the fork pushes back less (Boyle's law).
    expect(out.front.bottoming.forceN).toBeLessThan(v1.output.front.bottoming.forceN);

    const versions = await listVersions(id);
    expect(versions).toHaveLength(1);
    expect(versions[0]).toMatchObject({ state: "draft", notesForRider: "Check race sag after fitting." });
    expect((versions[0]!.output as Recommendation).rear.chosenRate.nMm).toBe(stiffer);

    const audit = (await listAuditForRequest(id)).filter((e) => e.action === "recommendation.saved");
    expect(audit).toHaveLength(1);
    expect(audit[0]!.actorLabel).toBe("Teo Brambleton");
    expect(audit[0]!.detail).toMatchObject({
      version: 1,
      changes: [
        { field: "front.oilLevelMm", from: null, to: oil },
        { field: "rear.preloadMm", from: null, to: preload },
        { field: "rear.rateNmm", from: null, to: stiffer },
      ],
    });
  });

  it("takes a rate typed in kgf/mm once converted (1 kgf = 9.80665 N exactly, NIST SP 811)", async () => {
    const saved = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: 5.2 * 9.80665 } },
    });
    expect(saved.status).toBe(200);
    const rate = (saved.body.output as Recommendation).rear.chosenRate;
    expect(rate.kgfMm).toBeCloseTo(5.2, 9);
    // 1 lbf/in = 4.4482216152605 N / 25.4 mm (NIST SP 811).
    expect(rate.lbfIn).toBeCloseTo((5.2 * 9.80665 * 25.4) / 4.4482216152605, 6);
    const last = (await listAuditForRequest(id)).at(-1)!;
    expect(last.detail).toMatchObject({
      changes: [
        { field: "front.oilLevelMm", to: null },
        { field: "rear.preloadMm", to: null },
        { field: "rear.rateNmm", from: stiffer, to: 5.2 * 9.80665 },
      ],
    });
  });

  it("names the bad figure and keeps what was saved", async () => {
    const bad = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: -5 } },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toHaveProperty(["overrides.rear.rateNmm"]);
    const beyond = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { raceSagMm: 390 } },
    });
    expect(beyond.status).toBe(400);
    expect(Object.keys(beyond.body.fields ?? {}).join()).toContain("overrides.rear");
    const stale = await call(saveRecommendation, id, "PATCH", { basedOnVersion: 2, overrides: {} });
    expect(stale.status).toBe(409);
    const [kept] = await listVersions(id);
    expect((kept!.output as Recommendation).rear.chosenRate.kgfMm).toBeCloseTo(5.2, 9);
  });

  it("approves: freezes version 1, stamps approver and time, e-mails the sheet link", async () => {
    const before = sent.length;
    const approved = await call(approve, id, "POST", { version: 1 });
    expect(approved.status).toBe(200);
    // The e-mail is queued with the approval; the answer does not wait for it.
    expect(approved.body).toMatchObject({ version: 1, revised: false, email: "queued" });
    expect(sent.length).toBe(before);
    await drainOutbox();
    const [v] = await listVersions(id);
    expect(v).toMatchObject({ state: "approved", approvedByName: "Teo Brambleton" });
    expect(v!.approvedAt).toBeInstanceOf(Date);
    expect((await getRequestRow(id))!.request.status).toBe("approved");
    const mails = sent.slice(before);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.to).toEqual(["gudrun.vh@example.test"]);
    expect(mails[0]!.subject).toMatch(/Your setup sheet for request \d+ is ready/);
    expect(mails[0]!.text).toContain(`/api/requests/${id}/sheet?version=1&token=`);
    const actions = (await listAuditForRequest(id)).map((e) => e.action);
    expect(actions.slice(-3)).toEqual(["request.status_changed", "recommendation.approved", "email.sent"]);
  });

  it("refuses to approve twice or ask on the approved request (409)", async () => {
    const again = await call(approve, id, "POST", {});
    expect(again.status).toBe(409);
    expect(again.body.error).toContain("already approved");
    const asked = await call(ask, id, "POST", { question: "How heavy is your riding gear?" });
    expect(asked.status).toBe(409);
    expect(asked.body.error).toContain("Save a revision first");
  });

  it("revising after approval makes version 2; approving it supersedes 1 and says revised", async () => {
    const revised = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: stiffer } },
    });
    expect(revised.status).toBe(200);
    expect(revised.body).toMatchObject({ version: 2, newVersion: true });
    expect((await getRequestRow(id))!.request.status).toBe("in_review");
    const approved = await call(approve, id, "POST");
    expect(approved.body).toMatchObject({ version: 2, revised: true });
    const versions = await listVersions(id);
    expect(versions.map((v) => [v.version, v.state])).toEqual([
      [1, "superseded"],
      [2, "approved"],
    ]);
    // Earlier versions stay readable as they were approved.
    expect((versions[0]!.output as Recommendation).rear.chosenRate.kgfMm).toBeCloseTo(5.2, 9);
    await drainOutbox();
    expect(sent.at(-1)!.subject).toMatch(/^Revised setup sheet \(version 2\) for request \d+$/);
  });
});

describe("ask, decline, assign", () => {
  it("asks the rider: message stored, waiting for rider, question e-mailed", async () => {
    const id = stableUuid("request:r01");
    const res = await call(ask, id, "POST", { question: "Which shock linkage is fitted?" });
    expect(res.status).toBe(200);
    expect((await getRequestRow(id))!.request.status).toBe("waiting_for_rider");
    await drainOutbox();
    expect(sent.at(-1)!.subject).toMatch(/A question about your setup request/);
    expect(sent.at(-1)!.text).toContain("Which shock linkage is fitted?");
    const detail = await call(getDetail, id, "GET");
    expect(detail.body.messages).toMatchObject([{ author: "tuner", body: "Which shock linkage is fitted?" }]);
    const actions = (await listAuditForRequest(id)).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["request.status_changed", "request.question_asked", "email.sent"]));
  });

  it("declines with a reason once; a second decline, an approval or a save then answer 409", async () => {
    const id = stableUuid("request:r05");
    const short = await call(decline, id, "POST", { reason: "no" });
    expect(short.status).toBe(400);
    expect(short.body.fields).toHaveProperty("reason");
    const res = await call(decline, id, "POST", { reason: "We do not work on youth 85 cc forks." });
    expect(res.status).toBe(200);
    const row = (await getRequestRow(id))!.request;
    expect(row).toMatchObject({ status: "declined", declineReason: "We do not work on youth 85 cc forks." });
    await drainOutbox();
    expect(sent.at(-1)!.text).toContain("We do not work on youth 85 cc forks.");
    for (const [handler, method, body] of [
      [decline, "POST", { reason: "Declining once more." }],
      [approve, "POST", {}],
      [saveRecommendation, "PATCH", { basedOnVersion: 1, overrides: {} }],
      [ask, "POST", { question: "Anything else to add?" }],
    ] as const) {
      const r = await call(handler as Handler, id, method, body);
      expect(r.status).toBe(409);
      expect(r.body.error).toMatch(/declined/);
    }
  });

  it("assigns a submitted request to a tuner and moves it into review", async () => {
    const id = stableUuid("request:r02");
    const staff = await listStaffMembers();
    const ines = staff.find((s) => s.name === "Ines Harrowgate")!;
    const bad = await call(assign, id, "POST", { tunerId: "nobody" });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toHaveProperty("tunerId");
    const res = await call(assign, id, "POST", { tunerId: ines.id });
    expect(res.status).toBe(200);
    const row = await getRequestRow(id);
    expect(row).toMatchObject({ tunerName: "Ines Harrowgate", request: { status: "in_review" } });
    const assigned = (await listAuditForRequest(id)).find((e) => e.action === "request.assigned");
    expect(assigned?.detail).toMatchObject({ from: null, to: ines.id, toName: "Ines Harrowgate" });
  });

  it("two approvals racing on the same draft: exactly one wins, the other gets 409, one e-mail goes out", async () => {
    const id = stableUuid("request:r08");
    const before = sent.length;
    const results = await Promise.all([call(approve, id, "POST", {}), call(approve, id, "POST", {})]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    await drainOutbox();
    expect(sent.slice(before).filter((m) => m.to.includes("lotte.brightwater@example.test"))).toHaveLength(1);
    const approvals = (await listAuditForRequest(id)).filter((e) => e.action === "recommendation.approved");
    expect(approvals).toHaveLength(1);
    expect(approvals[0]!.detail).toMatchObject({ version: 1, superseded: [], criticalWarnings: [] });
  });

  it("a sanity warning holds approval until the tuner acknowledges it (lib/sizing/README.md, sanity limits)", async () => {
    const id = stableUuid("request:r04"); // 450 class, in review
    // A preload past the shock's own range (2–20 mm on the 450 class) is refused, naming the range.
    const outside = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: 60, preloadMm: 25 } },
    });
    expect(outside.status).toBe(400);
    expect(outside.body.fields?.["overrides.rear.preloadMm"]).toBe(
      "This shock's preload goes from 2 to 20 mm; 25 mm cannot be set.",
    );
    // k·p/LR(0) = 70·20/3.05 ≈ 459 N holds the ≈ 408 N static rear load: static sag 0 on a coil end.
    const saved = await call(saveRecommendation, id, "PATCH", {
      basedOnVersion: 1,
      overrides: { rear: { rateNmm: 70, preloadMm: 20 } },
    });
    expect(saved.status).toBe(200);
    const out = saved.body.output as Recommendation;
    const codes = out.warnings.filter((w) => w.requiresAcknowledgement).map((w) => w.code);
    expect(codes).toContain("REAR_STATIC_SAG_ZERO");
    const refused = await call(approve, id, "POST", {});
    expect(refused.status).toBe(409);
    expect(refused.body.fields?.acknowledgedWarnings).toContain("REAR_STATIC_SAG_ZERO");
    expect((await listVersions(id))[0]).toMatchObject({ state: "draft" });
    const partial = await call(approve, id, "POST", { acknowledgedWarnings: codes.slice(1) });
    expect(partial.status).toBe(409); // the first code is missing
    const ok = await call(approve, id, "POST", { acknowledgedWarnings: codes });
    expect(ok.status).toBe(200);
    const approvals = (await listAuditForRequest(id)).filter((e) => e.action === "recommendation.approved");
    expect(approvals.at(-1)!.detail).toMatchObject({ acknowledgedWarnings: codes });
  });

  it("answers 404 for an unknown or malformed id", async () => {
    expect((await call(getDetail, stableUuid("request:none"), "GET")).status).toBe(404);
    expect((await call(getDetail, "not-a-uuid", "GET")).status).toBe(404);
  });
});

describe("every staff endpoint refuses anonymous (401) and rider (403) callers", () => {
  const id = stableUuid("request:r03");
  const endpoints: [string, Handler, string, unknown][] = [
    ["GET detail", getDetail, "GET", undefined],
    ["PATCH recommendation", saveRecommendation, "PATCH", { basedOnVersion: 1, overrides: {} }],
    ["POST approve", approve, "POST", {}],
    ["POST ask", ask, "POST", { question: "A question for you." }],
    ["POST decline", decline, "POST", { reason: "A reason to decline." }],
    ["POST assign", assign, "POST", { tunerId: null }],
  ];
  it.each(endpoints)("%s", async (_name, handler, method, body) => {
    expect((await call(handler, id, method, body, "")).status).toBe(401);
    expect((await call(handler, id, method, body, rider)).status).toBe(403);
    // Nothing changed on the request.
    expect((await getRequestRow(id))!.request.status).toBe("submitted");
  });
});
