// Loads the invented demo scenario (db/seed-data.ts). Every row has a stable key (settings id,
// e-mail, slug, a name-derived uuid), and each insert skips what is already there, so running the
// seed twice changes nothing.
import { count, eq } from "drizzle-orm";
import { getDb, type AppDb } from "@/db/client";
import {
  auditEvents,
  bikeModels,
  clickerRules,
  recommendationVersions,
  requestMessages,
  sagReports,
  setupRequests,
  setupTargets,
  shopSettings,
  springStock,
  user,
} from "@/db/schema";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { ensureStaffUser } from "@/lib/auth/staff";
import { getEnv } from "@/lib/env";
import { buildSizingInput } from "@/lib/requests/sizing-input";
import { demoStatusToken, statusPath } from "@/lib/requests/token";
import { defaultTargetValues } from "@/lib/shop/targets";
import {
  DISCIPLINES,
  SKILL_LEVELS,
  bikeSpecSchema,
  catalogParameters,
  evaluateSetup,
  recommend,
  sagVerdict,
  sizingDefaults,
  type BikeSpecInput,
  type Recommendation,
  type SizingInput,
} from "@/lib/sizing";
import { requestAnswersSchema } from "@/lib/validations/request";
import { loadShopSizingContext } from "./queries/sizing-context";
import { createStatusLink } from "./queries/status-links";
import { seedNotices } from "./seed-notices";
import { seedService } from "./seed-service";
import {
  DEMO_CALIBRATION_TRUTH,
  DEMO_REQUESTS,
  DEMO_SHOP,
  DEMO_STAFF,
  stableUuid,
  type DemoRequest,
} from "./seed-data";

export { stableUuid };

async function seedShop(db: AppDb) {
  await db
    .insert(shopSettings)
    .values({ id: 1, ...DEMO_SHOP })
    .onConflictDoNothing();
}

async function seedStaff(): Promise<Map<string, { id: string; name: string }>> {
  const password = getEnv().DEMO_PASSWORD;
  const staff = new Map<string, { id: string; name: string }>();
  for (const member of DEMO_STAFF) {
    const { id } = await ensureStaffUser({ ...member, password });
    staff.set(member.email, { id, name: member.name });
  }
  return staff;
}

async function seedCatalog(db: AppDb): Promise<Map<string, { id: string; name: string; spec: BikeSpecInput }>> {
  const bikes = new Map<string, { id: string; name: string; spec: BikeSpecInput }>();
  for (const bike of sizingDefaults.GENERIC_BIKE_CLASSES) {
    const spec = bikeSpecSchema.parse(bike.spec);
    const id = stableUuid(`bike:${bike.id}`);
    await db
      .insert(bikeModels)
      .values({
        id,
        slug: bike.id,
        name: bike.name,
        bikeClass: bike.id,
        isTypical: true,
        forkKind: spec.fork.kind,
        rearWheelTravelMm: spec.rear.wheelTravelMm,
        spec,
        notes: "Generic class with typical values, not any maker's data. Add your real models.",
      })
      .onConflictDoNothing();
    bikes.set(bike.id, { id, name: bike.name, spec: bike.spec });
  }

  const [stockCount] = await db.select({ n: count() }).from(springStock);
  if (Number(stockCount?.n ?? 0) === 0) {
    const rows = [
      ...sizingDefaults.TYPICAL_FORK_RATES_NMM.map((rateNmm, i) => ({
        id: stableUuid(`fork-spring:${i}`),
        end: "fork",
        rateNmm,
        quantity: 2 + (i % 3) * 2,
        freeLengthMm: 480,
        innerDiameterMm: 26.5,
      })),
      ...sizingDefaults.TYPICAL_SHOCK_RATES_NMM.map((rateNmm, i) => ({
        id: stableUuid(`shock-spring:${i}`),
        end: "shock",
        rateNmm,
        quantity: 1 + (i % 3),
        freeLengthMm: 260,
        innerDiameterMm: 61,
      })),
    ];
    await db.insert(springStock).values(rows).onConflictDoNothing();
  }

  for (const discipline of DISCIPLINES) {
    for (const skill of SKILL_LEVELS) {
      await db
        .insert(setupTargets)
        .values({ discipline, skill, values: defaultTargetValues(discipline, skill) })
        .onConflictDoNothing();
    }
  }

  const [ruleCount] = await db.select({ n: count() }).from(clickerRules);
  if (Number(ruleCount?.n ?? 0) === 0) {
    await db.insert(clickerRules).values(
      sizingDefaults.DEFAULT_CLICKER_RULES.map((rule, i) => ({
        id: stableUuid(`clicker-rule:${i}`),
        rule,
        sortOrder: i,
      })),
    );
  }
  return bikes;
}

