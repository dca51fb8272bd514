// Calibration from the shop's sag reports through GET/POST /api/shop/catalog/[id]/calibration: the
// contract's shape, who may call it, the refusal under 3 reports, and apply/undo changing the next
// recommendation for the model (and only the next), both audited.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET, POST } from "@/app/api/shop/catalog/[id]/calibration/route";
import { POST as reportSag } from "@/app/api/status/[id]/sag/route";
import { getDb } from "@/db/client";
import { auditEvents, bikeCalibrations, recommendationVersions } from "@/db/schema";
import { stableUuid } from "@/db/seed-demo";
import { demoStatusToken } from "@/lib/requests/token";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { submitSetupRequest } from "@/lib/requests/intake";
import { STANDARD_GRAVITY, catalogParameters, sizingDefaults, type Recommendation } from "@/lib/sizing";
import { requestAnswersSchema } from "@/lib/validations/request";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { idContext, jsonRequest, staffCookie } from "./admin-helpers";

setupTestApp({ seed: true, tempDataDir: true });

const model125 = stableUuid("bike:mx-125-2t");
const model450 = stableUuid("bike:mx-450-4t");
const url = (id: string) => `/api/shop/catalog/${id}/calibration`;
const spec125 = sizingDefaults.GENERIC_BIKE_CLASSES.find((c) => c.id === "mx-125-2t")!.spec;

interface Summary {
  reports: number;
  fit: null | {
    parameters: { rearSprungKg: number; frontSprungKg: number; riderRearShare: number };
    residualsMm: number[];
    rmsBeforeMm: number;
    rmsAfterMm: number;
  };
  applied: boolean;
  reason?: string;
  catalog: { rearSprungKg: number; frontSprungKg: number; riderRearShare: number };
}

async function get(id: string, cookie?: string) {
  const response = await GET(jsonRequest(url(id), "GET", cookie), idContext(id));
  return { status: response.status, body: (await response.json()) as Summary & { error?: string } };
}
async function post(id: string, cookie: string | undefined, body: unknown) {
  const response = await POST(jsonRequest(url(id), "POST", cookie, body), idContext(id));
  return {
    status: response.status,
    body: (await response.json()) as Summary & { error?: string; fields?: Record<string, string> },
  };
}

/** A new request on the 125 class from the same rider, as the public form would send it. */
async function newRecommendation(email: string): Promise<Recommendation> {
  const answers = requestAnswersSchema.parse({
    rider: {
      name: "Calibration Check",
      email,
      weight: { value: 72, unit: "kg" },
      gearIncluded: false,
      skill: "intermediate",
      style: "moderate",
    },
    riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 10 },
    bike: { modelId: model125, year: 2024 },
    feel: { complaints: [] },
    review: { consent: true },
  });
  const { id } = await submitSetupRequest(answers, []);
  const db = await getDb();
  const [version] = await db.select().from(recommendationVersions).where(eq(recommendationVersions.requestId, id));
  return version!.output as Recommendation;
}

async function auditOf(action: string) {
  const db = await getDb();
  return db.select().from(auditEvents).where(eq(auditEvents.action, action));
}

describe("who may see and change a calibration", () => {
  it("answers 401 without a session and 403 to a tuner, for reading and for applying", async () => {
    const tuner = await staffCookie("tuner@sagwise.test");
    expect((await get(model125)).status).toBe(401);
    expect((await get(model125, tuner)).status).toBe(403);
    expect((await post(model125, undefined, { action: "apply" })).status).toBe(401);
    expect((await post(model125, tuner, { action: "apply" })).status).toBe(403);
    const db = await getDb();
    expect(await db.select().from(bikeCalibrations)).toHaveLength(0);
  });

  it("answers 404 for an id that names no model, and 400 naming the field for a bad action", async () => {
    const admin = await staffCookie("owner@sagwise.test");
    expect((await get("not-a-uuid", admin)).status).toBe(404);
    expect((await get(stableUuid("bike:none"), admin)).status).toBe(404);
    const bad = await post(model125, admin, { action: "apply-everything" });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ action: "Choose apply or undo" });
  });
});

