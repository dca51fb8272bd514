// Sign-in and roles as a person meets them, in Chromium against the seeded production server.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { mailFor, openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const mailUrl = inject("mailUrl");
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";

describe("health", () => {
  it("answers with the database kind and the newest migration", async () => {
    const response = await fetch(`${baseUrl}/api/health`);
    expect(response.status).toBe(200);
    const body = (await response.json()) as Record<string, unknown>;
    expect(body).toMatchObject({ ok: true, database: "pglite" });
    expect(body.migration).toMatch(/^\d{4}_/);
  });
});

describe("staff", () => {
  let browsing: Browsing;
  beforeAll(async () => {
    browsing = await openBrowser();
  });
  afterAll(() => browsing.close());

  it("an anonymous visit to /shop goes to sign-in", async () => {
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/shop`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    expect(new URL(page.url()).searchParams.get("next")).toBe("/shop");
    await page.close();
  });

  it("a wrong password is refused with a message, the right one opens the queue", async () => {
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=/shop`);
    const staff = page.getByRole("form", { name: "Staff sign-in" });
    await staff.getByLabel("E-mail").fill("tuner@sagwise.test");
    await staff.getByLabel("Password").fill("not-the-password");
    await staff.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => staff.getByRole("alert").textContent()).toContain("do not match");

    await staff.getByLabel("Password").fill(DEMO_PASSWORD);
    await staff.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl}/shop`);
    await expect
      .poll(() => page.getByRole("heading", { level: 1 }).textContent())
      .toBe("Setup requests");
    await page.close();
  });
});

describe("rider", () => {
  let browsing: Browsing;
  beforeAll(async () => {
    browsing = await openBrowser({ viewport: { width: 390, height: 844 } });
  });
  afterAll(() => browsing.close());

  it("signs in with an e-mail link from the mail fake and cannot open the workspace", async () => {
    const email = `rider-${Date.now()}@example.test`;
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    const rider = page.getByRole("form", { name: "Rider sign-in" });
    await rider.getByLabel(/E-mail/).fill(email);
    await rider.getByRole("button", { name: /sign-in link/ }).click();
    await expect.poll(() => page.getByRole("status").textContent()).toContain(email);

    // The outbox worker sends it just after the answer: wait for it to arrive.
    let messages: Awaited<ReturnType<typeof mailFor>> = [];
    await expect.poll(async () => (messages = await mailFor(mailUrl, email)).length).toBe(1);
    const html = messages[0]?.html ?? "";
    const link = /href="([^"]*magic-link\/verify[^"]*)"/.exec(html)?.[1]?.replaceAll("&amp;", "&");
    expect(link, "the e-mail carries the sign-in link").toBeTruthy();

    await page.goto(link!);
    await page.waitForURL(`${baseUrl}/my-requests`);
    await expect.poll(() => page.getByText(`Signed in as ${email}`).count()).toBe(1);

    const shop = await page.goto(`${baseUrl}/shop`);
    expect(shop?.status()).toBe(403);
    const api = await page.request.get(`${baseUrl}/api/requests`);
    expect(api.status()).toBe(403);
    await page.close();
  });
});
