// Service intervals end to end on the seeded shop: the rider logs hours through the contract route
// (200 with the next due dates, 400 naming the field, 403 for another rider's token), the dates move
// with the hours, and the reminder job queues each due service once (run twice: nothing the second
// time), from the CLI too (exit code 0 and the count printed).
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as logHours } from "@/app/api/status/[id]/hours/route";
import { getDb } from "@/db/client";
import { outboundEmails, serviceReminders } from "@/db/schema";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { drainOutbox } from "@/lib/mail";
import { demoStatusToken } from "@/lib/requests/token";
import { addDays } from "@/lib/service/civil-date";
import { loadServiceOverview, loadServiceRows } from "@/lib/service/overview";
import { queueDueReminders } from "@/lib/service/reminders";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { fromClient } from "../helpers/client";

const app = setupTestApp({ seed: true, tempDataDir: true });
const id = (key: string) => stableUuid(`request:${key}`);
const token = (key: string) => demoStatusToken(resolveAuthSecret(), id(key));
let ip = 0;

const post = (requestId: string, body: unknown) =>
  logHours(
    new Request(`${ORIGIN()}/api/status/${requestId}/hours`, {
      method: "POST",
      headers: { "content-type": "application/json", ...fromClient(`10.9.${++ip >> 8}.${ip & 255}`) },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({ id: requestId }) },
  );

const today = () => new Date().toISOString().slice(0, 10); // the demo shop's calendar is UTC

describe("the demo shop", () => {
  it("has riders with services overdue, due soon and far off", async () => {
    const rows = await loadServiceRows();
    const states = new Set(rows.flatMap((r) => r.overview.due.map((d) => d.state)));
    expect([...states].sort()).toEqual(expect.arrayContaining(["due-soon", "later", "overdue"]));
    // r11: supercross at 40 h/month from an approval 14 days ago, 9.5 h logged 10 and 6 days ago:
    // fork oil every 10 h (common practice) is reached by the projection long before today.
    const r11 = rows.find((r) => r.subject.requestId === id("r11"))!;
    expect(r11.overview.hoursLogged).toBe(9.5);
    expect(r11.overview.due.find((d) => d.item === "fork-oil")!.state).toBe("overdue");
    // r10: enduro, 30 h fork oil at 14 h/month from 11 days ago: about two months on.
    expect(rows.find((r) => r.subject.requestId === id("r10"))!.overview.due.every((d) => d.state === "later")).toBe(
      true,
    );
  });

  it("starts the clock at an order's ship date when the order left after the approval", async () => {
    const rows = await loadServiceRows();
    // c04 (approved 54 days ago) had its springs shipped 2 days ago (db/seed-orders.ts): the clock
    // starts at the ship date, so motocross fork oil at 10 h a month is weeks away again.
    const c04 = rows.find((r) => r.subject.requestId === id("c04"))!;
    expect(c04.overview.startedBy).toBe("order-shipped");
    expect(c04.overview.startedOn).toBe(addDays(today(), -2));
    expect(c04.overview.due.every((d) => d.state === "later")).toBe(true);
    // r11 has orders, none shipped: its clock still starts at the approval.
    const r11 = rows.find((r) => r.subject.requestId === id("r11"))!;
    expect(r11.overview.startedBy).toBe("sheet-approved");
  });
});

describe("POST /api/status/:id/hours", () => {
  it("logs hours with a decimal comma and answers the moved due dates", async () => {
    const before = await loadServiceOverview(id("r10"));
    const forkBefore = before!.due.find((d) => d.item === "fork-oil")!;
    const response = await post(id("r10"), { token: token("r10"), hours: "12,5", date: today() });
    expect(response.status, await response.clone().text()).toBe(200);
    const body = (await response.json()) as { hoursLogged: number; due: { item: string; dueOn: string }[] };
    expect(body.hoursLogged).toBe(12.5);
    const fork = body.due.find((d) => d.item === "fork-oil")!;
    // r10 is enduro at 14 h a month: fork oil every 30 h (common practice, lib/service/items.ts).
    // 17.5 h left at 14 h/month from today = 1.25 months × 30.436875 = 38.05 days → 39 days on.
    expect(fork.dueOn).toBe(addDays(today(), 39));
    expect(fork.dueOn < forkBefore.dueOn!).toBe(true);
    expect(body.due.map((d) => d.item)).toEqual(["fork-oil", "shock-service", "full-rebuild"]);
  });

  it("bad input is answered 400 naming each field, in the shop's words", async () => {
    const response = await post(id("r10"), { token: token("r10"), hours: "lots", date: "2026-02-30" });
    expect(response.status).toBe(400);
    const { fields } = (await response.json()) as { fields: Record<string, string> };
    expect(fields.hours).toBe("Enter the hours ridden as a number, like 2 or 1,5");
    expect(fields.date).toBe("Pick the day you rode");
    const missing = (await (await post(id("r10"), { token: token("r10") })).json()) as {
      fields: Record<string, string>;
    };
    expect(missing.fields).toEqual({
      hours: "Enter the hours ridden as a number, like 2 or 1,5",
      date: "Pick the day you rode",
    });
    for (const text of Object.values(missing.fields))
      expect(text).not.toMatch(/expected|Invalid input|Too (small|big)/);
    const zero = (await (await post(id("r10"), { token: token("r10"), hours: "0", date: today() })).json()) as {
      fields: Record<string, string>;
    };
    expect(zero.fields.hours).toBe("Enter more than 0 hours");
  });

  it("a day still to come, or before the setup, is refused on the date field and nothing is saved", async () => {
    const before = (await loadServiceOverview(id("r10")))!.hoursLogged;
    const future = await post(id("r10"), { token: token("r10"), hours: 2, date: addDays(today(), 3) });
    expect(future.status).toBe(400);
    expect(((await future.json()) as { fields: Record<string, string> }).fields.date).toBe(
      "Pick a day you have already ridden",
    );
    const early = await post(id("r10"), { token: token("r10"), hours: 2, date: "2020-01-01" });
    expect(early.status).toBe(400);
    expect(((await early.json()) as { fields: Record<string, string> }).fields.date).toMatch(/^Pick a day from /);
    expect((await loadServiceOverview(id("r10")))!.hoursLogged).toBe(before);
  });

  it("another rider's token is refused with 403 and logs nothing", async () => {
    const before = (await loadServiceOverview(id("r11")))!.hoursLogged;
    const response = await post(id("r11"), { token: token("r09"), hours: 3, date: today() });
    expect(response.status).toBe(403);
    expect((await loadServiceOverview(id("r11")))!.hoursLogged).toBe(before);
  });

  it("a request with no approved sheet has no service dates yet (409)", async () => {
    const response = await post(id("r04"), { token: token("r04"), hours: 3, date: today() });
    expect(response.status).toBe(409);
  });
});

describe("the reminder job", () => {
  it("queues each due service once: the second run queues none", async () => {
    const first = await queueDueReminders();
    expect(first).toBeGreaterThan(0);
    expect(await queueDueReminders()).toBe(0);
    const db = await getDb();
    const mails = await db.select().from(outboundEmails).where(eq(outboundEmails.template, "service-reminder"));
    expect(mails).toHaveLength(first);
    // r11 (supercross, 40 h/month, approved 14 days ago): fork oil every 10 h is long past.
    const r11 = await db
      .select()
      .from(serviceReminders)
      .where(eq(serviceReminders.requestId, id("r11")));
    expect(r11.map((r) => r.item).sort()).toContain("fork-oil");
    expect(r11.every((r) => r.outboundEmailId)).toBe(true);
    // r10 (enduro) is weeks away: no reminder.
    expect(
      await db
        .select()
        .from(serviceReminders)
        .where(eq(serviceReminders.requestId, id("r10"))),
    ).toEqual([]);
    await drainOutbox();
    const sent = app.sent.find(
      (m) => m.subject.includes("due for your") && m.to.includes("hana.whitlock@example.test"),
    );
    const mail = sent ?? app.sent.find((m) => m.subject.includes("due for your"));
    expect(mail?.html).toContain(`/request?bike=`);
    expect(mail?.text).toMatch(/overdue since|due \d/);
  });

  it("a due date moved by new hours is a new reminder; the old one is not sent again", async () => {
    const db = await getDb();
    const before = await db
      .select()
      .from(serviceReminders)
      .where(eq(serviceReminders.requestId, id("r09")));
    // 20 more hours today puts r09's shock service (25 h, motocross) due today: a new due date.
    const response = await post(id("r09"), { token: token("r09"), hours: 20, date: today() });
    expect(response.status).toBe(200);
    expect(await queueDueReminders()).toBe(1);
    const after = await db
      .select()
      .from(serviceReminders)
      .where(eq(serviceReminders.requestId, id("r09")));
    expect(after.length).toBeGreaterThan(before.length);
    expect(await queueDueReminders()).toBe(0);
  });
});

describe("npm run jobs:reminders", () => {
  it("exits 0 and prints how many it queued; the second run queues none", () => {
    const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-reminders-"));
    const env: NodeJS.ProcessEnv = { ...process.env, DATA_DIR: dataDir, RESEND_BASE_URL: "http://127.0.0.1:9" };
    delete env.DATABASE_URL;
    const run = (script: string) => spawnSync("npx", ["tsx", script], { encoding: "utf8", env, timeout: 120_000 });
    try {
      expect(run("db/seed.ts").status).toBe(0);
      const first = run("scripts/jobs-reminders.ts");
      expect(first.status, first.stderr).toBe(0);
      const count = Number(/service reminders queued: (\d+)/.exec(first.stdout)?.[1]);
      expect(count).toBeGreaterThan(0);
      const second = run("scripts/jobs-reminders.ts");
      expect(second.status, second.stderr).toBe(0);
      expect(second.stdout).toContain("service reminders queued: 0");
    } finally {
      rmSync(dataDir, { recursive: true, force: true });
    }
  }, 240_000);
});
