// The shop's own wording of the rider e-mails: the owner previews it (nothing saved), saves it per
// template, and the next e-mail of that kind carries it with the placeholders filled in; a wording
// with an unknown placeholder is refused naming the field, and what was saved stays.
import { describe, expect, it } from "vitest";
import { GET as listWording, PUT as putWording } from "@/app/api/shop/emails/wording/route";
import { POST as preview } from "@/app/api/shop/emails/preview/route";
import { getDb } from "@/db/client";
import { getShopName } from "@/db/queries/settings";
import { stableUuid } from "@/db/seed-demo";
import { drainOutbox } from "@/lib/mail";
import { notifyRider } from "@/lib/notify";
import { setupTestApp } from "../helpers/app";
import { jsonRequest, noCtx, staffCookie } from "./admin-helpers";

const app = setupTestApp({ seed: true });
const requestId = stableUuid("request:r09");

describe("rider e-mail wording", () => {
  it("previews with the shop's name and saves nothing", async () => {
    const owner = await staffCookie("owner@sagwise.test");
    const response = await noCtx(preview)(
      jsonRequest("/api/shop/emails/preview", "POST", owner, {
        template: "request-received",
        heading: "Thanks, {rider}!",
        intro: "Request {request} is with {shop}'s tuners.",
      }),
    );
    expect(response.status).toBe(200);
    const { html, subject } = (await response.json()) as { html: string; subject: string };
    const shop = await getShopName();
    expect(subject).toContain(shop);
    expect(html).toContain("Thanks, Alex Demo!");
    expect(html).toContain(`Request 1042 is with ${shop.replace(/'/g, "&#x27;")}&#x27;s tuners.`);
    const listed = (await (await noCtx(listWording)(jsonRequest("/api/shop/emails/wording", "GET", owner))).json()) as {
      template: string;
      heading: string | null;
    }[];
    expect(listed.find((r) => r.template === "request-received")?.heading).toBeNull();
  });

  it("saves per template; the next e-mail of that kind carries it, the others keep their own words", async () => {
    const owner = await staffCookie("owner@sagwise.test");
    const saved = await noCtx(putWording)(
      jsonRequest("/api/shop/emails/wording", "PUT", owner, {
        template: "sheet-ready",
        heading: "{rider}, your numbers are in",
        intro: "Here is the setup for request {request}, straight from the bench.",
      }),
    );
    expect(saved.status).toBe(200);
    await notifyRider(await getDb(), requestId, { kind: "sheet-ready", version: 1, tunerName: "Teo", revised: false });
    await notifyRider(await getDb(), requestId, { kind: "request-received" });
    await drainOutbox({ now: new Date(Date.now() + 1000) });
    const sheet = app.sent.find((m) => m.subject === "Your setup sheet for request 9 is ready")!;
    expect(sheet.html).toContain("Dario Lindqvist, your numbers are in");
    expect(sheet.text).toContain("Here is the setup for request 9, straight from the bench.");
    expect(sheet.text).not.toContain("approved the setup for request");
    const received = app.sent.find((m) => m.subject.includes("received your setup request 9"))!;
    expect(received.html).toContain("Your setup request is in");
  });

  it("refuses an unknown placeholder naming the field, and keeps what was saved", async () => {
    const owner = await staffCookie("owner@sagwise.test");
    const bad = await noCtx(putWording)(
      jsonRequest("/api/shop/emails/wording", "PUT", owner, { template: "sheet-ready", intro: "Hi {name}" }),
    );
    expect(bad.status).toBe(400);
    const { fields } = (await bad.json()) as { fields: Record<string, string> };
    expect(fields).toEqual({ intro: "Only {rider}, {request} and {shop} can be filled in: check the words in braces" });
    const listed = (await (await noCtx(listWording)(jsonRequest("/api/shop/emails/wording", "GET", owner))).json()) as {
      template: string;
      intro: string | null;
    }[];
    expect(listed.find((r) => r.template === "sheet-ready")?.intro).toBe(
      "Here is the setup for request {request}, straight from the bench.",
    );
    const unknown = await noCtx(putWording)(
      jsonRequest("/api/shop/emails/wording", "PUT", owner, { template: "staff-invite", heading: "Hi" }),
    );
    expect(unknown.status).toBe(400);
    expect(((await unknown.json()) as { fields: Record<string, string> }).fields.template).toBe(
      "Choose one of the rider e-mails",
    );
  });
});
