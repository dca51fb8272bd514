// The e-mail outbox end to end against the mail fake (fakes/mail, which answers as the resend API
// does, idempotency keys included; resend's "Idempotency Keys" documentation is the reference):
// claims by several senders are disjoint, a crashed sender's lease runs out and its message is sent
// by another, a lost answer is retried under the same key and delivered once, and a started worker
// sends what is queued without anyone draining. Loopback only; runs on PGlite and on PostgreSQL.
import { mkdtempSync, rmSync } from "node:fs";
import { createServer, request as httpRequest, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { claimDueEmails, findOutboundEmail } from "@/db/queries/outbound-emails";
import { startMailFake, type MailFake } from "@/fakes/mail/server";
import type { StoredEmail } from "@/fakes/mail/store";
import { resetEnvForTests } from "@/lib/env";
import {
  configureOutbox,
  drainOutbox,
  kickOutbox,
  resetOutboxPolicy,
  queueMail,
  startOutboxWorker,
  stopOutboxWorker,
  type SendMailInput,
} from "@/lib/mail";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";

let dir: string;
let fake: MailFake;
const saved = process.env.RESEND_BASE_URL;

function useMailApi(url: string) {
  process.env.RESEND_BASE_URL = url;
  resetEnvForTests();
}

async function inbox(to: string): Promise<StoredEmail[]> {
  const res = await fetch(`${fake.url}/emails?to=${encodeURIComponent(to)}`);
  return ((await res.json()) as { data: StoredEmail[] }).data;
}

const message = (to: string): SendMailInput => ({
  template: "sign-in-link",
  to,
  subject: "Sign in",
  html: "<p>Hello</p>",
  text: "Hello",
});

async function queue(input: SendMailInput) {
  const db = await getDb();
  return db.transaction((tx) => queueMail(tx, input));
}

/** Polls `check` every 25 ms for up to 10 s (bounded: the test fails rather than hangs). */
async function eventually<T>(check: () => Promise<T | undefined | null | false>): Promise<T> {
  for (let i = 0; i < 400; i++) {
    const value = await check();
    if (value) return value;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error("condition not met within 10 s");
}

beforeAll(async () => {
  await createTestDatabase();
  dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-outbox-"));
  fake = await startMailFake({ port: 0, host: "127.0.0.1", dir });
  useMailApi(fake.url);
});
afterEach(async () => {
  await stopOutboxWorker();
  resetOutboxPolicy();
  useMailApi(fake.url);
});
afterAll(async () => {
  await fake.close();
  rmSync(dir, { recursive: true, force: true });
  if (saved === undefined) delete process.env.RESEND_BASE_URL;
  else process.env.RESEND_BASE_URL = saved;
  resetEnvForTests();
  await closeTestDatabase();
});

describe("e-mail outbox", () => {
  it("two senders claiming at once get disjoint messages, together all of them", async () => {
    const ids = new Set<string>();
    for (let i = 0; i < 12; i++) ids.add((await queue(message(`claim.${i}@riders.test`))).outboundEmailId);
    const now = new Date();
    const leaseUntil = new Date(now.getTime() + 60_000);
    const [a, b] = await Promise.all([
      claimDueEmails({ now, leaseUntil, claimer: "instance-a", limit: 7 }),
      claimDueEmails({ now, leaseUntil, claimer: "instance-b", limit: 7 }),
    ]);
    const claimedA = a.map((r) => r.id);
    const claimedB = b.map((r) => r.id);
    expect(claimedA.filter((id) => claimedB.includes(id))).toEqual([]);
    expect(new Set([...claimedA, ...claimedB])).toEqual(ids);
    // Both "instances" stopped without sending (as if killed): the leases run out, then one drain sends each once.
    await drainOutbox({ now: new Date(leaseUntil.getTime() + 1) });
    for (let i = 0; i < 12; i++) expect(await inbox(`claim.${i}@riders.test`)).toHaveLength(1);
    for (const id of ids) expect(await findOutboundEmail(id)).toMatchObject({ status: "sent", attempts: 2 });
  });

  it("leaves a message alone while another sender's lease holds", async () => {
    const { outboundEmailId } = await queue(message("leased@riders.test"));
    const now = new Date();
    await claimDueEmails({ now, leaseUntil: new Date(now.getTime() + 120_000), claimer: "busy-instance", limit: 5 });
    expect(await drainOutbox({ now: new Date(now.getTime() + 60_000) })).toEqual({ sent: 0, retried: 0, failed: 0 });
    expect(await inbox("leased@riders.test")).toHaveLength(0);
    await drainOutbox({ now: new Date(now.getTime() + 120_001) });
    expect(await inbox("leased@riders.test")).toHaveLength(1);
    expect((await findOutboundEmail(outboundEmailId))?.status).toBe("sent");
  });

  it("an answer lost on the way back is retried with the same key, and the message is delivered once", async () => {
    // Forwards to the mail fake, but drops the connection instead of passing on its first answer.
    let forwarded = 0;
    const lossy: Server = createServer((req, res) => {
      const upstream = httpRequest(`${fake.url}${req.url}`, { method: req.method, headers: req.headers }, (answer) => {
        forwarded += 1;
        if (forwarded === 1) {
          answer.resume();
          answer.on("end", () => res.destroy());
          return;
        }
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      });
      req.pipe(upstream);
    });
    await new Promise<void>((r) => lossy.listen(0, "127.0.0.1", r));
    try {
      useMailApi(`http://127.0.0.1:${(lossy.address() as AddressInfo).port}`);
      const { outboundEmailId } = await queue(message("lost.answer@riders.test"));
      await drainOutbox({ settle: true });
      expect(forwarded).toBe(2);
      const row = await findOutboundEmail(outboundEmailId);
      expect(row).toMatchObject({ status: "sent", attempts: 2 });
      const delivered = await inbox("lost.answer@riders.test");
      expect(delivered).toHaveLength(1);
      expect(delivered[0]!.id).toBe(row!.providerMessageId);
    } finally {
      lossy.closeAllConnections();
      await new Promise((r) => lossy.close(r));
    }
  });

  it("a started worker sends what an earlier run left queued, and a kick after a commit sends at once", async () => {
    const left = await queue(message("left.over@riders.test"));
    // No poll within the test: what arrives was sent by the start and by the kick.
    configureOutbox({ pollMs: 3_600_000 });
    startOutboxWorker();
    await eventually(async () => (await inbox("left.over@riders.test")).length === 1);
    expect((await findOutboundEmail(left.outboundEmailId))?.status).toBe("sent");

    const db = await getDb();
    const fresh = await db.transaction((tx) => queueMail(tx, message("after.commit@riders.test")));
    kickOutbox();
    await eventually(async () => (await inbox("after.commit@riders.test")).length === 1);
    expect((await findOutboundEmail(fresh.outboundEmailId))?.status).toBe("sent");
  });
});
