// Sign-in and roles through better-auth's real endpoints and the one guard, against a fresh database.
import { setupServer } from "msw/node";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as health } from "@/app/api/health/route";
import { GET as listRequests } from "@/app/api/requests/route";
import { readJournal } from "@/db/migrate";
import { ensureStaffUser } from "@/lib/auth/staff";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { captureMail, cookieFrom, ORIGIN, signInStaff, signInWithEmailLink } from "../helpers/auth";

const server = setupServer();
let sent: ReturnType<typeof captureMail>;
let kind: string;

beforeAll(async () => {
  kind = (await createTestDatabase()).kind;
  server.listen({ onUnhandledRequest: "error" });
  sent = captureMail(server);
  await ensureStaffUser({
    email: "tuner@sagwise.test",
    name: "Test Tuner",
    role: "tuner",
    password: "correct-horse-1",
  });
});
afterAll(async () => {
  server.close();
  await closeTestDatabase();
});

const queue = (cookie?: string, query = "") =>
  listRequests(
    new Request(`${ORIGIN()}/api/requests${query}`, { headers: cookie ? { cookie } : {} }),
    undefined as never,
  );

describe("GET /api/health", () => {
  it("names the database and the newest applied migration", async () => {
    const response = await health(new Request(`${ORIGIN()}/api/health`));
    expect(response.status).toBe(200);
    const journal = readJournal();
    expect(await response.json()).toEqual({
      ok: true,
      database: kind,
      migration: journal[journal.length - 1]?.tag,
    });
  });
});

describe("staff sign-in", () => {
  it("refuses a wrong password", async () => {
    const response = await signInStaff("tuner@sagwise.test", "wrong-password");
    expect(response.status).toBe(401);
    expect(cookieFrom(response)).toBe("");
  });

  it("signs in with the right password and reaches the staff API", async () => {
    const response = await signInStaff("TUNER@sagwise.test", "correct-horse-1");
    expect(response.status).toBe(200);
    const cookie = cookieFrom(response);
    expect(cookie).toMatch(/session_token=/);
    const listed = await queue(cookie);
    expect(listed.status).toBe(200);
    expect(await listed.json()).toEqual({ items: [], total: 0 });
  });

  it("does not allow open sign-up", async () => {
    const { POST } = await import("@/app/api/auth/[...all]/route");
    const response = await POST(
      new Request(`${ORIGIN()}/api/auth/sign-up/email`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: ORIGIN() },
        body: JSON.stringify({ email: "new@example.test", password: "a-long-password", name: "New" }),
      }),
    );
    expect(response.status).toBeGreaterThanOrEqual(400);
  });
});

describe("roles", () => {
  it("anonymous callers get 401 from staff APIs", async () => {
    const response = await queue();
    expect(response.status).toBe(401);
    expect(await response.json()).toEqual({ error: expect.any(String) });
  });

  it("a rider signed in by e-mail link gets 403 from staff APIs", async () => {
    const email = "rider.one@example.test";
    const { response, cookie } = await signInWithEmailLink(email, sent);
    // The link signs in and sends the rider on to their requests.
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(`${ORIGIN()}/my-requests`);
    expect(cookie).toMatch(/session_token=/);
    expect(sent.findLast((m) => m.to.includes(email))?.text).toContain("magic-link/verify");
    expect((await queue(cookie)).status).toBe(403);
  });

  it("a sign-in link works once", async () => {
    const email = "rider.two@example.test";
    const { link } = await signInWithEmailLink(email, sent);
    const { GET } = await import("@/app/api/auth/[...all]/route");
    const again = await GET(new Request(link, { headers: { origin: ORIGIN() } }));
    expect(cookieFrom(again)).not.toMatch(/session_token=[^;]+/);
  });
});

describe("bad input", () => {
  it("names the query field that is wrong", async () => {
    const cookie = cookieFrom(await signInStaff("tuner@sagwise.test", "correct-horse-1"));
    const response = await queue(cookie, "?pageSize=500&status=lost");
    expect(response.status).toBe(400);
    const body = (await response.json()) as { fields: Record<string, string> };
    expect(Object.keys(body.fields).sort()).toEqual(["pageSize", "status"]);
  });
});
