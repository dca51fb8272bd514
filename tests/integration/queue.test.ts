// The staff queue (GET /api/requests) over 10,000 bulk-inserted requests: filters, search, sorting
// and paging return exactly the rows a plain in-memory filter of the same generated data returns
// (the oracle is Array.filter/sort over what was inserted). Correctness only, no timings.
import { eq } from "drizzle-orm";
import { setupServer } from "msw/node";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/requests/route";
import { getDb } from "@/db/client";
import { setupRequests, user } from "@/db/schema";
import { seedDemo } from "@/db/seed-demo";
import { DISCIPLINES } from "@/lib/sizing";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { ORIGIN, captureMail, cookieFrom, signInStaff, signInWithEmailLink } from "../helpers/auth";

const N = 10_000;
const STATUSES = ["submitted", "in_review", "waiting_for_rider", "approved", "declined"] as const;
// Classes that no demo request uses, so every filtered expectation below is over bulk rows only.
const CLASSES = ["bulk-a", "bulk-b", "bulk-c", "bulk-d"] as const;
const BASE = Date.parse("2021-03-01T12:00:00Z");
const HOUR = 3_600_000;

interface Row {
  id?: string;
  i: number;
  status: (typeof STATUSES)[number];
  discipline: string;
  bikeClass: string;
  tuner: "t1" | "t2" | null;
  riderName: string;
  riderEmail: string;
  bikeLabel: string;
  createdAt: Date;
}

// i*7 mod N scrambles the creation order against i, so "newest" is not the insertion order.
const rows: Row[] = Array.from({ length: N }, (_, i) => ({
  i,
  status: STATUSES[i % 5]!,
  discipline: DISCIPLINES[i % DISCIPLINES.length]!,
  bikeClass: CLASSES[i % 4]!,
  tuner: i % 3 === 0 ? "t1" : i % 3 === 1 ? "t2" : null,
  riderName: i === 4242 ? "Quintessa Marlowe-Vey" : `Rider ${String(i).padStart(5, "0")}`,
  riderEmail: `rider${i}@bulk.test`,
  bikeLabel: i % 2 ? "Bulk 450 (typical)" : "Bulk 300 (typical)",
  createdAt: new Date(BASE + ((i * 7) % N) * HOUR),
}));

let tunerIds: Record<"t1" | "t2", string>;
let cookie: string;
let riderCookie: string;
const server = setupServer();

async function list(query: Record<string, string | number>, as = cookie) {
  const qs = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]));
  const response = await GET(new Request(`${ORIGIN()}/api/requests?${qs}`, { headers: { cookie: as } }), undefined);
  const body = (await response.json()) as {
    items: { id: string; status: string; riderName: string; assignedTunerName: string | null; number: number }[];
    total: number;
    counts: Record<string, number>;
    fields?: Record<string, string>;
  };
  return { status: response.status, body };
}

const newestFirst = (a: Row, b: Row) => b.createdAt.getTime() - a.createdAt.getTime();

beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  server.listen({ onUnhandledRequest: "error" });
  const sent = captureMail(server);
  const db = await getDb();
  const staff = await db.select({ id: user.id, email: user.email }).from(user);
  tunerIds = {
    t1: staff.find((s) => s.email === "tuner@sagwise.test")!.id,
    t2: staff.find((s) => s.email === "tuner2@sagwise.test")!.id,
  };
  for (let start = 0; start < N; start += 1000) {
    const inserted = await db
      .insert(setupRequests)
      .values(
        rows.slice(start, start + 1000).map((r) => ({
          status: r.status,
          riderName: r.riderName,
          riderEmail: r.riderEmail,
          discipline: r.discipline,
          skill: "intermediate",
          bikeClass: r.bikeClass,
          bikeLabel: r.bikeLabel,
          riderMassKg: 70,
          answers: {},
          assignedTunerId: r.tuner ? tunerIds[r.tuner] : null,
          createdAt: r.createdAt,
        })),
      )
      .returning({ id: setupRequests.id, email: setupRequests.riderEmail });
    for (const row of inserted) rows[Number(row.email.slice(5, row.email.indexOf("@")))]!.id = row.id;
  }
  cookie = cookieFrom(await signInStaff("tuner@sagwise.test", "sagwise-demo"));
  riderCookie = (await signInWithEmailLink("dario.lindqvist@example.test", sent)).cookie;
}, 180_000);