/**
 * The sag a rider would read (whole mm) on the springs and settings of `output`, on a bike whose
 * real sprung masses are DEMO_CALIBRATION_TRUTH's: the engine's own force law with those loads
 * (the recommendation's settings given back as overrides, so only the loads change).
 */
function demoSagReading(input: SizingInput, output: Recommendation) {
  const catalog = catalogParameters(input.bike);
  const truth = {
    ...catalog,
    rearSprungKg: catalog.rearSprungKg + DEMO_CALIBRATION_TRUTH.extraRearSprungKg,
    frontSprungKg: catalog.frontSprungKg + DEMO_CALIBRATION_TRUTH.extraFrontSprungKg,
  };
  const real = evaluateSetup(
    { ...input, bike: { ...input.bike, calibration: { ...truth, reports: 1 } } },
    {
      rear: { rateNmm: output.rear.chosenRate.nMm, preloadMm: output.rear.preloadMm },
      front: {
        rateNmm: output.front.chosenRate?.nMm,
        preloadMm: output.front.preloadMm ?? undefined,
        oilLevelMm: output.front.oilLevelMm ?? undefined,
      },
    },
  );
  const end = (p: { staticSagMm: number; raceSagMm: number }) => ({
    static: Math.round(p.staticSagMm),
    race: Math.round(p.raceSagMm),
  });
  const given = { rear: end(real.rear.predicted), front: end(real.front.predicted) };
  const mm = {
    rear: { freeMm: null, staticMm: given.rear.static, raceMm: given.rear.race },
    front: { freeMm: null, staticMm: given.front.static, raceMm: given.front.race },
  };
  const verdict = Object.fromEntries(
    (["front", "rear"] as const).map((e) => [
      e,
      sagVerdict({
        input,
        recommendation: output,
        end: e,
        measured: { staticSagMm: mm[e].staticMm, raceSagMm: mm[e].raceMm },
      }),
    ]),
  );
  return { measured: { asGiven: { unit: "mm" as const, ...given }, mm }, verdict };
}

