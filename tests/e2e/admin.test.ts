// Shop administration in the browser: the admin adds a bike with a progressive leverage curve through
// the catalog form; a rider's request on that bike is then sized on it.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Page } from "playwright-core";
import { mailFor, openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const mailUrl = inject("mailUrl");
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
const BIKE_NAME = `E2E progressive 350 ${Date.now()}`;

// Ratio falling linearly 3.0 → 2.0 over 300 mm: shock travel x(y) = 300·ln(3/(3 − y/300)), so the
// stroke is 300·ln 1.5 = 121.64 mm (calculus; leverage ratio = dy/dx by definition).
const CURVE: [number, number][] = [[0, 3], [100, 2.6667], [200, 2.3333], [300, 2]];
const STROKE = "121.64";

describe("admin catalog", () => {
  let browsing: Browsing;
  let page: Page;
  let bikeId = "";

  beforeAll(async () => {
    browsing = await openBrowser();
    page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=/shop/catalog`);
    const form = page.getByRole("form", { name: "Staff sign-in" });
    await form.getByLabel("E-mail").fill("owner@sagwise.test");
    await form.getByLabel("Password").fill(DEMO_PASSWORD);
    await form.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl}/shop/catalog`);
  });
  afterAll(() => browsing.close());

  it("the admin sees the admin-only pages in the navigation", async () => {
    const nav = page.getByRole("navigation", { name: "Workspace" });
    for (const label of ["Catalog", "Stock", "Tools", "Targets", "Team", "Settings"])
      expect(await nav.getByRole("link", { name: label, exact: true }).count()).toBe(1);
  });

  it("refuses a curve that misses the stroke, then saves a progressive curve", async () => {
    await page.getByRole("link", { name: "Add a bike" }).click();
    await page.waitForURL(`${baseUrl}/shop/catalog/new`);
    const form = page.getByRole("form", { name: "Bike model" });
    await form.getByLabel("Name", { exact: true }).fill(BIKE_NAME);
    await form.getByLabel("Class", { exact: true }).fill("enduro-350-4t");
    await form.getByLabel("Rear wheel travel (mm)").fill("300");
    // The template has 7 points; keep 4.
    for (const n of [7, 6, 5]) await form.getByRole("button", { name: `Remove point ${n}` }).click();
    for (const [i, [y, ratio]] of CURVE.entries()) {
      await form.getByLabel(`Point ${i + 1} wheel travel (mm)`).fill(String(y));
      await form.getByLabel(`Point ${i + 1} leverage ratio`).fill(String(ratio));
    }
    await form.getByLabel("Shock stroke (mm)").fill("140");
    await expect.poll(() => form.getByRole("status").first().textContent()).toContain("does not match the stroke");
    await form.getByRole("button", { name: "Add bike" }).click();
    await expect.poll(() => form.locator("#spec\\.rear\\.shockStrokeMm-error").textContent()).toMatch(/tolerance 2\.1 mm/);

    await form.getByLabel("Shock stroke (mm)").fill(STROKE);
    await expect.poll(() => form.getByRole("status").first().textContent()).toContain("Curve matches the stroke");
    await form.getByRole("button", { name: "Add bike" }).click();
    await page.waitForURL(/\/shop\/catalog\/[0-9a-f-]{36}$/);
    bikeId = page.url().split("/").pop()!;
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(BIKE_NAME);

    const saved = await page.request.get(`${baseUrl}/api/shop/catalog/${bikeId}`);
    expect(saved.status()).toBe(200);
    const model = (await saved.json()) as { rearWheelTravelMm: number; spec: { rear: { shockStrokeMm: number; leverageCurve: { wheelTravelMm: number; ratio: number }[] } } };
    expect(model.rearWheelTravelMm).toBe(300);
    expect(model.spec.rear.shockStrokeMm).toBe(Number(STROKE));
    expect(model.spec.rear.leverageCurve.map((p) => [p.wheelTravelMm, p.ratio])).toEqual(CURVE);
    await page.screenshot({ path: "/tmp/issue7-bike.png", fullPage: true });
  });

  it("an invited tuner joins through the e-mailed link; deactivation signs them out at once", async () => {
    const email = `e2e-tuner-${Date.now()}@example.test`;
    await page.goto(`${baseUrl}/shop/team`);
    const invite = page.getByRole("form", { name: "Invite to the team" });
    await invite.getByLabel("E-mail").fill(email);
    await invite.getByRole("button", { name: "Send invitation" }).click();
    await expect.poll(() => page.getByRole("status").first().textContent()).toContain(`Invitation sent to ${email}`);

    // The outbox worker sends it just after the answer: wait for it to arrive.
    let messages: Awaited<ReturnType<typeof mailFor>> = [];
    await expect.poll(async () => (messages = await mailFor(mailUrl, email)).length).toBe(1);
    const link = /href="([^"]*\/invite\/[^"]+)"/.exec(messages[0]?.html ?? "")?.[1];
    expect(link, "the e-mail carries the invitation link").toBeTruthy();

    const invitee = await openBrowser();
    try {
      const tab = await invitee.context.newPage();
      await tab.goto(link!);
      const accept = tab.getByRole("form", { name: "Accept invitation" });
      await accept.getByLabel("Your name").fill("Tess Newcomer");
      await accept.getByLabel("Password").fill("a-long-password-1");
      await accept.getByRole("button", { name: "Join the workspace" }).click();
      await tab.waitForURL(`${baseUrl}/shop`);
      const nav = tab.getByRole("navigation", { name: "Workspace" });
      expect(await nav.getByRole("link", { name: "Catalog", exact: true }).count()).toBe(1);
      expect(await nav.getByRole("link", { name: "Team", exact: true }).count()).toBe(0);

      await page.reload();
      await page.getByRole("button", { name: "Deactivate Tess Newcomer" }).click();
      await expect.poll(() => page.getByRole("button", { name: "Reactivate Tess Newcomer" }).count()).toBe(1);
      await tab.goto(`${baseUrl}/shop/catalog`);
      expect(new URL(tab.url()).pathname).toBe("/sign-in");
    } finally {
      await invitee.close();
    }
  });

  it("the new bike is in the catalog list", async () => {
    await page.goto(`${baseUrl}/shop/catalog?q=${encodeURIComponent("E2E progressive")}`);
    expect(await page.getByRole("link", { name: BIKE_NAME }).count()).toBe(1);
  });

  // Needs POST /api/requests (issue 4) merged: not in this branch.
  it("a rider's request on the new bike is sized on it", async () => {
    const email = `e2e-rider-${Date.now()}@example.test`;
    const answers = {
      rider: { name: "Test Rider", email, weight: { value: 80, unit: "kg" }, gearIncluded: true, skill: "intermediate", style: "moderate" },
      riding: { discipline: "enduro", terrain: [], jumpSize: "medium" },
      bike: { modelId: bikeId },
      feel: { complaints: [] },
      review: { consent: true },
    };
    const created = await fetch(`${baseUrl}/api/requests`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: baseUrl },
      body: JSON.stringify(answers),
    });
    expect(created.status).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const queue = await page.request.get(`${baseUrl}/api/requests?q=${encodeURIComponent(email)}`);
    const items = ((await queue.json()) as { items: { id: string; bikeLabel: string }[] }).items;
    expect(items.map((i) => [i.id, i.bikeLabel])).toEqual([[id, BIKE_NAME]]);
  });
});
