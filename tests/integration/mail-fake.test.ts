// The mail fake against the real resend SDK (resend 6.38.0): the SDK is the outside reference for
// the request it sends (parseEmailToApiOptions + post() in node_modules/resend/dist/index.mjs) and
// the response shapes it parses ({ id } on success; ErrorResponse { statusCode, message, name }).
import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Resend } from "resend";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@/fakes/mail/server";
import type { StoredEmail } from "@/fakes/mail/store";

type Listing = { object: "list"; has_more: boolean; data: StoredEmail[] };

const FROM = "Sagwise demo shop <setup@sagwise.test>";
const RIDER = "rider.one@riders.test";
const HTML = `<p>Hello "Pat" &amp; crew <script>alert(1)</script><a href="https://demo.sagwise.test/r/abc?x=1&amp;y=2">Open</a></p>`;

let dir: string;
let fake: MailFake;
let resend: Resend;

async function getJson<T = Listing>(url: string): Promise<{ status: number; body: T }> {
  const res = await fetch(url);
  return { status: res.status, body: (await res.json()) as T };
}

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-mail-fake-"));
  fake = await startMailFake({ port: 0, dir });
  resend = new Resend("re_test_key", { baseUrl: fake.url });
});
afterAll(async () => {
  await fake.close();
  rmSync(dir, { recursive: true, force: true });
});
afterEach(async () => {
  await fetch(`${fake.url}/emails`, { method: "DELETE" });
});

describe("mail fake: send through the resend SDK", () => {
  it("accepts a send, answers { id }, and lists and shows the message as sent", async () => {
    const pdf = Buffer.from("%PDF-1.7 fake sheet bytes");
    const { data, error } = await resend.emails.send({
      from: FROM,
      to: [RIDER],
      cc: "tuner@sagwise.test",
      replyTo: "shop@sagwise.test",
      subject: "Your setup sheet <v2>",
      html: HTML,
      text: "Open https://demo.sagwise.test/r/abc",
      headers: { "X-Sagwise-Request": "1042" },
      tags: [{ name: "template", value: "approved" }],
      attachments: [{ filename: 'setup-sheet "v2".pdf', content: pdf, contentType: "application/pdf" }],
    });
    expect(error).toBeNull();
    expect(data?.id).toMatch(/^[0-9a-f-]{36}$/);
    const id = data!.id;

    const list = await getJson(`${fake.url}/emails`);
    expect(list.status).toBe(200);
    expect(list.body.object).toBe("list");
    expect(list.body.data).toHaveLength(1);
    expect(list.body.data[0]).toMatchObject({
      id,
      from: FROM,
      to: [RIDER],
      cc: ["tuner@sagwise.test"],
      reply_to: ["shop@sagwise.test"],
      subject: "Your setup sheet <v2>",
      html: HTML,
    });
    // The listing keeps attachment names and sizes but not their bodies.
    expect(list.body.data[0]?.attachments[0]).toEqual({
      filename: 'setup-sheet "v2".pdf',
      content_type: "application/pdf",
      content_id: null,
      path: null,
      size: pdf.length,
    });

    const one = await getJson<StoredEmail>(`${fake.url}/emails/${id}`);
    expect(one.body).toMatchObject({
      id,
      headers: { "X-Sagwise-Request": "1042" },
      tags: [{ name: "template", value: "approved" }],
      text: "Open https://demo.sagwise.test/r/abc",
    });
    expect(Buffer.from(one.body.attachments[0]?.content ?? "", "base64").equals(pdf)).toBe(true);

    // The SDK's own getter parses the same record.
    const viaSdk = await resend.emails.get(id);
    expect(viaSdk.data?.subject).toBe("Your setup sheet <v2>");

    const download = await fetch(`${fake.url}/inbox/${id}/attachments/0`);
    expect(download.headers.get("content-disposition")).toBe(
      `attachment; filename="setup-sheet v2.pdf"; filename*=UTF-8''setup-sheet%20v2.pdf`,
    );
    expect(Buffer.from(await download.arrayBuffer()).equals(pdf)).toBe(true);
  });

  it("shows the message in the inbox with its html escaped into a sandboxed srcdoc", async () => {
    const { data } = await resend.emails.send({
      from: FROM,
      to: RIDER,
      subject: "Sign in <now> & go",
      html: HTML,
      text: "plain part here",
    });
    const inbox = await (await fetch(`${fake.url}/`)).text();
    expect(inbox).toContain("Sign in &lt;now&gt; &amp; go");
    expect(inbox).toContain(`href="/inbox/${data!.id}"`);

    const res = await fetch(`${fake.url}/inbox/${data!.id}`);
    expect(res.headers.get("content-security-policy")).toContain("default-src 'none'");
    const page = await res.text();
    const iframe = /<iframe[^>]*>/.exec(page)?.[0] ?? "";
    expect(iframe).toMatch(/sandbox="[^"]*"/);
    expect(iframe).not.toContain("allow-scripts");
    expect(iframe).not.toContain("allow-same-origin");
    const srcdoc = /srcdoc="([^"]*)"/.exec(iframe)?.[1];
    expect(srcdoc).toBe(
      "&lt;p&gt;Hello &quot;Pat&quot; &amp;amp; crew &lt;script&gt;alert(1)&lt;/script&gt;&lt;a href=&quot;https://demo.sagwise.test/r/abc?x=1&amp;amp;y=2&quot;&gt;Open&lt;/a&gt;&lt;/p&gt;",
    );
    expect(page).not.toContain("<script>");
    expect(page).toContain("<pre>plain part here</pre>");
    expect(page).toContain('href="https://demo.sagwise.test/r/abc?x=1&amp;y=2"');
  });

  it("lists newest first and filters by recipient", async () => {
    const a = await resend.emails.send({ from: FROM, to: "a@riders.test", subject: "first", text: "1" });
    const b = await resend.emails.send({ from: FROM, to: "Bee Rider <B@Riders.test>", subject: "second", text: "2" });
    const c = await resend.emails.send({ from: FROM, to: "a@riders.test", subject: "third", text: "3" });
    const all = await getJson(`${fake.url}/emails`);
    expect(all.body.data.map((m: { subject: string }) => m.subject)).toEqual(["third", "second", "first"]);
    const toA = await getJson(`${fake.url}/emails?to=${encodeURIComponent("A@riders.test")}`);
    expect(toA.body.data.map((m: { id: string }) => m.id)).toEqual([c.data!.id, a.data!.id]);
    const toB = await getJson(`${fake.url}/emails?to=b@riders.test`);
    expect(toB.body.data.map((m: { id: string }) => m.id)).toEqual([b.data!.id]);
  });

  it("answers a batch send with one id per e-mail", async () => {
    const { data, error } = await resend.batch.send([
      { from: FROM, to: "one@riders.test", subject: "b1", text: "x" },
      { from: FROM, to: "two@riders.test", subject: "b2", html: "<p>y</p>" },
    ]);
    expect(error).toBeNull();
    expect(data?.data).toHaveLength(2);
    const listed = await getJson(`${fake.url}/emails`);
    expect(listed.body.data.map((m: { id: string }) => m.id).sort()).toEqual(data!.data.map((d) => d.id).sort());
  });

  it("returns the same id for a repeated Idempotency-Key and stores the message once", async () => {
    const payload = { from: FROM, to: RIDER, subject: "once", text: "x" };
    const first = await resend.emails.send(payload, { idempotencyKey: "sagwise-outbound-1" });
    const again = await resend.emails.send(payload, { idempotencyKey: "sagwise-outbound-1" });
    expect(again.data?.id).toBe(first.data?.id);
    expect((await getJson(`${fake.url}/emails`)).body.data).toHaveLength(1);
  });
});

