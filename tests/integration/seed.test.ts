// The demo seed: complete, invented, and idempotent; and the staff queue over it.
import { count, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as listRequests } from "@/app/api/requests/route";
import { getDb } from "@/db/client";
import * as schema from "@/db/schema";
import { seedDemo } from "@/db/seed-demo";
import { DEMO_REQUESTS } from "@/db/seed-data";
import { recommendationSchema } from "@/lib/sizing";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { cookieFrom, ORIGIN, signInStaff } from "../helpers/auth";

const TABLES = {
  user: schema.user,
  account: schema.account,
  shopSettings: schema.shopSettings,
  bikeModels: schema.bikeModels,
  springStock: schema.springStock,
  setupTargets: schema.setupTargets,
  clickerRules: schema.clickerRules,
  setupRequests: schema.setupRequests,
  recommendationVersions: schema.recommendationVersions,
  requestMessages: schema.requestMessages,
  auditEvents: schema.auditEvents,
  sagReports: schema.sagReports,
  bikeCalibrations: schema.bikeCalibrations,
  serviceSettings: schema.serviceSettings,
  serviceIntervals: schema.serviceIntervals,
  serviceHourLogs: schema.serviceHourLogs,
};

async function countAll() {
  const db = await getDb();
  const counts: Record<string, number> = {};
  for (const [name, table] of Object.entries(TABLES)) {
    const [row] = await db.select({ n: count() }).from(table);
    counts[name] = Number(row?.n ?? 0);
  }
  return counts;
}

let cookie = "";
beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  cookie = cookieFrom(await signInStaff("owner@sagwise.test", "sagwise-demo"));
}, 120_000);
afterAll(closeTestDatabase);

describe("demo seed", () => {
  it("loads a shop, one admin and two tuners, the catalog and a dozen requests in every status", async () => {
    const counts = await countAll();
    expect(counts.shopSettings).toBe(1);
    expect(counts.setupRequests).toBe(DEMO_REQUESTS.length);
    expect(counts.setupRequests).toBeGreaterThanOrEqual(12);
    const db = await getDb();
    const roles = await db.select({ role: schema.user.role, n: count() }).from(schema.user).groupBy(schema.user.role);
    expect(Object.fromEntries(roles.map((r) => [r.role, Number(r.n)]))).toEqual({ admin: 1, tuner: 2 });
    const statuses = await db.selectDistinct({ s: schema.setupRequests.status }).from(schema.setupRequests);
    expect(statuses.map((s) => s.s).sort()).toEqual([...schema.REQUEST_STATUSES].sort());
  });

  it("marks every catalog bike as a generic class with typical values", async () => {
    const db = await getDb();
    const bikes = await db.select().from(schema.bikeModels);
    expect(bikes.length).toBeGreaterThanOrEqual(4);
    for (const bike of bikes) {
      expect(bike.isTypical).toBe(true);
      expect(bike.name).toMatch(/typical values/);
    }
  });

  it("stores an engine recommendation for each request, approved ones with approver and time", async () => {
    const db = await getDb();
    const versions = await db.select().from(schema.recommendationVersions);
    expect(versions).toHaveLength(DEMO_REQUESTS.length);
    for (const v of versions) {
      expect(() => recommendationSchema.parse(v.output)).not.toThrow();
      if (v.state === "approved") {
        expect(v.approvedById).toBeTruthy();
        expect(v.approvedAt).toBeInstanceOf(Date);
      }
    }
    expect(versions.filter((v) => v.state === "approved")).toHaveLength(
      DEMO_REQUESTS.filter((r) => r.status === "approved").length,
    );
  });

  it("gives one catalog model at least five sag reports, each on its approved version", async () => {
    const db = await getDb();
    const rows = await db
      .select({
        model: schema.setupRequests.bikeModelId,
        state: schema.recommendationVersions.state,
        measured: schema.sagReports.measured,
      })
      .from(schema.sagReports)
      .innerJoin(schema.setupRequests, eq(schema.setupRequests.id, schema.sagReports.requestId))
      .innerJoin(schema.recommendationVersions, eq(schema.recommendationVersions.id, schema.sagReports.versionId));
    const perModel = new Map<string | null, number>();
    for (const r of rows) perModel.set(r.model, (perModel.get(r.model) ?? 0) + 1);
    expect(Math.max(...perModel.values())).toBeGreaterThanOrEqual(5);
    expect(rows.every((r) => r.state === "approved")).toBe(true);
    // Read like a rider reads a tape: whole millimetres.
    for (const r of rows) {
      const mm = (r.measured as { mm: Record<string, { staticMm: number; raceMm: number }> }).mm;
      for (const end of Object.values(mm))
        expect(Number.isInteger(end.staticMm) && Number.isInteger(end.raceMm)).toBe(true);
    }
  });

  it("changes nothing when run a second time", async () => {
    const before = await countAll();
    await seedDemo();
    expect(await countAll()).toEqual(before);
  }, 60_000);
});

describe("GET /api/requests over the demo data", () => {
  const get = async (query: string) => {
    const response = await listRequests(
      new Request(`${ORIGIN()}/api/requests${query}`, { headers: { cookie } }),
      undefined as never,
    );
    expect(response.status).toBe(200);
    return (await response.json()) as {
      items: { id: string; status: string; riderName: string; createdAt: string }[];
      total: number;
    };
  };

  it("filters by status with the right total", async () => {
    const { items, total } = await get("?status=approved");
    expect(total).toBe(DEMO_REQUESTS.filter((r) => r.status === "approved").length);
    expect(items.every((i) => i.status === "approved")).toBe(true);
  });

  it("searches rider names, e-mails and bikes case-insensitively", async () => {
    expect((await get("?q=LINDQVIST")).items.map((i) => i.riderName)).toEqual(["Dario Lindqvist"]);
    expect((await get("?q=hana.whitlock@")).total).toBe(1);
    const enduro = DEMO_REQUESTS.filter((r) => r.bikeClass === "enduro-300-2t").length;
    expect((await get("?q=300 two-stroke enduro")).total).toBe(enduro);
    // A LIKE wildcard typed by the user is a literal character, not "match anything".
    expect((await get("?q=%25")).total).toBe(0);
  });

  it("pages and sorts", async () => {
    const first = await get("?pageSize=5&page=1&sort=oldest");
    const second = await get("?pageSize=5&page=2&sort=oldest");
    expect(first.items).toHaveLength(5);
    expect(first.total).toBe(DEMO_REQUESTS.length);
    const dates = [...first.items, ...second.items].map((i) => Date.parse(i.createdAt));
    expect(dates).toEqual([...dates].sort((a, b) => a - b));
    const ids = new Set([...first.items, ...second.items].map((i) => i.id));
    expect(ids.size).toBe(10);
  });

  it("has the status-and-date index the status filter uses", async () => {
    const db = await getDb();
    const result = await db.execute(
      sql`select indexname from pg_indexes where tablename = 'setup_requests' and indexname = 'setup_requests_status_created_idx'`,
    );
    expect((result as unknown as { rows: unknown[] }).rows).toHaveLength(1);
  });
});
