// Team administration: invitations by e-mail, accepting, role changes, deactivation ending sessions
// at once, last-admin protection, and tuners refused on admin-only actions.
import { setupServer } from "msw/node";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as listTeam, POST as invite } from "@/app/api/shop/team/route";
import { PATCH as patchMember } from "@/app/api/shop/team/[id]/route";
import { POST as accept } from "@/app/api/invite/accept/route";
import { DELETE as revoke, POST as resend } from "@/app/api/shop/team/invites/[id]/route";
import { GET as listCatalog } from "@/app/api/shop/catalog/route";
import { findUserByEmail, listStaff } from "@/db/queries/team";
import { getDb } from "@/db/client";
import { auditEvents, staffInvites } from "@/db/schema";
import { seedDemo } from "@/db/seed-demo";
import { hashInviteToken } from "@/lib/auth/staff";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { drainOutbox } from "@/lib/mail";
import { captureMail, cookieFrom } from "../helpers/auth";
import { idContext, jsonRequest, staffCookie, noCtx } from "./admin-helpers";

const server = setupServer();
let sent: ReturnType<typeof captureMail>;
let owner: string;
let tuner: string;

beforeAll(async () => {
  await createTestDatabase();
  server.listen({ onUnhandledRequest: "error" });
  sent = captureMail(server);
  await seedDemo();
  owner = await staffCookie("owner@sagwise.test");
  tuner = await staffCookie("tuner@sagwise.test");
});
afterAll(async () => {
  server.close();
  await closeTestDatabase();
});

const catalogAs = (cookie: string) => noCtx(listCatalog)(jsonRequest("/api/shop/catalog", "GET", cookie));
const memberId = async (email: string) => (await findUserByEmail(email))!.id;
const inviteLink = async (email: string) => {
  await drainOutbox();
  const html = sent.findLast((m) => m.to.includes(email))?.html ?? "";
  return /href="([^"]*\/invite\/[^"]+)"/.exec(html)?.[1];
};

describe("admin-only actions", () => {
  it("a tuner gets 403 on team, and nothing is sent", async () => {
    const before = sent.length;
    expect((await noCtx(listTeam)(jsonRequest("/api/shop/team", "GET", tuner))).status).toBe(403);
    expect(
      (await noCtx(invite)(jsonRequest("/api/shop/team", "POST", tuner, { email: "x@example.test", role: "tuner" })))
        .status,
    ).toBe(403);
    const id = await memberId("tuner2@sagwise.test");
    expect(
      (await patchMember(jsonRequest(`/api/shop/team/${id}`, "PATCH", tuner, { active: false }), idContext(id))).status,
    ).toBe(403);
    expect(sent.length).toBe(before);
  });
});