describe("mail fake: rejections in the API's error shape", () => {
  it.each([
    ["to", { from: FROM, subject: "s", text: "t" }],
    ["subject", { from: FROM, to: RIDER, text: "t" }],
    ["from", { to: RIDER, subject: "s", text: "t" }],
  ])("422 names the missing `%s`", async (field, body) => {
    const { data, error } = await resend.emails.send(body as never);
    expect(data).toBeNull();
    expect(error).toEqual({ statusCode: 422, name: "missing_required_field", message: `Missing \`${field}\` field.` });
  });

  it("422 names a malformed address and a batch item by index", async () => {
    const bad = await resend.emails.send({ from: FROM, to: "not-an-address", subject: "s", text: "t" });
    expect(bad.error?.statusCode).toBe(422);
    expect(bad.error?.message).toContain("`to`");
    const batch = await resend.batch.send([
      { from: FROM, to: RIDER, subject: "ok", text: "t" },
      { from: FROM, to: RIDER, text: "t" } as never,
    ]);
    expect(batch.error).toEqual({
      statusCode: 422,
      name: "missing_required_field",
      message: "Missing `[1].subject` field.",
    });
    expect((await getJson(`${fake.url}/emails`)).body.data).toHaveLength(0);
  });

  it("401 without a Bearer key, and nothing is stored", async () => {
    const res = await fetch(`${fake.url}/emails`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ from: FROM, to: RIDER, subject: "s", text: "t" }),
    });
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ statusCode: 401, name: "missing_api_key" });
    expect((await getJson(`${fake.url}/emails`)).body.data).toHaveLength(0);
  });

  it("404 in the same shape for an unknown message", async () => {
    const missing = await getJson<unknown>(`${fake.url}/emails/00000000-0000-4000-8000-000000000000`);
    expect(missing).toEqual({ status: 404, body: { statusCode: 404, name: "not_found", message: "Email not found." } });
  });
});

describe("mail fake: persistence", () => {
  it("keeps messages on disk across a restart, and DELETE clears them", async () => {
    const { data } = await resend.emails.send({ from: FROM, to: RIDER, subject: "kept", text: "t" });
    expect(readdirSync(dir)).toEqual([`${data!.id}.json`]);
    await fake.close();
    fake = await startMailFake({ port: 0, dir });
    resend = new Resend("re_test_key", { baseUrl: fake.url });
    const after = await getJson(`${fake.url}/emails`);
    expect(after.body.data.map((m: { id: string; subject: string }) => [m.id, m.subject])).toEqual([
      [data!.id, "kept"],
    ]);
    // A message sent after the restart still sorts first.
    await resend.emails.send({ from: FROM, to: RIDER, subject: "newer", text: "t" });
    expect((await getJson(`${fake.url}/emails`)).body.data[0]?.subject).toBe("newer");

    const cleared = await fetch(`${fake.url}/emails`, { method: "DELETE" });
    expect(await cleared.json()).toEqual({ deleted: 2 });
    expect(readdirSync(dir)).toEqual([]);
  });
});
