// POST /api/requests and GET /api/bikes against a fresh seeded database: a valid request is stored
// with recommendation version 1 in one go; every kind of bad input is refused naming the field and
// leaves no row and no file; the limiter answers 429.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { count, eq } from "drizzle-orm";
import { http, HttpResponse } from "msw";
import { describe, expect, it } from "vitest";
import { GET as listBikes } from "@/app/api/bikes/route";
import { POST as submit } from "@/app/api/requests/route";
import { getDb } from "@/db/client";
import { bikeModels, recommendationVersions, setupRequests, uploads } from "@/db/schema";
import { findRequestIdByStatusToken } from "@/db/queries/status-links";
import { listOutboundEmailsForRequest } from "@/db/queries/outbound-emails";
import { mailBaseUrl } from "@/lib/env";
import { drainOutbox, startOutboxWorker, stopOutboxWorker } from "@/lib/mail";
import { listAuditForRequest } from "@/db/queries/audit";
import { stableUuid } from "@/db/seed-demo";
import { recommendationSchema } from "@/lib/sizing";
import { setupTestApp } from "../helpers/app";
import { fromClient } from "../helpers/client";
import { ORIGIN } from "../helpers/auth";
import { heicHeader, pdfBytes, tinyJpeg, tinyPng } from "../fixtures/images";

const app = setupTestApp({ seed: true, tempDataDir: true });
let ip = 0;

const bike450 = stableUuid("bike:mx-450-4t");

function answers(overrides: Record<string, unknown> = {}) {
  return {
    rider: {
      name: "Test Rider",
      email: "Test.Rider@Example.test",
      weight: { value: 180, unit: "lb" },
      gearIncluded: false,
      skill: "intermediate",
      style: "moderate",
    },
    riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 10 },
    bike: { modelId: bike450, year: 2023 },
    feel: { complaints: ["bottoming"], notes: "Bottoms on the big table." },
    review: { consent: true },
    ...overrides,
  };
}

// Each call comes from its own address unless a test asks otherwise, so the limiter stays out of the way.
const post = (body: BodyInit, headers: Record<string, string> = {}, from = `10.0.${++ip >> 8}.${ip & 255}`) =>
  submit(
    new Request(`${ORIGIN()}/api/requests`, { method: "POST", body, headers: { ...fromClient(from), ...headers } }),
    undefined as never,
  );
const postJson = (value: unknown, from?: string) =>
  post(JSON.stringify(value), { "content-type": "application/json" }, from);
function postForm(value: unknown, files: { bytes: Uint8Array; name: string; type: string }[] = []) {
  const form = new FormData();
  form.set("answers", typeof value === "string" ? value : JSON.stringify(value));
  for (const f of files) form.append("photos", new File([f.bytes as BlobPart], f.name, { type: f.type }));
  return post(form);
}

async function counts() {
  const db = await getDb();
  const [requests] = await db.select({ n: count() }).from(setupRequests);
  const [files] = await db.select({ n: count() }).from(uploads);
  let onDisk: string[] = [];
  try {
    onDisk = readdirSync(path.join(app.dataDir, "uploads"));
  } catch {
    // No upload yet.
  }
  return { requests: Number(requests?.n), uploads: Number(files?.n), onDisk: onDisk.length };
}

