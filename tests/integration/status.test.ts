// The rider's side after submitting: a status token or the rider's own session opens the request and
// nothing else; the rider answers the tuner's question; the sag follow-up is judged at once; photos
// reach only staff and the request's rider.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/requests/route";
import { POST as answer } from "@/app/api/status/[id]/answer/route";
import { POST as sag } from "@/app/api/status/[id]/sag/route";
import { GET as photo } from "@/app/api/uploads/[id]/route";
import { getDb } from "@/db/client";
import { recommendationVersions, requestMessages, sagReports, setupRequests, uploads } from "@/db/schema";
import { listAuditForRequest } from "@/db/queries/audit";
import { findRequestForViewer, loadRiderStatus } from "@/db/queries/status";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { demoStatusToken } from "@/lib/requests/token";
import { sagVerdict, type Recommendation, type SizingInput } from "@/lib/sizing";
import { setupTestApp } from "../helpers/app";
import { fromClient } from "../helpers/client";
import { cookieFrom, ORIGIN, signInStaff, signInWithEmailLink } from "../helpers/auth";
import { tinyPng } from "../fixtures/images";

const app = setupTestApp({ seed: true, tempDataDir: true });
const id = (key: string) => stableUuid(`request:${key}`);
const token = (key: string) => demoStatusToken(resolveAuthSecret(), id(key));

const params = (value: string) => ({ params: Promise.resolve({ id: value }) });
let ip = 0;
const postTo = (handler: typeof answer, requestId: string, body: unknown, cookie?: string) =>
  handler(
    new Request(`${ORIGIN()}/api/status/${requestId}/x`, {
      method: "POST",
      headers: {
        "content-type": "application/json",
        ...fromClient(`10.1.${++ip >> 8}.${ip & 255}`),
        ...(cookie ? { cookie } : {}),
      },
      body: JSON.stringify(body),
    }),
    params(requestId),
  );

describe("who may open a request", () => {
  it("a token opens its own request only; a rider's session only requests made with that e-mail", async () => {
    expect(await findRequestForViewer({ token: token("r09") })).toBe(id("r09"));
    expect(await findRequestForViewer({ token: token("r09") }, id("r09"))).toBe(id("r09"));
    expect(await findRequestForViewer({ token: token("r09") }, id("r07"))).toBeNull();
    expect(await findRequestForViewer({ token: `${token("r09")}x` })).toBeNull();
    expect(await findRequestForViewer({ email: "Dario.Lindqvist@example.test" }, id("r09"))).toBe(id("r09"));
    expect(await findRequestForViewer({ email: "dario.lindqvist@example.test" }, id("r07"))).toBeNull();
    expect(await findRequestForViewer({ email: "dario.lindqvist@example.test" })).toBeNull();
  });

  it("the status view holds the approved versions, the question and the decline reason", async () => {
    const approved = await loadRiderStatus(id("r09"));
    expect(approved!.versions.map((v) => [v.version, v.state])).toEqual([[1, "approved"]]);
    const waiting = await loadRiderStatus(id("r07"));
    expect(waiting!.versions).toEqual([]);
    expect(waiting!.messages.map((m) => m.author)).toEqual(["tuner"]);
    const declined = await loadRiderStatus(id("r12"));
    expect(declined!.request.declineReason).toMatch(/cartridge/);
  });
});

describe("POST /api/status/:id/answer", () => {
  it("another rider's token changes nothing (404)", async () => {
    const response = await postTo(answer, id("r07"), { token: token("r09"), body: "Original linkage." });
    expect(response.status).toBe(404);
    const [row] = await (
      await getDb()
    )
      .select()
      .from(setupRequests)
      .where(eq(setupRequests.id, id("r07")));
    expect(row!.status).toBe("waiting_for_rider");
  });

  it("an empty answer is refused naming the field", async () => {
    const response = await postTo(answer, id("r07"), { token: token("r07"), body: " " });
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string> }).fields).toHaveProperty("body");
  });

  it("the rider's answer is stored, the request goes back to review, and it is audited", async () => {
    const response = await postTo(answer, id("r07"), { token: token("r07"), body: "Original linkage, never lowered." });
    expect(response.status).toBe(201);
    const db = await getDb();
    const [row] = await db
      .select()
      .from(setupRequests)
      .where(eq(setupRequests.id, id("r07")));
    expect(row!.status).toBe("in_review");
    const messages = await db
      .select()
      .from(requestMessages)
      .where(and(eq(requestMessages.requestId, id("r07")), eq(requestMessages.author, "rider")));
    expect(messages.map((m) => m.body)).toEqual(["Original linkage, never lowered."]);
    expect((await listAuditForRequest(id("r07"))).at(-1)).toMatchObject({
      action: "request.rider_answered",
      actorLabel: "rider",
    });
    // Answering again when nothing is asked: 409, nothing added.
    expect((await postTo(answer, id("r07"), { token: token("r07"), body: "Again" })).status).toBe(409);
  });

  it("a signed-in rider answers without a token; another rider's session sees nothing", async () => {
    const other = await signInWithEmailLink("jesper.dunmore@example.test", app.sent);
    expect((await postTo(answer, id("r08"), { body: "Mostly seated." }, other.cookie)).status).toBe(404);
    expect((await postTo(answer, id("r08"), { body: "Mostly seated." })).status).toBe(401);
    const own = await signInWithEmailLink("lotte.brightwater@example.test", app.sent);
    expect((await postTo(answer, id("r08"), { body: "Mostly seated, about half." }, own.cookie)).status).toBe(201);
  });
});