afterAll(async () => {
  server.close();
  await closeTestDatabase();
});

describe("GET /api/requests over 10,000 requests", () => {
  it("filters by status and bike class, newest first, and pages through them", async () => {
    const expected = rows.filter((r) => r.status === "approved" && r.bikeClass === "bulk-b").sort(newestFirst);
    const page1 = await list({ status: "approved", bikeClass: "bulk-b", pageSize: 50 });
    expect(page1.status).toBe(200);
    expect(page1.body.total).toBe(expected.length);
    expect(page1.body.items.map((r) => r.id)).toEqual(expected.slice(0, 50).map((r) => r.id));
    const page3 = await list({ status: "approved", bikeClass: "bulk-b", pageSize: 50, page: 3 });
    expect(page3.body.items.map((r) => r.id)).toEqual(expected.slice(100, 150).map((r) => r.id));
    expect(page3.body.items.every((r) => r.status === "approved")).toBe(true);
  });

  it("filters by discipline, assigned tuner and an inclusive date range, with the tuner's name joined", async () => {
    const from = "2021-03-10";
    const to = "2021-03-20";
    const lo = Date.parse(`${from}T00:00:00Z`);
    const hi = Date.parse(`${to}T00:00:00Z`) + 24 * HOUR;
    const expected = rows
      .filter(
        (r) =>
          r.discipline === "cross-country" &&
          r.tuner === "t1" &&
          r.createdAt.getTime() >= lo &&
          r.createdAt.getTime() < hi,
      )
      .sort(newestFirst);
    expect(expected.length).toBeGreaterThan(5);
    const { body } = await list({ discipline: "cross-country", tuner: tunerIds.t1, from, to, pageSize: 100 });
    expect(body.total).toBe(expected.length);
    expect(body.items.map((r) => r.id)).toEqual(expected.map((r) => r.id));
    expect(new Set(body.items.map((r) => r.assignedTunerName))).toEqual(new Set(["Teo Brambleton"]));
  });

  it("filters unassigned requests and the caller's own", async () => {
    const unassigned = rows.filter((r) => r.tuner === null && r.bikeClass === "bulk-c");
    expect((await list({ tuner: "unassigned", bikeClass: "bulk-c" })).body.total).toBe(unassigned.length);
    const mine = rows.filter((r) => r.tuner === "t1" && r.bikeClass === "bulk-d");
    expect((await list({ tuner: "me", bikeClass: "bulk-d" })).body.total).toBe(mine.length);
  });

  it("searches rider name, e-mail and bike, case-insensitively, with wildcards taken literally", async () => {
    const byName = await list({ q: "marlowe-VEY" });
    expect(byName.body.total).toBe(1);
    expect(byName.body.items[0]!.id).toBe(rows[4242]!.id);
    const byEmail = await list({ q: "rider777@bulk" });
    expect(byEmail.body.items.map((r) => r.id)).toEqual([rows[777]!.id]);
    const byBike = await list({ q: "bulk 450", bikeClass: "bulk-b" });
    expect(byBike.body.total).toBe(rows.filter((r) => r.i % 2 === 1 && r.bikeClass === "bulk-b").length);
    expect((await list({ q: "rider%" })).body.total).toBe(0);
  });

  it("sorts by rider both ways and by number ascending", async () => {
    const set = rows.filter((r) => r.bikeClass === "bulk-a" && r.status === "declined" && r.i !== 4242);
    const byName = [...set].sort((a, b) => a.riderName.localeCompare(b.riderName));
    const asc = await list({ bikeClass: "bulk-a", status: "declined", sort: "rider", pageSize: 20 });
    expect(asc.body.items.map((r) => r.riderName)).toEqual(byName.slice(0, 20).map((r) => r.riderName));
    const desc = await list({ bikeClass: "bulk-a", status: "declined", sort: "rider_desc", pageSize: 20 });
    expect(desc.body.items.map((r) => r.riderName)).toEqual(
      byName
        .reverse()
        .slice(0, 20)
        .map((r) => r.riderName),
    );
    const byNumber = await list({ bikeClass: "bulk-a", sort: "number_asc", pageSize: 10 });
    const numbers = byNumber.body.items.map((r) => r.number);
    expect(numbers).toEqual([...numbers].sort((a, b) => a - b));
    // Inserted in i order, so the lowest numbers in bulk-a are i = 0, 4, 8, …
    expect(byNumber.body.items.map((r) => r.id)).toEqual([0, 4, 8, 12, 16, 20, 24, 28, 32, 36].map((i) => rows[i]!.id));
  });

  it("finds a request by its number, as every e-mail writes it ('request 796', '#796', '796')", async () => {
    const number = (await list({ q: "rider777@bulk" })).body.items[0]!.number;
    // The bare number also matches the text (e-mails like rider1796@…); the row itself must be there.
    const bare = await list({ q: String(number), pageSize: 100 });
    expect(bare.body.items.map((r) => r.id)).toContain(rows[777]!.id);
    for (const q of [`request ${number}`, `Request ${number}`, `#${number}`])
      expect((await list({ q })).body.items.map((r) => r.id)).toEqual([rows[777]!.id]);
    // Not a number search: the digits stay a plain text match.
    expect((await list({ q: `${number}x` })).body.total).toBe(0);
  });

  it("sorts status in the workflow's order (submitted → in review → waiting → approved → declined), both ways", async () => {
    const from = "2021-03-10";
    const to = "2021-03-12";
    const lo = Date.parse(`${from}T00:00:00Z`);
    const hi = Date.parse(`${to}T00:00:00Z`) + 24 * HOUR;
    const set = rows.filter((r) => r.createdAt.getTime() >= lo && r.createdAt.getTime() < hi);
    expect(new Set(set.map((r) => r.status)).size).toBe(5);
    const rank = (r: Row) => STATUSES.indexOf(r.status);
    const ascending = [...set].sort((a, b) => rank(a) - rank(b) || newestFirst(a, b));
    const descending = [...set].sort((a, b) => rank(b) - rank(a) || newestFirst(a, b));
    const asc = await list({ from, to, sort: "status", pageSize: 100 });
    expect(asc.body.items.map((r) => r.id)).toEqual(ascending.map((r) => r.id));
    const desc = await list({ from, to, sort: "status_desc", pageSize: 100 });
    expect(desc.body.items.map((r) => r.id)).toEqual(descending.map((r) => r.id));
    // Alphabetical order would put "approved" first: the workflow puts "submitted" first.
    expect(asc.body.items[0]!.status).toBe("submitted");
    expect(desc.body.items[0]!.status).toBe("declined");
  });

  it("counts every request per status (18 demo requests plus the bulk rows)", async () => {
    expect((await list({ pageSize: 1 })).body.counts).toBeUndefined();
    const { body } = await list({ pageSize: 1, counts: 1 });
    expect(body.total).toBe(N + 18);
    // Demo (db/seed-data.ts): 3 submitted, 3 in review, 2 waiting, 9 approved (6 of them the 125's
    // with sag reports), 1 declined.
    expect(body.counts).toEqual({
      submitted: 2000 + 3,
      in_review: 2000 + 3,
      waiting_for_rider: 2000 + 2,
      approved: 2000 + 9,
      declined: 2000 + 1,
    });
    // One status's total, and a deep page of it, agree with those counts. The 2 waiting demo
    // requests are days old, newer than every bulk row (2021-22), so they come first.
    const waiting = rows.filter((r) => r.status === "waiting_for_rider").sort(newestFirst);
    const deep = await list({ status: "waiting_for_rider", page: 40 });
    expect(deep.body.total).toBe(body.counts.waiting_for_rider);
    expect(deep.body.items.map((r) => r.id)).toEqual(waiting.slice(975 - 2, 1000 - 2).map((r) => r.id));
  });

  it("names the bad parameter", async () => {
    const big = await list({ pageSize: 500 });
    expect(big.status).toBe(400);
    expect(big.body.fields).toHaveProperty("pageSize");
    const date = await list({ from: "2021-13-40" });
    expect(date.status).toBe(400);
    expect(date.body.fields).toHaveProperty("from");
    const order = await list({ from: "2021-05-01", to: "2021-04-01" });
    expect(order.body.fields).toHaveProperty("to");
  });

  it("refuses anonymous (401) and rider (403) callers", async () => {
    expect((await list({}, "")).status).toBe(401);
    expect((await list({}, riderCookie)).status).toBe(403);
    const db = await getDb();
    const [one] = await db
      .select({ n: setupRequests.number })
      .from(setupRequests)
      .where(eq(setupRequests.id, rows[0]!.id!));
    expect(one?.n).toBeGreaterThan(0);
  });
});