describe("the demo model's sag reports", () => {
  it("gives the contract's shape: reports, a fit with residuals and RMS before/after, applied", async () => {
    const admin = await staffCookie("owner@sagwise.test");
    const { status, body } = await get(model125, admin);
    expect(status).toBe(200);
    expect(body).toMatchObject({ reports: 6, applied: false });
    expect(Object.keys(body.fit!).sort()).toEqual(["parameters", "residualsMm", "rmsAfterMm", "rmsBeforeMm"]);
    // Four readings per report (static and race at both ends), one residual each.
    expect(body.fit!.residualsMm).toHaveLength(24);
    // Least squares can only lower the misfit of the catalog's loads (Strang, §4.3: the projection
    // is the closest point); the readings are whole mm, so what is left is rounding.
    expect(body.fit!.rmsAfterMm).toBeLessThan(body.fit!.rmsBeforeMm);
    expect(body.fit!.rmsAfterMm).toBeLessThan(1);
    // The catalog column is the model's weight split: sprung = m·(1−f) − unsprung (lib/sizing/README.md, loads).
    expect(body.catalog.rearSprungKg).toBeCloseTo(
      spec125.massKg * (1 - spec125.frontFraction) - spec125.unsprungRearKg,
      9,
    );
    // The seeded riders measured a bike heavier than the catalog says, at both ends.
    expect(body.fit!.parameters.rearSprungKg).toBeGreaterThan(body.catalog.rearSprungKg + 1);
    expect(body.fit!.parameters.frontSprungKg).toBeGreaterThan(body.catalog.frontSprungKg + 0.5);
  });

  it("refuses to fit fewer than 3 reports, says why, and refuses to apply (409, nothing stored)", async () => {
    const admin = await staffCookie("owner@sagwise.test");
    const none = await get(model450, admin);
    expect(none.body).toMatchObject({ reports: 0, fit: null, applied: false });
    expect(none.body.reason).toMatch(/at least 3/);
    // One real report from the rider of the approved demo request r09 (a 450).
    const r09 = stableUuid("request:r09");
    const sag = await reportSag(
      new Request(`${ORIGIN()}/api/status/${r09}/sag`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          token: demoStatusToken(resolveAuthSecret(), r09),
          unit: "mm",
          rear: { static: "34", race: "104" },
          front: { static: "30", race: "75" },
        }),
      }),
      idContext(r09),
    );
    expect(sag.status).toBe(201);
    const one = await get(model450, admin);
    expect(one.body).toMatchObject({ reports: 1, fit: null });
    expect(one.body.reason).toBe("1 sag report so far: the fit needs at least 3.");
    const apply = await post(model450, admin, { action: "apply" });
    expect(apply.status).toBe(409);
    expect(apply.body.error).toMatch(/at least 3/);
    expect((await post(model450, admin, { action: "undo" })).status).toBe(409);
    const db = await getDb();
    expect(await db.select().from(bikeCalibrations).where(eq(bikeCalibrations.bikeModelId, model450))).toHaveLength(0);
  });
});

describe("apply and undo", () => {
  it("apply changes the next recommendation and says it is calibrated; undo restores it; both audited", async () => {
    const admin = await staffCookie("owner@sagwise.test");
    const before = await newRecommendation("before.calibration@example.test");
    expect(before.resolved.calibration).toBeUndefined();
    const catalog = catalogParameters(spec125);
    // Static equilibrium, W = m·g (lib/sizing/README.md, loads): the catalog's own sprung mass.
    expect(before.resolved.loads.rearStaticN).toBeCloseTo(catalog.rearSprungKg * STANDARD_GRAVITY, 6);

    const applied = await post(model125, admin, { action: "apply" });
    expect(applied.status).toBe(200);
    expect(applied.body.applied).toBe(true);
    const fitted = applied.body.fit!.parameters;
    expect((await post(model125, admin, { action: "apply" })).status).toBe(409);

    const after = await newRecommendation("after.calibration@example.test");
    expect(after.resolved.calibration).toEqual({ reports: 6 });
    expect(after.resolved.loads.rearStaticN).toBeCloseTo(fitted.rearSprungKg * STANDARD_GRAVITY, 6);
    expect(after.resolved.riderRearShare).toBeCloseTo(fitted.riderRearShare, 9);
    expect(after.reasons.join(" ")).toMatch(/calibrated from 6 sag reports/);
    // More load for the same race-sag target takes more preload or a stiffer spring (Hooke's law, F = k·x).
    const setup = (r: Recommendation) => ({ rateNmm: r.rear.chosenRate.nMm, preloadMm: r.rear.preloadMm });
    expect(setup(after)).not.toEqual(setup(before));

    const [appliedEvent] = await auditOf("calibration.applied");
    expect(appliedEvent).toMatchObject({ requestId: null, actorLabel: "Mara Quillfeather" });
    expect(appliedEvent!.detail).toMatchObject({ bikeModelId: model125, reports: 6, parameters: fitted });

    const undone = await post(model125, admin, { action: "undo" });
    expect(undone.status).toBe(200);
    expect(undone.body.applied).toBe(false);
    expect((await post(model125, admin, { action: "undo" })).status).toBe(409);
    const restored = await newRecommendation("restored.calibration@example.test");
    expect(restored.resolved.calibration).toBeUndefined();
    expect(restored.resolved.loads).toEqual(before.resolved.loads);
    expect(restored.rear.preloadMm).toBe(before.rear.preloadMm);
    expect(restored.front.preloadMm).toBe(before.front.preloadMm);

    const [undoneEvent] = await auditOf("calibration.undone");
    expect(undoneEvent).toMatchObject({ requestId: null, actorLabel: "Mara Quillfeather" });

    // History kept, nothing active; the calibrated recommendation keeps what made it.
    const db = await getDb();
    const rows = await db.select().from(bikeCalibrations).where(eq(bikeCalibrations.bikeModelId, model125));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({
      reports: 6,
      appliedByLabel: "Mara Quillfeather",
      undoneByLabel: "Mara Quillfeather",
    });
    expect(rows[0]!.undoneAt).toBeInstanceOf(Date);
    const kept = await db
      .select({ output: recommendationVersions.output, input: recommendationVersions.input })
      .from(recommendationVersions)
      .where(and(eq(recommendationVersions.version, 1)));
    const calibratedKept = kept.filter((v) => (v.output as Recommendation).resolved.calibration);
    expect(calibratedKept).toHaveLength(1);
    expect((calibratedKept[0]!.input as { bike: { calibration?: unknown } }).bike.calibration).toMatchObject({
      reports: 6,
    });
  });
});