describe("POST /api/status/:id/sag", () => {
  it("converts inches to mm, answers with the engine's verdict per end, and stores the report", async () => {
    const body = {
      token: token("r09"),
      unit: "in",
      rear: { free: "1.1", static: "1.3", race: "4.1" },
      front: { static: "1.2", race: "2.3" },
    };
    const response = await postTo(sag, id("r09"), body);
    expect(response.status).toBe(201);
    const result = (await response.json()) as {
      measured: { mm: Record<string, { freeMm: number | null; staticMm: number; raceMm: number }> };
      verdict: Record<string, { verdict: string; message: string }>;
    };
    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
    expect(result.measured.mm.rear).toEqual({ freeMm: 27.94, staticMm: 33.02, raceMm: 104.14 });
    expect(result.measured.mm.front).toEqual({ freeMm: null, staticMm: 30.48, raceMm: 58.42 });

    const db = await getDb();
    const [version] = await db
      .select()
      .from(recommendationVersions)
      .where(eq(recommendationVersions.requestId, id("r09")));
    for (const [end, m] of [
      ["rear", { staticSagMm: 33.02, raceSagMm: 104.14 }],
      ["front", { staticSagMm: 30.48, raceSagMm: 58.42 }],
    ] as const) {
      const expected = sagVerdict({
        input: version!.input as SizingInput,
        recommendation: version!.output as Recommendation,
        end,
        measured: m,
      });
      expect(result.verdict[end]!.verdict).toBe(expected.verdict);
      expect(result.verdict[end]!.message).toBe(expected.message);
    }
    const [stored] = await db
      .select()
      .from(sagReports)
      .where(eq(sagReports.requestId, id("r09")));
    expect(stored!.versionId).toBe(version!.id);
    expect(stored!.measured).toMatchObject({ asGiven: { unit: "in", rear: { free: 1.1, static: 1.3, race: 4.1 } } });
    expect((await listAuditForRequest(id("r09"))).at(-1)).toMatchObject({ action: "sag.reported" });
  });

  it("refuses race sag not larger than static sag, naming the field", async () => {
    const response = await postTo(sag, id("r09"), {
      token: token("r09"),
      unit: "mm",
      rear: { static: "100", race: "35" },
      front: {},
    });
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string> }).fields["rear.race"]).toMatch(
      /larger than static/,
    );
  });

  it("refuses race sag beyond the travel (engine check) naming the field", async () => {
    const response = await postTo(sag, id("r09"), {
      token: token("r09"),
      unit: "mm",
      rear: { static: "30", race: "320" },
      front: {},
    });
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string> }).fields["rear.race"]).toMatch(
      /less than the travel/,
    );
  });

  it("is refused before approval (409) and with another rider's token (404)", async () => {
    expect(
      (
        await postTo(sag, id("r01"), {
          token: token("r01"),
          unit: "mm",
          rear: { static: "30", race: "100" },
          front: {},
        })
      ).status,
    ).toBe(409);
    expect(
      (
        await postTo(sag, id("r10"), {
          token: token("r09"),
          unit: "mm",
          rear: { static: "30", race: "100" },
          front: {},
        })
      ).status,
    ).toBe(404);
  });
});

describe("GET /api/uploads/:id", () => {
  it("serves a photo to its rider and staff only, as an inline image that is never sniffed", async () => {
    const form = new FormData();
    form.set(
      "answers",
      JSON.stringify({
        rider: {
          name: "Photo Rider",
          email: "photo.rider@example.test",
          weight: { value: 75, unit: "kg" },
          gearIncluded: true,
          skill: "novice",
          style: "smooth",
        },
        riding: { discipline: "trail", terrain: [], jumpSize: "none" },
        bike: { modelId: stableUuid("bike:enduro-300-2t") },
        feel: { complaints: [] },
        review: { consent: true },
      }),
    );
    const png = tinyPng();
    form.append("photos", new File([png as BlobPart], "<script>.html", { type: "text/html" }));
    const created = await submit(
      new Request(`${ORIGIN()}/api/requests`, { method: "POST", body: form, headers: fromClient("10.2.0.1") }),
      undefined as never,
    );
    expect(created.status).toBe(201);
    const { id: requestId, statusUrl } = (await created.json()) as { id: string; statusUrl: string };
    const riderToken = statusUrl.split("/").pop()!;
    const [upload] = await (await getDb()).select().from(uploads).where(eq(uploads.requestId, requestId));

    const get = (query: string, cookie?: string) =>
      photo(
        new Request(`${ORIGIN()}/api/uploads/${upload!.id}${query}`, { headers: cookie ? { cookie } : {} }),
        params(upload!.id),
      );

    const byToken = await get(`?token=${riderToken}`);
    expect(byToken.status).toBe(200);
    expect(byToken.headers.get("content-type")).toBe("image/png");
    expect(byToken.headers.get("content-disposition")).toBe('inline; filename="photo-1.png"');
    expect(byToken.headers.get("x-content-type-options")).toBe("nosniff");
    expect(new Uint8Array(await byToken.arrayBuffer())).toEqual(png);

    expect((await get(`?token=${token("r09")}`)).status).toBe(404);
    expect((await get("")).status).toBe(401);
    const otherRider = await signInWithEmailLink("dario.lindqvist@example.test", app.sent);
    expect((await get("", otherRider.cookie)).status).toBe(404);
    const ownRider = await signInWithEmailLink("photo.rider@example.test", app.sent);
    expect((await get("", ownRider.cookie)).status).toBe(200);
    const staff = cookieFrom(await signInStaff("tuner@sagwise.test", "sagwise-demo"));
    expect((await get("", staff)).status).toBe(200);
    const badId = await photo(
      new Request(`${ORIGIN()}/api/uploads/not-a-uuid`, { headers: { cookie: staff } }),
      params("not-a-uuid"),
    );
    expect(badId.status).toBe(404);
  });
});
