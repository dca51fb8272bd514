// The rider's side in Chromium at phone size (390×844) against the seeded production server: the
// whole request in lb and inches with a reload mid-way, the status link from the e-mail, the sag
// follow-up on an approved request, axe-core on every public page, and (after the merge with the
// staff approval API and the sheet route) approval → sheet download → sag report on the new request.
import AxeBuilder from "@axe-core/playwright";
import { request as playwrightRequest, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { stableUuid } from "@/db/seed-demo";
import { demoStatusToken } from "@/lib/requests/token";
import { tinyPng } from "../fixtures/images";
import { clientHeaders, mailFor, openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const mailUrl = inject("mailUrl");
const SECRET = "e2e-secret-e2e-secret-e2e-secret-0123456789";
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
const demoToken = (key: string) => demoStatusToken(SECRET, stableUuid(`request:${key}`));

let browsing: Browsing;
beforeAll(async () => {
  browsing = await openBrowser({ viewport: { width: 390, height: 844 } });
});
afterAll(() => browsing.close());

/** Nothing may be wider than the phone's screen. */
async function expectNoSideways(page: Page) {
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390);
}

async function expectAccessible(page: Page, what: string) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(bad.map((v) => `${what}: ${v.id} (${v.impact}) ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

const stepHeading = (page: Page) => page.getByRole("heading", { level: 2, name: /^Step \d of 5/ }).textContent();

// Shared with the final test, which needs the staff approval API and the sheet route.
const created: { id?: string; statusPath?: string; email?: string } = {};

describe("a rider's setup request", () => {
  it("completes every step in lb and inches, keeps the draft over a reload, submits and opens the e-mailed link", async () => {
    const email = `phone.rider.${Date.now()}@example.test`;
    created.email = email;
    const page = await browsing.context.newPage();
    await page.goto(baseUrl);
    await expectNoSideways(page);
    await page.getByRole("link", { name: "Start my setup request" }).click();
    await page.waitForURL(`${baseUrl}/request`);
    await expect.poll(() => stepHeading(page)).toContain("Step 1 of 5");

    // A step refuses to move on with errors shown beside the fields.
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => page.getByText("Enter your name").count()).toBe(1);
    await expect.poll(() => page.getByText("Enter your e-mail address").count()).toBe(1);

    await page.getByLabel("Your name").fill("Phone Rider");
    await page.getByLabel("E-mail").fill(email);
    expect(await page.getByLabel("E-mail").getAttribute("inputmode")).toBe("email");
    await page.getByLabel("Your weight").fill("185");
    expect(await page.getByLabel("Your weight").getAttribute("inputmode")).toBe("decimal");
    await page.getByRole("group", { name: "Weight unit" }).getByText("lb").click();
    await page.getByLabel("That weight includes my riding gear").check();
    await page.getByLabel("Height (optional)").fill("70");
    await page.getByRole("group", { name: "Height unit" }).getByText("in").click();
    await page.getByRole("radio", { name: "Advanced" }).check();
    await page.getByRole("radio", { name: "In between" }).check();
    await expectNoSideways(page);
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => stepHeading(page)).toContain("Step 2 of 5");

    await page.getByRole("radio", { name: "Enduro" }).check();
    await page.getByRole("checkbox", { name: "Rocky" }).check();

    // Mid-way: the tab reloads (or the signal drops). Nothing typed is lost.
    await page.reload();
    await expect.poll(() => stepHeading(page)).toContain("Step 2 of 5");
    await expect.poll(() => page.getByText("We kept your answers from last time", { exact: false }).count()).toBe(1);
    expect(await page.getByRole("radio", { name: "Enduro" }).isChecked()).toBe(true);
    expect(await page.getByRole("checkbox", { name: "Rocky" }).isChecked()).toBe(true);
    // Back through the step indicator to the first step: still filled in, lb still chosen.
    await page.getByRole("navigation", { name: "Form steps" }).getByRole("button", { name: /You/ }).click();
    await expect.poll(() => page.getByLabel("Your name").inputValue()).toBe("Phone Rider");
    expect(await page.getByRole("radio", { name: "lb" }).isChecked()).toBe(true);
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => stepHeading(page)).toContain("Step 2 of 5");

    await page.getByRole("checkbox", { name: "Roots" }).check();
    await page.getByRole("radio", { name: "Small (under 10 m)" }).check();
    await page.getByLabel("Hours ridden per month (optional)").fill("12");
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => stepHeading(page)).toContain("Step 3 of 5");

    // The picker searches the shop's catalog; this rider's bike is not in it.
    await page.getByLabel("Search the shop's list").fill("300");
    await expect.poll(() => page.getByRole("radio", { name: /300 two-stroke enduro/ }).count()).toBe(1);
    await expect.poll(() => page.getByRole("radio", { name: /450 four-stroke/ }).count()).toBe(0);
    await page.getByRole("radio", { name: "My bike is not listed" }).check();
    await page.getByLabel("Make, size and type").fill("350 four-stroke enduro, 2019");
    await page.getByLabel("Rear wheel travel").fill("12.8");
    await page.getByRole("group", { name: "Rear travel unit" }).getByText("in").click();
    await page.getByLabel("Fork travel").fill("11.8");
    await page.getByRole("group", { name: "Fork travel unit" }).getByText("in").click();
    await page.getByLabel("Bike weight, ready to ride (optional)").fill("245");
    await page.getByRole("group", { name: "Bike weight unit" }).getByText("lb").click();
    await page.getByLabel("Year (optional)").fill("2019");
    await page.getByLabel(/^Photos of the bike/).setInputFiles({ name: "bike.png", mimeType: "image/png", buffer: Buffer.from(tinyPng()) });
    await expect.poll(() => page.getByRole("button", { name: "Remove bike.png" }).count()).toBe(1);
    await expectNoSideways(page);
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => stepHeading(page)).toContain("Step 4 of 5");

    await page.getByRole("checkbox", { name: "Bottoms out" }).check();
    await page.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await page.getByLabel("Rear static sag (bike on its own weight)").fill("1.4");
    await page.getByLabel("Rear race sag (you aboard in gear)").fill("4.3");
    await page.getByRole("button", { name: "Review" }).click();
    await expect.poll(() => stepHeading(page)).toContain("Step 5 of 5");

    // The review shows everything as given, units included.
    const review = page.getByRole("form", { name: "Review and send" });
    for (const text of ["185 lb (with gear)", "70 in", "Enduro", "Rocky, Roots", "350 four-stroke enduro, 2019 (not in the shop's list)", "12.8 in", "245 lb", "rear static 1.4 in, rear race 4.3 in", "1 photo: bike.png"]) {
      await expect.poll(() => review.getByText(text, { exact: false }).count(), { message: text }).toBeGreaterThan(0);
    }
    await page.getByRole("button", { name: "Send my request" }).click();
    await expect.poll(() => page.getByText("Agree to be contacted about this request").count()).toBe(1);
    await page.getByLabel(/The shop may contact me/).check();
    const posted = page.waitForResponse((r) => r.url() === `${baseUrl}/api/requests` && r.request().method() === "POST");
    await page.getByRole("button", { name: "Send my request" }).click();
    const response = await posted;
    expect(response.status()).toBe(201);
    const body = (await response.json()) as { id: string; statusUrl: string };
    created.id = body.id;
    created.statusPath = body.statusUrl;
    await page.waitForURL(/\/status\/[A-Za-z0-9_-]+\?sent=1$/);
    await expect.poll(() => page.getByRole("status").first().textContent()).toContain("Request sent");
    expect(await page.evaluate(() => window.localStorage.getItem("sagwise.request-draft.v1"))).toBeNull();

    // The confirmation e-mail carries the private link; it opens this request.
    let messages: Awaited<ReturnType<typeof mailFor>> = [];
    await expect.poll(async () => (messages = await mailFor(mailUrl, email)).length).toBe(1);
    const link = /href="([^"]*\/status\/[A-Za-z0-9_-]+)"/.exec(messages[0]!.html ?? "")?.[1];
    expect(link).toBe(`${baseUrl}${body.statusUrl}`);
    await page.goto(link!);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toMatch(/^Request \d+$/);
    await expect.poll(() => page.getByText("Submitted", { exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByText("A tuner will look at your request soon.").count()).toBe(1);
    await expect.poll(() => page.getByText("185 lb (with gear)").count()).toBe(1);
    const img = page.getByRole("img", { name: "Photo 1: bike.png" });
    const src = await img.getAttribute("src");
    const photo = await page.request.get(`${baseUrl}${src}`);
    expect(photo.status()).toBe(200);
    expect(photo.headers()["content-type"]).toBe("image/png");
    expect(Buffer.from(await photo.body())).toEqual(Buffer.from(tinyPng()));
    await expectNoSideways(page);
    await page.close();
  });

  it("reports measured sag on an approved request and gets the verdict at once", async () => {
    const page = await browsing.context.newPage();
    const token = demoToken("r09");
    await page.goto(`${baseUrl}/status/${token}`);
    await expect.poll(() => page.getByText("Approved", { exact: true }).count()).toBe(1);
    const sheet = page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" });
    expect(await sheet.getAttribute("href")).toBe(`/api/requests/${stableUuid("request:r09")}/sheet?version=1&token=${token}`);
    // The cautions sit where the rider will work on springs.
    const safety = page.getByRole("note", { name: "Safety" });
    await expect.poll(() => safety.textContent()).toContain("gas-charged shocks store energy");
    await expect.poll(() => safety.textContent()).toContain("manufacturer's service manual");
    await expect.poll(() => page.getByRole("img", { name: /Race sag = L1 − L3/ }).count()).toBe(1);

    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await form.getByLabel("Rear static sag").fill("1.5");
    await form.getByLabel("Rear race sag").fill("1.2");
    await form.getByRole("button", { name: "Check my sag" }).click();
    await expect.poll(() => form.getByText("Race sag (with you aboard) must be larger than static sag").count()).toBe(1);

    await form.getByLabel("Rear race sag").fill("4.1");
    await form.getByLabel("Front static sag").fill("1.2");
    await form.getByLabel("Front race sag").fill("2.3");
    await form.getByRole("button", { name: "Check my sag" }).click();
    const verdict = form.getByRole("status");
    await expect.poll(() => verdict.textContent()).toMatch(/Shock: Spring is (right|too soft|too stiff)/);
    await expect.poll(() => verdict.textContent()).toMatch(/Fork: Spring is (right|too soft|too stiff)/);
    await expect.poll(() => page.getByText("Your earlier reports").count()).toBe(1);
    await expectNoSideways(page);
    await page.close();
  });
});

describe("accessibility of the public pages (axe-core)", () => {
  it("has no serious or critical violations on any public page", async () => {
    const page = await browsing.context.newPage();
    const pages: [string, string][] = [
      ["landing", "/"],
      ["request form", "/request"],
      ["sign-in", "/sign-in"],
      ["status: submitted", `/status/${demoToken("r01")}`],
      ["status: waiting for rider", `/status/${demoToken("r07")}`],
      ["status: approved with sag form", `/status/${demoToken("r10")}`],
      ["status: declined", `/status/${demoToken("r12")}`],
      ["status: unknown link", "/status/not-a-real-token-not-a-real-token"],
    ];
    for (const [what, path] of pages) {
      await page.goto(`${baseUrl}${path}`);
      await page.waitForLoadState("networkidle");
      await expectAccessible(page, what);
      await expectNoSideways(page);
    }
    // Every step of the form, walked with the validation errors showing on the first one.
    await page.goto(`${baseUrl}/request`);
    await page.evaluate(() => window.localStorage.clear());
    await page.reload();
    await page.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => page.getByText("Enter your name").count()).toBe(1);
    await expectAccessible(page, "request form with errors");
    for (const step of [1, 2, 3, 4]) {
      await page.evaluate((s) => {
        const draft = { version: 1, step: s, reached: 4, values: {}, savedAt: new Date().toISOString() };
        window.localStorage.setItem("sagwise.request-draft.v1", JSON.stringify(draft));
      }, step);
      await page.reload();
      await expect.poll(() => stepHeading(page)).toContain(`Step ${step + 1} of 5`);
      await page.waitForLoadState("networkidle");
      await expectAccessible(page, `request form step ${step + 1}`);
      await expectNoSideways(page);
    }
    await page.evaluate(() => window.localStorage.clear());

    // My requests, signed in with an e-mail link, and one request opened from there without a token.
    const email = "hana.whitlock@example.test";
    await page.goto(`${baseUrl}/sign-in`);
    const rider = page.getByRole("form", { name: "Rider sign-in" });
    await rider.getByLabel(/E-mail/).fill(email);
    await rider.getByRole("button", { name: /sign-in link/ }).click();
    await expect.poll(() => page.getByRole("status").textContent()).toContain(email);
    let mail: Awaited<ReturnType<typeof mailFor>>[number] | undefined;
    await expect.poll(async () => (mail = (await mailFor(mailUrl, email))[0])).toBeTruthy();
    const link = /href="([^"]*magic-link\/verify[^"]*)"/.exec(mail?.html ?? "")?.[1]?.replaceAll("&amp;", "&");
    await page.goto(link!);
    await page.waitForURL(`${baseUrl}/my-requests`);
    await expectAccessible(page, "my requests");
    await page.getByRole("link", { name: /^Request \d+ · 300 two-stroke enduro/ }).click();
    await page.waitForURL(`${baseUrl}/my-requests/${stableUuid("request:r10")}`);
    await expect.poll(() => page.getByText("Approved", { exact: true }).count()).toBe(1);
    expect(await page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" }).getAttribute("href")).toBe(
      `/api/requests/${stableUuid("request:r10")}/sheet?version=1`,
    );
    await expectAccessible(page, "my request");
    await expectNoSideways(page);
    // Another rider's request does not open for this session.
    await page.goto(`${baseUrl}/my-requests/${stableUuid("request:r09")}`);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("No such request for this e-mail");
    expect(await page.getByText("Dario Lindqvist").count()).toBe(0);
    await page.close();
  });
});

// Needs the staff approval API (issue 5) and the sheet route (issue 6): passes after the merge.
describe("after a staff approval (needs issues 5 and 6 merged)", () => {
  it("the rider downloads the approved sheet from the status page and reports sag", async () => {
    expect(created.id, "the first test created a request").toBeTruthy();
    const staff = await playwrightRequest.newContext({ baseURL: baseUrl, extraHTTPHeaders: { origin: baseUrl, ...clientHeaders() } });
    try {
      const signedIn = await staff.post("/api/auth/sign-in/email", { data: { email: "tuner@sagwise.test", password: DEMO_PASSWORD } });
      expect(signedIn.status()).toBe(200);
      const approved = await staff.post(`/api/requests/${created.id}/approve`, { data: {} });
      expect(approved.ok(), `approve answered ${approved.status()}`).toBe(true);
    } finally {
      await staff.dispose();
    }
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}${created.statusPath}`);
    await expect.poll(() => page.getByText("Approved", { exact: true }).count()).toBe(1);
    const href = await page.getByRole("link", { name: "Download setup sheet, version 1 (PDF)" }).getAttribute("href");
    const sheet = await page.request.get(`${baseUrl}${href}`);
    expect(sheet.status()).toBe(200);
    expect(sheet.headers()["content-type"]).toContain("application/pdf");
    expect(Buffer.from(await sheet.body()).subarray(0, 5).toString("latin1")).toBe("%PDF-");

    const form = page.getByRole("form", { name: "Report measured sag" });
    await form.getByRole("group", { name: "Sag unit" }).getByText("in").click();
    await form.getByLabel("Rear static sag").fill("1.4");
    await form.getByLabel("Rear race sag").fill("4.3");
    await form.getByRole("button", { name: "Check my sag" }).click();
    await expect.poll(() => form.getByRole("status").textContent()).toMatch(/Shock: Spring is (right|too soft|too stiff)/);
    await page.close();
  });
});
