// Who may call what: every route file under app/api (found by glob, so a new route cannot be
// missed), every HTTP method it exports, called as five people — nobody signed in, rider A (owns the
// request and photo probed), rider B (another rider), a tuner and the admin. The expected answer per
// route comes from EXPECTED below; a route or method missing from it fails the test. "ok" means the
// guard let the caller through: any answer below 500 other than 401, 403 or 404 (a 400 for the
// probe's empty body is fine). Riders never see another rider's request; tuners get 403 on the
// admin's routes (the roles and who may do what: README "What is where").
import { readdirSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/requests/route";
import { POST as addStock } from "@/app/api/shop/stock/route";
import { getDb } from "@/db/client";
import { springStock, staffInvites, user } from "@/db/schema";
import { stableUuid } from "@/db/seed-demo";
import { getEnv } from "@/lib/env";
import { setupTestApp } from "../helpers/app";
import { cookieFrom, ORIGIN, signInStaff, signInWithEmailLink } from "../helpers/auth";
import { fromClient } from "../helpers/client";
import { tinyJpeg } from "../fixtures/images";

const app = setupTestApp({ seed: true, tempDataDir: true });

type Who = "anonymous" | "riderA" | "riderB" | "tuner" | "admin";
type Outcome = "ok" | 401 | 403 | 404;
type Row = Record<Who, Outcome>;

const everyone: Row = { anonymous: "ok", riderA: "ok", riderB: "ok", tuner: "ok", admin: "ok" };
const staff: Row = { anonymous: 401, riderA: 403, riderB: 403, tuner: "ok", admin: "ok" };
const adminOnly: Row = { anonymous: 401, riderA: 403, riderB: 403, tuner: 403, admin: "ok" };
// The status page's writes without a token: the rider's own session only; anyone else's session
// (staff included) does not find the request.
const ridersOwn: Row = { anonymous: 401, riderA: "ok", riderB: 404, tuner: 404, admin: 404 };
// Orders: staff see every one; a rider only the orders of their own requests (404 for another's).
const staffOrRider: Row = { anonymous: 401, riderA: "ok", riderB: 404, tuner: "ok", admin: "ok" };

const EXPECTED: Record<string, Row> = {
  // better-auth's own: probed on its admin plugin (GET list-users, POST set-role), the endpoints
  // that would hand out roles; only the admin role may use them (lib/auth/roles.ts).
  "GET /api/auth/[...all]": { anonymous: 401, riderA: 403, riderB: 403, tuner: 403, admin: "ok" },
  "POST /api/auth/[...all]": { anonymous: 401, riderA: 403, riderB: 403, tuner: 403, admin: "ok" },
  "GET /api/bikes": everyone,
  "GET /api/health": everyone,
  "POST /api/invite/accept": everyone,
  "GET /api/requests": staff,
  "POST /api/requests": everyone,
  "GET /api/requests/[id]": staff,
  "POST /api/requests/[id]/approve": staff,
  "POST /api/requests/[id]/ride-revision": staff,
  "POST /api/requests/[id]/ask": staff,
  "POST /api/requests/[id]/assign": staff,
  "POST /api/requests/[id]/decline": staff,
  "PATCH /api/requests/[id]/recommendation": staff,
  "POST /api/requests/[id]/seen": staff,
  "POST /api/requests/[id]/start": staff,
  "GET /api/requests/[id]/sheet": { anonymous: 401, riderA: "ok", riderB: 403, tuner: "ok", admin: "ok" },
  "GET /api/requests/[id]/order": staffOrRider,
  "POST /api/requests/[id]/order": staffOrRider,
  "GET /api/orders/[id]/build-sheet": staff,
  "GET /api/orders/[id]/photos": staff,
  "POST /api/orders/[id]/photos": staff,
  "PUT /api/shop/catalog/[id]/build-notes": staff,
  "GET /api/shop/orders-settings": adminOnly,
  "PUT /api/shop/orders-settings": adminOnly,
  "PUT /api/shop/price-list": adminOnly,
  "POST /api/shop/finishers": adminOnly,
  "PATCH /api/shop/finishers/[id]": adminOnly,
  "GET /api/orders/[id]": staffOrRider,
  "PATCH /api/orders/[id]": staff,
  "PUT /api/orders/[id]/lines": staff,
  "POST /api/orders/[id]/accept": staffOrRider,
  "POST /api/orders/[id]/checkout": staffOrRider,
  "POST /api/orders/[id]/refund": staff,
  "POST /api/orders/[id]/check-in": staff,
  "POST /api/orders/[id]/finishers": staff,
  "POST /api/orders/[id]/finisher-back": staff,
  // The payment service's webhook: no session, admitted by its signature (the probe has none: 400).
  "POST /api/payments/webhook": everyone,
  "GET /api/shop/catalog": staff,
  "POST /api/shop/catalog": staff,
  "GET /api/shop/catalog/[id]": staff,
  "PUT /api/shop/catalog/[id]": staff,
  "GET /api/shop/catalog/[id]/calibration": adminOnly,
  "POST /api/shop/catalog/[id]/calibration": adminOnly,
  "POST /api/shop/catalog/[id]/duplicate": staff,
  "POST /api/shop/catalog/[id]/retire": staff,
  "GET /api/shop/catalog/csv": staff,
  "POST /api/shop/catalog/csv": staff,
  "GET /api/shop/settings": adminOnly,
  "PUT /api/shop/settings": adminOnly,
  "GET /api/shop/emails/wording": adminOnly,
  "PUT /api/shop/emails/wording": adminOnly,
  "POST /api/shop/emails/preview": adminOnly,
  "PUT /api/shop/settings/service": adminOnly,
  "GET /api/shop/stock": staff,
  "POST /api/shop/stock": staff,
  "PUT /api/shop/stock/[id]": staff,
  "DELETE /api/shop/stock/[id]": staff,
  "POST /api/shop/targets/preview": adminOnly,
  "POST /api/shop/targets/reset": adminOnly,
  "PUT /api/shop/targets": adminOnly,
  "PUT /api/shop/targets/rules": adminOnly,
  "DELETE /api/shop/targets/rules": adminOnly,
  "GET /api/shop/team": adminOnly,
  "POST /api/shop/team": adminOnly,
  "PATCH /api/shop/team/[id]": adminOnly,
  "POST /api/shop/team/invites/[id]": adminOnly,
  "DELETE /api/shop/team/invites/[id]": adminOnly,
  "POST /api/status/[id]/answer": ridersOwn,
  "POST /api/status/[id]/sag": ridersOwn,
  "POST /api/status/[id]/feedback": ridersOwn,
  // Logging hours: another rider's token or session is told no (403), not "no such request".
  "POST /api/status/[id]/hours": { anonymous: 401, riderA: "ok", riderB: 403, tuner: 403, admin: 403 },
  "GET /api/uploads/[id]": { anonymous: 401, riderA: "ok", riderB: 404, tuner: "ok", admin: "ok" },
};

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
const ROOT = process.cwd();

/** `app/api/shop/stock/[id]/route.ts` → `/api/shop/stock/[id]`. */
const routePathOf = (file: string) =>
  `/${path
    .dirname(path.relative(path.join(ROOT, "app"), file))
    .split(path.sep)
    .join("/")}`;
// Every app/api/**/route.ts (readdirSync's recursive listing: Node 20 has no fs.globSync).
const routeFiles = (readdirSync(path.join(ROOT, "app/api"), { recursive: true }) as string[])
  .filter((f) => path.basename(f) === "route.ts")
  .map((f) => path.join(ROOT, "app/api", f))
  .sort();

type Handler = (request: Request, context: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
interface Probe {
  key: string;
  method: (typeof METHODS)[number];
  route: string;
  handler: Handler;
}

const RIDER_A = "dario.lindqvist@example.test"; // owns demo request r09 (db/seed-data.ts)
const RIDER_B = "hana.whitlock@example.test";
const cookies: Partial<Record<Who, string>> = {};
const ids: Record<string, string> = {};

beforeAll(async () => {
  const password = getEnv().DEMO_PASSWORD;
  cookies.tuner = cookieFrom(await signInStaff("tuner@sagwise.test", password));
  cookies.admin = cookieFrom(await signInStaff("owner@sagwise.test", password));
  cookies.riderA = (await signInWithEmailLink(RIDER_A, app.sent)).cookie;
  cookies.riderB = (await signInWithEmailLink(RIDER_B, app.sent)).cookie;
  for (const who of ["tuner", "admin", "riderA", "riderB"] as const)
    expect(cookies[who], who).toMatch(/session_token=/);

  const db = await getDb();
  ids.request = stableUuid("request:r09");
  ids.bike = stableUuid("bike:mx-450-4t");
  ids.order = stableUuid("order:o3"); // a demo order on r09 (db/seed-orders.ts)
  ids.finisher = stableUuid("finisher:polish");
  const [stock] = await db.select({ id: springStock.id }).from(springStock).limit(1);
  const [tuner2] = await db.select({ id: user.id }).from(user).where(eq(user.email, "tuner2@sagwise.test"));
  ids.stock = stock!.id;
  ids.member = tuner2!.id;
  // An open invitation for the resend and revoke probes (only its hash would ever be e-mailed).
  ids.invite = stableUuid("invite:role-matrix");
  await db.insert(staffInvites).values({
    id: ids.invite,
    email: "invited.probe@example.test",
    role: "tuner",
    tokenHash: "0".repeat(64),
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  // A photo of rider A's: submitted as a rider would, then found through the request's status.
  const form = new FormData();
  form.set(
    "answers",
    JSON.stringify({
      rider: {
        name: "Dario Lindqvist",
        email: RIDER_A,
        weight: { value: 86, unit: "kg" },
        gearIncluded: false,
        skill: "advanced",
        style: "moderate",
      },
      riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 8 },
      bike: { modelId: ids.bike, year: 2022 },
      feel: { complaints: ["bottoming"] },
      review: { consent: true },
    }),
  );
  form.append("photos", new File([tinyJpeg() as BlobPart], "bike.jpg", { type: "image/jpeg" }));
  const created = await submit(
    new Request(`${ORIGIN()}/api/requests`, { method: "POST", body: form, headers: fromClient() }),
    undefined as never,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const { uploads } = await import("@/db/schema");
  const { id: requestId } = (await created.json()) as { id: string };
  const [photo] = await db.select({ id: uploads.id }).from(uploads).where(eq(uploads.requestId, requestId));
  ids.upload = photo!.id;
}, 120_000);

// Where a route checks its input before the caller (the schema is checked first, which tells
// nothing about the data), the probe sends a well-formed body or query so the guard decides.
const PROBE_BODY: Record<string, () => unknown> = {
  "POST /api/auth/[...all]": () => ({ userId: ids.member, role: "tuner" }),
  "POST /api/requests/[id]/order": () => ({ serviceType: "kit" }),
  "POST /api/status/[id]/answer": () => ({ body: "The bike is stock apart from the bars." }),
  "POST /api/status/[id]/hours": () => ({ hours: "1,5", date: new Date().toISOString().slice(0, 10) }),
  "POST /api/status/[id]/sag": () => ({ unit: "mm", front: { static: 30, race: 70 }, rear: { static: 35, race: 105 } }),
  "POST /api/status/[id]/feedback": () => ({ front: ["bottoming"], rear: [] }),
};
const PROBE_QUERY: Record<string, string> = { "GET /api/requests/[id]/sheet": "?version=1" };

/** The URL and params a probe uses for a route: real ids of the seeded shop and rider A. */
function target(route: string, method: string): { url: string; params: Record<string, string | string[]> } {
  if (route === "/api/auth/[...all]") {
    const sub = method === "GET" ? ["admin", "list-users"] : ["admin", "set-role"];
    return { url: `/api/auth/${sub.join("/")}`, params: { all: sub } };
  }
  const id =
    route.startsWith("/api/requests/") || route.startsWith("/api/status/")
      ? ids.request
      : route.startsWith("/api/shop/catalog/")
        ? ids.bike
        : route.startsWith("/api/shop/stock/")
          ? ids.stock
          : route.startsWith("/api/shop/team/invites/")
            ? ids.invite
            : route.startsWith("/api/shop/team/")
              ? ids.member
              : route.startsWith("/api/uploads/")
                ? ids.upload
                : route.startsWith("/api/orders/")
                  ? ids.order
                  : route.startsWith("/api/shop/finishers/")
                    ? ids.finisher
                    : undefined;
  return { url: route.replace("[id]", id ?? "") + (PROBE_QUERY[`${method} ${route}`] ?? ""), params: id ? { id } : {} };
}

/** A spring of its own for each DELETE, so the tuner's delete leaves the admin's one to find. */
async function freshStock() {
  const response = await addStock(
    new Request(`${ORIGIN()}/api/shop/stock`, {
      method: "POST",
      headers: { origin: ORIGIN(), "content-type": "application/json", cookie: cookies.admin! },
      body: JSON.stringify({ end: "shock", rate: 50, rateUnit: "N/mm", quantity: 1 }),
    }),
    undefined as never,
  );
  const { id } = (await response.json()) as { id: string };
  return { url: `/api/shop/stock/${id}`, params: { id } };
}

const probes: Probe[] = [];
for (const file of routeFiles) {
  const route = routePathOf(file);
  const mod = (await import(file)) as Partial<Record<(typeof METHODS)[number], Handler>>;
  for (const method of METHODS) {
    const handler = mod[method];
    if (typeof handler === "function") probes.push({ key: `${method} ${route}`, method, route, handler });
  }
}

describe("role matrix over every route file", () => {
  it("finds the routes, and every route and method is in the table (and nothing stale is)", () => {
    expect(routeFiles.length).toBeGreaterThan(25);
    const found = probes.map((p) => p.key).sort();
    expect(
      found.filter((k) => !(k in EXPECTED)),
      "routes missing from EXPECTED",
    ).toEqual([]);
    expect(
      Object.keys(EXPECTED).filter((k) => !found.includes(k)),
      "EXPECTED rows with no route",
    ).toEqual([]);
  });

  // Staff last: their calls may change the probed rows (a retired bike, an answered question).
  const order: Who[] = ["anonymous", "riderB", "riderA", "tuner", "admin"];
  it.each(probes.map((p) => [p.key, p] as const))("%s", async (_key, probe) => {
    const wrong: string[] = [];
    for (const who of order) {
      const { url, params } =
        probe.key === "DELETE /api/shop/stock/[id]" ? await freshStock() : target(probe.route, probe.method);
      const headers: Record<string, string> = { origin: ORIGIN(), ...fromClient() };
      if (cookies[who]) headers.cookie = cookies[who]!;
      const hasBody = probe.method !== "GET" && probe.method !== "DELETE";
      if (hasBody) headers["content-type"] = "application/json";
      const response = await probe.handler(
        new Request(`${ORIGIN()}${url}`, {
          method: probe.method,
          headers,
          body: hasBody ? JSON.stringify(PROBE_BODY[probe.key]?.() ?? {}) : undefined,
        }),
        { params: Promise.resolve(params) },
      );
      const expected = EXPECTED[probe.key]![who];
      const status = response.status;
      const outcome: Outcome | number =
        status === 401 || status === 403 || status === 404 ? status : status < 500 ? "ok" : status;
      if (outcome !== expected) wrong.push(`${who}: expected ${expected}, got ${status}`);
    }
    expect(wrong).toEqual([]);
  });
});
