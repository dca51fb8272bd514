// A tuner's day in the workspace, in Chromium against the seeded production server: find Priya
// Castellane's request (r04, in review; no other browser test touches it) by search, change the
// shock spring and the fork oil level, watch the predicted sag follow, approve, and find the rider's
// e-mail with the sheet link in the mail fake.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { mailFor, openBrowser, type Browsing } from "./browser";

const baseUrl = inject("baseUrl");
const mailUrl = inject("mailUrl");
const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
const RIDER = "priya.castellane@example.test";

const sagNumbers = (text: string | null) => (text?.match(/\d+\.\d/g) ?? []).map(Number);

describe("shop workspace", () => {
  let browsing: Browsing;
  beforeAll(async () => {
    browsing = await openBrowser();
  });
  afterAll(() => browsing.close());

  it("search → adjust with live recompute → approve → rider e-mailed the sheet link", async () => {
    const page = await browsing.context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=/shop`);
    const form = page.getByRole("form", { name: "Staff sign-in" });
    await form.getByLabel("E-mail").fill("tuner@sagwise.test");
    await form.getByLabel("Password").fill(DEMO_PASSWORD);
    await form.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl}/shop`);

    // Search narrows the queue (server-side) to the one rider.
    await page.getByLabel("Search rider, e-mail or bike").fill("castellane");
    await page.waitForURL(/q=castellane/);
    await expect.poll(() => page.getByText(/^1–1 of 1 requests/).count(), { timeout: 15_000 }).toBe(1);
    await page.getByRole("link", { name: "Priya Castellane" }).click();
    await page.waitForURL(/\/shop\/requests\/[0-9a-f-]{36}/);
    const requestId = /requests\/([0-9a-f-]{36})/.exec(page.url())![1]!;
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toMatch(/^Request \d+: Priya Castellane$/);

    const predicted = page.getByRole("status", { name: "Predicted sag" });
    const before = sagNumbers(await predicted.textContent());
    expect(before).toHaveLength(4);

    // Shock: the stiffest spring on the shelf instead of the engine's pick.
    const stock = page.getByLabel("Shock spring rate from stock");
    const options = await stock.locator("option").evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value).filter(Boolean));
    await stock.selectOption(options.at(-1)!);
    await expect.poll(async () => Number(await page.getByLabel("Shock spring rate", { exact: true }).inputValue())).toBeCloseTo(Number(options.at(-1)), 1);
    // The engine re-solves preload to hold the race sag target, so with Hooke's law F = k(p + x) at
    // both sags, race − static = ΔW/k: a stiffer spring leaves MORE static sag (the classic sign of a
    // spring too stiff: common practice, follows from the force law).
    await expect.poll(async () => sagNumbers(await predicted.textContent())[1]!).toBeGreaterThan(before[1]! + 1);

    // Fork: 10 mm lower oil level (more air gap) → less force at full travel (Boyle's law).
    const oil = page.getByLabel("Fork oil level (mm from top)");
    const engineOil = Number(await oil.getAttribute("placeholder"));
    expect(engineOil).toBeGreaterThan(0);
    await oil.fill(String(engineOil + 10));
    const bottoming = page.getByRole("row", { name: /Fork force at full travel/ });
    await expect.poll(() => bottoming.textContent()).toMatch(/changed \(-\d+\)/);

    await page.getByRole("button", { name: /Save and approve/ }).click();
    await expect.poll(() => page.getByRole("status").filter({ hasText: "approved" }).first().textContent(), { timeout: 20_000 }).toContain(
      "Version 1 approved. The rider is being e-mailed the sheet link (see E-mails below).",
    );
    await expect.poll(() => page.locator("header").getByText("Approved", { exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByRole("link", { name: "Version 1: Approved" }).count()).toBe(1);

    // The audit timeline shows the override with old and new values.
    const history = page.getByRole("region", { name: "History" });
    await expect.poll(() => history.textContent()).toContain(`front.oilLevelMm: engine's choice → ${engineOil + 10}`);

    await expect
      .poll(async () => (await mailFor(mailUrl, RIDER)).find((m) => /Your setup sheet for request \d+ is ready/.test(m.subject)), { timeout: 20_000 })
      .toBeTruthy();
    const mail = (await mailFor(mailUrl, RIDER)).find((m) => /setup sheet/.test(m.subject))!;
    expect(`${mail.text}${mail.html}`).toMatch(new RegExp(`/api/requests/${requestId}/sheet\\?version=1&(amp;)?token=[A-Za-z0-9_-]{20,}`));
    await page.close();
  });
});