describe("invitations", () => {
  it("refuses a bad e-mail and a bad role, naming the fields", async () => {
    const response = await noCtx(invite)(
      jsonRequest("/api/shop/team", "POST", owner, { email: "not-mail", role: "owner" }),
    );
    expect(response.status).toBe(400);
    expect(Object.keys(((await response.json()) as { fields: object }).fields).sort()).toEqual(["email", "role"]);
  });

  it("refuses to invite someone already on the team (409)", async () => {
    const response = await noCtx(invite)(
      jsonRequest("/api/shop/team", "POST", owner, { email: "tuner2@sagwise.test", role: "tuner" }),
    );
    expect(response.status).toBe(409);
  });

  it("e-mails a link; the token is stored only as its SHA-256; accepting creates a signed-in tuner", async () => {
    const email = "new.tuner@example.test";
    const response = await noCtx(invite)(jsonRequest("/api/shop/team", "POST", owner, { email, role: "tuner" }));
    expect(response.status).toBe(201);
    const link = await inviteLink(email);
    expect(link).toBeDefined();
    const token = decodeURIComponent(new URL(link!).pathname.split("/").pop()!);
    const db = await getDb();
    const rows = await db.select().from(staffInvites);
    const row = rows.find((r) => r.email === email)!;
    // FIPS 180-4 SHA-256, hex: 64 characters, and not the token itself.
    expect(row.tokenHash).toBe(hashInviteToken(token));
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(rows)).not.toContain(token);

    const short = await noCtx(accept)(
      jsonRequest("/api/invite/accept", "POST", undefined, { token, name: "N", password: "short" }),
    );
    expect(short.status).toBe(400);
    expect(Object.keys(((await short.json()) as { fields: object }).fields).sort()).toEqual(["name", "password"]);
    expect(await findUserByEmail(email)).toBeNull();

    const accepted = await noCtx(accept)(
      jsonRequest("/api/invite/accept", "POST", undefined, { token, name: "New Tuner", password: "a-long-password-1" }),
    );
    expect(accepted.status).toBe(201);
    const cookie = cookieFrom(accepted);
    expect(cookie).toMatch(/session_token=/);
    expect((await catalogAs(cookie)).status).toBe(200);
    expect((await noCtx(listTeam)(jsonRequest("/api/shop/team", "GET", cookie))).status).toBe(403);

    const actions = (await db.select().from(auditEvents)).map((e) => [e.action, e.actorLabel]);
    expect(actions).toEqual(
      expect.arrayContaining([
        ["staff.invited", "Mara Quillfeather"],
        ["staff.joined", "New Tuner"],
      ]),
    );

    const again = await noCtx(accept)(
      jsonRequest("/api/invite/accept", "POST", undefined, { token, name: "New Tuner", password: "a-long-password-1" }),
    );
    expect(again.status).toBe(409);
  });

  it("two people racing on one invitation link: one account, one 201, the other 409", async () => {
    const email = "racing.tuner@example.test";
    expect((await noCtx(invite)(jsonRequest("/api/shop/team", "POST", owner, { email, role: "tuner" }))).status).toBe(
      201,
    );
    const token = decodeURIComponent(new URL((await inviteLink(email))!).pathname.split("/").pop()!);
    const body = (name: string) => ({ token, name, password: "a-long-password-1" });
    const answers = await Promise.all([
      noCtx(accept)(jsonRequest("/api/invite/accept", "POST", undefined, body("First Racer"))),
      noCtx(accept)(jsonRequest("/api/invite/accept", "POST", undefined, body("Second Racer"))),
    ]);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409]);
    const db = await getDb();
    const invites = (await db.select().from(staffInvites)).filter((r) => r.email === email);
    expect(invites).toHaveLength(1);
    expect(invites[0]!.acceptedAt).toBeInstanceOf(Date);
    expect((await listStaff()).filter((m) => m.email === email)).toHaveLength(1);
  });

  it("an invitation that cannot be accepted stays open: nothing is marked used without an account", async () => {
    const email = "taken.meanwhile@example.test";
    expect((await noCtx(invite)(jsonRequest("/api/shop/team", "POST", owner, { email, role: "tuner" }))).status).toBe(
      201,
    );
    const token = decodeURIComponent(new URL((await inviteLink(email))!).pathname.split("/").pop()!);
    // Someone made a staff account with this address after the invitation went out.
    const { ensureStaffUser } = await import("@/lib/auth/staff");
    await ensureStaffUser({ email, name: "Made Elsewhere", role: "tuner", password: "another-long-password" });
    const refused = await noCtx(accept)(
      jsonRequest("/api/invite/accept", "POST", undefined, {
        token,
        name: "Late Joiner",
        password: "a-long-password-1",
      }),
    );
    expect(refused.status).toBe(409);
    const db = await getDb();
    const row = (await db.select().from(staffInvites)).find((r) => r.email === email)!;
    expect(row.acceptedAt).toBeNull();
  });

  it("says what is wrong with 'not-an-email' in the shop's words", async () => {
    const response = await noCtx(invite)(
      jsonRequest("/api/shop/team", "POST", owner, { email: "not-an-email", role: "tuner" }),
    );
    expect(response.status).toBe(400);
    const { fields } = (await response.json()) as { fields: Record<string, string> };
    expect(fields.email).toBe(
      "This is not an e-mail address: it needs a name, an @ and a domain, like sam@example.com",
    );
    const empty = await noCtx(invite)(jsonRequest("/api/shop/team", "POST", owner, { email: " ", role: "tuner" }));
    expect(((await empty.json()) as { fields: Record<string, string> }).fields.email).toBe(
      "Enter the person's e-mail address",
    );
  });

  it("resend: a fresh link goes out and the old one stops working; revoke: the link stops working, audited", async () => {
    const email = "resend.me@example.test";
    expect((await noCtx(invite)(jsonRequest("/api/shop/team", "POST", owner, { email, role: "tuner" }))).status).toBe(
      201,
    );
    const first = decodeURIComponent(new URL((await inviteLink(email))!).pathname.split("/").pop()!);
    const db = await getDb();
    const id = (await db.select().from(staffInvites)).find((r) => r.email === email)!.id;

    expect((await resend(jsonRequest(`/api/shop/team/invites/${id}`, "POST", tuner), idContext(id))).status).toBe(403);
    const resent = await resend(jsonRequest(`/api/shop/team/invites/${id}`, "POST", owner), idContext(id));
    expect(resent.status).toBe(200);
    const second = decodeURIComponent(new URL((await inviteLink(email))!).pathname.split("/").pop()!);
    expect(second).not.toBe(first);
    const body = (token: string) => ({ token, name: "Resent Tuner", password: "a-long-password-1" });
    // Only the newest link works.
    expect((await noCtx(accept)(jsonRequest("/api/invite/accept", "POST", undefined, body(first)))).status).toBe(404);

    const revoked = await revoke(jsonRequest(`/api/shop/team/invites/${id}`, "DELETE", owner), idContext(id));
    expect(revoked.status).toBe(200);
    const refused = await noCtx(accept)(jsonRequest("/api/invite/accept", "POST", undefined, body(second)));
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: string }).error).toMatch(/withdrawn/);
    expect(await findUserByEmail(email)).toBeNull();
    const listed = (await (await noCtx(listTeam)(jsonRequest("/api/shop/team", "GET", owner))).json()) as {
      invites: { email: string }[];
    };
    expect(listed.invites.map((i) => i.email)).not.toContain(email);
    // Nothing left to resend or revoke.
    expect((await resend(jsonRequest(`/api/shop/team/invites/${id}`, "POST", owner), idContext(id))).status).toBe(404);
    expect((await revoke(jsonRequest(`/api/shop/team/invites/${id}`, "DELETE", owner), idContext(id))).status).toBe(
      404,
    );
    const actions = (await db.select().from(auditEvents)).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["staff.invite_resent", "staff.invite_revoked"]));
  });

  it("an unknown token is a 404", async () => {
    const response = await noCtx(accept)(
      jsonRequest("/api/invite/accept", "POST", undefined, {
        token: "x".repeat(43),
        name: "Someone",
        password: "a-long-password-1",
      }),
    );
    expect(response.status).toBe(404);
  });
});