describe("POST /api/requests, valid", () => {
  it("stores the answers as given, the rider in kg, version 1 from the engine, and e-mails the status link", async () => {
    const response = await postJson(answers());
    expect(response.status).toBe(201);
    const body = (await response.json()) as { id: string; statusUrl: string };
    const token = /^\/status\/([A-Za-z0-9_-]{40,})$/.exec(body.statusUrl)?.[1];
    expect(token).toBeTruthy();
    expect(await findRequestIdByStatusToken(token!)).toBe(body.id);

    const db = await getDb();
    const [row] = await db.select().from(setupRequests).where(eq(setupRequests.id, body.id));
    expect(row).toMatchObject({
      status: "submitted",
      riderEmail: "test.rider@example.test",
      bikeModelId: bike450,
      bikeClass: "mx-450-4t",
      bikeYear: 2023,
    });
    expect(row!.bikeLabel).toBe("450 four-stroke motocross (typical values)");
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B): 180 lb = 81.6466266 kg.
    expect(row!.riderMassKg).toBeCloseTo(81.6466266, 6);
    expect((row!.answers as { rider: { weight: unknown } }).rider.weight).toEqual({ value: 180, unit: "lb" });

    const versions = await db
      .select()
      .from(recommendationVersions)
      .where(eq(recommendationVersions.requestId, body.id));
    expect(versions).toHaveLength(1);
    expect(versions[0]).toMatchObject({ version: 1, state: "draft" });
    const output = recommendationSchema.parse(versions[0]!.output);
    expect(output.input.rider.massKg).toBeCloseTo(81.6466266, 6);
    expect(output.rear.chosenRate.nMm).toBeGreaterThan(0);
    expect(versions[0]!.engineVersion).toBe(output.engineVersion);

    // The confirmation was queued with the request; once the worker has sent it, it is audited.
    expect((await listAuditForRequest(body.id)).map((a) => a.action)).toEqual(["request.submitted"]);
    await drainOutbox();
    const audit = await listAuditForRequest(body.id);
    // Two e-mails: the rider's confirmation and the shop's notice of a new request (lib/notify-staff.ts).
    expect(audit.map((a) => a.action)).toEqual(["request.submitted", "email.sent", "email.sent"]);
    expect(
      audit
        .map((a) => (a.detail as { template?: string }).template)
        .slice(1)
        .sort(),
    ).toEqual(["request-received", "staff-notice"]);
    const mail = app.sent.find((m) => m.to.includes("test.rider@example.test") && m.text.includes(body.statusUrl))!;
    expect(mail.to).toEqual(["test.rider@example.test"]);
    expect(mail.text).toContain(body.statusUrl);
  });

  it("answers 201 while the e-mail API hangs: the submit never waits for the confirmation", async () => {
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    let calls = 0;
    app.server.use(
      http.post(`${mailBaseUrl()}/emails`, async () => {
        calls += 1;
        await held;
        return HttpResponse.json({ id: "sent-after-the-answer" });
      }),
    );
    startOutboxWorker();
    try {
      const response = await postJson(answers({ rider: { ...answers().rider, email: "patient.rider@example.test" } }));
      expect(response.status).toBe(201);
      const { id } = (await response.json()) as { id: string };
      const riderMail = async () =>
        (await listOutboundEmailsForRequest(id)).find((r) => r.template === "request-received");
      // Queued with the request in its transaction; the worker was kicked and is now waiting on the API.
      expect(await riderMail()).toMatchObject({ toAddress: "patient.rider@example.test", status: "queued" });
      // The first of the two e-mails (the rider's confirmation, the shop's notice) is held by the API;
      // the worker sends one at a time, so the other waits behind it, still queued.
      await expect.poll(() => calls, { timeout: 10_000 }).toBe(1);
      expect((await riderMail())?.status).toBe("queued");
      release();
      await stopOutboxWorker();
      expect((await riderMail())?.status).toBe("sent");
    } finally {
      release();
      await stopOutboxWorker();
    }
  });

  it("keeps photos by their content with a SHA-256, the name only as text", async () => {
    const png = tinyPng();
    const jpeg = tinyJpeg(2048);
    const response = await postForm(answers(), [
      { bytes: png, name: "../../etc/passwd.jpg", type: "image/jpeg" },
      { bytes: jpeg, name: "fork.jpeg", type: "image/jpeg" },
    ]);
    expect(response.status).toBe(201);
    const { id } = (await response.json()) as { id: string };
    const db = await getDb();
    const rows = await db.select().from(uploads).where(eq(uploads.requestId, id));
    expect(rows.map((r) => [r.originalName, r.contentType, r.sizeBytes]).sort()).toEqual([
      ["../../etc/passwd.jpg", "image/png", png.byteLength],
      ["fork.jpeg", "image/jpeg", 2048],
    ]);
    for (const row of rows) {
      expect(row.storageKey).toMatch(/^[0-9a-f-]{36}\.(png|jpg)$/);
      const onDisk = readFileSync(path.join(app.dataDir, "uploads", row.storageKey));
      // SHA-256 by WebCrypto (FIPS 180-4), a second implementation beside the one that stored it.
      const digest = Buffer.from(await crypto.subtle.digest("SHA-256", onDisk)).toString("hex");
      expect(row.sha256).toBe(digest);
    }
  });

  it("sizes a bike the shop does not list on the nearest generic class, with a note for the tuner", async () => {
    const response = await postJson(
      answers({
        bike: {
          modelId: null,
          notListed: {
            description: "Home-built 350 enduro",
            rearWheelTravel: { value: 13, unit: "in" },
            forkTravel: { value: 11.8, unit: "in" },
            mass: { value: 240, unit: "lb" },
          },
        },
      }),
    );
    expect(response.status).toBe(201);
    const { id } = (await response.json()) as { id: string };
    const db = await getDb();
    const [row] = await db.select().from(setupRequests).where(eq(setupRequests.id, id));
    expect(row).toMatchObject({ bikeModelId: null, bikeClass: null, bikeLabel: "Home-built 350 enduro" });
    const [version] = await db.select().from(recommendationVersions).where(eq(recommendationVersions.requestId, id));
    const output = recommendationSchema.parse(version!.output);
    // 13 in = 330.2 mm (1 in = 25.4 mm exactly, NIST SP 811): nearest class is the 330 mm enduro one.
    expect(output.input.bike.rear.wheelTravelMm).toBe(330);
    // 240 lb × 0.45359237 = 108.8621688 kg (NIST SP 811).
    expect(output.input.bike.massKg).toBeCloseTo(108.8621688, 6);
    expect(output.warnings[0]).toMatchObject({ code: "BIKE_NOT_LISTED", severity: "caution" });
    expect(output.warnings[0]!.message).toContain("300 two-stroke enduro (typical values)");
    expect(output.reasons[0]).toContain("must check every figure");
  });
});