async function seedRequest(
  db: AppDb,
  demo: DemoRequest,
  bike: { id: string; name: string; spec: BikeSpecInput },
  staff: Map<string, { id: string; name: string }>,
  secret: string,
): Promise<string | null> {
  const id = stableUuid(`request:${demo.key}`);
  const existing = await db.select({ id: setupRequests.id }).from(setupRequests).where(eq(setupRequests.id, id));
  if (existing.length > 0) return null;

  const answers = requestAnswersSchema.parse({
    ...demo.answers,
    bike: { ...demo.answers.bike, modelId: bike.id },
  });
  const context = await loadShopSizingContext(bike.spec, answers.riding.discipline, answers.rider.skill);
  const input = buildSizingInput(answers, context);
  const output = recommend(input);
  const createdAt = new Date(Date.now() - demo.daysAgo * 86_400_000);
  const tuner = demo.tuner ? staff.get(demo.tuner) : undefined;
  const token = demoStatusToken(secret, id);

  await db.transaction(async (tx) => {
    await tx.insert(setupRequests).values({
      id,
      status: demo.status,
      riderName: answers.rider.name,
      riderEmail: answers.rider.email,
      discipline: answers.riding.discipline,
      skill: answers.rider.skill,
      bikeModelId: bike.id,
      bikeClass: demo.bikeClass,
      bikeLabel: bike.name,
      bikeYear: answers.bike.year ?? null,
      riderMassKg: input.rider.massKg,
      answers,
      assignedTunerId: tuner?.id ?? null,
      declineReason: demo.declineReason ?? null,
      createdAt,
      updatedAt: createdAt,
    });
    await createStatusLink(id, tx, token);
    const approved = demo.status === "approved";
    const approvedAt = new Date(createdAt.getTime() + 86_400_000);
    await tx.insert(recommendationVersions).values({
      id: stableUuid(`version:${demo.key}:1`),
      requestId: id,
      version: 1,
      state: approved ? "approved" : "draft",
      engineVersion: output.engineVersion,
      input,
      output,
      notesForRider: approved ? "Set race sag first, then check static sag; call us if it is out of the window." : null,
      approvedById: approved ? (tuner?.id ?? null) : null,
      approvedAt: approved ? approvedAt : null,
      createdAt,
    });
    const events: (typeof auditEvents.$inferInsert)[] = [
      { requestId: id, actorLabel: "rider", action: "request.submitted", detail: {}, createdAt },
    ];
    if (tuner && demo.status !== "submitted") {
      events.push({
        requestId: id,
        actorUserId: tuner.id,
        actorLabel: tuner.name,
        action: "request.status_changed",
        detail: { from: "submitted", to: demo.status },
        createdAt: new Date(createdAt.getTime() + 3_600_000),
      });
    }
    if (approved && tuner) {
      events.push({
        requestId: id,
        actorUserId: tuner.id,
        actorLabel: tuner.name,
        action: "recommendation.approved",
        detail: { version: 1 },
        createdAt: approvedAt,
      });
    }
    if (approved && demo.sagReportDaysAfter !== undefined) {
      const reportedAt = new Date(approvedAt.getTime() + demo.sagReportDaysAfter * 86_400_000);
      const sagReportId = stableUuid(`sag:${demo.key}`);
      await tx.insert(sagReports).values({
        id: sagReportId,
        requestId: id,
        versionId: stableUuid(`version:${demo.key}:1`),
        ...demoSagReading(input, output),
        createdAt: reportedAt,
      });
      events.push({
        requestId: id,
        actorLabel: "rider",
        action: "sag.reported",
        detail: { sagReportId, version: 1 },
        createdAt: reportedAt,
      });
    }
    await tx.insert(auditEvents).values(events);
    if (demo.question && tuner) {
      await tx.insert(requestMessages).values({
        requestId: id,
        author: "tuner",
        authorUserId: tuner.id,
        body: demo.question,
        createdAt: new Date(createdAt.getTime() + 7_200_000),
      });
    }
  });
  return `${answers.rider.name} (${demo.status}): ${statusPath(token)}`;
}

/** Seeds the demo scenario; returns a one-line summary. */
export async function seedDemo(): Promise<string> {
  const db = await getDb();
  const secret = resolveAuthSecret();
  await seedShop(db);
  const staff = await seedStaff();
  const bikes = await seedCatalog(db);
  const added: string[] = [];
  for (const demo of DEMO_REQUESTS) {
    const bike = bikes.get(demo.bikeClass);
    if (!bike) throw new Error(`Demo request ${demo.key}: no bike class ${demo.bikeClass}`);
    const line = await seedRequest(db, demo, bike, staff, secret);
    if (line) added.push(line);
  }
  await seedNotices(db);
  await seedService();
  await (await import("./seed-orders")).seedOrders(db);
  const [users] = await db.select({ n: count() }).from(user);
  const links = added.length ? `\n  status links:\n  ${added.join("\n  ")}` : "";
  return `${bikes.size} bike classes, ${Number(users?.n ?? 0)} users, ${added.length} new requests${links}`;
}