describe("roles and deactivation", () => {
  it("deactivation ends the person's session at once; reactivation lets them sign in again", async () => {
    const cookie = await staffCookie("tuner2@sagwise.test");
    expect((await catalogAs(cookie)).status).toBe(200);
    const id = await memberId("tuner2@sagwise.test");
    const response = await patchMember(
      jsonRequest(`/api/shop/team/${id}`, "PATCH", owner, { active: false }),
      idContext(id),
    );
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ banned: true });
    expect((await catalogAs(cookie)).status).toBe(401);
    await expect(staffCookie("tuner2@sagwise.test")).rejects.toThrow(/answered 403/);

    await patchMember(jsonRequest(`/api/shop/team/${id}`, "PATCH", owner, { active: true }), idContext(id));
    expect((await catalogAs(await staffCookie("tuner2@sagwise.test"))).status).toBe(200);
  });

  it("changes a role, and the new role applies", async () => {
    const id = await memberId("tuner2@sagwise.test");
    const response = await patchMember(
      jsonRequest(`/api/shop/team/${id}`, "PATCH", owner, { role: "admin" }),
      idContext(id),
    );
    expect(response.status).toBe(200);
    const cookie = await staffCookie("tuner2@sagwise.test");
    expect((await noCtx(listTeam)(jsonRequest("/api/shop/team", "GET", cookie))).status).toBe(200);
    await patchMember(jsonRequest(`/api/shop/team/${id}`, "PATCH", owner, { role: "tuner" }), idContext(id));
    expect((await listStaff()).find((m) => m.id === id)?.role).toBe("tuner");
  });

  it("the last active admin can be neither demoted nor deactivated (409), and stays admin", async () => {
    const ownerId = await memberId("owner@sagwise.test");
    const demote = await patchMember(
      jsonRequest(`/api/shop/team/${ownerId}`, "PATCH", owner, { role: "tuner" }),
      idContext(ownerId),
    );
    expect(demote.status).toBe(409);
    const self = await patchMember(
      jsonRequest(`/api/shop/team/${ownerId}`, "PATCH", owner, { active: false }),
      idContext(ownerId),
    );
    expect(self.status).toBe(409);
    expect((await listStaff()).find((m) => m.id === ownerId)).toMatchObject({ role: "admin", banned: false });
    expect((await noCtx(listTeam)(jsonRequest("/api/shop/team", "GET", owner))).status).toBe(200);
  });

  it("with a second admin, the first can be demoted", async () => {
    const id = await memberId("tuner2@sagwise.test");
    await patchMember(jsonRequest(`/api/shop/team/${id}`, "PATCH", owner, { role: "admin" }), idContext(id));
    const second = await staffCookie("tuner2@sagwise.test");
    const ownerId = await memberId("owner@sagwise.test");
    const response = await patchMember(
      jsonRequest(`/api/shop/team/${ownerId}`, "PATCH", second, { role: "tuner" }),
      idContext(ownerId),
    );
    expect(response.status).toBe(200);
    // Now tuner2 is the last admin: demoting them is refused.
    const back = await patchMember(
      jsonRequest(`/api/shop/team/${id}`, "PATCH", second, { role: "tuner" }),
      idContext(id),
    );
    expect(back.status).toBe(409);
    await patchMember(jsonRequest(`/api/shop/team/${ownerId}`, "PATCH", second, { role: "admin" }), idContext(ownerId));
  });
});