describe("POST /api/requests, refused", () => {
  const cases: [string, unknown, string][] = [
    ["missing e-mail", answers({ rider: { ...answers().rider, email: "" } }), "rider.email"],
    ["bad e-mail", answers({ rider: { ...answers().rider, email: "rider@" } }), "rider.email"],
    [
      "negative weight",
      answers({ rider: { ...answers().rider, weight: { value: -5, unit: "kg" } } }),
      "rider.weight.value",
    ],
    [
      "unknown unit",
      answers({ rider: { ...answers().rider, weight: { value: 80, unit: "stone" } } }),
      "rider.weight.unit",
    ],
    ["unknown discipline", answers({ riding: { ...answers().riding, discipline: "ice-racing" } }), "riding.discipline"],
    ["no bike", answers({ bike: { modelId: null } }), "bike.modelId"],
    ["unknown bike", answers({ bike: { modelId: "00000000-0000-4000-8000-000000000000" } }), "bike.modelId"],
    [
      "not listed without travel",
      answers({
        bike: { modelId: null, notListed: { description: "Old twin-shock", forkTravel: { value: 250, unit: "mm" } } },
      }),
      "bike.notListed.rearWheelTravel",
    ],
    [
      "not listed, bike weight a typo",
      answers({
        bike: {
          modelId: null,
          notListed: {
            description: "Tiny",
            rearWheelTravel: { value: 300, unit: "mm" },
            forkTravel: { value: 300, unit: "mm" },
            mass: { value: 12, unit: "kg" },
          },
        },
      }),
      "bike.notListed.mass.value",
    ],
    ["no consent", answers({ review: { consent: false } }), "review.consent"],
  ];

  it.each(cases)("%s: 400 naming the field, nothing written", async (_name, body, field) => {
    const before = await counts();
    const response = await postJson(body);
    expect(response.status).toBe(400);
    const json = (await response.json()) as { error: string; fields: Record<string, string> };
    expect(Object.keys(json.fields)).toContain(field);
    expect(json.fields[field]!.length).toBeGreaterThan(5);
    expect(await counts()).toEqual(before);
  });

  it("refuses answers that are not JSON", async () => {
    const before = await counts();
    const response = await postForm("{not json");
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string> }).fields).toHaveProperty("answers");
    expect(await counts()).toEqual(before);
  });

  const photoCases: [string, { bytes: Uint8Array; name: string; type: string }[], number, string, RegExp][] = [
    [
      "a text file renamed .jpg",
      [{ bytes: new TextEncoder().encode("just some text, not a photo"), name: "bike.jpg", type: "image/jpeg" }],
      400,
      "photos.0",
      /not a JPEG, PNG or WebP/,
    ],
    [
      "a PDF named .png after a good photo",
      [
        { bytes: tinyPng(), name: "ok.png", type: "image/png" },
        { bytes: pdfBytes(), name: "manual.png", type: "image/png" },
      ],
      400,
      "photos.1",
      /not a JPEG, PNG or WebP/,
    ],
    [
      "a HEIC photo",
      [{ bytes: heicHeader(), name: "IMG_0001.HEIC", type: "image/heic" }],
      400,
      "photos.0",
      /HEIC.*JPEG/,
    ],
    [
      "an oversize photo",
      [{ bytes: tinyJpeg(10 * 1024 * 1024 + 1), name: "huge.jpg", type: "image/jpeg" }],
      413,
      "photos.0",
      /at most 10 MB/,
    ],
    [
      "seven photos",
      Array.from({ length: 7 }, (_, i) => ({ bytes: tinyPng(), name: `p${i}.png`, type: "image/png" })),
      400,
      "photos",
      /at most 6 photos/,
    ],
  ];

  it.each(photoCases)(
    "%s: refused naming the photo, no row and no file",
    async (_name, files, status, field, message) => {
      const before = await counts();
      const response = await postForm(answers(), files);
      expect(response.status).toBe(status);
      const json = (await response.json()) as { fields: Record<string, string> };
      expect(json.fields[field]).toMatch(message);
      expect(await counts()).toEqual(before);
    },
  );

  it("answers 415 to a body that is neither JSON nor a form", async () => {
    const response = await post("rider=me", { "content-type": "text/plain" });
    expect(response.status).toBe(415);
  });

  it("limits each client to 8 submissions per 15 minutes, then 429 with Retry-After", async () => {
    const from = "192.0.2.77";
    const statuses: number[] = [];
    for (let i = 0; i < 8; i++) statuses.push((await postJson(answers({ review: { consent: false } }), from)).status);
    expect(statuses).toEqual(Array(8).fill(400));
    const limited = await postJson(answers(), from);
    expect(limited.status).toBe(429);
    const retryAfter = Number(limited.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    expect(((await limited.json()) as { error: string }).error).toMatch(/Try again in \d+ seconds/);
    // Another client is not affected.
    expect((await postJson(answers(), "192.0.2.78")).status).toBe(201);
  });
});

describe("GET /api/bikes", () => {
  const bikes = async (q = "") => {
    const response = await listBikes(new Request(`${ORIGIN()}/api/bikes${q}`), undefined as never);
    expect(response.status).toBe(200);
    return (
      (await response.json()) as {
        items: { id: string; name: string; bikeClass: string; travel: { rearWheelMm: number; forkMm: number } }[];
      }
    ).items;
  };

  it("searches the active catalog by name and hides retired models", async () => {
    expect((await bikes()).length).toBe(5);
    const found = await bikes("?q=450");
    expect(found).toEqual([
      {
        id: bike450,
        name: "450 four-stroke motocross (typical values)",
        bikeClass: "mx-450-4t",
        typical: true,
        travel: { rearWheelMm: 310, forkMm: 310 },
      },
    ]);
    const db = await getDb();
    await db
      .update(bikeModels)
      .set({ retiredAt: new Date() })
      .where(eq(bikeModels.id, stableUuid("bike:youth-85")));
    expect((await bikes("?q=85")).length).toBe(0);
    expect((await bikes()).map((b) => b.bikeClass)).not.toContain("youth-85");
  });
});
